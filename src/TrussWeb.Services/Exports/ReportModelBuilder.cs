using System.Reflection;
using Microsoft.EntityFrameworkCore;
using TrussWeb.Core.Validation;
using TrussWeb.Data;
using TrussWeb.Reports.Model;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Design;
using TrussWeb.Services.Review;

namespace TrussWeb.Services.Exports;

/// <summary>
/// Builds the report model of a project from what is stored. Core rebuilds each truss's result objects
/// (the renderers need the calculation records) from the stored inputs, and a member is printed only when
/// the rebuilt fingerprint equals its stored snapshot's, so every printed number is the stored result. A
/// truss or member without a matching stored result is left out and named in the document's notes.
/// </summary>
internal static class ReportModelBuilder
{
    public sealed record Model(ReportHeader Header, IReadOnlyList<TrussReportData> Trusses, string ProjectCode, string Revision);

    /// <summary>Number of trusses and members of the project (to size the progress before the work starts).</summary>
    public static async Task<(int Trusses, int Members)> CountAsync(TrussWebDbContext db, Guid projectId, CancellationToken cancellationToken)
    {
        var trusses = await db.Trusses.AsNoTracking().CountAsync(t => t.ProjectId == projectId, cancellationToken).ConfigureAwait(false);
        var members = await db.TrussMembers.AsNoTracking().CountAsync(m => m.Truss!.ProjectId == projectId, cancellationToken).ConfigureAwait(false);
        return (trusses, members);
    }

    public static async Task<Model> BuildAsync(TrussWebDbContext db, Guid projectId, string producedBy, bool final, DateTimeOffset producedAt,
        Action<string> trussDone, CancellationToken cancellationToken)
    {
        var project = await db.Projects.AsNoTracking().SingleOrDefaultAsync(p => p.Id == projectId, cancellationToken).ConfigureAwait(false)
            ?? throw new InvalidOperationException("The project was deleted.");
        var status = await ReviewService.IssueStatusAsync(db, projectId, cancellationToken).ConfigureAwait(false);
        if (final && !status.CanIssueFinal)
        {
            throw new InvalidOperationException($"The final set can no longer be produced: {status.Summary}");
        }

        var trussIds = await db.Trusses.AsNoTracking().Where(t => t.ProjectId == projectId).OrderBy(t => t.Name).Select(t => t.Id)
            .ToListAsync(cancellationToken).ConfigureAwait(false);
        var notes = new List<string>();
        var data = new List<TrussReportData>();
        var designerIds = new List<string>();
        var checkerIds = new List<string>();
        foreach (var trussId in trussIds)
        {
            cancellationToken.ThrowIfCancellationRequested();
            var truss = await DesignInputBuilder.LoadTrussAsync(db, trussId, cancellationToken).ConfigureAwait(false);
            if (truss is null)
            {
                continue;
            }

            designerIds.AddRange(truss.Members.Select(m => m.DesignerOfRecordId).OfType<string>());
            checkerIds.AddRange(truss.Members.Select(m => m.CheckerId).OfType<string>());
            var snapshots = await db.DesignSnapshots.AsNoTracking().Where(s => s.TrussId == trussId).ToListAsync(cancellationToken).ConfigureAwait(false);
            var stored = snapshots.FirstOrDefault(s => s.MemberId is null);
            var (context, _) = stored is null ? (null, []) : await DesignInputBuilder.BuildAsync(db, truss, forSizing: false, cancellationToken).ConfigureAwait(false);
            DesignRunner.Outcome? outcome = null;
            if (context is not null)
            {
                try
                {
                    outcome = DesignRunner.Design(context);
                }
                catch (InputValidationException)
                {
                    outcome = null;
                }
            }

            if (stored is null || outcome is null)
            {
                notes.Add($"Truss {truss.Name}: no stored design result ({truss.Members.Count} members); it is not included. Complete its inputs and design it.");
                trussDone(truss.Name);
                continue;
            }

            if (!string.Equals(outcome.TrussSnapshot.Fingerprint, stored.Fingerprint, StringComparison.Ordinal))
            {
                notes.Add($"Truss {truss.Name}: the stored design result no longer matches its inputs or the installed version; it is not included. Design it again.");
                trussDone(truss.Name);
                continue;
            }

            var storedByMember = snapshots.Where(s => s.MemberId is not null).ToDictionary(s => s.MemberId!.Value, s => s.Fingerprint);
            var rebuilt = outcome.Snapshots.ToDictionary(s => s.MemberId!.Value, s => s.Fingerprint);
            var missing = new List<string>();
            var kept = outcome.Result.Members.Where(o =>
            {
                var id = context!.MembersByMark[o.Mark].Id;
                var ok = storedByMember.TryGetValue(id, out var fp) && rebuilt.TryGetValue(id, out var now) && string.Equals(fp, now, StringComparison.Ordinal);
                if (!ok)
                {
                    missing.Add(o.Mark);
                }

                return ok;
            }).ToList();
            if (missing.Count > 0)
            {
                notes.Add($"Truss {truss.Name}: no stored design result for member(s) {string.Join(", ", missing)}; they are not included.");
            }

            var names = await NamesAsync(db, truss.Members.Select(m => m.CheckerId), cancellationToken).ConfigureAwait(false);
            var reviews = truss.Members.ToDictionary(m => m.Mark, m => new MemberReviewInfo(m.Mark, StateText(ReviewStateMachine.Parse(m.ReviewState)),
                m.CheckerId is { } c && names.TryGetValue(c, out var n) ? n : "", m.ReviewComment ?? ""), StringComparer.Ordinal);
            var result = outcome.Result with { Members = kept };
            data.Add(TrussReportData.From(truss.Name, context!.Input, result, result.LoadCases, context.Sections.Catalogue, reviews));
            trussDone(truss.Name);
        }

        var people = await NamesAsync(db, designerIds.Concat(checkerIds), cancellationToken).ConfigureAwait(false);
        string Join(IEnumerable<string> ids) => string.Join(", ", ids.Distinct(StringComparer.Ordinal).Select(i => people.GetValueOrDefault(i)).OfType<string>()
            .Order(StringComparer.Ordinal));
        var header = new ReportHeader
        {
            ProjectName = project.Name,
            ProjectNumber = project.Reference ?? "",
            Client = project.Client ?? "",
            Location = project.Location ?? "",
            Revision = project.Revision,
            Designer = Join(designerIds),
            Checker = Join(checkerIds),
            ProducedAtUtc = producedAt,
            ProducedBy = producedBy,
            AppVersion = AppVersion,
            StandardEdition = Standards.Find(project.StandardCode)?.Edition ?? project.StandardCode,
            TotalMembers = status.TotalMembers,
            ApprovedCount = status.ApprovedMembers,
            IsFinal = final,
            Notes = notes,
        };
        return new Model(header, data, string.IsNullOrWhiteSpace(project.Reference) ? project.Name : project.Reference, project.Revision);
    }

    /// <summary>The app's version as printed (informational version without the source hash).</summary>
    public static string AppVersion { get; } =
        (typeof(ReportModelBuilder).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion ?? "0").Split('+')[0];

    public static string StateText(MemberReviewState state) => state switch
    {
        MemberReviewState.Approved => "Approved",
        MemberReviewState.AwaitingCheck => "Awaiting check",
        MemberReviewState.Returned => "Returned",
        MemberReviewState.ApprovalStale => "Approval stale",
        _ => "Not submitted",
    };

    private static async Task<Dictionary<string, string>> NamesAsync(TrussWebDbContext db, IEnumerable<string?> ids, CancellationToken cancellationToken)
    {
        var wanted = ids.OfType<string>().Distinct(StringComparer.Ordinal).ToList();
        return await db.Users.AsNoTracking().Where(u => wanted.Contains(u.Id)).ToDictionaryAsync(u => u.Id, u => u.DisplayName, cancellationToken).ConfigureAwait(false);
    }
}
