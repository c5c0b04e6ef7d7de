using System.Diagnostics.CodeAnalysis;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Sections;

/// <summary>
/// Cold-formed square or rectangular hollow section from its true outline: the outer rectangle b × h
/// with corners of radius ro, less the inner rectangle (b - 2t) × (h - 2t) with corners of radius
/// ri = ro - t (exact integrals, <see cref="AreaIntegrals"/>). Width b along x, depth h along y: Ix,
/// about x-x (normal to the truss plane), uses h as the depth.
/// <para>J by the thin-walled closed-section (Bredt) formula J = 4 Ap² t / p, with Ap the area enclosed
/// by the wall midline and p the midline perimeter, both with midline corner radius rm = ro - t/2:
/// Ap = (b - t)(h - t) - (4 - π) rm², p = 2(b - t) + 2(h - t) - (8 - 2π) rm. Cw = 0 (closed section).</para>
/// <para>Elements for classification: the walls, Width = b - 4t and h - 4t as CSA S16 (and so
/// SANS 10162-1) defines the HSS wall width; AreaWidth = the flat between the corner radii, b - 2ro and
/// h - 2ro.</para>
/// </summary>
public static class RectangularHollow
{
    /// <summary>Statement of the method, copied into <see cref="SectionProperties.Method"/>.</summary>
    public const string MethodText =
        "Exact outline with rounded corners (outer ro, inner ro - t). J = 4Ap²t/p on the midline (thin-walled closed section); Cw = 0.";

    /// <summary>Computes the properties of an RHS/SHS h × b × t, mm; corner radius by EN 10219 unless given.</summary>
    /// <exception cref="InputValidationException">A rule of <see cref="RectangularHollowDimensions.Validate"/> fails.</exception>
    public static SectionProperties Compute(double depth, double width, double thickness, double? outerRadius = null, string? designation = null)
        => Compute(new RectangularHollowDimensions(depth, width, thickness, outerRadius), designation);

    /// <inheritdoc cref="Compute(double, double, double, double?, string?)"/>
    public static SectionProperties Compute(RectangularHollowDimensions dimensions, string? designation = null)
    {
        ArgumentNullException.ThrowIfNull(dimensions);
        Guard.ThrowIfAny(dimensions.Validate());
        return ComputeValid(dimensions, designation);
    }

    /// <summary>Non-throwing form of <see cref="Compute(RectangularHollowDimensions, string?)"/>.</summary>
    public static bool TryCompute(RectangularHollowDimensions dimensions, [NotNullWhen(true)] out SectionProperties? properties,
        out IReadOnlyList<ValidationIssue> issues, string? designation = null)
    {
        ArgumentNullException.ThrowIfNull(dimensions);
        issues = dimensions.Validate();
        properties = issues.Count == 0 ? ComputeValid(dimensions, designation) : null;
        return properties is not null;
    }

    private static SectionProperties ComputeValid(RectangularHollowDimensions dim, string? designation)
    {
        var h = dim.Depth;
        var b = dim.Width;
        var t = dim.Thickness;
        var ro = dim.EffectiveOuterRadius;
        var ri = ro - t;

        var s = new AreaIntegrals();
        s.AddRoundedRectangle(0, b, 0, h, ro, +1);
        s.AddRoundedRectangle(t, b - t, t, h - t, ri, -1);

        var area = s.Area;
        var ix = s.CentroidalIx;
        var iy = s.CentroidalIy;

        var rm = ro - t / 2;
        var enclosed = (b - t) * (h - t) - (4 - Math.PI) * rm * rm;
        var perimeter = 2 * (b - t) + 2 * (h - t) - (8 - 2 * Math.PI) * rm;
        var j = 4 * enclosed * enclosed * t / perimeter;

        var deduction = RectangularHollowDimensions.ClassificationDeductionFactor * t;

        return new SectionProperties
        {
            Designation = designation ?? dim.DefaultDesignation(),
            Family = SectionFamily.RectangularHollow,
            Symmetry = SymmetryKind.Doubly,
            Area = area,
            MassPerMetre = SectionMass.PerMetre(area),
            CentroidX = b / 2,
            CentroidY = h / 2,
            Ix = ix,
            Iy = iy,
            Ixy = 0,
            Iu = ix,
            Iv = iy,
            Alpha = 0,
            J = j,
            Cw = 0,
            X0 = 0,
            Y0 = 0,
            U0 = 0,
            V0 = 0,
            Sx = ix / (h / 2),
            Sy = iy / (b / 2),
            Elements =
            [
                new PlateElement("wall h", ElementKind.HollowWall, h - deduction, t, 2, h - 2 * ro),
                new PlateElement("wall b", ElementKind.HollowWall, b - deduction, t, 2, b - 2 * ro),
            ],
            GoverningThickness = t,
            Method = MethodText,
        };
    }
}
