using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Storage;
using TrussWeb.Data;

namespace TrussWeb.Services.Common;

/// <summary>
/// The per-truss write lock. Every save of a truss re-designs the whole truss and replaces all its snapshot rows,
/// so two saves of one truss must not overlap: each opens its transaction and takes this lock before it reads the
/// truss, and holds it until it commits (or the context is disposed, which rolls back). Saves of one truss
/// therefore queue instead of racing, and each one designs the state the previous one committed.
/// <list type="bullet">
/// <item>PostgreSQL: <c>SELECT ... FOR NO KEY UPDATE</c> on the truss row, a transaction-scoped row lock, so it
/// holds across app instances over one database. It does not block foreign-key checks of other transactions
/// (those take KEY SHARE), only other writers of the same truss and the truss row's own UPDATE/DELETE.</item>
/// <item>SQLite: the transaction begins IMMEDIATE (Microsoft.Data.Sqlite's non-deferred BEGIN), so it takes the
/// database's single write lock at its start instead of upgrading a read transaction later (which in WAL mode
/// fails at once with SQLITE_BUSY when another writer committed meanwhile). Waiting writers are held by
/// busy_timeout (5 s, SqlitePragmaInterceptor) and then by Microsoft.Data.Sqlite's own retry until the command
/// timeout (30 s).</item>
/// </list>
/// The caller's row versions are still checked on save (optimistic), so a stale edit of the same row is still a
/// Conflict. The lock only removes races between saves of different rows of one truss.
/// </summary>
internal static class TrussWriteLock
{
    /// <summary>
    /// Begins the transaction of a truss save on <paramref name="db"/> and takes the truss's write lock. Call it
    /// before the truss is loaded; commit with <see cref="CommitAsync"/> after SaveChanges.
    /// </summary>
    public static async Task<IDbContextTransaction> AcquireAsync(TrussWebDbContext db, Guid trussId, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(db);
        if (db.Database.CurrentTransaction is { } open)
        {
            return open;
        }

        // SQLite: non-deferred = BEGIN IMMEDIATE (the write lock is taken here). PostgreSQL: READ COMMITTED, so every
        // statement after the lock below sees what the previous holder committed.
        var transaction = await db.Database.BeginTransactionAsync(cancellationToken).ConfigureAwait(false);
        if (db.Database.IsNpgsql())
        {
            await db.Database.ExecuteSqlInterpolatedAsync($"SELECT 1 FROM \"Trusses\" WHERE \"Id\" = {trussId} FOR NO KEY UPDATE", cancellationToken)
                .ConfigureAwait(false);
        }

        return transaction;
    }

    /// <summary>Whether <paramref name="db"/> holds a truss write lock (an open transaction begun by <see cref="AcquireAsync"/>).</summary>
    public static bool IsHeld(TrussWebDbContext db) => db.Database.CurrentTransaction is not null;

    /// <summary>Commits the open truss transaction, if any, which releases the lock.</summary>
    public static async Task CommitAsync(TrussWebDbContext db, CancellationToken cancellationToken)
    {
        if (db.Database.CurrentTransaction is { } transaction)
        {
            await transaction.CommitAsync(cancellationToken).ConfigureAwait(false);
            await transaction.DisposeAsync().ConfigureAwait(false);
        }
    }
}
