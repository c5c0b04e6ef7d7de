using System.Diagnostics.CodeAnalysis;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Sections;

/// <summary>
/// Section properties of a hot-rolled single angle from its EN 10056-1 dimensions.
/// <para>Placement (see <see cref="SectionProperties"/>): heel at the origin, the long leg d along +y
/// (occupying 0 ≤ x ≤ t), the short leg b along +x (occupying 0 ≤ y ≤ t). CentroidX is measured from
/// the back of the long leg, CentroidY from the back of the short leg.</para>
/// <para>Outline: the two leg rectangles, plus the root fillet spandrel of radius r1 in the inner corner
/// (area r1²(1 - π/4)), less one toe spandrel of radius r2 at the inner edge of each toe (area
/// r2²(1 - π/4) each). All integrals are exact for that outline (<see cref="AreaIntegrals"/>).</para>
/// <para>Sign conventions: Ixy = ∫(x - xc)(y - yc) dA, which is negative for this placement (the legs lie
/// in the quadrants x &lt; xc, y &gt; yc and x &gt; xc, y &lt; yc). The major principal axis u-u is at
/// Alpha = ½ atan2(-2 Ixy, Ix - Iy) counter-clockwise from x-x, so 0 &lt; Alpha ≤ π/4 (π/4 for equal
/// legs, where u-u is the axis of symmetry through the heel); v-v is at Alpha + π/2.
/// Iu,v = (Ix + Iy)/2 ± √(((Ix - Iy)/2)² + Ixy²). A point (x, y) from the centroid has principal
/// coordinates u = x cos α + y sin α, v = -x sin α + y cos α.</para>
/// <para>Shear centre: the intersection of the leg midlines, (t/2, t/2) from the heel; X0, Y0 are its
/// coordinates from the centroid (both negative), U0, V0 the same rotated into u, v.</para>
/// </summary>
public static class Angle
{
    /// <summary>Statement of the method, copied into <see cref="SectionProperties.Method"/>.</summary>
    public const string MethodText =
        "Exact outline: leg rectangles + root fillet r1 - toe roundings r2 (each r²(1 - π/4)). " +
        "J = Σ b' t³/3 over both legs, b' = leg - t/2 on the midline (thin-walled, fillets ignored). " +
        "Cw = (t³/36)(d'³ + b'³) (AISC Design Guide 9 form). Shear centre at the intersection of the leg midlines.";

    /// <summary>Computes the properties; throws when the dimensions break a rule.</summary>
    /// <param name="dimensions">The angle's dimensions, mm.</param>
    /// <param name="designation">Shown name; default "L{d}x{b}x{t}".</param>
    /// <exception cref="InputValidationException">Any rule of <see cref="AngleDimensions.Validate"/> fails.</exception>
    public static SectionProperties Compute(AngleDimensions dimensions, string? designation = null)
    {
        ArgumentNullException.ThrowIfNull(dimensions);
        Guard.ThrowIfAny(dimensions.Validate());
        return ComputeValid(dimensions, designation ?? dimensions.DefaultDesignation());
    }

    /// <summary>Non-throwing form of <see cref="Compute"/>: false with the issues when the input is invalid.</summary>
    public static bool TryCompute(AngleDimensions dimensions, [NotNullWhen(true)] out SectionProperties? properties,
        out IReadOnlyList<ValidationIssue> issues, string? designation = null)
    {
        ArgumentNullException.ThrowIfNull(dimensions);
        issues = dimensions.Validate();
        properties = issues.Count == 0 ? ComputeValid(dimensions, designation ?? dimensions.DefaultDesignation()) : null;
        return properties is not null;
    }

    /// <summary>Computes the properties of dimensions that have already passed <see cref="AngleDimensions.Validate"/>.</summary>
    internal static SectionProperties ComputeValidated(AngleDimensions dimensions) =>
        ComputeValid(dimensions, dimensions.DefaultDesignation());

    private static SectionProperties ComputeValid(AngleDimensions dim, string designation)
    {
        var d = dim.LongLeg;
        var b = dim.ShortLeg;
        var t = dim.Thickness;
        var r1 = dim.RootRadius;
        var r2 = dim.ToeRadius;

        var s = new AreaIntegrals();
        s.AddRectangle(0, t, 0, d);                 // long leg, full length, includes the heel square
        s.AddRectangle(t, b, 0, t);                 // short leg beyond the heel square
        s.AddSpandrel(t, t, r1, 1, 1, +1);          // root fillet in the inner corner
        s.AddSpandrel(t, d, r2, -1, -1, -1);        // toe rounding, long leg (inner edge of the toe)
        s.AddSpandrel(b, t, r2, -1, -1, -1);        // toe rounding, short leg

        var area = s.Area;
        var xc = s.CentroidX;
        var yc = s.CentroidY;
        var ix = s.CentroidalIx;
        var iy = s.CentroidalIy;
        var ixy = s.CentroidalIxy;

        var mean = (ix + iy) / 2;
        var radius = Math.Sqrt(((ix - iy) / 2) * ((ix - iy) / 2) + ixy * ixy);
        var alpha = 0.5 * Math.Atan2(-2 * ixy, ix - iy);

        // Thin-walled open section on the leg midlines (see MethodText).
        var dPrime = d - t / 2;
        var bPrime = b - t / 2;
        var j = (dPrime + bPrime) * t * t * t / 3;
        var cw = t * t * t / 36 * (dPrime * dPrime * dPrime + bPrime * bPrime * bPrime);

        var x0 = t / 2 - xc;
        var y0 = t / 2 - yc;
        var (cos, sin) = (Math.Cos(alpha), Math.Sin(alpha));

        IReadOnlyList<PlateElement> elements = dim.IsEqualLeg
            ? [new PlateElement("legs", ElementKind.AngleLeg, d, t, 2, d - t)]
            : [new PlateElement("long leg", ElementKind.AngleLeg, d, t, 1, d - t),
               new PlateElement("short leg", ElementKind.AngleLeg, b, t, 1, b - t)];

        return new SectionProperties
        {
            Designation = designation,
            Family = SectionFamily.Angle,
            Symmetry = dim.IsEqualLeg ? SymmetryKind.Singly : SymmetryKind.Asymmetric,
            Area = area,
            MassPerMetre = SectionMass.PerMetre(area),
            CentroidX = xc,
            CentroidY = yc,
            Ix = ix,
            Iy = iy,
            Ixy = ixy,
            Iu = mean + radius,
            Iv = mean - radius,
            Alpha = alpha,
            J = j,
            Cw = cw,
            X0 = x0,
            Y0 = y0,
            U0 = x0 * cos + y0 * sin,
            V0 = -x0 * sin + y0 * cos,
            Sx = ix / Math.Max(yc, d - yc),
            Sy = iy / Math.Max(xc, b - xc),
            Elements = elements,
            GoverningThickness = t,
            Method = MethodText,
        };
    }
}
