using System.Globalization;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Sections;

/// <summary>
/// Shared wording of the dimension rules, so every family tells the user the same way which field is
/// wrong and what the limit is, e.g. "thickness t = 0 mm must be greater than 0 mm".
/// </summary>
internal static class DimensionRules
{
    /// <summary>Invariant-culture number for messages ("12.5", never "12,5"), unrounded ("R" round-trip).</summary>
    public static string Num(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>Adds an issue unless the value is finite and greater than 0; returns whether it is.</summary>
    public static bool Positive(List<ValidationIssue> issues, string field, string label, double value)
    {
        if (!double.IsFinite(value))
        {
            issues.Add(new ValidationIssue(field, $"{label} must be a finite number of mm (got {Num(value)})"));
            return false;
        }

        if (value <= 0)
        {
            issues.Add(new ValidationIssue(field, $"{label} = {Num(value)} mm must be greater than 0 mm"));
            return false;
        }

        return WithinLimits(issues, field, label, value);
    }

    /// <summary>Adds an issue unless the value is finite and not negative; returns whether it is.</summary>
    public static bool NonNegative(List<ValidationIssue> issues, string field, string label, double value)
    {
        if (!double.IsFinite(value))
        {
            issues.Add(new ValidationIssue(field, $"{label} must be a finite number of mm (got {Num(value)})"));
            return false;
        }

        if (value < 0)
        {
            issues.Add(new ValidationIssue(field, $"{label} = {Num(value)} mm must not be negative"));
            return false;
        }

        // Radii may be as small as the user likes (a sharp corner); only the upper limit applies.
        return value <= PlausibleRange.MaxDimensionMm || WithinLimits(issues, field, label, value);
    }

    /// <summary>Outer limits (<see cref="PlausibleRange"/>): no dimension below 0.1 mm or above 5 000 mm.</summary>
    private static bool WithinLimits(List<ValidationIssue> issues, string field, string label, double value)
    {
        if (value < PlausibleRange.MinDimensionMm)
        {
            issues.Add(new ValidationIssue(field, $"{label} = {Num(value)} mm is below the smallest accepted dimension, {Num(PlausibleRange.MinDimensionMm)} mm"));
            return false;
        }

        if (value > PlausibleRange.MaxDimensionMm)
        {
            issues.Add(new ValidationIssue(field, $"{label} = {Num(value)} mm is above the largest accepted dimension, {Num(PlausibleRange.MaxDimensionMm)} mm"));
            return false;
        }

        return true;
    }
}
