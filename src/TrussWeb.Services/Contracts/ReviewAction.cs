namespace TrussWeb.Services.Contracts;

/// <summary>The things a user can do to a member's review.</summary>
public enum ReviewAction
{
    /// <summary>Hand a member (or every member of a truss) to a checker.</summary>
    Submit,

    /// <summary>Hand a returned member back to its checker with an answer to the comment.</summary>
    Resubmit,

    /// <summary>Take a submitted member back before the checker decides.</summary>
    Withdraw,

    /// <summary>Accept the member's current design (its fingerprint is recorded).</summary>
    Approve,

    /// <summary>Send the member back to its designer with a comment.</summary>
    Return,

    /// <summary>Give a waiting or returned member to another checker.</summary>
    ReassignChecker,
}
