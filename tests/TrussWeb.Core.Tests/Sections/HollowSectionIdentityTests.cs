using TrussWeb.Core.Sections;
using TrussWeb.Core.Tests.Support;

namespace TrussWeb.Core.Tests.Sections;

/// <summary>Closed-form identities of the hollow-section calculations, at round-off tolerance.</summary>
public class HollowSectionIdentityTests
{
    private const double RoundOff = 1e-9;

    [Theory]
    // Source: common practice (EN 10219-2 sizes).
    [InlineData(48.3, 3.2)]
    [InlineData(114.3, 3.6)]
    [InlineData(323.9, 8.0)]
    public void Circular_hollow_section_is_the_exact_annulus(double d, double t)
    {
        var p = CircularHollow.Compute(d, t);

        var di = d - 2 * t;
        AssertClose.Relative(Math.PI * t * (d - t), p.Area, RoundOff, "A = π t (D - t)");
        AssertClose.Relative(Math.PI / 64 * (Math.Pow(d, 4) - Math.Pow(di, 4)), p.Ix, RoundOff, "I");
        AssertClose.Relative(2 * p.Ix, p.J, RoundOff, "J = 2I");
        AssertClose.Relative(p.Ix / (d / 2), p.Sx, RoundOff, "S");
        AssertClose.Relative(p.Area * 7850e-9 * 1000, p.MassPerMetre, RoundOff, "mass");
        Assert.Equal((0.0, 0.0, 0.0, 0.0), (p.Cw, p.X0, p.Y0, p.Alpha));
        Assert.Equal(SymmetryKind.Doubly, p.Symmetry);
        var wall = Assert.Single(p.Elements);
        Assert.Equal((ElementKind.CircularWall, d, t, 1), (wall.Kind, wall.Width, wall.Thickness, wall.Count));
        AssertClose.Relative(p.Area, wall.AreaWidth * wall.Thickness, RoundOff, "AreaWidth·t = A");
        Assert.Equal($"CHS {d}x{t}", p.Designation);
    }

    [Theory]
    // Source: common practice (EN 10219-2 sizes; radii by the EN 10219 rule, from memory).
    [InlineData(100, 50, 5, 10)]
    [InlineData(200, 100, 8, 20)]
    [InlineData(300, 200, 12.5, 37.5)]
    public void Rectangular_hollow_section_follows_the_rounded_box_formulas(double h, double b, double t, double expectedRo)
    {
        var p = RectangularHollow.Compute(h, b, t);

        var ri = expectedRo - t;
        var spandrel = 4 - Math.PI;
        var area = b * h - spandrel * expectedRo * expectedRo - ((b - 2 * t) * (h - 2 * t) - spandrel * ri * ri);
        AssertClose.Relative(area, p.Area, RoundOff, "A");
        Assert.Equal(expectedRo, new RectangularHollowDimensions(h, b, t).EffectiveOuterRadius);
        Assert.True(p.Ix > p.Iy, "h is the depth for Ix");
        var rm = expectedRo - t / 2;
        var enclosed = (b - t) * (h - t) - spandrel * rm * rm;
        var perimeter = 2 * (b - t) + 2 * (h - t) - (8 - 2 * Math.PI) * rm;
        AssertClose.Relative(4 * enclosed * enclosed * t / perimeter, p.J, RoundOff, "J = 4Ap²t/p");
        AssertClose.Relative(p.Ix / (h / 2), p.Sx, RoundOff, "Sx");
        AssertClose.Relative(p.Iy / (b / 2), p.Sy, RoundOff, "Sy");
        Assert.Equal(SymmetryKind.Doubly, p.Symmetry);
        Assert.Collection(p.Elements,
            e => Assert.Equal((ElementKind.HollowWall, h - 4 * t, h - 2 * expectedRo, 2), (e.Kind, e.Width, e.AreaWidth, e.Count)),
            e => Assert.Equal((ElementKind.HollowWall, b - 4 * t, b - 2 * expectedRo, 2), (e.Kind, e.Width, e.AreaWidth, e.Count)));
        Assert.Equal($"RHS {h}x{b}x{t}", p.Designation);
    }

    [Fact]
    public void Square_hollow_section_has_equal_axes_and_is_called_SHS()
    {
        // Source: common practice (EN 10219-2 size 100x100x5).
        var p = RectangularHollow.Compute(100, 100, 5);

        AssertClose.Relative(p.Ix, p.Iy, RoundOff, "Ix = Iy");
        Assert.Equal("SHS 100x100x5", p.Designation);
    }

    [Fact]
    public void A_thin_wall_tends_to_the_thin_walled_formulas()
    {
        // Source: common practice (thin-walled limit): SHS b × b × t with t → 0: A → 4bt, I → (2/3) b³ t.
        var p = RectangularHollow.Compute(1000, 1000, 1, outerRadius: 1);

        AssertClose.Relative(4 * 999.0, p.Area, 1e-3, "A");
        AssertClose.Relative(2.0 / 3 * Math.Pow(999, 3), p.Ix, 1e-3, "I");
    }
}
