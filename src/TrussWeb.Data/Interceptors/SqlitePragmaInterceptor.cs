using System.Data.Common;
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

    private static readonly string Pragmas =
        $"PRAGMA journal_mode=WAL; PRAGMA foreign_keys=ON; PRAGMA busy_timeout={BusyTimeoutMilliseconds};";

    /// <summary>The shared instance (the interceptor holds no state).</summary>
    public static SqlitePragmaInterceptor Instance { get; } = new();

    /// <inheritdoc />
    public override void ConnectionOpened(DbConnection connection, ConnectionEndEventData eventData)
    {
        ArgumentNullException.ThrowIfNull(connection);
        using var command = connection.CreateCommand();
        command.CommandText = Pragmas;
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
            command.CommandText = Pragmas;
            await command.ExecuteNonQueryAsync(cancellationToken).ConfigureAwait(false);
        }
    }
}
