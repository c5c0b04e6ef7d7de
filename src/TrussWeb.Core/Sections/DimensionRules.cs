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

        return true;
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

        return true;
    }
}
