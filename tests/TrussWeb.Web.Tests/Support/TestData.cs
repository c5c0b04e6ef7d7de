using TrussWeb.Core.Design;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Model;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Sizing;
using TrussWeb.Core.Standards.Sans10162;
using TrussWeb.Core.TrussDesign;

namespace TrussWeb.Web.Tests.Support;

/// <summary>
/// Real engineering data for the component tests: the seed-data catalogue and grades, member checks by
/// the SANS 10162-1 module, and a sized 24 m pitched Pratt truss (invented test scenario, as the Core
/// tests' truss design fixture). Nothing here is a made-up result.
/// </summary>
public static class TestData
{
    public static readonly string SeedData = Path.Combine(AppContext.BaseDirectory, "seed-data");

    public static readonly CatalogueLoadResult Catalogue = SectionCatalogue.Load(Path.Combine(SeedData, "sections"));

    public static readonly SteelGrade S355 = GradeCatalogue.Load(Path.Combine(SeedData, "grades.csv")).Find("S355JR");

    private static readonly Lazy<TrussSizingResult> Sized = new(SizePratt, LazyThreadSafetyMode.ExecutionAndPublication);

    /// <summary>The sized truss (final design with records).</summary>
    public static TrussSizingResult SizedTruss => Sized.Value;

    public static SectionProperties Section(string designation) => Catalogue.Find(designation).Properties;

    public static Material MaterialFor(SectionProperties section) => S355.For(section.GoverningThickness);

    /// <summary>A single-angle member of the catalogue checked by the standard for an axial force (N, tension positive).</summary>
    public static MemberDesignResult Check(string designation, double axial, double length = 2_000)
    {
        var section = Section(designation);
        var member = new DesignMember
        {
            Mark = "D1",
            Section = section,
            Material = MaterialFor(section),
            Lengths = EffectiveLengths.Uniform(length),
        };
        return new Sans10162Standard().CheckMember(member, MemberForces.FromAxial(axial, "ULS test"));
    }

    public static TrussModel Pratt24() => TrussGenerator.Generate(new TrussParameters
    {
        Type = TrussType.PitchedPratt,
        Span = 24_000,
        PitchDegrees = 10,
        HeelDepth = 600,
        PanelCount = 12,
        TrussSpacing = 6_000,
        BottomRestraintEvery = 2,
    });

    private static TrussSizingResult SizePratt()
    {
        var model = Pratt24();
        var actions = new AreaActions
        {
            RoofCoveringKPa = 0.10,
            PurlinsAndServicesKPa = 0.15,
            ImposedKPaOnPlan = 0.50,
            WindCases = [new WindCase("W1", "Uplift", -1.2, -1.2)],
        };
        var cases = LoadBuilder.Build(model, actions).Cases;
        GroupDesignSettings Group(string name, SectionFamily family) => new()
        {
            Group = name,
            Constraints = new SizingConstraints { Families = new HashSet<SectionFamily> { family }, MinDimension = 40, MinThickness = 4 },
            DoubleAngleGap = 10,
            Orientation = BackToBack.LongLegsBackToBack,
        };
        var input = new TrussDesignInput
        {
            Model = model,
            Actions = actions,
            Combinations = CombinationPresets.For(CombinationStandard.Sans10160, cases),
            Grade = S355,
            Standard = new Sans10162Standard(),
            Groups = new Dictionary<string, GroupDesignSettings>
            {
                ["TopChord"] = Group("TopChord", SectionFamily.DoubleAngle),
                ["BottomChord"] = Group("BottomChord", SectionFamily.DoubleAngle),
                ["Diagonals"] = Group("Diagonals", SectionFamily.Angle),
                ["Verticals"] = Group("Verticals", SectionFamily.Angle),
            },
        };
        return TrussSizer.Size(input, Catalogue);
    }
}
