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

    public static void ThrowIfAny(IReadOnlyList<ValidationIssue> issues)
    {
        if (issues.Count > 0)
        {
            throw new InputValidationException(issues);
        }
    }
}
