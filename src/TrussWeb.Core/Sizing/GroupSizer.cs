using TrussWeb.Core.Design;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Records;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Sizing;

/// <summary>
/// Picks, for a group of members, the lightest section (mass per metre) from the admissible
/// candidates that passes every check of every member. Deterministic: candidates are ordered by mass,
/// then designation (ordinal); the first that passes wins. Checks run without records while
/// searching and once more with records for the chosen section.
/// </summary>
public static class GroupSizer
{
    public static GroupSizingResult Size(
        string group,
        IReadOnlyList<GroupMemberDemand> members,
        IReadOnlyList<SizingCandidate> candidates,
        SizingConstraints constraints,
        SteelGrade grade,
        IDesignStandard standard)
    {
        ArgumentNullException.ThrowIfNull(members);
        ArgumentNullException.ThrowIfNull(candidates);
        ArgumentNullException.ThrowIfNull(constraints);
        ArgumentNullException.ThrowIfNull(grade);
        ArgumentNullException.ThrowIfNull(standard);
        Guard.ThrowIfAny(constraints.Validate());

        var ordered = candidates
            .Where(constraints.Admits)
            .OrderBy(c => c.MassPerMetre)
            .ThenBy(c => c.Section.Designation, StringComparer.Ordinal)
            .ToList();
        if (ordered.Count == 0)
        {
            return new GroupSizingResult(group, null, [], "no catalogue section meets the group's family and size limits", null, null, 0);
        }

        SizingCandidate? previous = null;
        string? previousFailure = null;
        var tried = 0;
        foreach (var candidate in ordered)
        {
            tried++;
            if (!grade.TryFyFor(candidate.Section.GoverningThickness, out _))
            {
                previous = candidate;
                previousFailure = $"grade {grade.Name} has no yield strength for t = {candidate.Section.GoverningThickness} mm";
                continue;
            }

            var material = grade.For(candidate.Section.GoverningThickness);
            var failure = FirstFailure(members, candidate, material, standard);
            if (failure is null)
            {
                var results = members.Select(m => standard.CheckMember(ToDesignMember(m, candidate, material), m.Forces, withRecord: true)).ToList();
                return new GroupSizingResult(group, candidate.Section, results, null, previous?.Section, previousFailure, tried);
            }

            previous = candidate;
            previousFailure = failure;
        }

        // Nothing passes: report the heaviest admissible candidate's governing failure, never a silently failing section.
        var heaviest = ordered[^1];
        return new GroupSizingResult(group, null, [],
            $"no admissible section passes; the heaviest, {heaviest.Section.Designation}, fails: {previousFailure}",
            heaviest.Section, previousFailure, tried);
    }

    /// <summary>The first member/check that fails for this candidate, or null when all pass.</summary>
    private static string? FirstFailure(IReadOnlyList<GroupMemberDemand> members, SizingCandidate candidate, Material material, IDesignStandard standard)
    {
        foreach (var m in members)
        {
            var dm = ToDesignMember(m, candidate, material);
            var issues = standard.Validate(dm);
            if (issues.Count > 0)
            {
                return $"{m.Mark}: {issues[0]}";
            }

            var result = standard.CheckMember(dm, m.Forces, withRecord: false);
            if (result.Status != CheckStatus.Pass)
            {
                return $"{m.Mark}: {result.GoverningCheck} (utilization {Display.Sig(result.Utilization)})";
            }
        }

        return null;
    }

    private static DesignMember ToDesignMember(GroupMemberDemand m, SizingCandidate candidate, Material material) => new()
    {
        Mark = m.Mark,
        Section = candidate.Section,
        Material = material,
        Lengths = m.Lengths,
        Connection = m.Connection,
        Connectors = candidate.Section.Family == Sections.SectionFamily.DoubleAngle ? m.Connectors ?? new ConnectorLayout() : null,
        Options = m.Options ?? new DesignOptions(),
    };
}
