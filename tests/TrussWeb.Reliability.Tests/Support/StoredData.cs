using System.Globalization;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;
using Npgsql;
using TrussWeb.Data;

namespace TrussWeb.Reliability.Tests.Support;

/// <summary>A member row as stored.</summary>
public sealed record StoredMember(Guid Id, string Mark, double? Kx, long Version);

/// <summary>Reads a database after the fact with the app's own data layer (a fresh context), and runs the engine's integrity checks.</summary>
public static class StoredData
{
    public static async Task<T> WithContextAsync<T>(string provider, string connectionString, Func<TrussWebDbContext, Task<T>> read)
    {
        var configuration = new ConfigurationBuilder().AddInMemoryCollection(new Dictionary<string, string?>
        {
            [DatabaseSettings.ProviderKey] = provider,
            [DatabaseSettings.ConnectionStringKey] = connectionString,
        }).Build();
        var services = new ServiceCollection().AddLogging();
        services.AddTrussWebData(configuration, Path.GetTempPath());
        await using var provider_ = services.BuildServiceProvider();
        await using var scope = provider_.CreateAsyncScope();
        var factory = scope.ServiceProvider.GetRequiredService<IDbContextFactory<TrussWebDbContext>>();
        await using var db = await factory.CreateDbContextAsync();
        return await read(db);
    }

    public static Task<Dictionary<Guid, StoredMember>> MembersAsync(TestDatabase database) => MembersAsync(database.Provider.ToString(), database.ConnectionString);

    public static Task<Dictionary<Guid, StoredMember>> MembersAsync(string provider, string connectionString) =>
        WithContextAsync(provider, connectionString, async db => (await db.TrussMembers.AsNoTracking().ToListAsync())
            .ToDictionary(m => m.Id, m => new StoredMember(m.Id, m.Mark, m.Kx, m.Version)));

    /// <summary>The Kx values the audit log recorded per member (every Updated entry of field Kx).</summary>
    public static Task<ILookup<Guid, double>> AuditedKxAsync(string provider, string connectionString) =>
        WithContextAsync(provider, connectionString, async db => (await db.AuditEntries.AsNoTracking()
                .Where(a => a.EntityType == "TrussMember" && a.Field == "Kx" && a.NewValue != null).ToListAsync())
            .ToLookup(a => Guid.Parse(a.EntityId), a => double.Parse(a.NewValue!, CultureInfo.InvariantCulture)));

    /// <summary><c>PRAGMA integrity_check</c> of a SQLite file (opened read-only after the writer died; the WAL is recovered on open).</summary>
    public static string SqliteIntegrity(string file)
    {
        SqliteConnection.ClearAllPools();
        using var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = file, Pooling = false }.ToString());
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = "PRAGMA integrity_check";
        var lines = new List<string>();
        using var reader = command.ExecuteReader();
        while (reader.Read())
        {
            lines.Add(reader.GetString(0));
        }

        return string.Join("; ", lines);
    }

    /// <summary>PostgreSQL's amcheck over every B-tree index of the public schema; returns how many indexes were checked (an error throws).</summary>
    public static async Task<int> PostgresIndexCheckAsync(string connectionString)
    {
        await using var connection = new NpgsqlConnection(connectionString);
        await connection.OpenAsync();
        await using (var create = new NpgsqlCommand("CREATE EXTENSION IF NOT EXISTS amcheck", connection))
        {
            await create.ExecuteNonQueryAsync();
        }

        await using var check = new NpgsqlCommand(
            "SELECT count(bt_index_check(c.oid, true)) FROM pg_index i JOIN pg_class c ON c.oid = i.indexrelid JOIN pg_am a ON a.oid = c.relam " +
            "WHERE a.amname = 'btree' AND c.relnamespace = 'public'::regnamespace", connection);
        return Convert.ToInt32(await check.ExecuteScalarAsync(), CultureInfo.InvariantCulture);
    }
}
