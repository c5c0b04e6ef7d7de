using Microsoft.EntityFrameworkCore;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Authorization;
using TrussWeb.Services.Common;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Design;

namespace TrussWeb.Services.Review;

/// <summary>
/// The review use cases. Transitions come from <see cref="ReviewStateMachine"/>; this class adds the rules
/// about people (four eyes, the assigned checker, who may be a checker), stores, audits and publishes after
/// commit. Approvals copy the stored snapshot; nothing here recalculates.
/// </summary>
internal sealed class ReviewService(IDbContextFactory<TrussWebDbContext> factory, Authorizer authorizer, TimeProvider clock, IReviewEvents events)
    : IReviewService
{
    private const string NotFoundMessage = "The member does not exist or you are not a member of its project.";

    private ICallerContext Caller => authorizer.Caller;

    public async Task<ServiceResult<MemberReviewView>> SubmitAsync(Guid memberId, string checkerUserId, string? note, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (member, refusal, role) = await LoadAsync(db, memberId, Op(nameof(SubmitAsync)), cancellationToken).ConfigureAwait(false);
        if (member is null)
        {
            return refusal!;
        }

        var problem = await SubmitOneAsync(db, member, checkerUserId, note, ActorOf(role), cancellationToken).ConfigureAwait(false);
        return problem ?? await SaveAsync(db, member, role, cancellationToken).ConfigureAwait(false);
    }

    public async Task<ServiceResult<TrussSubmission>> SubmitTrussAsync(Guid trussId, string checkerUserId, string? note, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var projectId = await db.Trusses.Where(t => t.Id == trussId).Select(t => (Guid?)t.ProjectId).FirstOrDefaultAsync(cancellationToken).ConfigureAwait(false);
        if (projectId is null)
        {
            return ServiceResult<TrussSubmission>.NotFound("The truss does not exist or you are not a member of its project.");
        }

        var (refusal, role) = await authorizer.CheckProjectAsync<TrussSubmission>(db, projectId.Value, Op(nameof(SubmitTrussAsync)), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        await TrussWriteLock.AcquireAsync(db, trussId, cancellationToken).ConfigureAwait(false);
        var members = await db.TrussMembers.Include(m => m.Truss).Where(m => m.TrussId == trussId).OrderBy(m => m.Mark).ToListAsync(cancellationToken).ConfigureAwait(false);
        var skipped = new List<SkippedMember>();
        var submitted = new List<TrussMember>();
        foreach (var member in members)
        {
            var state = ReviewStateMachine.Parse(member.ReviewState);
            var t = ReviewStateMachine.Decide(state, ReviewAction.Submit, ActorOf(role));
            if (t.RefusedForActor)
            {
                return ServiceResult<TrussSubmission>.Forbidden(t.Refusal!);
            }

            if (!t.Allowed)
            {
                skipped.Add(new SkippedMember(member.Id, member.Mark, state, t.Refusal!));
                continue;
            }

            var problem = await SubmitOneAsync(db, member, checkerUserId, note, ActorOf(role), cancellationToken).ConfigureAwait(false);
            if (problem is { Kind: ResultKind.Invalid, Errors: [{ Field: "Design" }] })
            {
                skipped.Add(new SkippedMember(member.Id, member.Mark, state, problem.Message!));
                continue;
            }

            if (problem is not null)
            {
                return problem.As<TrussSubmission>();
            }

            submitted.Add(member);
        }

        var (failure, published) = await CommitAsync(db, cancellationToken).ConfigureAwait(false);
        if (failure is not null)
        {
            return failure.As<TrussSubmission>();
        }

        Publish(published);
        return ServiceResult<TrussSubmission>.Ok(new TrussSubmission(await ViewsAsync(db, submitted, role, cancellationToken).ConfigureAwait(false), skipped));
    }

    public async Task<ServiceResult<MemberReviewView>> ResubmitAsync(Guid memberId, string answer, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (member, refusal, role) = await LoadAsync(db, memberId, Op(nameof(ResubmitAsync)), cancellationToken).ConfigureAwait(false);
        if (member is null)
        {
            return refusal!;
        }

        var (t, problem) = Transition(member, ReviewAction.Resubmit, role);
        if (problem is not null)
        {
            return problem;
        }

        if (string.IsNullOrWhiteSpace(answer))
        {
            return ServiceResult<MemberReviewView>.Invalid(nameof(answer), "Answer the checker's comment before resubmitting.");
        }

        if (await CurrentSnapshotAsync(db, member, cancellationToken).ConfigureAwait(false) is null)
        {
            return ServiceResult<MemberReviewView>.Invalid("Design", $"{member.Mark} has no stored design; fix the truss inputs first.");
        }

        var now = Now;
        Change(db, member, t, ReviewAction.Resubmit, answer.Trim(), member.ApprovedFingerprint);
        member.DesignerOfRecordId = Caller.UserId;
        member.SubmittedBy = Caller.UserId;
        member.SubmittedUtc = now;
        member.ReviewComment = answer.Trim();
        return await SaveAsync(db, member, role, cancellationToken).ConfigureAwait(false);
    }

    public async Task<ServiceResult<MemberReviewView>> WithdrawAsync(Guid memberId, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (member, refusal, role) = await LoadAsync(db, memberId, Op(nameof(WithdrawAsync)), cancellationToken).ConfigureAwait(false);
        if (member is null)
        {
            return refusal!;
        }

        var (t, problem) = Transition(member, ReviewAction.Withdraw, role);
        if (problem is not null)
        {
            return problem;
        }

        Change(db, member, t, ReviewAction.Withdraw, null, null);
        member.CheckerId = null;
        return await SaveAsync(db, member, role, cancellationToken).ConfigureAwait(false);
    }

    public Task<ServiceResult<MemberReviewView>> ApproveAsync(Guid memberId, string? comment, CancellationToken cancellationToken = default) =>
        DecideAsync(memberId, ReviewAction.Approve, comment, Op(nameof(ApproveAsync)), cancellationToken);

    public Task<ServiceResult<MemberReviewView>> ReturnAsync(Guid memberId, string comment, CancellationToken cancellationToken = default) =>
        DecideAsync(memberId, ReviewAction.Return, comment, Op(nameof(ReturnAsync)), cancellationToken);

    public async Task<ServiceResult<MemberReviewView>> ReassignCheckerAsync(Guid memberId, string checkerUserId, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (member, refusal, role) = await LoadAsync(db, memberId, Op(nameof(ReassignCheckerAsync)), cancellationToken).ConfigureAwait(false);
        if (member is null)
        {
            return refusal!;
        }

        var (t, problem) = Transition(member, ReviewAction.ReassignChecker, role);
        if (problem is not null)
        {
            return problem;
        }

        var checkerProblem = await CheckerProblemAsync(db, member, checkerUserId, cancellationToken).ConfigureAwait(false);
        if (checkerProblem is not null)
        {
            return checkerProblem;
        }

        var old = member.CheckerId;
        Change(db, member, t, ReviewAction.ReassignChecker, $"Checker changed from {await NameAsync(db, old, cancellationToken).ConfigureAwait(false) ?? "nobody"} " +
            $"to {await NameAsync(db, checkerUserId, cancellationToken).ConfigureAwait(false)}.", null);
        member.CheckerId = checkerUserId;
        return await SaveAsync(db, member, role, cancellationToken).ConfigureAwait(false);
    }

    public async Task<ServiceResult<IReadOnlyList<EligibleChecker>>> ListEligibleCheckersAsync(Guid projectId, Guid? reassignMemberId, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (refusal, _) = await authorizer.CheckProjectAsync<IReadOnlyList<EligibleChecker>>(db, projectId, Op(nameof(ListEligibleCheckersAsync)), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        var excluded = Caller.UserId;
        if (reassignMemberId is { } memberId)
        {
            var member = await db.TrussMembers.AsNoTracking().Where(m => m.Id == memberId && m.Truss!.ProjectId == projectId)
                .Select(m => new { m.DesignerOfRecordId }).FirstOrDefaultAsync(cancellationToken).ConfigureAwait(false);
            if (member is null)
            {
                return ServiceResult<IReadOnlyList<EligibleChecker>>.NotFound(NotFoundMessage);
            }

            excluded = member.DesignerOfRecordId;
        }

        var rows = await db.ProjectMemberships.AsNoTracking()
            .Where(m => m.ProjectId == projectId && (m.Role == Roles.Checker || m.Role == Roles.ProjectLead))
            .Join(db.Users.AsNoTracking(), m => m.UserId, u => u.Id, (m, u) => new { u.Id, u.DisplayName, m.Role })
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        IReadOnlyList<EligibleChecker> checkers = rows.Where(r => !string.Equals(r.Id, excluded, StringComparison.Ordinal))
            .OrderBy(r => r.DisplayName, StringComparer.CurrentCultureIgnoreCase)
            .Select(r => new EligibleChecker(r.Id, r.DisplayName, r.Role)).ToList();
        return ServiceResult<IReadOnlyList<EligibleChecker>>.Ok(checkers);
    }

    public async Task<ServiceResult<MemberReviewView>> GetMemberReviewAsync(Guid memberId, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (member, refusal, role) = await LoadAsync(db, memberId, Op(nameof(GetMemberReviewAsync)), cancellationToken, forWrite: false).ConfigureAwait(false);
        return member is null ? refusal! : ServiceResult<MemberReviewView>.Ok(await ViewAsync(db, member, role, cancellationToken).ConfigureAwait(false));
    }

    public async Task<ServiceResult<IReadOnlyList<MemberReviewView>>> GetTrussReviewAsync(Guid trussId, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var projectId = await db.Trusses.Where(t => t.Id == trussId).Select(t => (Guid?)t.ProjectId).FirstOrDefaultAsync(cancellationToken).ConfigureAwait(false);
        if (projectId is null)
        {
            return ServiceResult<IReadOnlyList<MemberReviewView>>.NotFound("The truss does not exist or you are not a member of its project.");
        }

        var (refusal, role) = await authorizer.CheckProjectAsync<IReadOnlyList<MemberReviewView>>(db, projectId.Value, Op(nameof(GetTrussReviewAsync)), cancellationToken)
            .ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        var members = await db.TrussMembers.AsNoTracking().Include(m => m.Truss).Where(m => m.TrussId == trussId).OrderBy(m => m.Mark)
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        return ServiceResult<IReadOnlyList<MemberReviewView>>.Ok(await ViewsAsync(db, members, role, cancellationToken).ConfigureAwait(false));
    }

    public async Task<ServiceResult<ChangesSinceApproval>> GetChangesSinceApprovalAsync(Guid memberId, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (member, refusal, _) = await LoadAsync(db, memberId, Op(nameof(GetChangesSinceApprovalAsync)), cancellationToken, forWrite: false).ConfigureAwait(false);
        if (member is null)
        {
            return refusal!.As<ChangesSinceApproval>();
        }

        if (member.ApprovedFingerprint is null || member.ApprovedInputsJson is null || member.ApprovedResultJson is null)
        {
            return ServiceResult<ChangesSinceApproval>.Invalid("Approval", $"{member.Mark} has never been approved; there is nothing to compare with.");
        }

        var snapshot = await CurrentSnapshotAsync(db, member, cancellationToken).ConfigureAwait(false);
        var changes = JsonFieldDiff.Compare("inputs", member.ApprovedInputsJson, snapshot?.InputsJson)
            .Concat(JsonFieldDiff.Compare("results", member.ApprovedResultJson, snapshot?.ResultJson, ["steps", "notes"]))
            .ToList();
        var approvedBy = await db.AuditEntries.AsNoTracking()
            .Where(a => a.EntityType == nameof(TrussMember) && a.EntityId == member.Id.ToString() && a.Action == ActionName(ReviewAction.Approve))
            .OrderByDescending(a => a.Id).Select(a => a.UserId).FirstOrDefaultAsync(cancellationToken).ConfigureAwait(false);
        return ServiceResult<ChangesSinceApproval>.Ok(new ChangesSinceApproval(member.Id, member.Mark, ReviewStateMachine.Parse(member.ReviewState),
            member.ApprovedFingerprint, snapshot?.Fingerprint, member.ReviewedUtc, await NameAsync(db, approvedBy, cancellationToken).ConfigureAwait(false), changes));
    }

    public async Task<ServiceResult<IReadOnlyList<CheckQueueItem>>> ListMyQueueAsync(CancellationToken cancellationToken = default)
    {
        var refusal = authorizer.Check<IReadOnlyList<CheckQueueItem>>(Op(nameof(ListMyQueueAsync)));
        if (refusal is not null)
        {
            return refusal;
        }

        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var me = Caller.UserId!;
        var awaiting = nameof(MemberReviewState.AwaitingCheck);
        var projects = db.ProjectMemberships.Where(m => m.UserId == me).Select(m => m.ProjectId);
        var rows = await db.TrussMembers.AsNoTracking()
            .Where(m => m.CheckerId == me && m.ReviewState == awaiting && (authorizer.IsAdministrator || projects.Contains(m.Truss!.ProjectId)))
            .Select(m => new { m.Id, m.Mark, m.TrussId, TrussName = m.Truss!.Name, m.Truss.ProjectId, ProjectName = m.Truss.Project!.Name, m.DesignerOfRecordId, m.SubmittedUtc })
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        var ids = rows.Select(r => (Guid?)r.Id).ToList();
        var snaps = await db.DesignSnapshots.AsNoTracking().Where(s => ids.Contains(s.MemberId)).Select(s => new { s.MemberId, s.Utilization, s.Status })
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        var names = await NamesAsync(db, rows.Select(r => r.DesignerOfRecordId), cancellationToken).ConfigureAwait(false);
        var items = rows
            .OrderBy(r => r.SubmittedUtc).ThenBy(r => r.ProjectName, StringComparer.Ordinal).ThenBy(r => r.TrussName, StringComparer.Ordinal).ThenBy(r => r.Mark, StringComparer.Ordinal)
            .Select(r =>
            {
                var s = snaps.FirstOrDefault(x => x.MemberId == r.Id);
                return new CheckQueueItem(r.ProjectId, r.ProjectName, r.TrussId, r.TrussName, r.Id, r.Mark,
                    r.DesignerOfRecordId is null ? null : names.GetValueOrDefault(r.DesignerOfRecordId), r.SubmittedUtc, s?.Utilization, s?.Status);
            }).ToList();
        return ServiceResult<IReadOnlyList<CheckQueueItem>>.Ok(items);
    }

    public async Task<ServiceResult<ReviewRollUp>> GetRollUpAsync(Guid projectId, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (refusal, _) = await authorizer.CheckProjectAsync<ReviewRollUp>(db, projectId, Op(nameof(GetRollUpAsync)), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        var trusses = await db.Trusses.AsNoTracking().Where(t => t.ProjectId == projectId).OrderBy(t => t.Name).Select(t => new { t.Id, t.Name })
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        var members = await MemberStatesAsync(db, projectId, cancellationToken).ConfigureAwait(false);
        var perTruss = trusses.Select(t => new TrussReviewCounts(t.Id, t.Name, Count(members.Where(m => m.TrussId == t.Id).Select(m => m.State)))).ToList();
        return ServiceResult<ReviewRollUp>.Ok(new ReviewRollUp(projectId, Count(members.Select(m => m.State)), perTruss));
    }

    public async Task<ServiceResult<IReadOnlyList<AuditEntryView>>> GetAuditAsync(Guid projectId, Guid? memberId, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (refusal, _) = await authorizer.CheckProjectAsync<IReadOnlyList<AuditEntryView>>(db, projectId, Op(nameof(GetAuditAsync)), cancellationToken).ConfigureAwait(false);
        return refusal ?? ServiceResult<IReadOnlyList<AuditEntryView>>.Ok(await AuditAsync(db, projectId, memberId, cancellationToken).ConfigureAwait(false));
    }

    public async Task<ServiceResult<byte[]>> ExportAuditCsvAsync(Guid projectId, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (refusal, _) = await authorizer.CheckProjectAsync<byte[]>(db, projectId, Op(nameof(ExportAuditCsvAsync)), cancellationToken).ConfigureAwait(false);
        return refusal ?? ServiceResult<byte[]>.Ok(AuditCsv.Write(await AuditAsync(db, projectId, null, cancellationToken).ConfigureAwait(false)));
    }

    public async Task<ServiceResult<IssueStatus>> GetIssueStatusAsync(Guid projectId, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (refusal, _) = await authorizer.CheckProjectAsync<IssueStatus>(db, projectId, Op(nameof(GetIssueStatusAsync)), cancellationToken).ConfigureAwait(false);
        return refusal ?? ServiceResult<IssueStatus>.Ok(await IssueStatusAsync(db, projectId, cancellationToken).ConfigureAwait(false));
    }

    public async Task<ServiceResult<IssueRecord>> IssueFinalSetAsync(Guid projectId, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (refusal, _) = await authorizer.CheckProjectAsync<IssueRecord>(db, projectId, Op(nameof(IssueFinalSetAsync)), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        var status = await IssueStatusAsync(db, projectId, cancellationToken).ConfigureAwait(false);
        if (!status.CanIssueFinal)
        {
            return ServiceResult<IssueRecord>.Forbidden($"The final set cannot be issued: {status.Summary}");
        }

        var project = await db.Projects.AsNoTracking().SingleAsync(p => p.Id == projectId, cancellationToken).ConfigureAwait(false);
        var fingerprints = await db.TrussMembers.AsNoTracking().Where(m => m.Truss!.ProjectId == projectId).Select(m => m.ApprovedFingerprint!)
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        var setFingerprint = DesignFingerprint.Hash(string.Join("\n", fingerprints.Order(StringComparer.Ordinal)));
        AuditWriter.AddAction(db, Caller, clock, projectId, nameof(Project), projectId.ToString(), "ReviewFinalSetIssued", "Revision", null, project.Revision,
            setFingerprint, $"Final set issued: {status.TotalMembers} members approved.");
        await db.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        return ServiceResult<IssueRecord>.Ok(new IssueRecord(projectId, project.Revision, Now, Caller.DisplayName, status.TotalMembers, setFingerprint));
    }

    private async Task<ServiceResult<MemberReviewView>> DecideAsync(Guid memberId, ReviewAction action, string? comment, string operation, CancellationToken cancellationToken)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (member, refusal, role) = await LoadAsync(db, memberId, operation, cancellationToken).ConfigureAwait(false);
        if (member is null)
        {
            return refusal!;
        }

        var (t, problem) = Transition(member, action, role);
        if (problem is not null)
        {
            return problem;
        }

        if (string.Equals(member.DesignerOfRecordId, Caller.UserId, StringComparison.Ordinal))
        {
            return ServiceResult<MemberReviewView>.Forbidden(
                $"You are the designer of record of {member.Mark} (you last submitted it or changed its design), so you cannot {Verb(action)} it: another engineer must check it.");
        }

        if (!string.Equals(member.CheckerId, Caller.UserId, StringComparison.Ordinal))
        {
            return ServiceResult<MemberReviewView>.Forbidden(
                $"{member.Mark} awaits {await NameAsync(db, member.CheckerId, cancellationToken).ConfigureAwait(false) ?? "another checker"}, not you; the project lead can reassign it.");
        }

        if (action == ReviewAction.Return && string.IsNullOrWhiteSpace(comment))
        {
            return ServiceResult<MemberReviewView>.Invalid(nameof(comment), "Say why the member is returned: a comment is required.");
        }

        var snapshot = await CurrentSnapshotAsync(db, member, cancellationToken).ConfigureAwait(false);
        if (snapshot is null)
        {
            return ServiceResult<MemberReviewView>.Invalid("Design", $"{member.Mark} has no stored design to {Verb(action)}.");
        }

        var text = string.IsNullOrWhiteSpace(comment) ? null : comment.Trim();
        Change(db, member, t, action, text, snapshot.Fingerprint);
        member.ReviewedUtc = Now;
        member.ReviewComment = text;
        if (action == ReviewAction.Approve)
        {
            member.ApprovedFingerprint = snapshot.Fingerprint;
            member.ApprovedInputsJson = snapshot.InputsJson;
            member.ApprovedResultJson = snapshot.ResultJson;
        }

        return await SaveAsync(db, member, role, cancellationToken).ConfigureAwait(false);
    }

    /// <summary>Stages a submission of one member (state, checker, designer of record, audit); a refusal when it cannot be submitted.</summary>
    private async Task<ServiceResult<MemberReviewView>?> SubmitOneAsync(TrussWebDbContext db, TrussMember member, string checkerUserId, string? note, ReviewActor actor,
        CancellationToken cancellationToken)
    {
        var t = ReviewStateMachine.Decide(ReviewStateMachine.Parse(member.ReviewState), ReviewAction.Submit, actor);
        if (!t.Allowed)
        {
            return t.RefusedForActor ? ServiceResult<MemberReviewView>.Forbidden(t.Refusal!) : ServiceResult<MemberReviewView>.Invalid("State", t.Refusal!);
        }

        var snapshot = await CurrentSnapshotAsync(db, member, cancellationToken).ConfigureAwait(false);
        if (snapshot is null)
        {
            return ServiceResult<MemberReviewView>.Invalid("Design", $"{member.Mark} has no stored design; fix the truss inputs first.");
        }

        // The submitter becomes the designer of record before the checker is vetted, so nobody submits to themselves.
        member.DesignerOfRecordId = Caller.UserId;
        var checkerProblem = await CheckerProblemAsync(db, member, checkerUserId, cancellationToken).ConfigureAwait(false);
        if (checkerProblem is not null)
        {
            return checkerProblem;
        }

        var text = string.IsNullOrWhiteSpace(note) ? null : note.Trim();
        Change(db, member, t, ReviewAction.Submit, text, snapshot.Fingerprint);
        member.SubmittedBy = Caller.UserId;
        member.SubmittedUtc = Now;
        member.CheckerId = checkerUserId;
        member.ReviewComment = text;
        return null;
    }

    /// <summary>Null when <paramref name="checkerUserId"/> may check the member: a Checker or ProjectLead of its project who is not its designer of record.</summary>
    private static async Task<ServiceResult<MemberReviewView>?> CheckerProblemAsync(TrussWebDbContext db, TrussMember member, string checkerUserId, CancellationToken cancellationToken)
    {
        if (string.IsNullOrWhiteSpace(checkerUserId))
        {
            return ServiceResult<MemberReviewView>.Invalid(nameof(checkerUserId), "Choose the checker.");
        }

        var role = await db.ProjectMemberships.Where(m => m.ProjectId == member.Truss!.ProjectId && m.UserId == checkerUserId).Select(m => m.Role)
            .FirstOrDefaultAsync(cancellationToken).ConfigureAwait(false);
        if (role is not (Roles.Checker or Roles.ProjectLead))
        {
            return ServiceResult<MemberReviewView>.Invalid(nameof(checkerUserId),
                role is null ? "The checker must be a member of the project." : $"The checker must have the Checker or ProjectLead role in the project (this user is {role}).");
        }

        return string.Equals(checkerUserId, member.DesignerOfRecordId, StringComparison.Ordinal)
            ? ServiceResult<MemberReviewView>.Invalid(nameof(checkerUserId), $"The designer of record of {member.Mark} cannot be its checker.")
            : null;
    }

    private (ReviewTransition Transition, ServiceResult<MemberReviewView>? Problem) Transition(TrussMember member, ReviewAction action, string? role)
    {
        var t = ReviewStateMachine.Decide(ReviewStateMachine.Parse(member.ReviewState), action, ActorOf(role));
        if (t.Allowed)
        {
            return (t, null);
        }

        return (t, t.RefusedForActor ? ServiceResult<MemberReviewView>.Forbidden(t.Refusal!) : ServiceResult<MemberReviewView>.Invalid("State", $"{member.Mark}: {t.Refusal}"));
    }

    /// <summary>Sets the new state and writes the audit entry (who, when, member, old → new state, comment, fingerprint); the event goes out after commit.</summary>
    private void Change(TrussWebDbContext db, TrussMember member, ReviewTransition t, ReviewAction action, string? comment, string? fingerprint)
    {
        var from = ReviewStateMachine.Parse(member.ReviewState);
        var to = t.Next!.Value;
        member.ReviewState = to.ToString();
        AuditWriter.AddAction(db, Caller, clock, member.Truss!.ProjectId, nameof(TrussMember), member.Id.ToString(), ActionName(action), "ReviewState",
            from.ToString(), to.ToString(), fingerprint, comment);
        pending.Add(new ReviewEvent(member.Truss.ProjectId, member.TrussId, member.Id, member.Mark, from, to, ActionName(action), Caller.UserId, Now));
    }

    private readonly List<ReviewEvent> pending = [];

    private async Task<(ServiceResult<Done>? Failure, IReadOnlyList<ReviewEvent> Events)> CommitAsync(TrussWebDbContext db, CancellationToken cancellationToken)
    {
        try
        {
            await db.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
            await TrussWriteLock.CommitAsync(db, cancellationToken).ConfigureAwait(false);
        }
        catch (DbUpdateConcurrencyException ex)
        {
            pending.Clear();
            return (ServiceResult<Done>.Conflict(await Conflicts.DescribeAsync(db, ex, cancellationToken).ConfigureAwait(false)), []);
        }

        var done = pending.ToList();
        pending.Clear();
        return (null, done);
    }

    private async Task<ServiceResult<MemberReviewView>> SaveAsync(TrussWebDbContext db, TrussMember member, string? role, CancellationToken cancellationToken)
    {
        var (failure, published) = await CommitAsync(db, cancellationToken).ConfigureAwait(false);
        if (failure is not null)
        {
            return failure.As<MemberReviewView>();
        }

        Publish(published);
        return ServiceResult<MemberReviewView>.Ok(await ViewAsync(db, member, role, cancellationToken).ConfigureAwait(false));
    }

    private void Publish(IReadOnlyList<ReviewEvent> published)
    {
        foreach (var e in published)
        {
            events.Publish(e);
        }
    }

    private async Task<(TrussMember? Member, ServiceResult<MemberReviewView>? Refusal, string? Role)> LoadAsync(TrussWebDbContext db, Guid memberId, string operation,
        CancellationToken cancellationToken, bool forWrite = true)
    {
        var owner = await db.TrussMembers.Where(m => m.Id == memberId).Select(m => new { m.TrussId, m.Truss!.ProjectId }).FirstOrDefaultAsync(cancellationToken).ConfigureAwait(false);
        if (owner is null)
        {
            return (null, ServiceResult<MemberReviewView>.NotFound(NotFoundMessage), null);
        }

        var (refusal, role) = await authorizer.CheckProjectAsync<MemberReviewView>(db, owner.ProjectId, operation, cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return (null, refusal, role);
        }

        if (forWrite)
        {
            // A review step writes a member row that design saves also write (designer of record, stale approvals) and
            // reads the snapshot a save replaces: it queues behind them under the truss's write lock (TrussWriteLock).
            await TrussWriteLock.AcquireAsync(db, owner.TrussId, cancellationToken).ConfigureAwait(false);
        }

        // deleted while this step waited for the lock: not found, as if it had never existed
        var member = await db.TrussMembers.Include(m => m.Truss).SingleOrDefaultAsync(m => m.Id == memberId, cancellationToken).ConfigureAwait(false);
        return member is null ? (null, ServiceResult<MemberReviewView>.NotFound(NotFoundMessage), role) : (member, null, role);
    }

    private static Task<DesignSnapshot?> CurrentSnapshotAsync(TrussWebDbContext db, TrussMember member, CancellationToken cancellationToken) =>
        db.DesignSnapshots.AsNoTracking().Where(s => s.MemberId == member.Id).FirstOrDefaultAsync(cancellationToken);

    private async Task<MemberReviewView> ViewAsync(TrussWebDbContext db, TrussMember member, string? role, CancellationToken cancellationToken)
    {
        var current = await db.DesignSnapshots.AsNoTracking().Where(s => s.MemberId == member.Id).Select(s => s.Fingerprint).FirstOrDefaultAsync(cancellationToken)
            .ConfigureAwait(false);
        var names = await NamesAsync(db, [member.DesignerOfRecordId, member.CheckerId], cancellationToken).ConfigureAwait(false);
        return View(member, role, current, names);
    }

    /// <summary>The views of many members with two queries (fingerprints, user names).</summary>
    private async Task<IReadOnlyList<MemberReviewView>> ViewsAsync(TrussWebDbContext db, IReadOnlyList<TrussMember> members, string? role, CancellationToken cancellationToken)
    {
        var ids = members.Select(m => (Guid?)m.Id).ToList();
        var fingerprints = await db.DesignSnapshots.AsNoTracking().Where(s => ids.Contains(s.MemberId)).Select(s => new { s.MemberId, s.Fingerprint })
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        var byMember = fingerprints.ToDictionary(f => f.MemberId!.Value, f => f.Fingerprint);
        var names = await NamesAsync(db, members.SelectMany(m => new[] { m.DesignerOfRecordId, m.CheckerId }), cancellationToken).ConfigureAwait(false);
        return members.Select(m => View(m, role, byMember.GetValueOrDefault(m.Id), names)).ToList();
    }

    private MemberReviewView View(TrussMember member, string? role, string? currentFingerprint, IReadOnlyDictionary<string, string> names)
    {
        var state = ReviewStateMachine.Parse(member.ReviewState);
        var mayDecide = !string.Equals(member.DesignerOfRecordId, Caller.UserId, StringComparison.Ordinal)
                        && string.Equals(member.CheckerId, Caller.UserId, StringComparison.Ordinal);
        var actions = ReviewStateMachine.Available(state, ActorOf(role))
            .Where(a => a is not (ReviewAction.Approve or ReviewAction.Return) || mayDecide).ToList();
        string? Name(string? id) => id is null ? null : names.GetValueOrDefault(id);
        return new MemberReviewView(member.Truss!.ProjectId, member.TrussId, member.Truss.Name, member.Id, member.Mark, state,
            member.DesignerOfRecordId, Name(member.DesignerOfRecordId), member.CheckerId, Name(member.CheckerId),
            member.SubmittedUtc, member.ReviewedUtc, member.ReviewComment, member.ApprovedFingerprint, currentFingerprint, actions);
    }

    private static async Task<IReadOnlyList<AuditEntryView>> AuditAsync(TrussWebDbContext db, Guid projectId, Guid? memberId, CancellationToken cancellationToken)
    {
        var query = db.AuditEntries.AsNoTracking().Where(a => a.ProjectId == projectId);
        if (memberId is { } id)
        {
            var key = id.ToString();
            query = query.Where(a => a.EntityId == key);
        }

        var rows = await query.OrderBy(a => a.Id).ToListAsync(cancellationToken).ConfigureAwait(false);
        var names = await NamesAsync(db, rows.Select(r => r.UserId), cancellationToken).ConfigureAwait(false);
        return rows.Select(a => new AuditEntryView(a.Id, a.UtcTime, a.UserId, a.UserId is null ? null : names.GetValueOrDefault(a.UserId), a.EntityType, a.EntityId,
            a.Action, a.Field, a.OldValue, a.NewValue, a.Comment, a.Fingerprint)).ToList();
    }

    private sealed record MemberState(Guid TrussId, MemberReviewState State);

    private static async Task<IReadOnlyList<MemberState>> MemberStatesAsync(TrussWebDbContext db, Guid projectId, CancellationToken cancellationToken) =>
        (await db.TrussMembers.AsNoTracking().Where(m => m.Truss!.ProjectId == projectId).Select(m => new { m.TrussId, m.ReviewState })
            .ToListAsync(cancellationToken).ConfigureAwait(false))
        .Select(m => new MemberState(m.TrussId, ReviewStateMachine.Parse(m.ReviewState))).ToList();

    internal static async Task<IssueStatus> IssueStatusAsync(TrussWebDbContext db, Guid projectId, CancellationToken cancellationToken)
    {
        var states = await MemberStatesAsync(db, projectId, cancellationToken).ConfigureAwait(false);
        var total = states.Count;
        var approved = states.Count(s => s.State == MemberReviewState.Approved);
        var stale = states.Count(s => s.State == MemberReviewState.ApprovalStale);
        var can = total > 0 && approved == total;
        var summary = can ? $"all {total} members are approved."
            : total == 0 ? "the project has no members."
            : $"{approved} of {total} members are approved; {total - approved} are not" + (stale > 0 ? $" ({stale} with a stale approval)." : ".");
        return new IssueStatus(projectId, total, approved, stale, can, summary);
    }

    private static Dictionary<MemberReviewState, int> Count(IEnumerable<MemberReviewState> states)
    {
        var counts = Enum.GetValues<MemberReviewState>().ToDictionary(s => s, _ => 0);
        foreach (var s in states)
        {
            counts[s]++;
        }

        return counts;
    }

    private static async Task<string?> NameAsync(TrussWebDbContext db, string? userId, CancellationToken cancellationToken) =>
        userId is null ? null : await db.Users.AsNoTracking().Where(u => u.Id == userId).Select(u => u.DisplayName).FirstOrDefaultAsync(cancellationToken).ConfigureAwait(false);

    private static async Task<Dictionary<string, string>> NamesAsync(TrussWebDbContext db, IEnumerable<string?> ids, CancellationToken cancellationToken)
    {
        var wanted = ids.OfType<string>().Distinct(StringComparer.Ordinal).ToList();
        return await db.Users.AsNoTracking().Where(u => wanted.Contains(u.Id)).ToDictionaryAsync(u => u.Id, u => u.DisplayName, cancellationToken).ConfigureAwait(false);
    }

    private ReviewActor ActorOf(string? projectRole) =>
        authorizer.IsAdministrator ? ReviewActor.Administrator : projectRole switch
        {
            Roles.ProjectLead => ReviewActor.ProjectLead,
            Roles.Checker => ReviewActor.Checker,
            _ => ReviewActor.Designer,
        };

    /// <summary>The audit action of a review step, e.g. "ReviewApprove".</summary>
    internal static string ActionName(ReviewAction action) => "Review" + action;

    private static string Verb(ReviewAction action) => action == ReviewAction.Approve ? "approve" : "return";

    private DateTime Now => clock.GetUtcNow().UtcDateTime;

    private static string Op(string method) => PermissionTable.Key<IReviewService>(method);
}
