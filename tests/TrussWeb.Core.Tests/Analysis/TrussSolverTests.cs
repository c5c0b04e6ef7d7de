using TrussWeb.Core.Analysis;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Model;
using TrussWeb.Core.Tests.Support;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Tests.Analysis;

public class TrussSolverTests
{
    private const double Kn = 1000;

    private static AnalysisResult SolveOne(TrussModel model, LoadCase loadCase, double area = 1000)
        => TrussSolver.Analyse(model, [loadCase], [], AnalysisOptions.UniformArea(area));

    /// <summary>REFERENCES.md §6: pitched Pratt, span 12 m, six 2 m panels, rise 3 m, entered as tables.</summary>
    private static TrussModel ReferencePratt()
    {
        var b = new TrussBuilder();
        for (var i = 0; i <= 6; i++)
        {
            b.Node($"L{i}", 2000 * i, 0);
        }

        double[] heights = [1000, 2000, 3000, 2000, 1000];
        for (var i = 1; i <= 5; i++)
        {
            b.Node($"U{i}", 2000 * i, heights[i - 1]);
        }

        string[] top = ["L0", "U1", "U2", "U3", "U4", "U5", "L6"];
        for (var i = 0; i < 6; i++)
        {
            b.Member($"{top[i]}-{top[i + 1]}", top[i], top[i + 1], "TopChord");
            b.Member($"L{i}-L{i + 1}", $"L{i}", $"L{i + 1}", "BottomChord");
        }

        for (var i = 1; i <= 5; i++)
        {
            b.Member($"U{i}-L{i}", $"U{i}", $"L{i}", "Verticals");
        }

        b.Member("L1-U2", "L1", "U2").Member("L2-U3", "L2", "U3").Member("L4-U3", "L4", "U3").Member("L5-U4", "L5", "U4");
        return b.Pin("L0").Roller("L6").Build();
    }

    [Theory]
    // REFERENCES.md §6 [C] (exact statics), kN, tension +; the right half mirrors the left.
    [InlineData("L0-U1", -55.902)]
    [InlineData("U1-U2", -55.902)]
    [InlineData("U2-U3", -44.721)]
    [InlineData("L0-L1", 50.000)]
    [InlineData("L1-L2", 40.000)]
    [InlineData("L2-L3", 30.000)]
    [InlineData("U1-L1", -10.000)]
    [InlineData("U2-L2", -15.000)]
    [InlineData("U3-L3", 0)]
    [InlineData("L1-U2", 14.142)]
    [InlineData("L2-U3", 18.028)]
    [InlineData("U5-L6", -55.902)]
    [InlineData("U4-U5", -55.902)]
    [InlineData("L5-L6", 50.000)]
    [InlineData("L5-U4", 14.142)]
    [InlineData("L4-U3", 18.028)]
    public void Reference_pitched_Pratt_forces_match_published_statics(string member, double expectedKn)
    {
        var loads = TrussBuilder.Down("P", ("U1", 10 * Kn), ("U2", 10 * Kn), ("U3", 10 * Kn), ("U4", 10 * Kn), ("U5", 10 * Kn), ("L0", 5 * Kn), ("L6", 5 * Kn));
        var result = SolveOne(ReferencePratt(), loads);
        var force = result.Case("P").MemberForces[member] / Kn;

        // 0.1 % of the published value (rounded to 3 decimals); the zero-force member to 1e-6 kN.
        AssertClose.Relative(expectedKn, force, 1e-3, member, absTol: 1e-6);
    }

    [Fact]
    public void Reference_pitched_Pratt_reactions_are_30_kN_each()
    {
        var loads = TrussBuilder.Down("P", ("U1", 10 * Kn), ("U2", 10 * Kn), ("U3", 10 * Kn), ("U4", 10 * Kn), ("U5", 10 * Kn), ("L0", 5 * Kn), ("L6", 5 * Kn));
        var r = SolveOne(ReferencePratt(), loads).Case("P");

        // REFERENCES.md §6: reactions 30 kN.
        AssertClose.Relative(30, r.Reactions["L0"].Y / Kn, 1e-9, "R L0");
        AssertClose.Relative(30, r.Reactions["L6"].Y / Kn, 1e-9, "R L6");
        AssertClose.Relative(0, r.Reactions["L0"].X / Kn, 1e-9, "H L0", absTol: 1e-9);
    }

    /// <summary>
    /// Two-panel Warren, panel 2 000 mm, depth 1 000 mm, 20 kN down at U1 only, solved by hand by the
    /// method of joints (diagonals at 45°, 1/√2 = 0.7071):
    /// Reactions: ΣM(L0) = 0: R2·4000 = 20·1000 → R2 = 5 kN, R0 = 15 kN.
    /// Joint L0: ΣFy: 15 + D1/√2 = 0 → D1 = −15√2 = −21.213 (C); ΣFx: BC1 + D1/√2 = 0 → BC1 = +15 (T).
    /// Joint L2: ΣFy: 5 + D4/√2 = 0 → D4 = −5√2 = −7.071 (C); ΣFx: −BC2 − D4/√2 = 0 → BC2 = +5 (T).
    /// Joint U2: ΣFy: −D3/√2 − D4/√2 = 0 → D3 = +7.071 (T); ΣFx: −TC1 − D3/√2 + D4/√2 = 0 → TC1 = −10 (C).
    /// Joint U1: ΣFy: −20 − D1/√2 − D2/√2 = 0 → D2 = −7.071 (C); ΣFx: −10 + 15 − 5 = 0 (check).
    /// Joint L1 (check): ΣFx: −15 + 5 + 5 + 5 = 0; ΣFy: −5 + 5 = 0.
    /// </summary>
    private static TrussModel HandWarren() => new TrussBuilder()
        .Node("L0", 0, 0).Node("L1", 2000, 0).Node("L2", 4000, 0).Node("U1", 1000, 1000).Node("U2", 3000, 1000)
        .Member("BC1", "L0", "L1", "BottomChord").Member("BC2", "L1", "L2", "BottomChord").Member("TC1", "U1", "U2", "TopChord")
        .Member("D1", "L0", "U1").Member("D2", "U1", "L1").Member("D3", "L1", "U2").Member("D4", "U2", "L2")
        .Pin("L0").Roller("L2").Build(span: 4000);

    [Theory]
    // Method of joints by hand, see HandWarren(); kN.
    [InlineData("BC1", 15)]
    [InlineData("BC2", 5)]
    [InlineData("TC1", -10)]
    [InlineData("D1", -21.2132)]
    [InlineData("D2", -7.07107)]
    [InlineData("D3", 7.07107)]
    [InlineData("D4", -7.07107)]
    public void Hand_solved_Warren_matches_method_of_joints(string member, double expectedKn)
    {
        var r = SolveOne(HandWarren(), TrussBuilder.Down("P", ("U1", 20 * Kn))).Case("P");
        AssertClose.Relative(expectedKn, r.MemberForces[member] / Kn, 1e-3, member);
    }

    [Fact]
    public void Hand_solved_Warren_deflection_matches_virtual_work()
    {
        var r = SolveOne(HandWarren(), TrussBuilder.Down("P", ("U1", 20 * Kn)), area: 1000).Case("P");

        // Virtual work by hand (unit load at U1 gives N/20): δ = Σ N²L / (E A P).
        // Σ N²L = (15² + 5² + 10²)·2000 + (21.213² + 3·7.071²)·1414.21 = 700 000 + 600·1414.21 = 1 548 528 kN²·mm
        // δ = 1 548 528e6 / (200 000 · 1000 · 20 000) = 0.387132 mm downwards.
        AssertClose.Relative(-0.387132, r.Displacements["U1"].Y, 1e-5, "v U1");
    }

    /// <summary>
    /// Beer &amp; Johnston, Vector Mechanics for Engineers: Statics, Sample Problem 6.1 (from memory; the
    /// geometry is reconstructed and reproduces every recalled force): A(0, 8), B(12, 8), C(24, 8),
    /// D(6, 0), E(18, 0) ft; 2 000 lb down at A, 1 000 lb down at B; pin at C, roller at E.
    /// Units scaled 1 ft → 1 000 mm and 1 lb → 1 N (linear statics, scale-free).
    /// </summary>
    [Theory]
    // Recalled answers (lb): AB 1 500 T, AD 2 500 C, BD 2 500 T, DE 3 000 C, BE 3 750 C, BC 5 250 T, CE 8 750 C.
    [InlineData("AB", 1500)]
    [InlineData("AD", -2500)]
    [InlineData("BD", 2500)]
    [InlineData("DE", -3000)]
    [InlineData("BE", -3750)]
    [InlineData("BC", 5250)]
    [InlineData("CE", -8750)]
    public void Textbook_truss_matches_published_answers(string member, double expected)
    {
        var model = new TrussBuilder()
            .Node("A", 0, 8000).Node("B", 12000, 8000).Node("C", 24000, 8000).Node("D", 6000, 0).Node("E", 18000, 0)
            .Member("AB", "A", "B", "TopChord").Member("BC", "B", "C", "TopChord").Member("AD", "A", "D").Member("BD", "B", "D")
            .Member("BE", "B", "E").Member("DE", "D", "E", "BottomChord").Member("CE", "C", "E")
            .Pin("C").Roller("E").Build(span: 24000);
        var r = SolveOne(model, TrussBuilder.Down("P", ("A", 2000), ("B", 1000))).Case("P");
        AssertClose.Relative(expected, r.MemberForces[member], 1e-3, member);

        // Recalled reactions: E = 10 000 lb up, C = 7 000 lb down.
        AssertClose.Relative(10000, r.Reactions["E"].Y, 1e-3, "E");
        AssertClose.Relative(-7000, r.Reactions["C"].Y, 1e-3, "Cy");
    }

    [Fact]
    public void Combination_is_the_factored_sum_of_cases()
    {
        var model = HandWarren();
        LoadCase d = new("D", "dead", LoadKind.Permanent, [new NodalLoad("U1", 0, -10 * Kn)]);
        LoadCase q = new("Q", "imposed", LoadKind.Imposed, [new NodalLoad("U2", 0, -4 * Kn)]);
        var combo = new LoadCombination("1.2D + 1.6Q", LimitState.Uls, new Dictionary<LoadKind, double> { [LoadKind.Permanent] = 1.2, [LoadKind.Imposed] = 1.6 });
        var r = TrussSolver.Analyse(model, [d, q], [combo], AnalysisOptions.UniformArea(1000));
        foreach (var m in model.Members)
        {
            var expected = (1.2 * r.Case("D").MemberForces[m.Id]) + (1.6 * r.Case("Q").MemberForces[m.Id]);
            AssertClose.Relative(expected, r.Combination("1.2D + 1.6Q").MemberForces[m.Id], 1e-12, m.Id, absTol: 1e-9);
        }

        // Reactions balance the factored loads: 1.2·10 + 1.6·4 = 18.4 kN (arithmetic).
        AssertClose.Relative(18.4 * Kn, r.Combination("1.2D + 1.6Q").ReactionTotal.Y, 1e-12, "ΣR");
    }

    [Fact]
    public void Envelope_gives_max_tension_and_compression_with_governing_combination()
    {
        var model = HandWarren();
        LoadCase down = new("G", "gravity", LoadKind.Permanent, [new NodalLoad("U1", 0, -10 * Kn)]);
        LoadCase up = new("W", "uplift", LoadKind.Wind, [new NodalLoad("U1", 0, 30 * Kn)]);
        LoadCombination a = new("A", LimitState.Uls, new Dictionary<LoadKind, double> { [LoadKind.Permanent] = 1.35 });
        LoadCombination b = new("B", LimitState.Uls, new Dictionary<LoadKind, double> { [LoadKind.Permanent] = 0.9, [LoadKind.Wind] = 1.3 });
        LoadCombination s = new("S", LimitState.Sls, new Dictionary<LoadKind, double> { [LoadKind.Wind] = 10 });
        var r = TrussSolver.Analyse(model, [down, up], [a, b, s], AnalysisOptions.UniformArea(1000));
        var bc1 = r.EnvelopeOf("BC1");

        // BC1 = +0.75 P_down at U1 (hand truss above: 15 kN per 20 kN): A: 1.35·10·0.75 = 10.125 kN T;
        // B: (−0.9·10 + 1.3·30)·(−0.75) = −22.5 kN (C). The SLS combination is ignored.
        AssertClose.Relative(10.125 * Kn, bc1.MaxTension, 1e-9, "T");
        Assert.Equal("A", bc1.TensionCombination);
        AssertClose.Relative(22.5 * Kn, bc1.MaxCompression, 1e-9, "C");
        Assert.Equal("B", bc1.CompressionCombination);
    }

    [Fact]
    public void Deflection_check_passes_or_fails_against_span_over_250()
    {
        var model = HandWarren();
        LoadCase d = new("D", "dead", LoadKind.Permanent, [new NodalLoad("U1", 0, -20 * Kn)]);
        LoadCombination sls = new("SLS 1.0D", LimitState.Sls, new Dictionary<LoadKind, double> { [LoadKind.Permanent] = 1.0 });

        // Virtual work above: 0.387 mm at A = 1 000 mm², so 38.7 mm at A = 10 mm²; limit 4 000/250 = 16 mm (common practice).
        var stiff = TrussSolver.Analyse(model, [d], [sls], AnalysisOptions.UniformArea(1000)).Deflections.Single();
        var soft = TrussSolver.Analyse(model, [d], [sls], AnalysisOptions.UniformArea(10)).Deflections.Single();
        AssertClose.Relative(16, stiff.Limit, 1e-12, "limit");
        Assert.True(stiff.Passes);
        Assert.False(soft.Passes);
        Assert.Equal("U1", soft.Node);
        AssertClose.Relative(-38.7132, soft.Deflection, 1e-5, "δ");
    }

    [Fact]
    public void Mechanism_is_an_input_error_naming_node_and_direction_not_a_NaN()
    {
        // The bottom chord node M has only the two collinear chord members: no vertical stiffness.
        var model = new TrussBuilder().Node("A", 0, 0).Node("M", 2000, 0).Node("B", 4000, 0).Node("T", 2000, 1000)
            .Member("BC1", "A", "M", "BottomChord").Member("BC2", "M", "B", "BottomChord").Member("TC1", "A", "T", "TopChord").Member("TC2", "T", "B", "TopChord")
            .Pin("A").Roller("B").Build(span: 4000);
        var ex = Assert.Throws<InputValidationException>(() => SolveOne(model, TrussBuilder.Down("P", ("T", 1000))));
        Assert.Contains(ex.Issues, i => i.Message == "mechanism: node M has no stiffness in the y direction; add a member or a support there");
    }

    [Fact]
    public void Unknown_load_node_is_reported()
    {
        var ex = Assert.Throws<InputValidationException>(() => SolveOne(HandWarren(), TrussBuilder.Down("P", ("X9", 1000))));
        Assert.Contains(ex.Issues, i => i.Message == "load case P has a load at unknown node 'X9'");
    }

    [Fact]
    public void TryAnalyse_returns_the_issues_of_an_unstable_truss()
    {
        var model = HandWarren() with { Supports = [new Core.Model.Support("L0", SupportKind.RollerX), new Core.Model.Support("L2", SupportKind.RollerX)] };
        var ok = TrussSolver.TryAnalyse(model, [TrussBuilder.Down("P", ("U1", 1000))], [], AnalysisOptions.UniformArea(1000), out var result, out var issues);
        Assert.False(ok);
        Assert.Null(result);
        Assert.Contains(issues, i => i.Field == "Supports" && i.Message.StartsWith("unstable supports: nothing restrains the truss in x", StringComparison.Ordinal));
    }

    [Fact]
    public void Renumbering_keeps_the_band_narrow_whatever_the_input_order()
    {
        var model = TrussGenerator.Generate(new TrussParameters { Type = TrussType.ParallelPratt, Span = 150_000, HeelDepth = 1500, PanelCount = 100, TrussSpacing = 6000 });
        var rng = new Random(7);
        var shuffled = model with { Nodes = model.Nodes.OrderBy(_ => rng.Next()).ToList() };
        var result = TrussSolver.Analyse(shuffled, [TrussBuilder.Down("P", ("U50", 1000))], [], AnalysisOptions.UniformArea(1000));

        // RCM on a ladder-like truss: each breadth-first level holds at most 2–3 nodes, so no member spans
        // more than 3 positions → half-bandwidth ≤ 2·3 + 1 = 7 DOF (Cuthill–McKee level-structure bound).
        Assert.InRange(result.HalfBandwidth, 1, 7);

        // Same answer as the generated order: mid-span bottom chord force is independent of numbering.
        var reference = TrussSolver.Analyse(model, [TrussBuilder.Down("P", ("U50", 1000))], [], AnalysisOptions.UniformArea(1000));
        AssertClose.Relative(reference.Case("P").MemberForces["BC50"], result.Case("P").MemberForces["BC50"], 1e-9, "BC50");
    }
}
