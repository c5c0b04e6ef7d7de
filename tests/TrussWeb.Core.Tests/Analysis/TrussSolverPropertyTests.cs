using TrussWeb.Core.Analysis;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Model;
using TrussWeb.Core.Tests.Support;

namespace TrussWeb.Core.Tests.Analysis;

/// <summary>Seeded random trusses from every generator with random loads and areas (300 cases, deterministic).</summary>
public class TrussSolverPropertyTests
{
    private const int Cases = 300;

    public static IEnumerable<object[]> Seeds() => Enumerable.Range(0, Cases).Select(i => new object[] { i });

    private static (TrussModel Model, LoadCase Loads, AnalysisOptions Options) Random(int seed)
    {
        var rng = new Random(seed);
        var types = Enum.GetValues<TrussType>();
        var type = types[rng.Next(types.Length)];
        var parallel = type is TrussType.ParallelPratt or TrussType.ParallelHowe or TrussType.ParallelWarren;
        var pitched = type is TrussType.PitchedHowe or TrussType.PitchedPratt or TrussType.Fink;
        var panels = type == TrussType.Fink ? 2 * rng.Next(2, 10) : pitched ? 2 * rng.Next(1, 10) : rng.Next(1, 20);
        var span = 4000 + (rng.NextDouble() * 40_000);
        var heel = parallel ? 300 + (rng.NextDouble() * 3000) : rng.Next(2) == 0 ? 0 : rng.NextDouble() * 1500;
        var model = TrussGenerator.Generate(new TrussParameters
        {
            Type = type,
            Span = span,
            PanelCount = panels,
            HeelDepth = heel,
            PitchDegrees = parallel ? null : 5 + (rng.NextDouble() * 40),
            TrussSpacing = 6000,
        });
        var loads = model.Nodes.Where(_ => rng.NextDouble() < 0.6)
            .Select(n => new NodalLoad(n.Id, (rng.NextDouble() - 0.5) * 20_000, (rng.NextDouble() - 0.7) * 50_000)).ToList();
        var areas = model.Members.ToDictionary(m => m.Id, _ => new MemberStiffness(200_000, 200 + (rng.NextDouble() * 5000)));
        return (model, new LoadCase("R", "random", LoadKind.Other, loads), new AnalysisOptions { DefaultArea = _ => 1000, Members = areas });
    }

    private static double Scale(LoadCase c) => Math.Max(1, c.Loads.Sum(l => Math.Abs(l.Fx) + Math.Abs(l.Fy)));

    [Theory]
    [MemberData(nameof(Seeds))]
    public void Reactions_balance_the_loads(int seed)
    {
        var (model, loads, options) = Random(seed);
        var r = TrussSolver.Analyse(model, [loads], [], options).Case("R");

        // Equilibrium of the whole truss (statics): ΣR + ΣF = 0 in x, y and moment about the origin, to 1e-9 of Σ|F|.
        var nodes = model.NodeMap();
        var scale = Scale(loads);
        var lever = scale * model.Span;
        Assert.True(Math.Abs(r.ReactionTotal.X + loads.TotalFx) <= 1e-9 * scale, $"ΣFx seed {seed}");
        Assert.True(Math.Abs(r.ReactionTotal.Y + loads.TotalFy) <= 1e-9 * scale, $"ΣFy seed {seed}");
        var moment = loads.Loads.Sum(l => (nodes[l.Node].X * l.Fy) - (nodes[l.Node].Y * l.Fx))
            + r.Reactions.Sum(kv => (nodes[kv.Key].X * kv.Value.Y) - (nodes[kv.Key].Y * kv.Value.X));
        Assert.True(Math.Abs(moment) <= 1e-9 * lever, $"ΣM seed {seed}: {moment}");
    }

    [Theory]
    [MemberData(nameof(Seeds))]
    public void Forces_scale_linearly_with_load(int seed)
    {
        var (model, loads, options) = Random(seed);
        var scaled = loads with { Id = "S", Loads = loads.Loads.Select(l => l with { Fx = -2.5 * l.Fx, Fy = -2.5 * l.Fy }).ToList() };
        var result = TrussSolver.Analyse(model, [loads, scaled], [], options);
        var max = Math.Max(1, result.Case("R").MemberForces.Values.Max(Math.Abs));
        foreach (var m in model.Members)
        {
            // Linear elastic analysis (superposition): N(−2.5 F) = −2.5 N(F).
            var diff = Math.Abs(result.Case("S").MemberForces[m.Id] + (2.5 * result.Case("R").MemberForces[m.Id]));
            Assert.True(diff <= 1e-9 * 2.5 * max, $"{m.Id} seed {seed}");
        }
    }

    [Theory]
    [MemberData(nameof(Seeds))]
    public void Mirrored_truss_gives_mirrored_forces(int seed)
    {
        var (model, loads, options) = Random(seed);

        // Mirror about x = span/2: x → span − x, Fx → −Fx; supports (by node) and members stay, so by symmetry
        // each member carries the same force.
        var mirrored = model with { Nodes = model.Nodes.Select(n => n with { X = model.Span - n.X }).ToList() };
        var mirroredLoads = loads with { Loads = loads.Loads.Select(l => l with { Fx = -l.Fx }).ToList() };
        var a = TrussSolver.Analyse(model, [loads], [], options).Case("R");
        var b = TrussSolver.Analyse(mirrored, [mirroredLoads], [], options).Case("R");
        var max = Math.Max(1, a.MemberForces.Values.Max(Math.Abs));
        foreach (var m in model.Members)
        {
            Assert.True(Math.Abs(a.MemberForces[m.Id] - b.MemberForces[m.Id]) <= 1e-9 * max, $"{m.Id} seed {seed}");
        }

        foreach (var n in model.Nodes)
        {
            AssertClose.Relative(-a.Displacements[n.Id].X, b.Displacements[n.Id].X, 1e-6, $"u {n.Id}", absTol: 1e-9 * Math.Max(1, a.Displacements.Values.Max(d => Math.Abs(d.X))));
        }
    }
}
