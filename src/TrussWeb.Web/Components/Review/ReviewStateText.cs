using MudBlazor;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Review;

namespace TrussWeb.Web.Components.Review;

/// <summary>The words and colours the pages use for review states and actions (one place for every page).</summary>
public static class ReviewStateText
{
    /// <summary>Every state in the order of the workflow (for roll-up columns).</summary>
    public static IReadOnlyList<MemberReviewState> Order { get; } =
        [MemberReviewState.NotSubmitted, MemberReviewState.AwaitingCheck, MemberReviewState.Returned, MemberReviewState.Approved, MemberReviewState.ApprovalStale];

    /// <summary>The state in the words the service uses in its messages (<see cref="ReviewStateMachine.Describe"/>), capitalised.</summary>
    public static string Words(MemberReviewState state)
    {
        var words = ReviewStateMachine.Describe(state);
        return words.Length == 0 ? words : char.ToUpperInvariant(words[0]) + words[1..];
    }

    /// <summary>The stored name (<c>TrussMember.ReviewState</c>: "Draft" reads as not submitted) in words.</summary>
    public static string Words(string? stored) => Words(Parse(stored));

    public static MemberReviewState Parse(string? stored) => ReviewStateMachine.Parse(stored);

    /// <summary>
    /// Counts keyed by stored state names (e.g. <c>{"Draft": 27, "Approved": 2}</c>) in words, in workflow order, the way the
    /// design counts read ("27 not submitted, 2 approved"); names that mean the same state are added together.
    /// </summary>
    public static string Counts(IReadOnlyDictionary<string, int> storedCounts)
    {
        ArgumentNullException.ThrowIfNull(storedCounts);
        var byState = storedCounts.GroupBy(kv => Parse(kv.Key)).ToDictionary(g => g.Key, g => g.Sum(kv => kv.Value));
        return string.Join(", ", Order.Where(s => byState.GetValueOrDefault(s) > 0).Select(s => $"{byState[s]} {ReviewStateMachine.Describe(s)}"));
    }

    public static Color ColorOf(MemberReviewState state) => state switch
    {
        MemberReviewState.AwaitingCheck => Color.Info,
        MemberReviewState.Approved => Color.Success,
        MemberReviewState.Returned => Color.Warning,
        MemberReviewState.ApprovalStale => Color.Error,
        _ => Color.Default,
    };

    /// <summary>An audit action such as "ReviewApprove" or a field change in words.</summary>
    public static string ActionWords(string action) => action switch
    {
        "ReviewSubmit" => "Submitted",
        "ReviewResubmit" => "Resubmitted",
        "ReviewWithdraw" => "Withdrawn",
        "ReviewApprove" => "Approved",
        "ReviewReturn" => "Returned",
        "ReviewReassignChecker" => "Checker reassigned",
        "ReviewApprovalStale" => "Approval no longer valid",
        "ReviewFinalSetIssued" => "Final set issued",
        _ => action,
    };

    /// <summary>The first 12 characters of a fingerprint (enough to tell two apart on screen).</summary>
    public static string Short(string? fingerprint) => fingerprint is null ? "–" : fingerprint.Length <= 12 ? fingerprint : fingerprint[..12];

    public static string When(DateTime? utc) => utc is { } t ? t.ToString("yyyy-MM-dd HH:mm", System.Globalization.CultureInfo.InvariantCulture) + " UTC" : "–";
}
