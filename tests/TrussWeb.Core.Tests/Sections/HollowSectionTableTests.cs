using TrussWeb.Core.Sections;
using TrussWeb.Core.Tests.Support;
using static TrussWeb.Core.Tests.Sections.UnitConversion;

namespace TrussWeb.Core.Tests.Sections;

/// <summary>
/// Hollow sections against EN 10219-2 style tables (the values recalled, from memory) and checked by
/// hand first: each recalled value below was compared with a hand calculation from the exact geometry
/// (annulus; rounded-corner box with the EN 10219 corner radii) and agrees within 0.5 %. A recollection
/// that disagreed by more than 2 % would be distrusted and left out: RHS 100x50x5 with Ix 162 cm⁴ and
/// Iy 53.3 cm⁴ was recalled, but the geometry gives 158.2 and 52.5 cm⁴ (2.4 %, 1.5 %), so that row is
/// not used as a check.
/// </summary>
public class HollowSectionTableTests
{
    private const double Tolerance = 0.01;

    [Theory]
    // Source: EN 10219-2 table values, from memory (hand check: A = π t (D - t) = 1252 mm²; I = 1.920e6 mm⁴).
    [InlineData(114.3, 3.6, 12.5, 192)]
    // Source: EN 10219-2 table values, from memory (hand check: A = 2565 mm²; I = 8.559e6 mm⁴).
    [InlineData(168.3, 5.0, 25.7, 856)]
    public void Circular_hollow_section_matches_the_table(double d, double t, double areaCm2, double iCm4)
    {
        var p = CircularHollow.Compute(d, t);

        AssertClose.Relative(FromCm(areaCm2, 2), p.Area, Tolerance, "A");
        AssertClose.Relative(FromCm(iCm4, 4), p.Ix, Tolerance, "I");
        Assert.Equal(p.Ix, p.Iy);
    }

    [Theory]
    // Source: EN 10219-2 table values, from memory (hand check with ro = 2t = 10, ri = 5: A = 1835.6 mm², I = 2.711e6 mm⁴).
    [InlineData(100, 100, 5, 18.4, 271, 271)]
    // Source: EN 10219-2 table values, from memory (hand check with ro = 2t = 6, ri = 3: A = 540.8 mm², I = 1.947e5 mm⁴).
    [InlineData(50, 50, 3, 5.41, 19.5, 19.5)]
    // Source: EN 10219-2 table values, from memory (hand check with ro = 2.5t = 20, ri = 12: A = 4324 mm², Ix = 2.091e7, Iy = 7.054e6 mm⁴).
    [InlineData(200, 100, 8, 43.2, 2091, 705)]
    public void Rectangular_hollow_section_matches_the_table(double h, double b, double t, double areaCm2, double ixCm4, double iyCm4)
    {
        var p = RectangularHollow.Compute(h, b, t);

        AssertClose.Relative(FromCm(areaCm2, 2), p.Area, Tolerance, "A");
        AssertClose.Relative(FromCm(ixCm4, 4), p.Ix, Tolerance, "Ix (h as depth)");
        AssertClose.Relative(FromCm(iyCm4, 4), p.Iy, Tolerance, "Iy");
    }
}
