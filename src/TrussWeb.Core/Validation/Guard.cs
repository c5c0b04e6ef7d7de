using System.Globalization;

namespace TrussWeb.Core.Validation;

/// <summary>Small helpers that collect <see cref="ValidationIssue"/>s with a field name and a limit.</summary>
public static class Guard
{
    public static void Positive(List<ValidationIssue> issues, string field, double value, string unit)
    {
        if (!double.IsFinite(value))
        {
            issues.Add(new ValidationIssue(field, $"must be a finite number (got {value.ToString(CultureInfo.InvariantCulture)})"));
        }
        else if (value <= 0)
        {
            issues.Add(new ValidationIssue(field, $"must be greater than 0 {unit} (got {value.ToString(CultureInfo.InvariantCulture)} {unit})".Replace("  ", " ", StringComparison.Ordinal)));
        }
    }

    public static void NonNegative(List<ValidationIssue> issues, string field, double value, string unit)
    {
        if (!double.IsFinite(value))
        {
            issues.Add(new ValidationIssue(field, $"must be a finite number (got {value.ToString(CultureInfo.InvariantCulture)})"));
        }
        else if (value < 0)
        {
            issues.Add(new ValidationIssue(field, $"must not be negative (got {value.ToString(CultureInfo.InvariantCulture)} {unit})"));
        }
    }

    /// <summary>Adds an issue unless <paramref name="value"/> is finite and within [<paramref name="min"/>, <paramref name="max"/>].</summary>
    public static bool InRange(List<ValidationIssue> issues, string field, double value, double min, double max, string unit)
    {
        var u = string.IsNullOrEmpty(unit) ? "" : " " + unit;
        if (!double.IsFinite(value))
        {
            issues.Add(new ValidationIssue(field, $"must be a finite number (got {value.ToString(CultureInfo.InvariantCulture)})"));
            return false;
        }

        var got = $"(got {value.ToString("G6", CultureInfo.InvariantCulture)}{u})";
        if (value < min)
        {
            issues.Add(new ValidationIssue(field, min == 0
                ? $"must not be negative {got}"
                : min > 0 && value <= 0
                    ? $"must be greater than 0{u} {got}"
                    : $"must be at least {min.ToString(CultureInfo.InvariantCulture)}{u} {got}"));
            return false;
        }

        if (value > max)
        {
            issues.Add(new ValidationIssue(field, $"must be at most {max.ToString(CultureInfo.InvariantCulture)}{u} {got}"));
            return false;
        }

        return true;
    }

    public static void ThrowIfAny(IReadOnlyList<ValidationIssue> issues)
    {
        if (issues.Count > 0)
        {
            throw new InputValidationException(issues);
        }
    }
}
