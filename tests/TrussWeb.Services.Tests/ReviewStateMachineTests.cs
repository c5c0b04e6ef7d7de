using TrussWeb.Services.Contracts;
using TrussWeb.Services.Review;

namespace TrussWeb.Services.Tests;

/// <summary>
/// Every state × every action × every actor against the table below, which is the specification of the
/// review workflow (docs/dev/review.md). It is written out by hand, not derived from the code.
/// </summary>
public sealed class ReviewStateMachineTests
{
    // D = project designer, C = project checker, L = project lead, A = administrator.
    // Each row: action, from state, who may, next state ("-" = refused for everybody).
    private static readonly (ReviewAction Action, MemberReviewState From, string Who, string Next)[] Specification =
    [
        (ReviewAction.Submit, MemberReviewState.NotSubmitted, "DLA", "AwaitingCheck"),
        (ReviewAction.Submit, MemberReviewState.AwaitingCheck, "", "-"),
        (ReviewAction.Submit, MemberReviewState.Approved, "", "-"),
        (ReviewAction.Submit, MemberReviewState.Returned, "", "-"),
        (ReviewAction.Submit, MemberReviewState.ApprovalStale, "DLA", "AwaitingCheck"),

        (ReviewAction.Resubmit, MemberReviewState.NotSubmitted, "", "-"),
        (ReviewAction.Resubmit, MemberReviewState.AwaitingCheck, "", "-"),
        (ReviewAction.Resubmit, MemberReviewState.Approved, "", "-"),
        (ReviewAction.Resubmit, MemberReviewState.Returned, "DLA", "AwaitingCheck"),
        (ReviewAction.Resubmit, MemberReviewState.ApprovalStale, "", "-"),

        (ReviewAction.Withdraw, MemberReviewState.NotSubmitted, "", "-"),
        (ReviewAction.Withdraw, MemberReviewState.AwaitingCheck, "DLA", "NotSubmitted"),
        (ReviewAction.Withdraw, MemberReviewState.Approved, "", "-"),
        (ReviewAction.Withdraw, MemberReviewState.Returned, "", "-"),
        (ReviewAction.Withdraw, MemberReviewState.ApprovalStale, "", "-"),

        (ReviewAction.Approve, MemberReviewState.NotSubmitted, "", "-"),
        (ReviewAction.Approve, MemberReviewState.AwaitingCheck, "CLA", "Approved"),
        (ReviewAction.Approve, MemberReviewState.Approved, "", "-"),
        (ReviewAction.Approve, MemberReviewState.Returned, "", "-"),
        (ReviewAction.Approve, MemberReviewState.ApprovalStale, "", "-"),

        (ReviewAction.Return, MemberReviewState.NotSubmitted, "", "-"),
        (ReviewAction.Return, MemberReviewState.AwaitingCheck, "CLA", "Returned"),
        (ReviewAction.Return, MemberReviewState.Approved, "", "-"),
        (ReviewAction.Return, MemberReviewState.Returned, "", "-"),
        (ReviewAction.Return, MemberReviewState.ApprovalStale, "", "-"),

        (ReviewAction.ReassignChecker, MemberReviewState.NotSubmitted, "", "-"),
        (ReviewAction.ReassignChecker, MemberReviewState.AwaitingCheck, "LA", "AwaitingCheck"),
        (ReviewAction.ReassignChecker, MemberReviewState.Approved, "", "-"),
        (ReviewAction.ReassignChecker, MemberReviewState.Returned, "LA", "Returned"),
        (ReviewAction.ReassignChecker, MemberReviewState.ApprovalStale, "", "-"),
    ];

    /// <summary>Who may take an action at all (else the refusal is about the actor, whatever the state).</summary>
    private static readonly Dictionary<ReviewAction, string> MayEver = new()
    {
        [ReviewAction.Submit] = "DLA",
        [ReviewAction.Resubmit] = "DLA",
        [ReviewAction.Withdraw] = "DLA",
        [ReviewAction.Approve] = "CLA",
        [ReviewAction.Return] = "CLA",
        [ReviewAction.ReassignChecker] = "LA",
    };

    private static char Letter(ReviewActor actor) => actor switch
    {
        ReviewActor.Designer => 'D',
        ReviewActor.Checker => 'C',
        ReviewActor.ProjectLead => 'L',
        _ => 'A',
    };

    [Fact]
    public void The_specification_covers_every_state_and_action_once()
    {
        var pairs = Specification.Select(r => (r.Action, r.From)).ToList();
        Assert.Equal(Enum.GetValues<ReviewAction>().Length * Enum.GetValues<MemberReviewState>().Length, pairs.Count);
        Assert.Equal(pairs.Count, pairs.Distinct().Count());
    }

    [Fact]
    public void Every_state_action_and_actor_gives_the_specified_next_state_or_a_reason()
    {
        var checkedCases = 0;
        foreach (var row in Specification)
        {
            foreach (var actor in Enum.GetValues<ReviewActor>())
            {
                var result = ReviewStateMachine.Decide(row.From, row.Action, actor);
                var label = $"{row.Action} from {row.From} by {actor}";
                if (row.Who.Contains(Letter(actor), StringComparison.Ordinal))
                {
                    Assert.True(result.Allowed, $"{label}: {result.Refusal}");
                    Assert.Equal(Enum.Parse<MemberReviewState>(row.Next), result.Next);
                    Assert.Null(result.Refusal);
                }
                else
                {
                    Assert.False(result.Allowed, label);
                    Assert.Null(result.Next);
                    Assert.False(string.IsNullOrWhiteSpace(result.Refusal), label);
                    Assert.Equal(!MayEver[row.Action].Contains(Letter(actor), StringComparison.Ordinal), result.RefusedForActor);
                }

                checkedCases++;
            }
        }

        Assert.Equal(6 * 5 * 4, checkedCases);
    }

    [Fact]
    public void Refusals_say_what_to_do_instead()
    {
        Assert.Contains("resubmit", ReviewStateMachine.Decide(MemberReviewState.Returned, ReviewAction.Submit, ReviewActor.Designer).Refusal, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("designer cannot approve", ReviewStateMachine.Decide(MemberReviewState.AwaitingCheck, ReviewAction.Approve, ReviewActor.Designer).Refusal,
            StringComparison.OrdinalIgnoreCase);
        Assert.Contains("already awaiting check", ReviewStateMachine.Decide(MemberReviewState.AwaitingCheck, ReviewAction.Submit, ReviewActor.ProjectLead).Refusal,
            StringComparison.Ordinal);
        Assert.Contains("approval stale", ReviewStateMachine.Decide(MemberReviewState.ApprovalStale, ReviewAction.Approve, ReviewActor.Checker).Refusal,
            StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("Draft", MemberReviewState.NotSubmitted)]
    [InlineData("NotSubmitted", MemberReviewState.NotSubmitted)]
    [InlineData("AwaitingCheck", MemberReviewState.AwaitingCheck)]
    [InlineData("Approved", MemberReviewState.Approved)]
    [InlineData("Returned", MemberReviewState.Returned)]
    [InlineData("ApprovalStale", MemberReviewState.ApprovalStale)]
    public void Stored_state_names_read_back(string stored, MemberReviewState expected) =>
        Assert.Equal(expected, ReviewStateMachine.Parse(stored));

    [Fact]
    public void Only_a_changed_fingerprint_of_an_approved_member_makes_it_stale()
    {
        var a = new string('a', 64);
        var b = new string('b', 64);
        Assert.True(ReviewStaleness.MakesStale(MemberReviewState.Approved, a, b));
        Assert.True(ReviewStaleness.MakesStale(MemberReviewState.Approved, a, null));
        Assert.False(ReviewStaleness.MakesStale(MemberReviewState.Approved, a, a));
        Assert.False(ReviewStaleness.MakesStale(MemberReviewState.AwaitingCheck, a, b));
        Assert.False(ReviewStaleness.MakesStale(MemberReviewState.ApprovalStale, a, b));
    }
}
