using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Diagnostics;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Interceptors;

/// <summary>
/// Bumps the <see cref="IVersioned.Version"/> concurrency token: 1 on insert, original + 1 on update.
/// EF Core compares the original value in the WHERE clause, so a save over a row someone else saved
/// since it was loaded affects no row and raises <see cref="DbUpdateConcurrencyException"/>. Working
/// from the original value (not the current one) keeps a retry after refreshing the originals correct.
/// </summary>
public sealed class VersionInterceptor : SaveChangesInterceptor
{
    /// <summary>The shared instance (the interceptor holds no state).</summary>
    public static VersionInterceptor Instance { get; } = new();

    /// <inheritdoc />
    public override InterceptionResult<int> SavingChanges(DbContextEventData eventData, InterceptionResult<int> result)
    {
        ArgumentNullException.ThrowIfNull(eventData);
        Bump(eventData.Context);
        return base.SavingChanges(eventData, result);
    }

    /// <inheritdoc />
    public override ValueTask<InterceptionResult<int>> SavingChangesAsync(
        DbContextEventData eventData, InterceptionResult<int> result, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(eventData);
        Bump(eventData.Context);
        return base.SavingChangesAsync(eventData, result, cancellationToken);
    }

    private static void Bump(DbContext? context)
    {
        if (context is null)
        {
            return;
        }

        foreach (var entry in context.ChangeTracker.Entries<IVersioned>())
        {
            var version = entry.Property(e => e.Version);
            switch (entry.State)
            {
                case EntityState.Added:
                    version.CurrentValue = 1;
                    break;
                case EntityState.Modified:
                    version.CurrentValue = version.OriginalValue + 1;
                    break;
            }
        }
    }
}
