namespace TrussWeb.Reports.Model;

/// <summary>
/// The review of one member as the caller states it (services map their review states to text).
/// </summary>
/// <param name="Mark">Member mark.</param>
/// <param name="State">Review state as printed, e.g. "Approved", "Submitted", "Returned", "Draft".</param>
/// <param name="Checker">Who reviewed it ("" when nobody has).</param>
/// <param name="Comment">The checker's comment ("" for none).</param>
public sealed record MemberReviewInfo(string Mark, string State, string Checker = "", string Comment = "")
{
    /// <summary>Shown when the caller gives no review for a member.</summary>
    public const string NotReviewedState = "Not reviewed";

    /// <summary>Review of a member the caller said nothing about.</summary>
    public static MemberReviewInfo NotReviewed(string mark) => new(mark, NotReviewedState);
}
