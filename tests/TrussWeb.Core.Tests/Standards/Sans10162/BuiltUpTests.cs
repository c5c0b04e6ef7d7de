using TrussWeb.Core.Design;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Records;
using TrussWeb.Core.Standards.Sans10162;
using TrussWeb.Core.Tests.Support;

namespace TrussWeb.Core.Tests.Standards.Sans10162;

public class BuiltUpTests
{
    private static readonly Sans10162Standard Standard = new();

    [Fact]
    public void Ac40_strut_with_one_connector_matches_the_worked_example()
    {
        var member = MemberBuilder.Ac40().Connectors(new ConnectorLayout { IntermediateCount = 1 }).Build();
        var result = Standard.CheckMember(member, new MemberForces(0, 100e3));
        var r = result.Record!;

        // Source: Carleton University CIVE 3205 course notes (N. M. Holtz), Example AC40, to CSA S16-14.
        AssertClose.Relative(2222, r.Find("a_max")!.Value, 0.001, "a_max");
        AssertClose.Relative(1500, r.Find("a")!.Value, 1e-12, "a");
        AssertClose.Relative(69.28, r.Find("ρo")!.Value, 0.001, "ρo");
        AssertClose.Relative(109.5, r.Find("ρi")!.Value, 0.001, "ρi");
        AssertClose.Relative(129.6, r.Find("ρe")!.Value, 0.001, "ρe");
        AssertClose.Relative(118, r.Find("Fey")!.Value, 0.01, "Fey from ρe");
        AssertClose.Relative(116, r.Find("Feyz")!.Value, 0.01, "Feyz");
        AssertClose.Relative(75.0, r.Find("Fe")!.Value, 0.01, "Fe = Fex");
        var compression = result.Checks.Single(c => c.Name == "Compression: member buckling");
        AssertClose.Relative(139e3, compression.Resistance, 0.01, "Cr governs by x");
        Assert.Contains(r.Notes, n => n.Contains("flexural about x-x", StringComparison.Ordinal));
        Assert.Contains(r.Notes, n => n.Contains("Modified slenderness", StringComparison.Ordinal));
    }

    [Fact]
    public void Proposed_layout_for_ac40_is_one_connector_at_mid_length()
    {
        var member = MemberBuilder.Ac40().Build();
        var layout = BuiltUp.Layout(member.Section, member.Lengths, null, null);
        // Source: Carleton University CIVE 3205 course notes (N. M. Holtz), Example AC40, to CSA S16-14: a ≤ 2222 mm → one connector at mid-length, a = 1500 mm.
        Assert.Equal(1, layout.IntermediateCount);
        AssertClose.Relative(1500, layout.Spacing, 1e-12, "a");
        Assert.True(layout.Proposed);
    }

    [Theory]
    // Common practice (layout rule in BuiltUp's doc): n = ⌈L/a_max⌉ − 1 at equal spaces L/(n + 1).
    [InlineData(6000, 2222, 2, 2000)]
    [InlineData(4444, 2222, 1, 2222)]
    [InlineData(2000, 2222, 0, 2000)]
    [InlineData(10_000, 2222, 4, 2000)]
    public void Required_count_gives_equal_spaces_not_above_the_limit(double length, double aMax, int count, double spacing)
    {
        Assert.Equal(count, BuiltUp.RequiredIntermediateCount(length, aMax));
        AssertClose.Relative(spacing, length / (count + 1), 1e-12, "a");
        Assert.True(length / (count + 1) <= aMax);
    }

    [Fact]
    public void Spacing_that_is_not_a_multiple_of_50_mm_is_kept_equal_and_the_record_says_so()
    {
        var member = MemberBuilder.Ac40().Length(3010).Build();
        var record = new CalcRecord("layout");
        var layout = BuiltUp.Layout(member.Section, member.Lengths, null, record);
        AssertClose.Relative(1505, layout.Spacing, 1e-12, "a");
        Assert.Contains(record.Notes, n => n.Contains("would leave unequal spaces", StringComparison.Ordinal));
    }

    [Fact]
    public void Given_spacing_above_the_limit_fails_the_connector_check()
    {
        var member = MemberBuilder.Ac40().Connectors(new ConnectorLayout { Spacing = 2500 }).Build();
        var result = Standard.CheckMember(member, new MemberForces(0, 100e3));
        var spacing = result.Checks.Single(c => c.Name == "Built-up: connector spacing");
        // Source: REFERENCES.md §3: a_max = 2222 mm; 2500/13.7 = 182.5 > 162.2.
        Assert.Equal(CheckStatus.Fail, spacing.Status);
        AssertClose.Relative(2500 / 13.7, spacing.Demand, 1e-12, "a/ri");
        Assert.Equal(CheckStatus.Fail, result.Status);
    }

    [Fact]
    public void Switching_off_the_modified_slenderness_uses_KyLy_over_ry_and_says_so()
    {
        var member = MemberBuilder.Ac40().Connectors(new ConnectorLayout { IntermediateCount = 1, UseModifiedSlenderness = false }).Build();
        var r = Standard.CheckMember(member, new MemberForces(0, 100e3)).Record!;
        // [C] Fey = π² × 200 000 / (3000/43.3)² = 411.2 MPa (REFERENCES.md §3 inputs).
        AssertClose.Relative(411.22, r.Find("Fey")!.Value, 1e-4, "Fey from ρo");
        Assert.Null(r.Find("ρe"));
        Assert.Contains(r.Notes, n => n.Contains("NOT used", StringComparison.Ordinal));
    }

    [Fact]
    public void Detailed_component_check_is_reported_and_the_lower_resistance_governs()
    {
        var member = MemberBuilder.Ac40().Connectors(new ConnectorLayout { IntermediateCount = 1 }).Build();
        var result = Standard.CheckMember(member, new MemberForces(0, 100e3));
        var r = result.Record!;
        var component = BuiltUp.ComponentResistance(member.Section.Component!, member.Material, 1500, 1.34, null);
        var member2 = r.Find("n·Cr,i")!;
        AssertClose.Relative(2 * component.Cr / 1000, member2.Value, 1e-12, "2 Cr,i");
        var governing = r.Find("Cr,gov")!.Value * 1000;
        var compression = result.Checks.Single(c => c.Name == "Compression: member buckling");
        AssertClose.Relative(governing, compression.Resistance, 1e-12, "governing");
        // Component: a/rv = 1500/13.7 = 109.5 → Fev = 164.6 MPa [C]; the cubic root lies below it.
        Assert.True(component.Fe < component.Fe2);
        AssertClose.Relative(164.65, component.Fe2, 1e-3, "Fev of component");
    }

    [Fact]
    public void Modified_slenderness_is_the_root_sum_of_squares()
    {
        // Source: CSA S16-14 19.1.4 via REFERENCES.md §3: √(69.28² + 109.5²) = 129.6.
        AssertClose.Relative(129.6, BuiltUp.ModifiedSlenderness(69.28, 109.5), 0.001, "ρe");
    }

    [Fact]
    public void Member_material_is_used_for_the_component()
    {
        var m = new Material("300W", 300, 450, Material.SansE, Material.SansG);
        var c = BuiltUp.ComponentResistance(SectionBuilder.Ac40Component(), m, 1500, 1.34, null);
        Assert.True(c.Cr > 0 && c.Cr < 0.9 * 1150 * 300);
    }
}
