using TrussWeb.Core.Design;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Standards.Sans10162;
using TrussWeb.Core.Tests.Support;

namespace TrussWeb.Core.Tests.Standards.Sans10162;

public class TensionTests
{
    // Source: Carleton University CIVE 3205 course notes (N. M. Holtz), notebook T15, to CSA S16-14: L178x102x13, Fy 350, Fu 450 MPa, Ag 3390 mm², t 12.7 mm,
    // 2 rows × 4 lines of 3/4 in bolts through the long leg, hole allowance 24 mm.
    private static readonly Material T15Steel = new("350W", 350, 450, Material.SansE, Material.SansG);

    private static SectionProperties T15Angle() => SectionBuilder.L4x3x3_8() with
    {
        // Only Ag, t and the family enter the tension checks; the rest is the L4X3X3/8 test shape's and unused here.
        Designation = "L178x102x13",
        Area = 3390,
        GoverningThickness = 12.7,
        Elements =
        [
            new PlateElement("long leg", ElementKind.AngleLeg, 177.8, 12.7, 1, 177.8 - 12.7),
            new PlateElement("short leg", ElementKind.AngleLeg, 101.6, 12.7, 1, 101.6 - 12.7),
        ],
    };

    private static TensionConnection T15Bolts(int lines, BlockShearPath? path = null) => new()
    {
        Kind = ConnectionKind.Bolted,
        HolesInCrossSection = 2,
        HoleAllowance = 24,
        TransverseBoltLines = lines,
        BlockShear = path,
    };

    [Fact]
    public void Bolted_angle_with_four_lines_matches_the_worked_example()
    {
        var record = new CalcRecord("T15");
        var checks = Tension.Check(T15Angle(), T15Steel, T15Bolts(4, new BlockShearPath(977.9, 3302, 0.6)), 500e3, record);

        // Source: Carleton University CIVE 3205 course notes (N. M. Holtz), notebook T15, to CSA S16-14: gross yield 1068 kN; An 2780, An' 2224 mm², 750.7 kN; block shear 792.4 kN.
        AssertClose.Relative(1068e3, checks[0].Resistance, 0.001, "gross yield");
        AssertClose.Relative(2780, record.Find("An")!.Value, 0.001, "An");
        AssertClose.Relative(2224, record.Find("Ane")!.Value, 0.001, "An'");
        AssertClose.Relative(750.7e3, checks[1].Resistance, 0.001, "net fracture");
        AssertClose.Relative(792.4e3, checks[2].Resistance, 0.001, "block shear");
        AssertClose.Relative(500e3 / 750.7e3, checks[1].Utilization, 0.001, "utilization");
    }

    [Fact]
    public void Bolted_angle_with_fewer_than_four_lines_uses_sixty_percent_of_the_net_area()
    {
        var checks = Tension.Check(T15Angle(), T15Steel, T15Bolts(3), 500e3, null);
        // Source: REFERENCES.md §4 (fewer than four lines: 0.60 An); [C] 0.75 × 0.60 × 2780.4 × 450 = 563.0 kN.
        AssertClose.Relative(563.03e3, checks[1].Resistance, 0.001, "net fracture");
    }

    [Fact]
    public void Missing_connection_checks_gross_yield_only_and_says_so()
    {
        var record = new CalcRecord("t");
        var checks = Tension.Check(T15Angle(), T15Steel, null, 100e3, record);
        Assert.Single(checks);
        Assert.Contains(record.Notes, n => n.Contains("net section fracture and block shear are NOT checked", StringComparison.Ordinal));
    }

    [Fact]
    public void Double_angle_deducts_the_holes_from_both_angles_and_doubles_block_shear()
    {
        var s = SectionBuilder.Ac40DoubleAngle();
        var c = new TensionConnection
        {
            Kind = ConnectionKind.Bolted, HolesInCrossSection = 1, HoleAllowance = 22, TransverseBoltLines = 4,
            BlockShear = new BlockShearPath(500, 1500, 0.6),
        };
        var record = new CalcRecord("t");
        var checks = Tension.Check(s, new Material("300W", 300, 450, Material.SansE, Material.SansG), c, 100e3, record);
        // [C] An = 2300 − 2 angles × 1 hole × 22 × 7.94 = 1950.6 mm²; Tr = 0.75 × 0.80 × 1950.6 × 450 = 526.7 kN.
        AssertClose.Relative(1950.64, record.Find("An")!.Value, 1e-6, "An");
        AssertClose.Relative(526.67e3, checks[1].Resistance, 1e-4, "net fracture");
        // [C] block shear 2 × 0.75 × [0.6 × 500 × 450 + 0.6 × 1500 × 375] = 2 × 354.4 kN = 708.75 kN.
        AssertClose.Relative(708.75e3, checks[2].Resistance, 1e-6, "block shear");
    }

    [Theory]
    // Source: CSA S16 cl. 12.3.3.3 weld length rule, from memory (L ≥ 2w 1.00; 2w > L ≥ 1.5w 0.87; 1.5w > L ≥ w 0.75).
    [InlineData(200, 100, 1.00)]
    [InlineData(199, 100, 0.87)]
    [InlineData(150, 100, 0.87)]
    [InlineData(149, 100, 0.75)]
    [InlineData(100, 100, 0.75)]
    public void Welded_shear_lag_follows_the_weld_length_rule(double length, double width, double expected)
    {
        Assert.Equal(expected, Tension.WeldedShearLag(length, width));
    }

    [Fact]
    public void Weld_shorter_than_the_connected_width_is_out_of_scope_without_a_resistance()
    {
        var c = new TensionConnection { Kind = ConnectionKind.Welded, WeldLength = 80, ConnectedWidth = 100 };
        var checks = Tension.Check(T15Angle(), T15Steel, c, 100e3, null);
        Assert.Equal(CheckStatus.OutOfScope, checks[1].Status);
        Assert.Equal(0, checks[1].Resistance);
    }

    [Fact]
    public void Bolted_hollow_section_not_fully_connected_is_out_of_scope()
    {
        var s = SectionBuilder.Doubly(1500, 2e6, 1.2e6, 3e6, 0);
        var c = new TensionConnection { Kind = ConnectionKind.Bolted, HolesInCrossSection = 2, HoleAllowance = 20, TransverseBoltLines = 2 };
        var checks = Tension.Check(s, T15Steel, c, 100e3, null);
        Assert.Equal(CheckStatus.OutOfScope, checks[1].Status);
    }

    [Fact]
    public void All_elements_connected_uses_the_full_net_area()
    {
        var c = T15Bolts(2) with { AllElementsConnected = true };
        var checks = Tension.Check(T15Angle(), T15Steel, c, 100e3, null);
        // [C] 0.75 × 2780.4 × 450 = 938.4 kN (U = 1.0).
        AssertClose.Relative(938.385e3, checks[1].Resistance, 1e-6, "net fracture");
    }
}
