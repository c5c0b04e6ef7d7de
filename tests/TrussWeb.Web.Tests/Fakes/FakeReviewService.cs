using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Tests.Fakes;

/// <summary>
/// IReviewService for the page tests: reviews the test sets per member, a record of every call, and an answer the test can
/// replace (<see cref="OnStep"/>). By default a step succeeds and moves the member to the state the workflow table gives.
/// </summary>
public sealed class FakeReviewService : IReviewService
{
    public Dictionary<Guid, MemberReviewView> Reviews { get; } = [];

    public ChangesSinceApproval? Changes { get; set; }

    public List<AuditEntryView> Audit { get; } = [];

    public List<CheckQueueItem> Queue { get; } = [];

    public ReviewRollUp? RollUp { get; set; }

    public List<EligibleChecker> Checkers { get; } = [new("u-checker", "Chris Checker", "Checker"), new("u-lead", "Lerato Lead", "ProjectLead")];

    /// <summary>Every call: the action (or method) name, the member or truss, and the text passed.</summary>
    public List<(string Call, Guid Id, string? Text)> Calls { get; } = [];

    /// <summary>Replaces the answer of a review step (member, action, text); null = default success.</summary>
    public Func<Guid, ReviewAction, string?, ServiceResult<MemberReviewView>?>? OnStep { get; set; }

    public TrussSubmission? Submission { get; set; }

    public int QueueReads { get; private set; }

    public int RollUpReads { get; private set; }

    public int ReviewReads { get; private set; }

    public static MemberReviewView View(Guid memberId, string mark, MemberReviewState state, IReadOnlyList<ReviewAction> actions,
        Guid? projectId = null, Guid? trussId = null, string? comment = null) =>
        new(projectId ?? ProjectId, trussId ?? TrussId, "RT1", memberId, mark, state, "u-designer", "Dineo Designer",
            state == MemberReviewState.NotSubmitted ? null : "u-checker", state == MemberReviewState.NotSubmitted ? null : "Chris Checker",
            state == MemberReviewState.NotSubmitted ? null : new DateTime(2026, 12, 1, 8, 0, 0, DateTimeKind.Utc), null, comment,
            state is MemberReviewState.Approved or MemberReviewState.ApprovalStale ? "a1b2c3d4e5f6a7b8c9d0" : null, "f0e1d2c3b4a5968778695a4b", actions);

    public static readonly Guid ProjectId = Guid.Parse("7a000000-0000-4000-8000-000000000001");

    public static readonly Guid TrussId = Guid.Parse("7a000000-0000-4000-8000-000000000002");

    private Task<ServiceResult<MemberReviewView>> Step(Guid memberId, ReviewAction action, string? text, MemberReviewState to)
    {
        Calls.Add((action.ToString(), memberId, text));
        var answer = OnStep?.Invoke(memberId, action, text);
        if (answer is null)
        {
            if (!Reviews.TryGetValue(memberId, out var current))
            {
                return Task.FromResult(ServiceResult<MemberReviewView>.NotFound("The member does not exist or you are not a member of its project."));
            }

            answer = ServiceResult<MemberReviewView>.Ok(current with { State = to, Comment = text ?? current.Comment, AvailableActions = [] });
        }

        if (answer.IsOk)
        {
            Reviews[memberId] = answer.Value!;
        }

        return Task.FromResult(answer);
    }

    public Task<ServiceResult<MemberReviewView>> SubmitAsync(Guid memberId, string checkerUserId, string? note, CancellationToken cancellationToken = default) =>
        Step(memberId, ReviewAction.Submit, note, MemberReviewState.AwaitingCheck);

    public Task<ServiceResult<TrussSubmission>> SubmitTrussAsync(Guid trussId, string checkerUserId, string? note, CancellationToken cancellationToken = default)
    {
        Calls.Add(("SubmitTruss", trussId, checkerUserId));
        return Task.FromResult(Submission is null ? ServiceResult<TrussSubmission>.Forbidden("not set up") : ServiceResult<TrussSubmission>.Ok(Submission));
    }

    public Task<ServiceResult<MemberReviewView>> ResubmitAsync(Guid memberId, string answer, CancellationToken cancellationToken = default) =>
        Step(memberId, ReviewAction.Resubmit, answer, MemberReviewState.AwaitingCheck);

    public Task<ServiceResult<MemberReviewView>> WithdrawAsync(Guid memberId, CancellationToken cancellationToken = default) =>
        Step(memberId, ReviewAction.Withdraw, null, MemberReviewState.NotSubmitted);

    public Task<ServiceResult<MemberReviewView>> ApproveAsync(Guid memberId, string? comment, CancellationToken cancellationToken = default) =>
        Step(memberId, ReviewAction.Approve, comment, MemberReviewState.Approved);

    public Task<ServiceResult<MemberReviewView>> ReturnAsync(Guid memberId, string comment, CancellationToken cancellationToken = default) =>
        Step(memberId, ReviewAction.Return, comment, MemberReviewState.Returned);

    public Task<ServiceResult<MemberReviewView>> ReassignCheckerAsync(Guid memberId, string checkerUserId, CancellationToken cancellationToken = default) =>
        Step(memberId, ReviewAction.ReassignChecker, checkerUserId, Reviews.TryGetValue(memberId, out var r) ? r.State : MemberReviewState.AwaitingCheck);

    public Task<ServiceResult<IReadOnlyList<EligibleChecker>>> ListEligibleCheckersAsync(Guid projectId, Guid? reassignMemberId, CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<IReadOnlyList<EligibleChecker>>.Ok(Checkers.ToList()));

    public Task<ServiceResult<MemberReviewView>> GetMemberReviewAsync(Guid memberId, CancellationToken cancellationToken = default)
    {
        ReviewReads++;
        return Task.FromResult(Reviews.TryGetValue(memberId, out var r) ? ServiceResult<MemberReviewView>.Ok(r)
            : ServiceResult<MemberReviewView>.NotFound("The member does not exist or you are not a member of its project."));
    }

    public Task<ServiceResult<IReadOnlyList<MemberReviewView>>> GetTrussReviewAsync(Guid trussId, CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<IReadOnlyList<MemberReviewView>>.Ok(Reviews.Values.Where(r => r.TrussId == trussId).ToList()));

    public Task<ServiceResult<ChangesSinceApproval>> GetChangesSinceApprovalAsync(Guid memberId, CancellationToken cancellationToken = default) =>
        Task.FromResult(Changes is { } c && c.MemberId == memberId ? ServiceResult<ChangesSinceApproval>.Ok(c)
            : ServiceResult<ChangesSinceApproval>.Invalid("Approval", "never approved"));

    public Task<ServiceResult<IReadOnlyList<CheckQueueItem>>> ListMyQueueAsync(CancellationToken cancellationToken = default)
    {
        QueueReads++;
        return Task.FromResult(ServiceResult<IReadOnlyList<CheckQueueItem>>.Ok(Queue.ToList()));
    }

    public Task<ServiceResult<ReviewRollUp>> GetRollUpAsync(Guid projectId, CancellationToken cancellationToken = default)
    {
        RollUpReads++;
        return Task.FromResult(RollUp is { } r && r.ProjectId == projectId ? ServiceResult<ReviewRollUp>.Ok(r)
            : ServiceResult<ReviewRollUp>.NotFound("The project does not exist or you are not a member of it."));
    }

    public Task<ServiceResult<IReadOnlyList<AuditEntryView>>> GetAuditAsync(Guid projectId, Guid? memberId, CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<IReadOnlyList<AuditEntryView>>.Ok(Audit.Where(a => memberId is null || a.EntityId == memberId.ToString()).ToList()));

    public Task<ServiceResult<byte[]>> ExportAuditCsvAsync(Guid projectId, CancellationToken cancellationToken = default) => throw new NotSupportedException();

    public Task<ServiceResult<IssueStatus>> GetIssueStatusAsync(Guid projectId, CancellationToken cancellationToken = default) => throw new NotSupportedException();

    public Task<ServiceResult<IssueRecord>> IssueFinalSetAsync(Guid projectId, CancellationToken cancellationToken = default) => throw new NotSupportedException();
}
