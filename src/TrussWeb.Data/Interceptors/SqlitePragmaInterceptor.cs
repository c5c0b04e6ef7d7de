using System.Data.Common;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore.Diagnostics;

namespace TrussWeb.Data.Interceptors;

/// <summary>
/// Sets the SQLite pragmas on every connection EF Core opens: WAL journal (readers do not block the
/// writer; the setting is persistent in the file), foreign keys on, and a busy timeout so a writer
/// waits for another instead of failing at once.
/// </summary>
public sealed class SqlitePragmaInterceptor : DbConnectionInterceptor
{
    /// <summary>Milliseconds a connection waits for a lock before SQLite reports busy.</summary>
    public const int BusyTimeoutMilliseconds = 5000;

    private static readonly string ConnectionPragmas =
        $"PRAGMA foreign_keys=ON; PRAGMA busy_timeout={BusyTimeoutMilliseconds};";

    // A read-only connection (EF Core opens one to test whether the file exists) cannot change the
    // journal mode of a file in rollback mode: it only gets the per-connection pragmas. 2026-12-01.
    private static readonly string WritablePragmas = "PRAGMA journal_mode=WAL; " + ConnectionPragmas;

    /// <summary>The shared instance (the interceptor holds no state).</summary>
    public static SqlitePragmaInterceptor Instance { get; } = new();

    /// <inheritdoc />
    public override void ConnectionOpened(DbConnection connection, ConnectionEndEventData eventData)
    {
        ArgumentNullException.ThrowIfNull(connection);
        using var command = connection.CreateCommand();
        command.CommandText = PragmasFor(connection);
        command.ExecuteNonQuery();
    }

    /// <inheritdoc />
    public override async Task ConnectionOpenedAsync(
        DbConnection connection, ConnectionEndEventData eventData, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(connection);
        var command = connection.CreateCommand();
        await using (command.ConfigureAwait(false))
        {
            command.CommandText = PragmasFor(connection);
            await command.ExecuteNonQueryAsync(cancellationToken).ConfigureAwait(false);
        }
    }

    private static string PragmasFor(DbConnection connection) =>
        new SqliteConnectionStringBuilder(connection.ConnectionString).Mode == SqliteOpenMode.ReadOnly
            ? ConnectionPragmas
            : WritablePragmas;
}
