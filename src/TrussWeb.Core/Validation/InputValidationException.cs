namespace TrussWeb.Core.Validation;

/// <summary>Thrown by the throwing form of an entry point when its input breaks a rule; carries every issue found.</summary>
public sealed class InputValidationException : Exception
{
    public InputValidationException(IReadOnlyList<ValidationIssue> issues)
        : base(string.Join("; ", issues))
    {
        Issues = issues;
    }

    public InputValidationException(string field, string message)
        : this([new ValidationIssue(field, message)])
    {
    }

    public IReadOnlyList<ValidationIssue> Issues { get; }
}
