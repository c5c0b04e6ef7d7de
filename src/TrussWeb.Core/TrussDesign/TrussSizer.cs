using TrussWeb.Core.Design;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Sizing;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.TrussDesign;

/// <summary>
/// Automatic sizing of a truss: per group with <see cref="GroupDesignSettings.Constraints"/>, the
/// lightest admissible section that passes every check of every member of the group for every
/// ultimate combination; then analysis again with the new self-weight, until the sections stop
/// changing or the mass changes by less than <see cref="MassTolerance"/>, at most
/// <see cref="MaxRounds"/> rounds.
/// </summary>
public static class TrussSizer
{
    /// <summary>Relative change of truss mass below which the self-weight iteration has settled (0.5 %).</summary>
    public const double MassTolerance = 0.005;

    /// <summary>Largest number of analysis-and-sizing rounds.</summary>
    public const int MaxRounds = 6;

    /// <param name="input">The truss; groups without constraints keep their section.</param>
    /// <param name="catalogue">Sections to choose from.</param>
    /// <param name="progress">Optional progress: (round, group just sized).</param>
    /// <param name="cancellationToken">Stops between groups.</param>
    public static TrussSizingResult Size(TrussDesignInput input, CatalogueLoadResult catalogue,
        IProgress<(int Round, string Group)>? progress = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(input);
        ArgumentNullException.ThrowIfNull(catalogue);
        var candidatesByGroup = new Dictionary<string, IReadOnlyList<SizingCandidate>>(StringComparer.Ordinal);
        var groups = new Dictionary<string, GroupDesignSettings>(input.Groups, StringComparer.Ordinal);
        foreach (var (name, settings) in input.Groups)
        {
            if (settings.Constraints is { } c)
            {
                Guard.ThrowIfAny(c.Validate());
                var candidates = CandidateBuilder.FromCatalogue(catalogue, c.Families, settings.DoubleAngleGap, settings.Orientation)
                    .Where(c.Admits).ToList();
                if (candidates.Count == 0)
                {
                    throw new InputValidationException($"Groups[{name}].Constraints", $"no catalogue section meets the limits of group '{name}'");
                }

                candidatesByGroup[name] = candidates;
                if (settings.Section is null)
                {
                    var lightest = candidates.OrderBy(x => x.MassPerMetre).ThenBy(x => x.Section.Designation, StringComparer.Ordinal).First();
                    groups[name] = settings with { Section = lightest.Section };
                }
            }
        }

        var current = input with { Groups = groups };
        var rounds = new List<SizingRound>();
        var lastGroups = new List<GroupSizingResult>();
        var previousMass = double.NaN;
        var converged = false;
        for (var round = 1; round <= MaxRounds && !converged; round++)
        {
            var design = TrussDesigner.Design(current, withRecords: false);
            lastGroups = [];
            var next = new Dictionary<string, GroupDesignSettings>(current.Groups, StringComparer.Ordinal);
            foreach (var (name, candidates) in candidatesByGroup)
            {
                cancellationToken.ThrowIfCancellationRequested();
                var settings = current.Groups[name];
                var demands = design.Members
                    .Where(m => m.Group == name && !current.MemberSections.ContainsKey(m.Mark))
                    .Select(m => new GroupMemberDemand(m.Mark, m.Lengths, m.Envelope.ToMemberForces(), settings.Connection, settings.Connectors,
                        current.MemberOptions.TryGetValue(m.Mark, out var o) ? o : settings.Options))
                    .ToList();
                var sized = GroupSizer.Size(name, demands, candidates, settings.Constraints!, current.Grade, current.Standard);
                lastGroups.Add(sized);
                if (sized.Chosen is not null)
                {
                    next[name] = settings with { Section = sized.Chosen };
                }

                progress?.Report((round, name));
            }

            var unchanged = next.All(p => ReferenceEquals(p.Value.Section, current.Groups[p.Key].Section)
                || p.Value.Section?.Designation == current.Groups[p.Key].Section?.Designation);
            current = current with { Groups = next };
            var mass = MassOf(current);
            rounds.Add(new SizingRound(round, next.ToDictionary(p => p.Key, p => p.Value.Section?.Designation ?? "-", StringComparer.Ordinal), mass));
            converged = unchanged || (!double.IsNaN(previousMass) && Math.Abs(mass - previousMass) < MassTolerance * mass);
            previousMass = mass;
        }

        var final = TrussDesigner.Design(current, withRecords: true);
        return new TrussSizingResult(final, current, lastGroups, rounds, converged);
    }

    private static double MassOf(TrussDesignInput input) =>
        input.Model.Members.Sum(m => input.Model.LengthOf(m) * TrussDesigner.SectionOf(input, m).MassPerMetre / 1000);
}
