using Microsoft.EntityFrameworkCore;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Common;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Review;

/// <summary>
/// Runs after a design run has staged new snapshots, in the same unit of work: a member whose fingerprint
/// changed gets the caller as its designer of record, and an approved member whose fingerprint no longer
/// equals the approved one becomes ApprovalStale (with an audit entry). Nothing is recalculated here: it
/// compares the fingerprints the run has just stored.
/// </summary>
internal static class ReviewStaleness
{
    /// <summary>The audit action written when an approval goes stale.</summary>
    public const string StaleAction = "ReviewApprovalStale";

    /// <summary>Whether a member in <paramref name="state"/> approved at <paramref name="approvedFingerprint"/> is stale at <paramref name="currentFingerprint"/> (null: no stored design).</summary>
    public static bool MakesStale(MemberReviewState state, string? approvedFingerprint, string? currentFingerprint) =>
        state == MemberReviewState.Approved && !string.Equals(approvedFingerprint, currentFingerprint, StringComparison.Ordinal);

    /// <summary>
    /// Applies designer of record and staleness to the tracked members of <paramref name="truss"/>;
    /// returns the events to publish once the caller has committed.
    /// </summary>
    public static IReadOnlyList<ReviewEvent> Apply(TrussWebDbContext db, Truss truss, IReadOnlyDictionary<Guid, string> previous,
        IReadOnlyDictionary<Guid, string> current, ICallerContext caller, TimeProvider clock)
    {
        var events = new List<ReviewEvent>();
        var now = clock.GetUtcNow().UtcDateTime;
        foreach (var member in truss.Members)
        {
            if (db.Entry(member).State is EntityState.Deleted or EntityState.Detached)
            {
                continue;
            }

            var before = previous.GetValueOrDefault(member.Id);
            var after = current.GetValueOrDefault(member.Id);
            if (!string.Equals(before, after, StringComparison.Ordinal) && after is not null && caller.UserId is not null)
            {
                member.DesignerOfRecordId = caller.UserId;
            }

            var state = ReviewStateMachine.Parse(member.ReviewState);
            if (!MakesStale(state, member.ApprovedFingerprint, after))
            {
                continue;
            }

            member.ReviewState = nameof(MemberReviewState.ApprovalStale);
            AuditWriter.AddAction(db, caller, clock, truss.ProjectId, nameof(TrussMember), member.Id.ToString(), StaleAction, "ReviewState",
                nameof(MemberReviewState.Approved), nameof(MemberReviewState.ApprovalStale), after,
                $"{member.Mark}: fingerprint changed since approval (approved {Short(member.ApprovedFingerprint)}, now {Short(after)}).");
            events.Add(new ReviewEvent(truss.ProjectId, truss.Id, member.Id, member.Mark, MemberReviewState.Approved, MemberReviewState.ApprovalStale,
                StaleAction, caller.UserId, now));
        }

        return events;
    }

    private static string Short(string? fingerprint) => fingerprint is null ? "no stored design" : fingerprint[..Math.Min(12, fingerprint.Length)];
}
