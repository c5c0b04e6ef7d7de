using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Review;

/// <summary>
/// The one table of review transitions: (state, action, actor) → next state or a refusal. Pure: it knows
/// nothing of users; the service adds the rules about people (four eyes, the assigned checker, who may be
/// a checker). See docs/dev/review.md.
/// </summary>
public static class ReviewStateMachine
{
    private sealed record Rule(IReadOnlySet<ReviewActor> Actors, string ActorRefusal, IReadOnlyDictionary<MemberReviewState, MemberReviewState> From);

    private static readonly HashSet<ReviewActor> Authors = [ReviewActor.Designer, ReviewActor.ProjectLead, ReviewActor.Administrator];
    private static readonly HashSet<ReviewActor> Deciders = [ReviewActor.Checker, ReviewActor.ProjectLead, ReviewActor.Administrator];
    private static readonly HashSet<ReviewActor> Leads = [ReviewActor.ProjectLead, ReviewActor.Administrator];

    private static readonly Dictionary<ReviewAction, Rule> Rules = new()
    {
        [ReviewAction.Submit] = new(Authors, "A checker does not submit members; a designer or the project lead does.",
            new Dictionary<MemberReviewState, MemberReviewState>
            {
                [MemberReviewState.NotSubmitted] = MemberReviewState.AwaitingCheck,
                [MemberReviewState.ApprovalStale] = MemberReviewState.AwaitingCheck,
            }),
        [ReviewAction.Resubmit] = new(Authors, "A checker does not resubmit members; the designer answers and resubmits.",
            new Dictionary<MemberReviewState, MemberReviewState> { [MemberReviewState.Returned] = MemberReviewState.AwaitingCheck }),
        [ReviewAction.Withdraw] = new(Authors, "Only a designer or the project lead can withdraw a submission.",
            new Dictionary<MemberReviewState, MemberReviewState> { [MemberReviewState.AwaitingCheck] = MemberReviewState.NotSubmitted }),
        [ReviewAction.Approve] = new(Deciders, "A designer cannot approve members; a checker or the project lead does.",
            new Dictionary<MemberReviewState, MemberReviewState> { [MemberReviewState.AwaitingCheck] = MemberReviewState.Approved }),
        [ReviewAction.Return] = new(Deciders, "A designer cannot return members; a checker or the project lead does.",
            new Dictionary<MemberReviewState, MemberReviewState> { [MemberReviewState.AwaitingCheck] = MemberReviewState.Returned }),
        [ReviewAction.ReassignChecker] = new(Leads, "Only the project lead can give a member to another checker.",
            new Dictionary<MemberReviewState, MemberReviewState>
            {
                [MemberReviewState.AwaitingCheck] = MemberReviewState.AwaitingCheck,
                [MemberReviewState.Returned] = MemberReviewState.Returned,
            }),
    };

    /// <summary>What <paramref name="action"/> by <paramref name="actor"/> does to a member in <paramref name="state"/>. The actor is checked first.</summary>
    public static ReviewTransition Decide(MemberReviewState state, ReviewAction action, ReviewActor actor)
    {
        var rule = Rules[action];
        if (!rule.Actors.Contains(actor))
        {
            return ReviewTransition.Refused(rule.ActorRefusal, forActor: true);
        }

        return rule.From.TryGetValue(state, out var next)
            ? ReviewTransition.To(next)
            : ReviewTransition.Refused(StateRefusal(state, action), forActor: false);
    }

    /// <summary>The actions <paramref name="actor"/> may take in <paramref name="state"/> (before the rules about people).</summary>
    public static IReadOnlyList<ReviewAction> Available(MemberReviewState state, ReviewActor actor) =>
        Enum.GetValues<ReviewAction>().Where(a => Decide(state, a, actor).Allowed).ToList();

    /// <summary>Reads a stored state name; the initial "Draft" and unknown text read as NotSubmitted.</summary>
    public static MemberReviewState Parse(string? stored) =>
        Enum.TryParse<MemberReviewState>(stored, ignoreCase: false, out var state) && Enum.IsDefined(state) ? state : MemberReviewState.NotSubmitted;

    private static string StateRefusal(MemberReviewState state, ReviewAction action) => (state, action) switch
    {
        (MemberReviewState.AwaitingCheck, ReviewAction.Submit) => "The member is already awaiting check.",
        (MemberReviewState.Approved, ReviewAction.Submit) => "The member is approved and unchanged since; there is nothing to submit.",
        (MemberReviewState.Returned, ReviewAction.Submit) => "The member was returned: resubmit it with an answer to the checker's comment.",
        (_, ReviewAction.Resubmit) => $"Only a returned member can be resubmitted; this one is {Describe(state)}.",
        (_, ReviewAction.Withdraw) => $"Only a member awaiting check can be withdrawn; this one is {Describe(state)}.",
        (_, ReviewAction.Approve) => $"Only a member awaiting check can be approved; this one is {Describe(state)}.",
        (_, ReviewAction.Return) => $"Only a member awaiting check can be returned; this one is {Describe(state)}.",
        (_, ReviewAction.ReassignChecker) => $"Only a member awaiting check or returned has a checker to change; this one is {Describe(state)}.",
        _ => $"{action} is not possible for a member that is {Describe(state)}.",
    };

    /// <summary>Words for a state in messages.</summary>
    public static string Describe(MemberReviewState state) => state switch
    {
        MemberReviewState.NotSubmitted => "not submitted",
        MemberReviewState.AwaitingCheck => "awaiting check",
        MemberReviewState.Approved => "approved",
        MemberReviewState.Returned => "returned",
        MemberReviewState.ApprovalStale => "approved but changed since (approval stale)",
        _ => state.ToString(),
    };
}
