using Npgsql;
using TrussWeb.Data;
using Xunit;

namespace TrussWeb.Testing;

/// <summary>A fresh database on the test cluster, dropped on dispose.</summary>
public sealed class PostgresTestDatabase : TestDatabase
{
    private readonly string adminConnectionString;
    private readonly string name;

    private PostgresTestDatabase(string adminConnectionString, string name, string connectionString)
    {
        this.adminConnectionString = adminConnectionString;
        this.name = name;
        ConnectionString = connectionString;
    }

    public override DatabaseProvider Provider => DatabaseProvider.Postgres;

    public override string ConnectionString { get; }

    public static async Task<PostgresTestDatabase> CreateAsync(string adminConnectionString)
    {
        var name = "trussweb_test_" + Guid.NewGuid().ToString("N");
        await using (var connection = new NpgsqlConnection(adminConnectionString))
        {
            await connection.OpenAsync();
            await using var command = new NpgsqlCommand($"CREATE DATABASE \"{name}\"", connection);
            await command.ExecuteNonQueryAsync();
        }

        var connectionString = new NpgsqlConnectionStringBuilder(adminConnectionString) { Database = name }.ToString();
        return new PostgresTestDatabase(adminConnectionString, name, connectionString);
    }

    public override async ValueTask DisposeAsync()
    {
        NpgsqlConnection.ClearAllPools();
        await using var connection = new NpgsqlConnection(adminConnectionString);
        await connection.OpenAsync();
        await using var command = new NpgsqlCommand($"DROP DATABASE IF EXISTS \"{name}\" WITH (FORCE)", connection);
        await command.ExecuteNonQueryAsync();
    }
}
