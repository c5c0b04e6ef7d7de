using System.Collections.Concurrent;
using System.Runtime.CompilerServices;
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
/// timeout (30 s). In front of that, an in-process gate per database file makes the waiting writers
/// first come, first served.</item>
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

        if (!db.Database.IsNpgsql())
        {
            // SQLite's own waiting writers poll (busy handler), so a writer that has just finished often takes the
            // lock again ahead of ones that waited long. An in-process first-come-first-served gate per database file
            // in front of BEGIN IMMEDIATE keeps the queue fair (SQLite serves one app process, docs/dev/data.md).
            var gate = SqliteGates.GetOrAdd(db.Database.GetConnectionString() ?? string.Empty, _ => new SemaphoreSlim(1, 1));
            if (!await gate.WaitAsync(GateWait, cancellationToken).ConfigureAwait(false))
            {
                throw new TimeoutException($"The database stayed busy with other saves for {GateWait.TotalSeconds:0} s; nothing was saved, try again.");
            }

            var lease = new GateLease(gate);
            try
            {
                // non-deferred = BEGIN IMMEDIATE: the file's write lock is taken here
                var immediate = await db.Database.BeginTransactionAsync(cancellationToken).ConfigureAwait(false);
                Leases.AddOrUpdate(db, lease);
                db.ReleaseOnDispose(lease); // an early return (nothing saved) disposes the context: rolled back, then released
                return immediate;
            }
            catch
            {
                lease.Dispose();
                throw;
            }
        }

        // PostgreSQL: READ COMMITTED, so every statement after the lock below sees what the previous holder committed.
        var transaction = await db.Database.BeginTransactionAsync(cancellationToken).ConfigureAwait(false);
        await db.Database.ExecuteSqlInterpolatedAsync($"SELECT 1 FROM \"Trusses\" WHERE \"Id\" = {trussId} FOR NO KEY UPDATE", cancellationToken)
            .ConfigureAwait(false);
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

        if (Leases.TryGetValue(db, out var lease))
        {
            Leases.Remove(db);
            lease.Dispose();
        }
    }

    /// <summary>The longest a SQLite save waits at the in-process gate (Microsoft.Data.Sqlite's command timeout is 30 s per statement).</summary>
    private static readonly TimeSpan GateWait = TimeSpan.FromSeconds(60);

    private static readonly ConcurrentDictionary<string, SemaphoreSlim> SqliteGates = new(StringComparer.Ordinal);

    private static readonly ConditionalWeakTable<TrussWebDbContext, GateLease> Leases = new();

    /// <summary>One holding of a SQLite gate, released once (on commit or on the context's disposal, whichever is first).</summary>
    private sealed class GateLease(SemaphoreSlim gate) : IDisposable
    {
        private int released;

        public void Dispose()
        {
            if (Interlocked.Exchange(ref released, 1) == 0)
            {
                gate.Release();
            }
        }
    }
}
