using TrussWeb.Core.Sections;
using TrussWeb.Core.Tests.Support;

namespace TrussWeb.Core.Tests.Sections;

/// <summary>Exact identities of the angle calculation (mechanics, not tables), at round-off tolerance.</summary>
public class AngleIdentityTests
{
    private const double RoundOff = 1e-9;

    // Source: common practice (EN 10056-1 sizes from seed data); any valid angles serve for identities.
    public static TheoryData<double, double, double, double, double> Angles => new()
    {
        { 100, 100, 10, 12, 6 },
        { 50, 50, 5, 7, 3.5 },
        { 200, 200, 20, 18, 9 },
        { 100, 75, 8, 10, 5 },
        { 150, 90, 10, 12, 6 },
        { 60, 40, 5, 6, 3 },
    };

    [Theory]
    [InlineData(100, 10, 12, 6)]
    [InlineData(50, 5, 7, 3.5)]
    [InlineData(200, 20, 18, 9)]
    public void Equal_angle_is_symmetric_about_the_line_through_the_heel(double leg, double t, double r1, double r2)
    {
        var p = Angle.Compute(new AngleDimensions(leg, leg, t, r1, r2));

        AssertClose.Relative(p.Ix, p.Iy, RoundOff, "Ix = Iy");
        AssertClose.Relative(p.CentroidX, p.CentroidY, RoundOff, "ex = ey");
        AssertClose.Relative(1.0, Math.Tan(p.Alpha), RoundOff, "tan α = 1");
        AssertClose.Relative(p.Ix + p.Iy, p.Iu + p.Iv, RoundOff, "Iu + Iv = Ix + Iy");
        AssertClose.Relative(p.Ix - p.Ixy, p.Iu, RoundOff, "Iu = Ix + |Ixy| for equal legs");
        // The shear centre lies on the symmetry axis u-u: V0 = 0, |U0| = √2 |X0|.
        Assert.True(Math.Abs(p.V0) < RoundOff * leg, $"V0 = {p.V0} mm should be 0");
        AssertClose.Relative(Math.Sqrt(2) * Math.Abs(p.X0), Math.Abs(p.U0), RoundOff, "|U0|");
        Assert.True(p.U0 < 0, "the shear centre lies towards the heel, at negative u");
        Assert.Equal(SymmetryKind.Singly, p.Symmetry);
        var legs = Assert.Single(p.Elements);
        Assert.Equal(2, legs.Count);
        Assert.Equal(leg, legs.Width);
        Assert.Equal(leg - t, legs.AreaWidth);
    }

    [Theory]
    [MemberData(nameof(Angles))]
    public void Rotating_into_the_principal_axes_removes_the_product_of_area(double d, double b, double t, double r1, double r2)
    {
        var p = Angle.Compute(new AngleDimensions(d, b, t, r1, r2));
        var (c, s) = (Math.Cos(2 * p.Alpha), Math.Sin(2 * p.Alpha));

        // Transformation of second moments to axes rotated by α (counter-clockwise), Ixy = ∫xy dA.
        var iuRotated = (p.Ix + p.Iy) / 2 + (p.Ix - p.Iy) / 2 * c - p.Ixy * s;
        var ivRotated = (p.Ix + p.Iy) / 2 - (p.Ix - p.Iy) / 2 * c + p.Ixy * s;
        var iuvRotated = (p.Ix - p.Iy) / 2 * s + p.Ixy * c;

        Assert.True(Math.Abs(iuvRotated) < RoundOff * p.Iu, $"Iuv = {iuvRotated} mm⁴ should vanish");
        AssertClose.Relative(p.Iu, iuRotated, RoundOff, "Iu");
        AssertClose.Relative(p.Iv, ivRotated, RoundOff, "Iv");
        AssertClose.Relative(p.Ix + p.Iy, p.Iu + p.Iv, RoundOff, "Iu + Iv = Ix + Iy");
        Assert.True(p.Ixy < 0, "Ixy = ∫(x - xc)(y - yc) dA is negative with the legs along +x and +y");
        Assert.InRange(p.Alpha, 0, Math.PI / 4 + RoundOff);
    }

    [Theory]
    [MemberData(nameof(Angles))]
    public void Mass_per_metre_is_area_times_density(double d, double b, double t, double r1, double r2)
    {
        var p = Angle.Compute(new AngleDimensions(d, b, t, r1, r2));

        // Source: common practice, 7 850 kg/m³; A mm² × 1e-9 m³/mm³ per mm × 1000 mm/m.
        AssertClose.Relative(p.Area * 7850e-9 * 1000, p.MassPerMetre, RoundOff, "mass");
    }

    [Theory]
    [MemberData(nameof(Angles))]
    public void Shear_centre_lies_at_the_intersection_of_the_leg_midlines(double d, double b, double t, double r1, double r2)
    {
        var p = Angle.Compute(new AngleDimensions(d, b, t, r1, r2));

        AssertClose.Relative(t / 2, p.CentroidX + p.X0, RoundOff, "x of shear centre from the heel");
        AssertClose.Relative(t / 2, p.CentroidY + p.Y0, RoundOff, "y of shear centre from the heel");
        AssertClose.Relative(p.X0 * p.X0 + p.Y0 * p.Y0, p.U0 * p.U0 + p.V0 * p.V0, RoundOff, "rotation keeps the distance");
        AssertClose.Relative(Math.Sqrt(p.U0 * p.U0 + p.V0 * p.V0 + (p.Iu + p.Iv) / p.Area), p.R0, RoundOff, "r0 in principal axes");
    }

    [Fact]
    public void Sharp_angle_matches_the_hand_calculation_of_two_rectangles()
    {
        // Source: hand calculation (common practice), L100x50x10 with no radii:
        // A = 100·10 + 40·10 = 1400 mm²; ex = (1000·5 + 400·30)/1400 = 12.142857 mm;
        // ey = (1000·50 + 400·5)/1400 = 37.142857 mm;
        // Ix = 10·100³/12 + 1000·(50 - ey)² + 40·10³/12 + 400·(5 - ey)² = 1 415 238.095 mm⁴;
        // Iy = 100·10³/12 + 1000·(5 - ex)² + 10·40³/12 + 400·(30 - ex)² = 240 238.095 mm⁴;
        // Ixy = 1000·(5 - ex)(50 - ey) + 400·(30 - ex)(5 - ey) = -321 428.57 mm⁴.
        var p = Angle.Compute(new AngleDimensions(100, 50, 10, 0, 0));

        AssertClose.Relative(1400, p.Area, RoundOff, "A");
        AssertClose.Relative(12.142857142857, p.CentroidX, 1e-12, "ex");
        AssertClose.Relative(37.142857142857, p.CentroidY, 1e-12, "ey");
        AssertClose.Relative(1_415_238.095238, p.Ix, 1e-10, "Ix");
        AssertClose.Relative(240_238.095238, p.Iy, 1e-10, "Iy");
        AssertClose.Relative(-321_428.571429, p.Ixy, 1e-10, "Ixy");
        // J = (95 + 45)·10³/3; Cw = (10³/36)(95³ + 45³).
        AssertClose.Relative(140 * 1000 / 3.0, p.J, RoundOff, "J");
        AssertClose.Relative(1000 / 36.0 * (95.0 * 95 * 95 + 45.0 * 45 * 45), p.Cw, RoundOff, "Cw");
        AssertClose.Relative(p.Ix / (100 - p.CentroidY), p.Sx, RoundOff, "Sx at the toe of the long leg");
        AssertClose.Relative(p.Iy / (50 - p.CentroidX), p.Sy, RoundOff, "Sy at the toe of the short leg");
        Assert.Equal(SymmetryKind.Asymmetric, p.Symmetry);
        Assert.Collection(p.Elements,
            e => Assert.Equal((ElementKind.AngleLeg, 100.0, 90.0, 1), (e.Kind, e.Width, e.AreaWidth, e.Count)),
            e => Assert.Equal((ElementKind.AngleLeg, 50.0, 40.0, 1), (e.Kind, e.Width, e.AreaWidth, e.Count)));
        Assert.Equal(10, p.GoverningThickness);
        Assert.Contains("t³/3", p.Method, StringComparison.Ordinal);
    }

    [Fact]
    public void Root_fillet_adds_and_toe_roundings_remove_their_spandrel_areas()
    {
        // Source: common practice, spandrel area r²(1 - π/4).
        var sharp = Angle.Compute(new AngleDimensions(100, 75, 8, 0, 0));
        var rounded = Angle.Compute(new AngleDimensions(100, 75, 8, 10, 5));

        var expected = sharp.Area + 10 * 10 * (1 - Math.PI / 4) - 2 * 5 * 5 * (1 - Math.PI / 4);
        AssertClose.Relative(expected, rounded.Area, RoundOff, "A");
    }

    [Fact]
    public void Custom_angle_uses_the_same_calculation_with_the_designation_custom()
    {
        // Source: common practice (EN 10056-1 size 100x75x8, r1 10, r2 5).
        var dims = new AngleDimensions(100, 75, 8, 10, 5);
        var custom = CustomAngle.Compute(dims);
        var catalogue = Angle.Compute(dims);

        Assert.Equal("custom", custom.Designation);
        Assert.Equal("L100x75x8", catalogue.Designation);
        Assert.Equal(catalogue with { Designation = "custom", Elements = custom.Elements }, custom);
    }
}
