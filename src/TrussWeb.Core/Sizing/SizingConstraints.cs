using TrussWeb.Core.Sections;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Sizing;

/// <summary>
/// Limits on the sections a group may take: allowed families, minimum leg/outer dimension and
/// thickness, maximum leg/outer dimension (mm). Double-angle candidates share one gap, set when the
/// candidates are built.
/// </summary>
public sealed record SizingConstraints
{
    public required IReadOnlySet<SectionFamily> Families { get; init; }

    public double MinDimension { get; init; }

    public double MinThickness { get; init; }

    public double MaxDimension { get; init; } = double.PositiveInfinity;

    public bool Admits(SizingCandidate candidate) =>
        Families.Contains(candidate.Family)
        && candidate.SmallestDimension >= MinDimension
        && candidate.Thickness >= MinThickness
        && candidate.LargestDimension <= MaxDimension;

    public IReadOnlyList<ValidationIssue> Validate()
    {
        var issues = new List<ValidationIssue>();
        if (Families.Count == 0)
        {
            issues.Add(new ValidationIssue(nameof(Families), "choose at least one section family"));
        }

        Guard.NonNegative(issues, nameof(MinDimension), MinDimension, "mm");
        Guard.NonNegative(issues, nameof(MinThickness), MinThickness, "mm");
        if (double.IsNaN(MaxDimension) || MaxDimension <= 0)
        {
            issues.Add(new ValidationIssue(nameof(MaxDimension), $"must be greater than 0 mm (got {MaxDimension} mm)"));
        }
        else if (MaxDimension < MinDimension)
        {
            issues.Add(new ValidationIssue(nameof(MaxDimension), $"maximum {MaxDimension} mm is below the minimum {MinDimension} mm"));
        }

        return issues;
    }
}
