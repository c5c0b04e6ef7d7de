using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Data.Tests.Support;

namespace TrussWeb.Data.Tests;

/// <summary>The shared data behaviours on a real SQLite file, plus the SQLite pragmas.</summary>
public sealed class SqliteDataTests : DataBehaviourTests
{
    [Fact]
    public async Task Journal_mode_is_wal_on_the_context_connection_and_in_the_file()
    {
        await using (var context = await CreateContextAsync())
        {
            await context.Database.OpenConnectionAsync();
            var connection = context.Database.GetDbConnection();
            Assert.Equal("wal", await ScalarAsync(connection, "PRAGMA journal_mode"));
            Assert.Equal("1", await ScalarAsync(connection, "PRAGMA foreign_keys"));
            Assert.Equal("5000", await ScalarAsync(connection, "PRAGMA busy_timeout"));
        }

        // WAL is a property of the file: a plain connection without the interceptor sees it too.
        await using var plain = new SqliteConnection(Database.ConnectionString);
        await plain.OpenAsync();
        Assert.Equal("wal", await ScalarAsync(plain, "PRAGMA journal_mode"));
    }

    [Fact]
    public async Task A_database_file_made_elsewhere_in_rollback_journal_mode_is_switched_to_wal_when_opened()
    {
        var database = (SqliteTestDatabase)await NewDatabaseAsync();
        await using (var plain = new SqliteConnection(database.ConnectionString))
        {
            await plain.OpenAsync();
            await using var create = plain.CreateCommand();
            create.CommandText = "CREATE TABLE made_elsewhere (id INTEGER PRIMARY KEY)";
            await create.ExecuteNonQueryAsync();
            Assert.Equal("delete", await ScalarAsync(plain, "PRAGMA journal_mode"));
        }

        SqliteConnection.ClearAllPools();
        var services = NewServices(database);
        await DatabaseMigrator.MigrateAsync(services);

        await using var check = new SqliteConnection(database.ConnectionString);
        await check.OpenAsync();
        Assert.Equal("wal", await ScalarAsync(check, "PRAGMA journal_mode"));
    }

    [Fact]
    public async Task Without_a_connection_string_the_database_is_data_trussweb_db_under_the_content_root()
    {
        var root = Path.Combine(Path.GetTempPath(), "trussweb-data-tests", Guid.NewGuid().ToString("N"));
        try
        {
            var configuration = new ConfigurationBuilder().Build();
            var services = new ServiceCollection().AddTrussWebData(configuration, root).BuildServiceProvider();
            await using (services)
            {
                await DatabaseMigrator.MigrateAsync(services);
            }

            Assert.True(File.Exists(Path.Combine(root, "data", "trussweb.db")));
        }
        finally
        {
            SqliteConnection.ClearAllPools();
            Directory.Delete(root, recursive: true);
        }
    }

    protected override Task<TestDatabase> CreateEmptyDatabaseAsync() => Task.FromResult<TestDatabase>(new SqliteTestDatabase());

    private static async Task<string?> ScalarAsync(System.Data.Common.DbConnection connection, string sql)
    {
        await using var command = connection.CreateCommand();
        command.CommandText = sql;
        return Convert.ToString(await command.ExecuteScalarAsync(), System.Globalization.CultureInfo.InvariantCulture);
    }
}
