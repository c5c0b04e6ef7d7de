using TrussWeb.Core.Analysis;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Model;
using TrussWeb.Core.Tests.Support;

namespace TrussWeb.Core.Tests.Analysis;

public class DesignLengthBuilderTests
{
    // Pitched Pratt 12 m, six 2 m panels, apex 3 m (REFERENCES.md §6 geometry); top-chord members 2 236.07 mm (√(2000² + 1000²)).
    private static TrussModel Pratt(int? bottomEvery = null) => TrussGenerator.Generate(new TrussParameters
    {
        Type = TrussType.PitchedPratt, Span = 12_000, ApexHeight = 3000, PanelCount = 6, TrussSpacing = 6000, BottomRestraintEvery = bottomEvery,
    });

    [Fact]
    public void Wind_uplift_puts_the_bottom_chord_in_compression_over_the_brace_spacing()
    {
        // Worked truss: 0.4 kPa permanent, −1.2 kPa net uplift on both slopes, trusses at 6 m, bottom chord braced at
        // every second node (L0, L2, L4, L6: 4 m apart). 0.9D + 1.3W: net upward load 1.3·1.2·cos θ − 0.9·0.4 > 0 per
        // unit slope area (cos θ = 0.894), so the truss is lifted and the bottom chord is compressed (statics).
        var model = Pratt(bottomEvery: 2);
        var loads = LoadBuilder.Build(model, new AreaActions { RoofCoveringKPa = 0.3, PurlinsAndServicesKPa = 0.1, WindCases = [new WindCase("W1", "uplift", -1.2, -1.2)] });
        var combos = CombinationPresets.For(CombinationStandard.Sans10160, loads.Cases);
        var result = TrussSolver.Analyse(model, loads.Cases, combos, AnalysisOptions.UniformArea(1000));
        var uplift = result.Combination("0.9D + 1.3W(W1)");
        foreach (var bc in model.Members.Where(m => m.Group == "BottomChord"))
        {
            Assert.True(uplift.MemberForces[bc.Id] < 0, $"{bc.Id} in compression under uplift");
            Assert.Equal("0.9D + 1.3W(W1)", result.EnvelopeOf(bc.Id).CompressionCombination);
        }

        var lengths = DesignLengthBuilder.Build(model);

        // Out of plane: brace spacing 2 × 2 000 mm = 4 000 mm; in plane: node to node 2 000 mm.
        AssertClose.Relative(4000, lengths["BC3"].Ly, 1e-12, "Ly BC3");
        AssertClose.Relative(2000, lengths["BC3"].Lx, 1e-12, "Lx BC3");
        Assert.Equal("chain BC3–BC4 between restraints at L2 and L4: 4 000 mm", lengths["BC3"].LySource);
        Assert.Equal(lengths["BC3"].Ly, lengths["BC3"].Lz);
    }

    [Fact]
    public void Bottom_chord_restrained_only_at_the_supports_spans_the_whole_truss()
    {
        var lengths = DesignLengthBuilder.Build(Pratt());
        AssertClose.Relative(12_000, lengths["BC4"].Ly, 1e-12, "Ly");
        Assert.Equal("chain BC1–BC6 between restraints at L0 and L6: 12 000 mm", lengths["BC4"].LySource);
    }

    [Fact]
    public void Top_chord_restrained_at_every_purlin_is_node_to_node()
    {
        var lengths = DesignLengthBuilder.Build(Pratt());
        AssertClose.Relative(2236.068, lengths["TC2"].Ly, 1e-6, "Ly");
        Assert.Equal("chain TC2 between restraints at U1 and U2: 2 236 mm", lengths["TC2"].LySource);
        Assert.Equal("node to node U1–U2: 2 236 mm", lengths["TC2"].LxSource);
    }

    [Fact]
    public void Unrestrained_apex_runs_the_chain_through_the_change_of_direction()
    {
        var model = Pratt();
        model = model with { LateralRestraints = model.LateralRestraints.Where(id => id != "U3").ToList() };
        var lengths = DesignLengthBuilder.Build(model);

        // TC3 + TC4 = 2 × 2 236.07 = 4 472.14 mm (conservative: the kink at U3 is not a restraint).
        AssertClose.Relative(4472.136, lengths["TC3"].Ly, 1e-6, "Ly");
        Assert.Equal("chain TC3–TC4 between restraints at U2 and U4: 4 472 mm; runs through a change of direction at U3 (not taken as a restraint)", lengths["TC3"].LySource);
    }

    [Fact]
    public void Webs_are_node_to_node_both_ways()
    {
        var lengths = DesignLengthBuilder.Build(Pratt());

        // D1 = L1–U2: √(2000² + 2000²) = 2 828.43 mm.
        AssertClose.Relative(2828.427, lengths["D1"].Lx, 1e-6, "Lx");
        AssertClose.Relative(2828.427, lengths["D1"].Ly, 1e-6, "Ly");
        Assert.Equal("node to node L1–U2: 2 828 mm", lengths["D1"].LySource);
    }

    [Fact]
    public void Override_replaces_K_and_L_and_says_so()
    {
        var overrides = new Dictionary<string, MemberLengthOverride> { ["BC2"] = new() { Ly = 3000, Kx = 0.9, Reason = "tie at mid-bay" } };
        var lengths = DesignLengthBuilder.Build(Pratt(), overrides);
        Assert.Equal(3000, lengths["BC2"].Ly);
        Assert.Equal(3000, lengths["BC2"].Lz);
        Assert.Equal(0.9, lengths["BC2"].Kx);
        Assert.Equal("user override: Ly = 3 000 mm (tie at mid-bay); computed chain BC1–BC6 between restraints at L0 and L6: 12 000 mm", lengths["BC2"].LySource);
        Assert.StartsWith("user override: Kx = 0.9", lengths["BC2"].LxSource, StringComparison.Ordinal);
    }

    [Fact]
    public void Principal_axis_override_is_stated()
    {
        var overrides = new Dictionary<string, MemberLengthOverride> { ["D1"] = new() { KLv = 1800 } };
        var lengths = DesignLengthBuilder.Build(Pratt(), overrides)["D1"];
        Assert.Equal(1800, lengths.KLv);
        Assert.Null(lengths.KLu);
        Assert.EndsWith("; user override: principal-axis lengths KLu = not given, KLv = 1 800 mm", lengths.LySource, StringComparison.Ordinal);
    }

    [Fact]
    public void Chain_ending_at_an_unrestrained_free_end_is_flagged()
    {
        var model = Pratt();
        model = model with { LateralRestraints = model.LateralRestraints.Where(id => id != "L6").ToList() };
        var source = DesignLengthBuilder.Build(model)["BC6"].LySource;
        Assert.Equal("chain BC1–BC6 from restraint at L0 to free end at L6 (not a lateral restraint: check bracing): 12 000 mm", source);
    }
}
