namespace TrussWeb.Services.Contracts;

/// <summary>
/// The independent check of members: submit, approve, return, resubmit, withdraw, reassign; staleness of
/// approvals; audit log; queues; issue gating. The transitions are those of <c>ReviewStateMachine</c>
/// (docs/dev/review.md); the designer of record never approves or returns their own member.
/// </summary>
public interface IReviewService
{
    /// <summary>Hands one member to <paramref name="checkerUserId"/>; the caller becomes its designer of record.</summary>
    Task<ServiceResult<MemberReviewView>> SubmitAsync(Guid memberId, string checkerUserId, string? note, CancellationToken cancellationToken = default);

    /// <summary>Submits every member of the truss that is NotSubmitted or ApprovalStale; others are left alone (listed as skipped).</summary>
    Task<ServiceResult<TrussSubmission>> SubmitTrussAsync(Guid trussId, string checkerUserId, string? note, CancellationToken cancellationToken = default);

    /// <summary>Hands a returned member back to its checker; <paramref name="answer"/> (required) replies to the comment.</summary>
    Task<ServiceResult<MemberReviewView>> ResubmitAsync(Guid memberId, string answer, CancellationToken cancellationToken = default);

    /// <summary>Takes a member awaiting check back to NotSubmitted.</summary>
    Task<ServiceResult<MemberReviewView>> WithdrawAsync(Guid memberId, CancellationToken cancellationToken = default);

    /// <summary>Approves the member's current stored design; records its fingerprint and a copy of its inputs and results.</summary>
    Task<ServiceResult<MemberReviewView>> ApproveAsync(Guid memberId, string? comment, CancellationToken cancellationToken = default);

    /// <summary>Returns the member to its designer; <paramref name="comment"/> is required.</summary>
    Task<ServiceResult<MemberReviewView>> ReturnAsync(Guid memberId, string comment, CancellationToken cancellationToken = default);

    /// <summary>Project lead: gives a member awaiting check (or returned) to another checker.</summary>
    Task<ServiceResult<MemberReviewView>> ReassignCheckerAsync(Guid memberId, string checkerUserId, CancellationToken cancellationToken = default);

    /// <summary>
    /// Project members who may be named checker (project role Checker or ProjectLead). For a submission by the caller
    /// (<paramref name="reassignMemberId"/> null) the caller is left out, as they become the designer of record; for
    /// reassigning a member, its designer of record is left out. The service still checks the choice on the call.
    /// </summary>
    Task<ServiceResult<IReadOnlyList<EligibleChecker>>> ListEligibleCheckersAsync(Guid projectId, Guid? reassignMemberId, CancellationToken cancellationToken = default);

    Task<ServiceResult<MemberReviewView>> GetMemberReviewAsync(Guid memberId, CancellationToken cancellationToken = default);

    /// <summary>Every member of a truss with its review.</summary>
    Task<ServiceResult<IReadOnlyList<MemberReviewView>>> GetTrussReviewAsync(Guid trussId, CancellationToken cancellationToken = default);

    /// <summary>Inputs and results at approval against the current stored design, field by field (no recalculation).</summary>
    Task<ServiceResult<ChangesSinceApproval>> GetChangesSinceApprovalAsync(Guid memberId, CancellationToken cancellationToken = default);

    /// <summary>Members awaiting the caller's check, across the projects the caller belongs to.</summary>
    Task<ServiceResult<IReadOnlyList<CheckQueueItem>>> ListMyQueueAsync(CancellationToken cancellationToken = default);

    /// <summary>Counts per review state for the project and per truss.</summary>
    Task<ServiceResult<ReviewRollUp>> GetRollUpAsync(Guid projectId, CancellationToken cancellationToken = default);

    /// <summary>The project's audit log (oldest first), or one member's when <paramref name="memberId"/> is given. Read only.</summary>
    Task<ServiceResult<IReadOnlyList<AuditEntryView>>> GetAuditAsync(Guid projectId, Guid? memberId, CancellationToken cancellationToken = default);

    /// <summary>The project's audit log as CSV (RFC 4180, UTF-8, invariant culture, CRLF).</summary>
    Task<ServiceResult<byte[]>> ExportAuditCsvAsync(Guid projectId, CancellationToken cancellationToken = default);

    /// <summary>What the final-issue gate sees: members, approved (stale ones do not count), and whether the final set may be issued.</summary>
    Task<ServiceResult<IssueStatus>> GetIssueStatusAsync(Guid projectId, CancellationToken cancellationToken = default);

    /// <summary>Project lead: records the issue of the final set; refused unless every member is approved.</summary>
    Task<ServiceResult<IssueRecord>> IssueFinalSetAsync(Guid projectId, CancellationToken cancellationToken = default);
}

/// <summary>A member's review as stored, with the actions the caller may take now.</summary>
public sealed record MemberReviewView(
    Guid ProjectId,
    Guid TrussId,
    string TrussName,
    Guid MemberId,
    string Mark,
    MemberReviewState State,
    string? DesignerOfRecordId,
    string? DesignerOfRecordName,
    string? CheckerId,
    string? CheckerName,
    DateTime? SubmittedUtc,
    DateTime? ReviewedUtc,
    string? Comment,
    string? ApprovedFingerprint,
    string? CurrentFingerprint,
    IReadOnlyList<ReviewAction> AvailableActions);

/// <summary>A project member who may check members, with their project role.</summary>
public sealed record EligibleChecker(string UserId, string DisplayName, string ProjectRole);

/// <summary>Outcome of submitting a truss: the members submitted and those left as they were (with why).</summary>
public sealed record TrussSubmission(IReadOnlyList<MemberReviewView> Submitted, IReadOnlyList<SkippedMember> Skipped);

public sealed record SkippedMember(Guid MemberId, string Mark, MemberReviewState State, string Reason);

/// <summary>One difference between the approved design and the current one. Values are invariant JSON text; null when absent.</summary>
public sealed record FieldChange(string Field, string? AtApproval, string? Now);

public sealed record ChangesSinceApproval(
    Guid MemberId,
    string Mark,
    MemberReviewState State,
    string ApprovedFingerprint,
    string? CurrentFingerprint,
    DateTime? ApprovedUtc,
    string? ApprovedByName,
    IReadOnlyList<FieldChange> Changes);

public sealed record CheckQueueItem(
    Guid ProjectId,
    string ProjectName,
    Guid TrussId,
    string TrussName,
    Guid MemberId,
    string Mark,
    string? DesignerOfRecordName,
    DateTime? SubmittedUtc,
    double? Utilization,
    string? DesignStatus);

/// <summary>Counts per state (every state present, zero included).</summary>
public sealed record ReviewRollUp(Guid ProjectId, IReadOnlyDictionary<MemberReviewState, int> Totals, IReadOnlyList<TrussReviewCounts> Trusses);

public sealed record TrussReviewCounts(Guid TrussId, string Name, IReadOnlyDictionary<MemberReviewState, int> Counts);

public sealed record AuditEntryView(
    long Id,
    DateTime UtcTime,
    string? UserId,
    string? UserName,
    string EntityType,
    string EntityId,
    string Action,
    string? Field,
    string? OldValue,
    string? NewValue,
    string? Comment,
    string? Fingerprint);

public sealed record IssueStatus(Guid ProjectId, int TotalMembers, int ApprovedMembers, int StaleMembers, bool CanIssueFinal, string Summary);

/// <summary>A recorded final issue: the project revision, when, by whom, and a hash over every approved fingerprint.</summary>
public sealed record IssueRecord(Guid ProjectId, string Revision, DateTime IssuedUtc, string IssuedBy, int MemberCount, string ApprovalSetFingerprint);
