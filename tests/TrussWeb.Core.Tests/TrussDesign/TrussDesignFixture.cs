using TrussWeb.Core.Design;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Model;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Sizing;
using TrussWeb.Core.Standards.Sans10162;
using TrussWeb.Core.TrussDesign;

namespace TrussWeb.Core.Tests.TrussDesign;

/// <summary>
/// A 24 m pitched Pratt roof truss at 6 m centres (invented test scenario), double-angle chords and
/// single-angle webs, S355JR, SANS 10162-1 with SANS 10160 combinations; bottom chord braced at
/// every second panel point.
/// </summary>
public static class TrussDesignFixture
{
    public static readonly CatalogueLoadResult Shapes =
        SectionCatalogue.Load(Path.Combine(AppContext.BaseDirectory, "seed-data", "sections"));

    public static readonly SteelGrade S355 =
        GradeCatalogue.Load(Path.Combine(AppContext.BaseDirectory, "seed-data", "grades.csv")).Find("S355JR");

    public static TrussModel Pratt24(int bottomRestraintEvery = 2) => TrussGenerator.Generate(new TrussParameters
    {
        Type = TrussType.PitchedPratt,
        Span = 24_000,
        PitchDegrees = 10,
        HeelDepth = 600,
        PanelCount = 12,
        TrussSpacing = 6_000,
        BottomRestraintEvery = bottomRestraintEvery,
    });

    public static AreaActions Actions(double upliftKPa = -1.2) => new()
    {
        RoofCoveringKPa = 0.10,
        PurlinsAndServicesKPa = 0.15,
        ImposedKPaOnPlan = 0.50,
        WindCases = [new WindCase("W1", "Uplift", upliftKPa, upliftKPa)],
    };

    public static TrussDesignInput Input(TrussModel model, bool size, AreaActions? actions = null)
    {
        var a = actions ?? Actions();
        var cases = LoadBuilder.Build(model, a).Cases;
        var angle = new HashSet<SectionFamily> { SectionFamily.Angle };
        var pair = new HashSet<SectionFamily> { SectionFamily.DoubleAngle };
        GroupDesignSettings Group(string name, IReadOnlySet<SectionFamily> families, string fixedSection) => new()
        {
            Group = name,
            Section = size ? null : Find(fixedSection, families.Contains(SectionFamily.DoubleAngle)),
            Constraints = size ? new SizingConstraints { Families = families, MinDimension = 40, MinThickness = 4 } : null,
            DoubleAngleGap = 10,
            Orientation = BackToBack.LongLegsBackToBack,
        };

        return new TrussDesignInput
        {
            Model = model,
            Actions = a,
            Combinations = CombinationPresets.For(CombinationStandard.Sans10160, cases),
            Grade = S355,
            Standard = new Sans10162Standard(),
            Groups = new Dictionary<string, GroupDesignSettings>
            {
                ["TopChord"] = Group("TopChord", pair, "L100x75x8"),
                ["BottomChord"] = Group("BottomChord", pair, "L80x60x7"),
                ["Diagonals"] = Group("Diagonals", angle, "L70x70x7"),
                ["Verticals"] = Group("Verticals", angle, "L60x60x6"),
            },
        };
    }

    public static SectionProperties Find(string designation, bool doubleAngle)
    {
        var entry = Shapes.Find(designation);
        return doubleAngle
            ? DoubleAngle.Compute((AngleDimensions)entry.Dimensions, 10, BackToBack.LongLegsBackToBack)
            : entry.Properties;
    }
}
