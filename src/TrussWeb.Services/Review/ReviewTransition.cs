using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Review;

/// <summary>Answer of <see cref="ReviewStateMachine"/>: the next state, or why the action is refused.</summary>
/// <remarks><see cref="RefusedForActor"/> is true when the actor may never take the action (a matter of rights), false when the state forbids it now.</remarks>
public sealed record ReviewTransition(bool Allowed, MemberReviewState? Next, string? Refusal, bool RefusedForActor = false)
{
    public static ReviewTransition To(MemberReviewState next) => new(true, next, null);

    public static ReviewTransition Refused(string reason, bool forActor) => new(false, null, reason, forActor);
}
