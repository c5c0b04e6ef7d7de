using Microsoft.Data.Sqlite;
using TrussWeb.Data;
using Xunit;

namespace TrussWeb.Testing;

/// <summary>A SQLite database file in its own temporary folder.</summary>
public sealed class SqliteTestDatabase : TestDatabase
{
    public SqliteTestDatabase()
    {
        Folder = Path.Combine(Path.GetTempPath(), "trussweb-tests", Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(Folder);
        FilePath = Path.Combine(Folder, "trussweb.db");
        ConnectionString = new SqliteConnectionStringBuilder { DataSource = FilePath }.ToString();
    }

    public string Folder { get; }

    public string FilePath { get; }

    public override DatabaseProvider Provider => DatabaseProvider.Sqlite;

    public override string ConnectionString { get; }

    public override ValueTask DisposeAsync()
    {
        SqliteConnection.ClearAllPools();
        Directory.Delete(Folder, recursive: true);
        return ValueTask.CompletedTask;
    }
}
