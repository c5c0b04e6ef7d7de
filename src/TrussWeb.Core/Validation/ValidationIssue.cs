namespace TrussWeb.Core.Validation;

/// <summary>
/// A problem with an input, named so that a form can show it beside the field:
/// <c>new ValidationIssue("LegThickness", "thickness t = 12 mm must be less than the short leg b = 10 mm")</c>.
/// </summary>
/// <param name="Field">The input's name as the caller knows it (property name, CSV column).</param>
/// <param name="Message">What is wrong and the limit, in words a user understands.</param>
public sealed record ValidationIssue(string Field, string Message)
{
    public override string ToString() => $"{Field}: {Message}";
}
