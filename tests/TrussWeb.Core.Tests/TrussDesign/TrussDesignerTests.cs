using TrussWeb.Core.Model;
using TrussWeb.Core.Records;
using TrussWeb.Core.Standards.Sans10162;
using TrussWeb.Core.Tests.Support;
using TrussWeb.Core.TrussDesign;
using TrussWeb.Core.Validation;
using static TrussWeb.Core.Tests.TrussDesign.TrussDesignFixture;

namespace TrussWeb.Core.Tests.TrussDesign;

public class TrussDesignerTests
{
    [Fact]
    public void Every_member_gets_a_design_with_its_record_and_governing_combination()
    {
        var model = Pratt24();

        var result = TrussDesigner.Design(Input(model, size: false));

        Assert.Equal(model.Members.Count, result.Members.Count);
        Assert.All(result.Members, m =>
        {
            Assert.NotNull(m.Design.Record);
            Assert.False(string.IsNullOrEmpty(m.Design.GoverningCheck));
            Assert.True(double.IsFinite(m.Design.Utilization));
            Assert.NotNull(m.GoverningCombination);
        });
    }

    [Fact]
    public void Under_uplift_the_bottom_chord_is_in_compression_and_designed_on_the_brace_spacing()
    {
        // Worked truss: 24 m span, 12 panels of 2 m, bottom chord braced at every second panel point,
        // so the out-of-plane length of each bottom chord member is 2 × 2 000 = 4 000 mm (common
        // practice: the bracing of the bottom chord sets its out-of-plane length under uplift).
        var model = Pratt24(bottomRestraintEvery: 2);
        var input = Input(model, size: false);

        var result = TrussDesigner.Design(input);

        var bottom = result.Members.Where(m => m.Group == "BottomChord").ToList();
        Assert.NotEmpty(bottom);
        Assert.All(bottom, m =>
        {
            Assert.True(m.Envelope.MaxCompression > 0, $"{m.Mark} should be in compression under uplift");
            Assert.Contains("W1", m.Envelope.CompressionCombination);
            AssertClose.Relative(4000, m.Lengths.Ly, 1e-9, $"{m.Mark} Ly");
            AssertClose.Relative(2000, m.Lengths.Lx, 1e-9, $"{m.Mark} Lx");
            // The member's design used that length: the out-of-plane slenderness of the double angle is Ly / ry.
            var rho = m.Design.Record!.Find("ρo") ?? m.Design.Record.Find("KyLy/ry");
            Assert.NotNull(rho);
            var section = TrussDesigner.SectionOf(input, model.Members.Single(x => x.Id == m.Mark));
            AssertClose.Relative(4000 / section.Ry, rho!.Value, 1e-9, $"{m.Mark} out-of-plane slenderness");
        });
    }

    [Fact]
    public void Closer_bottom_chord_bracing_raises_the_compressive_resistance_under_uplift()
    {
        var every4 = TrussDesigner.Design(Input(Pratt24(bottomRestraintEvery: 4), size: false));
        var every2 = TrussDesigner.Design(Input(Pratt24(bottomRestraintEvery: 2), size: false));

        double Cr(TrussDesignResult r) => r.Members.Where(m => m.Group == "BottomChord")
            .Min(m => m.Design.Checks.Single(c => c.Name == "Compression: member buckling").Resistance);

        Assert.True(Cr(every2) > Cr(every4));
    }

    [Fact]
    public void Truss_mass_is_the_sum_of_member_lengths_times_mass_per_metre()
    {
        var input = Input(Pratt24(), size: false);

        var result = TrussDesigner.Design(input);

        var expected = input.Model.Members.Sum(m => input.Model.LengthOf(m) / 1000 * TrussDesigner.SectionOf(input, m).MassPerMetre);
        AssertClose.Relative(expected, result.Mass, 1e-12, "truss mass");
        AssertClose.Relative(expected * 1.10, result.MassWithAllowance, 1e-12, "mass with connection allowance 1.10 (common practice)");
        Assert.Equal(input.Model.Members.Count, result.Totals.Sum(t => t.Count));
    }

    [Fact]
    public void Member_masses_add_up_to_the_section_totals_and_the_result_keeps_its_load_cases()
    {
        var result = TrussDesigner.Design(Input(Pratt24(), size: false));

        foreach (var total in result.Totals)
        {
            AssertClose.Relative(total.Mass, result.Members.Where(m => m.Section!.Designation == total.Designation).Sum(m => m.Mass), 1e-12, total.Designation);
        }

        Assert.Contains(result.LoadCases, c => c.Kind == Core.Loads.LoadKind.Wind);
        Assert.Contains(result.LoadCases, c => c.Kind == Core.Loads.LoadKind.Permanent);
    }

    [Fact]
    public void A_member_with_no_force_in_any_combination_gets_exactly_zero_not_round_off()
    {
        // Source: common practice (statics): at the top heel node of a pitched truss whose end vertical
        // rises from the support, the first top chord member is the only member with a horizontal
        // component, so with vertical and slope-normal loads only its force is what equilibrium leaves.
        // Here: every member whose envelope is tiny is exactly zero, never 1e-11 N of round-off.
        var result = TrussDesigner.Design(Input(Pratt24(), size: false));

        var largest = result.Members.Max(m => Math.Max(m.Envelope.MaxTension, m.Envelope.MaxCompression));
        Assert.All(result.Members, m =>
        {
            Assert.True(m.Envelope.MaxCompression == 0 || m.Envelope.MaxCompression > largest * 1e-12, $"{m.Mark} compression {m.Envelope.MaxCompression}");
            Assert.True(m.Envelope.MaxTension == 0 || m.Envelope.MaxTension > largest * 1e-12, $"{m.Mark} tension {m.Envelope.MaxTension}");
        });
    }

    [Fact]
    public void A_group_without_a_section_is_reported_by_name()
    {
        var input = Input(Pratt24(), size: false);
        var groups = input.Groups.ToDictionary(p => p.Key, p => p.Value);
        groups["Verticals"] = groups["Verticals"] with { Section = null };

        var issues = TrussDesigner.Validate(input with { Groups = groups });

        Assert.Contains(issues, i => i.Field == "Groups[Verticals].Section" && i.Message.Contains("no section"));
        Assert.Throws<InputValidationException>(() => TrussDesigner.Design(input with { Groups = groups }));
    }

    [Fact]
    public void A_heavily_overloaded_truss_fails_and_names_the_failing_members()
    {
        var actions = Actions() with { ImposedKPaOnPlan = 20 };

        var result = TrussDesigner.Design(Input(Pratt24(), size: false, actions));

        Assert.Equal(CheckStatus.Fail, result.Status);
        Assert.Contains(result.Members, m => m.Design.Status == CheckStatus.Fail && m.Design.Utilization > 1);
    }
}
