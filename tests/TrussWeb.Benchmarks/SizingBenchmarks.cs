using BenchmarkDotNet.Attributes;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Model;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Sizing;
using TrussWeb.Core.Standards.Sans10162;
using TrussWeb.Core.TrussDesign;

namespace TrussWeb.Benchmarks;

/// <summary>
/// Full design and automatic sizing of a 65-member pitched Pratt truss (32 m, 16 panels; at least the 60 members of the target) with 8
/// combinations (6 ultimate, 2 serviceability) over the whole shipped catalogue: four groups, double
/// angles for the chords and single angles for the webs, self-weight iteration to convergence.
/// Target: 300 ms. Also one design pass with full records (what a page shows after an edit).
/// </summary>
[MemoryDiagnoser]
public class SizingBenchmarks
{
    private TrussDesignInput _sizeInput = null!;
    private TrussDesignInput _designInput = null!;
    private CatalogueLoadResult _catalogue = null!;

    [GlobalSetup]
    public void Setup()
    {
        _catalogue = SectionCatalogue.Load(Path.Combine(AppContext.BaseDirectory, "seed-data", "sections"));
        var grade = GradeCatalogue.Load(Path.Combine(AppContext.BaseDirectory, "seed-data", "grades.csv")).Find("S355JR");
        var model = TrussGenerator.Generate(new TrussParameters
        {
            Type = TrussType.PitchedPratt,
            Span = 32_000,
            PitchDegrees = 10,
            HeelDepth = 800,
            PanelCount = 16,
            TrussSpacing = 6_000,
            BottomRestraintEvery = 2,
        });
        var actions = new AreaActions
        {
            RoofCoveringKPa = 0.10,
            PurlinsAndServicesKPa = 0.15,
            ImposedKPaOnPlan = 0.50,
            WindCases = [new WindCase("W1", "uplift, wind across", -1.1, -0.7), new WindCase("W2", "uplift, wind along", -0.9, -0.9)],
        };
        var cases = LoadBuilder.Build(model, actions).Cases;
        var combos = CombinationPresets.For(CombinationStandard.Sans10160, cases).Where(c => c.LimitState == LimitState.Uls).ToList();
        combos.AddRange(CombinationPresets.For(CombinationStandard.Sans10160, cases).Where(c => c.LimitState == LimitState.Sls).Take(2));
        if (model.Members.Count != 65 || combos.Count != 8)
        {
            throw new InvalidOperationException($"benchmark truss has {model.Members.Count} members and {combos.Count} combinations");
        }

        GroupDesignSettings Group(string name, SectionFamily family) => new()
        {
            Group = name,
            Constraints = new SizingConstraints { Families = new HashSet<SectionFamily> { family }, MinDimension = 40, MinThickness = 4 },
        };

        _sizeInput = new TrussDesignInput
        {
            Model = model,
            Actions = actions,
            Combinations = combos,
            Grade = grade,
            Standard = new Sans10162Standard(),
            Groups = new Dictionary<string, GroupDesignSettings>
            {
                ["TopChord"] = Group("TopChord", SectionFamily.DoubleAngle),
                ["BottomChord"] = Group("BottomChord", SectionFamily.DoubleAngle),
                ["Diagonals"] = Group("Diagonals", SectionFamily.Angle),
                ["Verticals"] = Group("Verticals", SectionFamily.Angle),
            },
        };
        _designInput = TrussSizer.Size(_sizeInput, _catalogue).FinalInput;
    }

    [Benchmark]
    public TrussSizingResult SizeWholeTruss() => TrussSizer.Size(_sizeInput, _catalogue);

    [Benchmark]
    public TrussDesignResult DesignWithRecords() => TrussDesigner.Design(_designInput, withRecords: true);
}
