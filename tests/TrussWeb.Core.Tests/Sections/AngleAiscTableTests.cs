using TrussWeb.Core.Sections;
using TrussWeb.Core.Tests.Support;
using static TrussWeb.Core.Tests.Sections.UnitConversion;

namespace TrussWeb.Core.Tests.Sections;

/// <summary>
/// Single angles against AISC Shapes Database v16.0 rows (REFERENCES.md §1), converted from inches
/// with 25.4 mm/in.
/// <para>Modelling of the database rows: the database gives no radii, only kdes = t + fillet, so the
/// root radius is taken as r1 = kdes - t. It gives no toe radius either; we take r2 = r1/2, the
/// EN 10056-1 proportion between toe and root radii (common practice where no toe radius is published).
/// How the database treats fillets is not stated in REFERENCES.md: for L4X4X1/2 and L5X3X1/2 its area
/// equals the sharp-cornered (d + b - t) t exactly, for the other rows it is up to 0.9 % above it. With
/// our radii the fillet and the toe roundings nearly cancel in A and the centroid; the remaining
/// differences show in the second moments of the thinnest legs.</para>
/// <para>Default tolerance 2 %. Where the model differs by more (measured, see <see cref="Tolerances"/>),
/// the property is tested at the tolerance it meets and the reason is stated there.</para>
/// </summary>
public class AngleAiscTableTests
{
    private const double DefaultTolerance = 0.02;

    /// <summary>
    /// Properties that differ by more than 2 % from the database, with the measured difference:
    /// <list type="bullet">
    /// <item>J: every row. We use the thin-walled Σ b' t³/3 on the midline (b' = leg - t/2, no fillet);
    /// the database's J is 2 % to 5.3 % larger (measured: L3X3X1/4 -4.3 %, L4X4X1/2 -3.0 %,
    /// L5X5X1/2 -5.1 %, L4X3X3/8 -5.3 %, L5X3X1/2 -3.0 %, L8X6X3/4 -1.9 %), consistent with a formula
    /// that credits the fillet bulb. 6 % covers it; the thin-walled value is the lower, safe side for Fez.</item>
    /// <item>Iv (Iz) of L3X3X1/4 (+2.6 %) and L4X3X3/8 (+2.2 %): the thinnest legs, where the assumed toe
    /// and root radii weigh most in the minor axis; even a sharp outline gives +2.9 % and +3.0 %, so the
    /// database figure cannot be met by any radius choice within 2 %. Tested at 3 %.</item>
    /// <item>Iu (Iw) of L3X3X1/4 (-2.2 %) and L5X5X1/2 (-2.0 %): the assumed toe radius r2 = r1/2 removes
    /// area at the toes, the fibres farthest from the major axis (a sharp outline: +0.7 %, -0.5 %).
    /// Tested at 2.5 %.</item>
    /// </list>
    /// </summary>
    private static readonly Dictionary<(string Shape, string Property), double> Tolerances = new()
    {
        [("L3X3X1/4", "J")] = 0.06,
        [("L4X4X1/2", "J")] = 0.06,
        [("L5X5X1/2", "J")] = 0.06,
        [("L4X3X3/8", "J")] = 0.06,
        [("L5X3X1/2", "J")] = 0.06,
        [("L8X6X3/4", "J")] = 0.06,
        [("L3X3X1/4", "Iv")] = 0.03,
        [("L4X3X3/8", "Iv")] = 0.03,
        [("L3X3X1/4", "Iu")] = 0.025,
        [("L5X5X1/2", "Iu")] = 0.025,
    };

    /// <summary>
    /// Rows of AISC Shapes Database v16.0 (REFERENCES.md §1), in inches: shape, database d (short leg),
    /// b (long leg), t, kdes, then A, x_bar, y_bar, Ix, Iy, Iz (= Iv), Iw (= Iu), tan α, J, Cw, ro.
    /// </summary>
    public static TheoryData<string, double, double, double, double, double[]> Rows => new()
    {
        // Source: AISC Shapes Database v16.0, L3X3X1/4
        { "L3X3X1/4", 3.00, 3.00, 0.250, 0.625, [1.44, 0.836, 0.836, 1.23, 1.23, 0.490, 1.97, 1.00, 0.0313, 0.0206, 1.65] },
        // Source: AISC Shapes Database v16.0, L4X4X1/2
        { "L4X4X1/2", 4.00, 4.00, 0.500, 0.875, [3.75, 1.18, 1.18, 5.52, 5.52, 2.25, 8.79, 1.00, 0.322, 0.366, 2.16] },
        // Source: AISC Shapes Database v16.0, L5X5X1/2
        { "L5X5X1/2", 5.00, 5.00, 0.500, 1.00, [4.79, 1.42, 1.42, 11.3, 11.3, 4.64, 18.0, 1.00, 0.417, 0.744, 2.73] },
        // Source: AISC Shapes Database v16.0, L4X3X3/8
        { "L4X3X3/8", 3.00, 4.00, 0.375, 0.750, [2.49, 0.775, 1.27, 3.94, 1.89, 1.00, 4.82, 0.551, 0.123, 0.114, 1.97] },
        // Source: AISC Shapes Database v16.0, L5X3X1/2
        { "L5X3X1/2", 3.00, 5.00, 0.500, 0.938, [3.75, 0.746, 1.74, 9.43, 2.55, 1.55, 10.4, 0.357, 0.322, 0.444, 2.38] },
        // Source: AISC Shapes Database v16.0, L8X6X3/4
        { "L8X6X3/4", 6.00, 8.00, 0.750, 1.25, [9.99, 1.56, 2.55, 63.5, 30.8, 16.6, 77.8, 0.550, 1.90, 7.28, 3.95] },
    };

    /// <summary>The angle the database row describes, in mm, with the radii explained in the class comment.</summary>
    internal static AngleDimensions Dimensions(double dShortIn, double bLongIn, double tIn, double kdesIn)
    {
        var r1 = Mm(kdesIn - tIn);
        return new AngleDimensions(Mm(bLongIn), Mm(dShortIn), Mm(tIn), r1, r1 / 2);
    }

    [Theory]
    [MemberData(nameof(Rows))]
    public void Computed_properties_match_the_AISC_database_row(string shape, double dIn, double bIn, double tIn, double kdesIn, double[] table)
    {
        var p = Angle.Compute(Dimensions(dIn, bIn, tIn, kdesIn), shape);

        Check(shape, "A", Mm2(table[0]), p.Area);
        Check(shape, "x_bar", Mm(table[1]), p.CentroidX);
        Check(shape, "y_bar", Mm(table[2]), p.CentroidY);
        Check(shape, "Ix", Mm4(table[3]), p.Ix);
        Check(shape, "Iy", Mm4(table[4]), p.Iy);
        Check(shape, "Iv", Mm4(table[5]), p.Iv);
        Check(shape, "Iu", Mm4(table[6]), p.Iu);
        Check(shape, "tan a", table[7], Math.Tan(p.Alpha));
        Check(shape, "J", Mm4(table[8]), p.J);
        Check(shape, "Cw", Mm6(table[9]), p.Cw);
        Check(shape, "r0", Mm(table[10]), p.R0);
    }

    private static void Check(string shape, string property, double expected, double actual)
    {
        var tol = Tolerances.GetValueOrDefault((shape, property), DefaultTolerance);
        AssertClose.Relative(expected, actual, tol, $"{shape} {property}");
    }
}
