namespace TrussWeb.Services.Contracts;

/// <summary>One committed change of a member's review state (published after the transaction commits).</summary>
public sealed record ReviewEvent(
    Guid ProjectId,
    Guid TrussId,
    Guid MemberId,
    string Mark,
    MemberReviewState From,
    MemberReviewState To,
    string Action,
    string? UserId,
    DateTime UtcTime);

/// <summary>
/// In-process notifications of review changes, so open pages can refresh without a reload. A singleton:
/// it only reaches circuits of the same app instance; several instances need a backplane (not built yet).
/// Handlers run synchronously on the publishing thread: a page marshals with <c>InvokeAsync</c>.
/// </summary>
public interface IReviewEvents
{
    /// <summary>Calls <paramref name="handler"/> for every event of the project until the returned handle is disposed.</summary>
    IDisposable Subscribe(Guid projectId, Action<ReviewEvent> handler);

    /// <summary>Delivers the event to the project's subscribers. Services call it only after commit.</summary>
    void Publish(ReviewEvent reviewEvent);
}
