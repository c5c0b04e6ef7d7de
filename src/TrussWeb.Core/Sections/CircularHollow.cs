using System.Diagnostics.CodeAnalysis;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Sections;

/// <summary>
/// Circular hollow section, exact annulus: A = π(D² - di²)/4 = π t (D - t), I = π(D⁴ - di⁴)/64 about
/// any diameter, di = D - 2t; J = 2I (exact for a circular tube); Cw = 0; doubly symmetric, shear
/// centre at the centroid. Centroid given from the corner of the bounding square (D/2, D/2).
/// </summary>
public static class CircularHollow
{
    /// <summary>Statement of the method, copied into <see cref="SectionProperties.Method"/>.</summary>
    public const string MethodText = "Exact annulus: A = π(D² - di²)/4, I = π(D⁴ - di⁴)/64, J = 2I, Cw = 0.";

    /// <summary>Computes the properties of a CHS of outside diameter D and wall t, mm.</summary>
    /// <exception cref="InputValidationException">A rule of <see cref="CircularHollowDimensions.Validate"/> fails.</exception>
    public static SectionProperties Compute(double diameter, double thickness, string? designation = null)
        => Compute(new CircularHollowDimensions(diameter, thickness), designation);

    /// <inheritdoc cref="Compute(double, double, string?)"/>
    public static SectionProperties Compute(CircularHollowDimensions dimensions, string? designation = null)
    {
        ArgumentNullException.ThrowIfNull(dimensions);
        Guard.ThrowIfAny(dimensions.Validate());
        return ComputeValid(dimensions, designation);
    }

    /// <summary>Non-throwing form of <see cref="Compute(CircularHollowDimensions, string?)"/>.</summary>
    public static bool TryCompute(CircularHollowDimensions dimensions, [NotNullWhen(true)] out SectionProperties? properties,
        out IReadOnlyList<ValidationIssue> issues, string? designation = null)
    {
        ArgumentNullException.ThrowIfNull(dimensions);
        issues = dimensions.Validate();
        properties = issues.Count == 0 ? ComputeValid(dimensions, designation) : null;
        return properties is not null;
    }

    private static SectionProperties ComputeValid(CircularHollowDimensions dim, string? designation)
    {
        var d = dim.Diameter;
        var t = dim.Thickness;
        var di = d - 2 * t;
        var area = Math.PI * (d * d - di * di) / 4;
        var i = Math.PI * (d * d * d * d - di * di * di * di) / 64;
        var s = i / (d / 2);

        return new SectionProperties
        {
            Designation = designation ?? dim.DefaultDesignation(),
            Family = SectionFamily.CircularHollow,
            Symmetry = SymmetryKind.Doubly,
            Area = area,
            MassPerMetre = SectionMass.PerMetre(area),
            CentroidX = d / 2,
            CentroidY = d / 2,
            Ix = i,
            Iy = i,
            Ixy = 0,
            Iu = i,
            Iv = i,
            Alpha = 0,
            J = 2 * i,
            Cw = 0,
            X0 = 0,
            Y0 = 0,
            U0 = 0,
            V0 = 0,
            Sx = s,
            Sy = s,
            // Width D for the D/t ratio; AreaWidth = midline circumference π(D - t), so AreaWidth·t = A exactly.
            Elements = [new PlateElement("wall", ElementKind.CircularWall, d, t, 1, Math.PI * (d - t))],
            GoverningThickness = t,
            Method = MethodText,
        };
    }
}
