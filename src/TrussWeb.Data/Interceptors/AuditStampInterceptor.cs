using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Diagnostics;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Interceptors;

/// <summary>
/// Stamps <see cref="IAuditable"/> rows on save: insert sets Created* and Updated*, update sets
/// Updated* and keeps Created* as stored. Time comes from the injected <see cref="TimeProvider"/> and
/// the user from <see cref="ICurrentUser"/>, so tests can fix both.
/// </summary>
public sealed class AuditStampInterceptor : SaveChangesInterceptor
{
    private readonly TimeProvider timeProvider;
    private readonly ICurrentUser currentUser;

    public AuditStampInterceptor(TimeProvider timeProvider, ICurrentUser currentUser)
    {
        ArgumentNullException.ThrowIfNull(timeProvider);
        ArgumentNullException.ThrowIfNull(currentUser);
        this.timeProvider = timeProvider;
        this.currentUser = currentUser;
    }

    /// <inheritdoc />
    public override InterceptionResult<int> SavingChanges(DbContextEventData eventData, InterceptionResult<int> result)
    {
        ArgumentNullException.ThrowIfNull(eventData);
        Stamp(eventData.Context);
        return base.SavingChanges(eventData, result);
    }

    /// <inheritdoc />
    public override ValueTask<InterceptionResult<int>> SavingChangesAsync(
        DbContextEventData eventData, InterceptionResult<int> result, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(eventData);
        Stamp(eventData.Context);
        return base.SavingChangesAsync(eventData, result, cancellationToken);
    }

    private void Stamp(DbContext? context)
    {
        if (context is null)
        {
            return;
        }

        var now = timeProvider.GetUtcNow().UtcDateTime;
        var user = currentUser.UserId;
        foreach (var entry in context.ChangeTracker.Entries<IAuditable>())
        {
            switch (entry.State)
            {
                case EntityState.Added:
                    entry.Entity.CreatedUtc = now;
                    entry.Entity.CreatedBy = user;
                    entry.Entity.UpdatedUtc = now;
                    entry.Entity.UpdatedBy = user;
                    break;
                case EntityState.Modified:
                    entry.Property(e => e.CreatedUtc).IsModified = false;
                    entry.Property(e => e.CreatedBy).IsModified = false;
                    entry.Entity.UpdatedUtc = now;
                    entry.Entity.UpdatedBy = user;
                    break;
            }
        }
    }
}
