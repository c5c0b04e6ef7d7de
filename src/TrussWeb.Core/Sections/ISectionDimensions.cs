using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Sections;

/// <summary>
/// The stored dimensions of one section (what a catalogue row or a user's custom entry holds).
/// Properties are always computed from these, never stored.
/// </summary>
public interface ISectionDimensions
{
    /// <summary>The family whose calculator these dimensions feed.</summary>
    SectionFamily Family { get; }

    /// <summary>Every rule the dimensions break, each naming its field and limit; empty when valid.</summary>
    IReadOnlyList<ValidationIssue> Validate();

    /// <summary>Computes the section properties.</summary>
    /// <exception cref="InputValidationException">The dimensions are invalid.</exception>
    SectionProperties Compute(string? designation = null);
}
