using System.Diagnostics.CodeAnalysis;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Sections;

/// <summary>
/// An angle the user enters by its dimensions. There is no separate calculation: this is
/// <see cref="Angle.Compute"/> with the designation <see cref="Designation"/>, so a custom angle and a
/// catalogue angle of the same dimensions have identical properties.
/// </summary>
public static class CustomAngle
{
    /// <summary>Designation given to user-entered angles.</summary>
    public const string Designation = "custom";

    /// <inheritdoc cref="Angle.Compute"/>
    public static SectionProperties Compute(AngleDimensions dimensions) => Angle.Compute(dimensions, Designation);

    /// <inheritdoc cref="Angle.TryCompute"/>
    public static bool TryCompute(AngleDimensions dimensions, [NotNullWhen(true)] out SectionProperties? properties,
        out IReadOnlyList<ValidationIssue> issues)
        => Angle.TryCompute(dimensions, out properties, out issues, Designation);
}
