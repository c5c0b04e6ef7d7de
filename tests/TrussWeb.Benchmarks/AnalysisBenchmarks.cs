using BenchmarkDotNet.Attributes;
using TrussWeb.Core.Analysis;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Model;

namespace TrussWeb.Benchmarks;

/// <summary>
/// Analysis of parallel-chord Pratt trusses: 2(n + 1) nodes for n panels, so 99 panels ≈ 200 nodes and
/// 2 499 panels ≈ 5 000 nodes; the series between shows how the cost scales (banded LDLᵀ after RCM:
/// expected linear in the number of nodes). Each run: validation (with its own stability factorisation),
/// assembly, factorisation, 4 load cases and the SANS 10160 preset combinations.
/// </summary>
[MemoryDiagnoser]
public class AnalysisBenchmarks
{
    private TrussModel _model = null!;
    private IReadOnlyList<LoadCase> _cases = null!;
    private IReadOnlyList<LoadCombination> _combinations = null!;
    private readonly AnalysisOptions _options = AnalysisOptions.UniformArea(2000);

    [Params(99, 249, 499, 999, 2499)]
    public int Panels { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        _model = TrussGenerator.Generate(new TrussParameters
        {
            Type = TrussType.ParallelPratt,
            Span = Panels * 1500.0,
            HeelDepth = 1500,
            PanelCount = Panels,
            TrussSpacing = 6000,
            BottomRestraintEvery = 4,
        });
        var built = LoadBuilder.Build(_model, new AreaActions
        {
            RoofCoveringKPa = 0.3,
            PurlinsAndServicesKPa = 0.15,
            ImposedKPaOnPlan = 0.5,
            WindCases = [new WindCase("W1", "uplift", -0.9, -0.6)],
        });
        _cases = built.Cases;
        _combinations = CombinationPresets.For(CombinationStandard.Sans10160, _cases);
    }

    [Benchmark]
    public AnalysisResult Analyse() => TrussSolver.Analyse(_model, _cases, _combinations, _options);

    [Benchmark]
    public IReadOnlyDictionary<string, TrussWeb.Core.Design.EffectiveLengths> DesignLengths() => DesignLengthBuilder.Build(_model);
}
