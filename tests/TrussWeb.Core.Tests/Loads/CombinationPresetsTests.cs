using TrussWeb.Core.Loads;

namespace TrussWeb.Core.Tests.Loads;

public class CombinationPresetsTests
{
    private static readonly LoadCase D = new("D", "dead", LoadKind.Permanent, []);
    private static readonly LoadCase Q = new("Q", "imposed", LoadKind.Imposed, []);
    private static readonly LoadCase W1 = new("W1", "wind 0°", LoadKind.Wind, []);
    private static readonly LoadCase W2 = new("W2", "wind 90°", LoadKind.Wind, []);
    private static readonly LoadCase[] Cases = [D, Q, W1, W2];

    private static (double D, double Q, double W1, double W2) Factors(LoadCombination c) => (c.FactorFor(D), c.FactorFor(Q), c.FactorFor(W1), c.FactorFor(W2));

    [Fact]
    public void Sans_10160_presets_match_the_documented_forms()
    {
        // ENGINEERING.md / REFERENCES.md §7, SANS 10160-1 (from memory): 1.35D; 1.2D + 1.6Q; 1.2D + 1.3W + 0.5Q; 0.9D + 1.3W;
        // SLS 1.0D + 1.0Q; 1.0D + 1.0W — one wind combination per wind case.
        var list = CombinationPresets.For(CombinationStandard.Sans10160, Cases).ToDictionary(c => c.Name);
        Assert.Equal(
            ["1.35D", "1.2D + 1.6Q", "1.2D + 1.3W(W1) + 0.5Q", "1.2D + 1.3W(W2) + 0.5Q", "0.9D + 1.3W(W1)", "0.9D + 1.3W(W2)", "SLS 1.0D + 1.0Q", "SLS 1.0D + 1.0W(W1)", "SLS 1.0D + 1.0W(W2)"],
            list.Keys);
        Assert.Equal((1.35, 0, 0, 0), Factors(list["1.35D"]));
        Assert.Equal((1.2, 1.6, 0, 0), Factors(list["1.2D + 1.6Q"]));
        Assert.Equal((1.2, 0.5, 1.3, 0), Factors(list["1.2D + 1.3W(W1) + 0.5Q"]));
        Assert.Equal((0.9, 0, 0, 1.3), Factors(list["0.9D + 1.3W(W2)"]));
        Assert.Equal((1.0, 1.0, 0, 0), Factors(list["SLS 1.0D + 1.0Q"]));
        Assert.Equal(LimitState.Sls, list["SLS 1.0D + 1.0W(W1)"].LimitState);
        Assert.Equal((1.0, 0, 1.0, 0), Factors(list["SLS 1.0D + 1.0W(W1)"]));
    }

    [Fact]
    public void Asce_7_presets_match_the_documented_forms()
    {
        // REFERENCES.md §7 (IBC 1605.2 / ASCE 7 2.3.1): 1.4D; 1.2D + 1.6Lr + 0.5W; 1.2D + 1.0W + 0.5Lr; 0.9D + 1.0W.
        var list = CombinationPresets.For(CombinationStandard.Asce7Lrfd, [D, Q, W1]).Where(c => c.LimitState == LimitState.Uls).ToList();
        Assert.Equal(["1.4D", "1.2D + 0.5W(W1) + 1.6Q", "1.2D + 1.0W(W1) + 0.5Q", "0.9D + 1.0W(W1)"], list.Select(c => c.Name));
        Assert.Equal((1.4, 0, 0, 0), Factors(list[0]));
        Assert.Equal((1.2, 1.6, 0.5, 0), Factors(list[1]));
        Assert.Equal((1.2, 0.5, 1.0, 0), Factors(list[2]));
        Assert.Equal((0.9, 0, 1.0, 0), Factors(list[3]));
    }

    [Fact]
    public void En_1990_presets_match_the_documented_forms()
    {
        // ENGINEERING.md, EN 1990 (6.10): 1.35G + 1.5Q; 1.35G + 1.5W; 1.0G + 1.5W (γ from REFERENCES.md §7).
        var list = CombinationPresets.For(CombinationStandard.En1990, [D, Q, W1]).Where(c => c.LimitState == LimitState.Uls).ToList();
        Assert.Equal(["1.35D + 1.5Q", "1.35D + 1.5W(W1)", "1.0D + 1.5W(W1)"], list.Select(c => c.Name));
        Assert.Equal((1.35, 1.5, 0, 0), Factors(list[0]));
        Assert.Equal((1.35, 0, 1.5, 0), Factors(list[1]));
        Assert.Equal((1.0, 0, 1.5, 0), Factors(list[2]));
    }

    [Fact]
    public void Factors_are_editable_plain_data()
    {
        var sans = CombinationPresets.For(CombinationStandard.Sans10160, Cases).Single(c => c.Name == "1.2D + 1.3W(W1) + 0.5Q");

        // ψ = 0 for inaccessible roofs (REFERENCES.md §7, from memory): the user edits the factor.
        var edited = sans with { KindFactors = new Dictionary<LoadKind, double>(sans.KindFactors) { [LoadKind.Imposed] = 0 } };
        Assert.Equal(0, edited.FactorFor(Q));
        Assert.Equal(1.3, edited.FactorFor(W1));
    }
}
