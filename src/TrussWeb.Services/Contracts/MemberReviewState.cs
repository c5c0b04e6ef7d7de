namespace TrussWeb.Services.Contracts;

/// <summary>Where a member stands in the independent check. Stored by name in <c>TrussMember.ReviewState</c>.</summary>
public enum MemberReviewState
{
    /// <summary>Being designed; not yet handed to a checker (stored "Draft" on new members reads as this).</summary>
    NotSubmitted,

    /// <summary>Handed to a named checker; waiting for their decision.</summary>
    AwaitingCheck,

    /// <summary>Approved by the checker; valid while the member's fingerprint equals the approved one.</summary>
    Approved,

    /// <summary>Sent back by the checker with a comment; the designer answers and resubmits.</summary>
    Returned,

    /// <summary>Was approved, but a design run has since given the member a different fingerprint.</summary>
    ApprovalStale,
}
