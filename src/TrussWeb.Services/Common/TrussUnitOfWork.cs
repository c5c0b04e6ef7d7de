using Microsoft.EntityFrameworkCore;
using TrussWeb.Core.Validation;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Authorization;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Design;
using TrussWeb.Services.Trusses;

namespace TrussWeb.Services.Common;

/// <summary>
/// The shared steps of every truss use case: load the truss with everything it owns, authorize, and
/// commit (re-design, replace snapshots, write the audit, save in one transaction, turn a lost race
/// into a Conflict result). A save loads with <see cref="LoadForWriteAsync{T}"/>, which takes the truss's
/// write lock (<see cref="TrussWriteLock"/>) first, so saves of one truss queue instead of racing.
/// </summary>
internal sealed class TrussUnitOfWork(IDbContextFactory<TrussWebDbContext> factory, Authorizer authorizer, TimeProvider clock, IReviewEvents reviewEvents)
{
    public Authorizer Authorizer { get; } = authorizer;

    public ICallerContext Caller => Authorizer.Caller;

    public TimeProvider Clock { get; } = clock;

    public Task<TrussWebDbContext> CreateAsync(CancellationToken cancellationToken) => factory.CreateDbContextAsync(cancellationToken);

    /// <summary>Loads and authorizes; Truss is null when Refusal is set.</summary>
    public Task<(Truss? Truss, ServiceResult<T>? Refusal, string? Role)> LoadAsync<T>(TrussWebDbContext db, Guid trussId, string operation, CancellationToken cancellationToken) =>
        LoadAsync<T>(db, trussId, operation, forWrite: false, cancellationToken);

    /// <summary>
    /// Authorizes, then opens the save's transaction and takes the truss's write lock, then loads the truss: every
    /// save of a truss loads with this. The lock is held until <see cref="CommitAsync{T}"/> commits, or until the
    /// context is disposed (rolled back: nothing saved). Truss is null when Refusal is set.
    /// </summary>
    /// <remarks>
    /// The design runs inside the lock on purpose: a member's result depends on every row of the truss (forces from
    /// geometry, loads and the self-weight of every section), so a design computed before the lock, from a state
    /// another user is about to change, would store a stale snapshot. Designing a truss takes a few milliseconds;
    /// loading the truss and saving its rows cost about as much, so the lock is held for one save's work.
    /// </remarks>
    public Task<(Truss? Truss, ServiceResult<T>? Refusal, string? Role)> LoadForWriteAsync<T>(TrussWebDbContext db, Guid trussId, string operation, CancellationToken cancellationToken) =>
        LoadAsync<T>(db, trussId, operation, forWrite: true, cancellationToken);

    private async Task<(Truss? Truss, ServiceResult<T>? Refusal, string? Role)> LoadAsync<T>(TrussWebDbContext db, Guid trussId, string operation, bool forWrite,
        CancellationToken cancellationToken)
    {
        var projectId = await db.Trusses.Where(t => t.Id == trussId).Select(t => (Guid?)t.ProjectId).FirstOrDefaultAsync(cancellationToken).ConfigureAwait(false);
        if (projectId is null)
        {
            return (null, ServiceResult<T>.NotFound("The truss does not exist or you are not a member of its project."), null);
        }

        var (refusal, role) = await Authorizer.CheckProjectAsync<T>(db, projectId.Value, operation, cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return (null, refusal, role);
        }

        if (forWrite)
        {
            await TrussWriteLock.AcquireAsync(db, trussId, cancellationToken).ConfigureAwait(false);
        }

        var truss = await DesignInputBuilder.LoadTrussAsync(db, trussId, cancellationToken).ConfigureAwait(false);
        return truss is null ? (null, ServiceResult<T>.NotFound("The truss was deleted."), role) : (truss, null, role);
    }

    /// <summary>
    /// Re-designs the truss from its tracked (edited) state, stages new snapshots, audits every change
    /// and saves. With <paramref name="refuseUndesignable"/>, an edit after which the truss cannot be designed is refused and nothing is saved. Returns the design issues (the inputs are saved even when the design cannot run) or a conflict.
    /// </summary>
    public async Task<(ServiceResult<T>? Failure, IReadOnlyList<ValidationIssue> DesignIssues, DesignRunner.Outcome? Outcome)> CommitAsync<T>(
        TrussWebDbContext db, Truss truss, string? auditAction, CancellationToken cancellationToken,
        Func<IReadOnlyList<ValidationIssue>, ServiceResult<T>>? refuseUndesignable = null)
    {
        var (outcome, issues, events) = await DesignRunner.DesignAndStageAsync(db, truss, Caller, Clock, cancellationToken).ConfigureAwait(false);
        if (outcome is null && refuseUndesignable is not null)
        {
            // nothing is saved: the caller's context is dropped with its staged changes
            return (refuseUndesignable(issues), issues, null);
        }

        AuditWriter.AddChanges(db, Caller, Clock, truss.ProjectId, outcome?.TrussSnapshot.Fingerprint);
        if (auditAction is not null || outcome is not null)
        {
            AuditWriter.AddAction(db, Caller, Clock, truss.ProjectId, nameof(Truss), truss.Id.ToString(), auditAction ?? "Designed",
                newValue: outcome?.TrussSnapshot.Status ?? "NotDesigned", fingerprint: outcome?.TrussSnapshot.Fingerprint);
        }

        try
        {
            await db.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
            await TrussWriteLock.CommitAsync(db, cancellationToken).ConfigureAwait(false);
        }
        catch (DbUpdateConcurrencyException ex)
        {
            return (ServiceResult<T>.Conflict(await Conflicts.DescribeAsync(db, ex, cancellationToken).ConfigureAwait(false)), issues, null);
        }

        foreach (var e in events)
        {
            reviewEvents.Publish(e);
        }

        return (null, issues, outcome);
    }

    /// <summary>Reads the truss detail fresh from a new context.</summary>
    public async Task<ServiceResult<TrussDetail>> DetailAsync(Guid trussId, string? role, IReadOnlyList<ValidationIssue>? designIssues, CancellationToken cancellationToken)
    {
        await using var db = await CreateAsync(cancellationToken).ConfigureAwait(false);
        var truss = await DesignInputBuilder.LoadTrussAsync(db, trussId, cancellationToken).ConfigureAwait(false);
        if (truss is null)
        {
            return ServiceResult<TrussDetail>.NotFound("The truss was deleted.");
        }

        var snapshots = await db.DesignSnapshots.AsNoTracking().Where(s => s.TrussId == trussId).ToListAsync(cancellationToken).ConfigureAwait(false);
        IReadOnlyList<ValidationIssue> messages = designIssues ?? [];
        if (designIssues is null && snapshots.All(s => s.MemberId is not null))
        {
            messages = (await DesignInputBuilder.BuildAsync(db, truss, forSizing: false, cancellationToken).ConfigureAwait(false)).Issues;
        }

        var canEdit = PermissionTable.Allows(AccessLevel.ProjectEdit, Caller.Roles, role);
        return ServiceResult<TrussDetail>.Ok(TrussViews.ToDetail(truss, snapshots, role, canEdit, messages.Select(m => m.ToString()).ToList()));
    }

    /// <summary>Sets the version EF compares on save to the one the caller loaded.</summary>
    public static void ExpectVersion(TrussWebDbContext db, TrackedEntity row, long loadedVersion) =>
        db.Entry(row).Property(r => r.Version).OriginalValue = loadedVersion;
}
