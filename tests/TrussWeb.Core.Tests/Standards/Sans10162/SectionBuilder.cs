using TrussWeb.Core.Sections;

namespace TrussWeb.Core.Tests.Standards.Sans10162;

/// <summary>
/// Builds <see cref="SectionProperties"/> for tests directly from handbook values (the section
/// calculators are tested elsewhere). Derived quantities (shear centre in principal axes, Ixy) are
/// computed here from the stated handbook inputs, [C].
/// </summary>
internal static class SectionBuilder
{
    private const double Inch = 25.4; // mm per inch, exact

    /// <summary>
    /// A single angle from AISC Shapes Database v16.0 values (REFERENCES.md §1), inches in, mm out.
    /// d = short leg (along x), b = long leg (along y), heel at the origin; x_bar along d, y_bar along b.
    /// Shear centre at the intersection of the leg midlines (t/2, t/2) from the heel (REFERENCES.md §1 notes);
    /// principal axis u at alpha = atan(tan a) counter-clockwise from x (Ixy &lt; 0 for legs along +x and +y).
    /// </summary>
    public static SectionProperties AiscAngle(string name, double a, double d, double b, double t, double xBar, double yBar,
        double ix, double iy, double iz, double iw, double tanAlpha, double j, double cw)
    {
        var in2 = Inch * Inch;
        var in4 = in2 * in2;
        var in6 = in4 * in2;
        var x0 = (t / 2 - xBar) * Inch;
        var y0 = (t / 2 - yBar) * Inch;
        var alpha = Math.Atan(tanAlpha);
        var ixmm = ix * in4;
        var iymm = iy * in4;
        var ixy = -(ixmm - iymm) * Math.Tan(2 * alpha) / 2;
        var symmetric = d == b;
        return new SectionProperties
        {
            Designation = name,
            Family = SectionFamily.Angle,
            Symmetry = symmetric ? SymmetryKind.Singly : SymmetryKind.Asymmetric,
            Area = a * in2,
            MassPerMetre = a * in2 * 1e-6 * 7850,
            CentroidX = xBar * Inch,
            CentroidY = yBar * Inch,
            Ix = ixmm,
            Iy = iymm,
            Ixy = ixy,
            Iu = iw * in4,
            Iv = iz * in4,
            Alpha = alpha,
            J = j * in4,
            Cw = cw * in6,
            X0 = x0,
            Y0 = y0,
            U0 = x0 * Math.Cos(alpha) + y0 * Math.Sin(alpha),
            V0 = -x0 * Math.Sin(alpha) + y0 * Math.Cos(alpha),
            Sx = ixmm / ((b - yBar) * Inch),
            Sy = iymm / ((d - xBar) * Inch),
            Elements =
            [
                new PlateElement("long leg", ElementKind.AngleLeg, b * Inch, t * Inch, 1, (b - t) * Inch),
                new PlateElement("short leg", ElementKind.AngleLeg, d * Inch, t * Inch, 1, (d - t) * Inch),
            ],
            GoverningThickness = t * Inch,
            Method = "AISC Shapes Database v16.0 values (test data)",
        };
    }

    /// <summary>L4X3X3/8. Source: AISC Shapes Database v16.0 (REFERENCES.md §1).</summary>
    public static SectionProperties L4x3x3_8() => AiscAngle("L4X3X3/8", 2.49, 3.00, 4.00, 0.375, 0.775, 1.27, 3.94, 1.89, 1.00, 4.82, 0.551, 0.123, 0.114);

    /// <summary>L5X3X1/2. Source: AISC Shapes Database v16.0 (REFERENCES.md §1).</summary>
    public static SectionProperties L5x3x1_2() => AiscAngle("L5X3X1/2", 3.75, 3.00, 5.00, 0.500, 0.746, 1.74, 9.43, 2.55, 1.55, 10.4, 0.357, 0.322, 0.444);

    /// <summary>L8X6X3/4. Source: AISC Shapes Database v16.0 (REFERENCES.md §1).</summary>
    public static SectionProperties L8x6x3_4() => AiscAngle("L8X6X3/4", 9.99, 6.00, 8.00, 0.750, 1.56, 2.55, 63.5, 30.8, 16.6, 77.8, 0.550, 1.90, 7.28);

    /// <summary>L4X4X1/2 (equal legs). Source: AISC Shapes Database v16.0 (REFERENCES.md §1).</summary>
    public static SectionProperties L4x4x1_2() => AiscAngle("L4X4X1/2", 3.75, 4.00, 4.00, 0.500, 1.18, 1.18, 5.52, 5.52, 2.25, 8.79, 1.00, 0.322, 0.366);

    /// <summary>
    /// One L89x64x7.9 of the double angle of Carleton University CIVE 3205 course notes (N. M. Holtz), Example AC40, to CSA S16-14:
    /// A 1150 mm² (half of 2300), r_min 13.7 mm, J 24.1e3 mm⁴, Cw 11.5e6 mm⁶, b 88.9, t 7.94 [R].
    /// The other properties (Ix, Iy, principal directions, shear centre) are NOT given there; they come from
    /// a thin-walled midline model of the legs 88.9 and 63.5 mm, [C], with Iv set to A·13.7² so that
    /// r_min matches the handbook.
    /// </summary>
    public static SectionProperties Ac40Component()
    {
        const double d = 63.5, b = 88.9, t = 7.94, area = 1150, rMin = 13.7;
        // Thin-walled midline model, legs from the heel: long leg along y (length b − t/2), short along x (d − t/2).
        var lb = b - t / 2;
        var ld = d - t / 2;
        var a1 = lb * t;
        var a2 = ld * t;
        var at = a1 + a2;
        var xc = a2 * (ld / 2) / at; // long leg midline at x = 0
        var yc = a1 * (lb / 2) / at;
        var ix = t * lb * lb * lb / 3 - at * yc * yc;
        var iy = t * ld * ld * ld / 3 - at * xc * xc;
        var ixy = -at * xc * yc; // product about the heel is 0 for thin legs on the axes
        var avg = (ix + iy) / 2;
        var rad = Math.Sqrt((ix - iy) * (ix - iy) / 4 + ixy * ixy);
        var alpha = 0.5 * Math.Atan2(-2 * ixy, ix - iy);
        var scale = area / at;
        var iv = area * rMin * rMin;
        var iu = (avg + rad) * scale;
        var x0 = -xc;
        var y0 = -yc;
        return new SectionProperties
        {
            Designation = "L89x64x7.9",
            Family = SectionFamily.Angle,
            Symmetry = SymmetryKind.Asymmetric,
            Area = area,
            MassPerMetre = area * 1e-6 * 7850,
            CentroidX = xc + t / 2,
            CentroidY = yc + t / 2,
            Ix = ix * scale,
            Iy = iy * scale,
            Ixy = ixy * scale,
            Iu = iu,
            Iv = iv,
            Alpha = alpha,
            J = 24.1e3,
            Cw = 11.5e6,
            X0 = x0,
            Y0 = y0,
            U0 = x0 * Math.Cos(alpha) + y0 * Math.Sin(alpha),
            V0 = -x0 * Math.Sin(alpha) + y0 * Math.Cos(alpha),
            Sx = ix * scale / (b - yc),
            Sy = iy * scale / (d - xc),
            Elements =
            [
                new PlateElement("long leg", ElementKind.AngleLeg, b, t, 1, b - t),
                new PlateElement("short leg", ElementKind.AngleLeg, d, t, 1, d - t),
            ],
            GoverningThickness = t,
        };
    }

    /// <summary>
    /// 2L89x64x7.9 short legs back to back, 8 mm gap: Carleton University CIVE 3205 course notes (N. M. Holtz), Example AC40, to CSA S16-14 [R]:
    /// A 2300 mm², rx 18.5 mm, ry 43.3 mm, x0 = 0, y0 = 12.2 mm (r0_bar² = 2366 mm²), J 48.2e3 mm⁴,
    /// Cw 23e6 mm⁶ (pair), b/t of a leg 88.9/7.94.
    /// </summary>
    public static SectionProperties Ac40DoubleAngle()
    {
        const double area = 2300, rx = 18.5, ry = 43.3, t = 7.94;
        var ix = area * rx * rx;
        var iy = area * ry * ry;
        return new SectionProperties
        {
            Designation = "2L89x64x7.9 SLBB s=8",
            Family = SectionFamily.DoubleAngle,
            Symmetry = SymmetryKind.Singly,
            Area = area,
            MassPerMetre = area * 1e-6 * 7850,
            CentroidX = 0,
            CentroidY = 0,
            Ix = ix,
            Iy = iy,
            Ixy = 0,
            Iu = ix,
            Iv = iy,
            Alpha = 0,
            J = 48.2e3,
            Cw = 23e6,
            X0 = 0,
            Y0 = 12.2,
            U0 = 0,
            V0 = 12.2,
            Sx = 1,
            Sy = 1,
            Elements =
            [
                new PlateElement("long leg", ElementKind.AngleLeg, 88.9, t, 2, 88.9 - t),
                new PlateElement("short leg", ElementKind.AngleLeg, 63.5, t, 2, 63.5 - t),
            ],
            GoverningThickness = t,
            Component = Ac40Component(),
            Gap = 8,
        };
    }

    /// <summary>A doubly symmetric section built from chosen radii (identity tests; values are test inputs, not engineering data).</summary>
    public static SectionProperties Doubly(double area, double ix, double iy, double j, double cw) => new()
    {
        Designation = "doubly symmetric test section",
        Family = SectionFamily.RectangularHollow,
        Symmetry = SymmetryKind.Doubly,
        Area = area,
        MassPerMetre = area * 1e-6 * 7850,
        CentroidX = 0,
        CentroidY = 0,
        Ix = ix,
        Iy = iy,
        Ixy = 0,
        Iu = ix,
        Iv = iy,
        Alpha = 0,
        J = j,
        Cw = cw,
        X0 = 0,
        Y0 = 0,
        U0 = 0,
        V0 = 0,
        Sx = 1,
        Sy = 1,
        Elements = [new PlateElement("wall", ElementKind.HollowWall, 80, 5, 4, 80)],
        GoverningThickness = 5,
    };
}
