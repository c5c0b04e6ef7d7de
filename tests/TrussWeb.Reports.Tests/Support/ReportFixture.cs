using TrussWeb.Core.Loads;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Model;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Sizing;
using TrussWeb.Core.Standards.Sans10162;
using TrussWeb.Core.TrussDesign;
using TrussWeb.Reports.Model;

namespace TrussWeb.Reports.Tests.Support;

/// <summary>
/// Real designs for the report tests: a generated 24 m pitched Pratt truss (invented scenario),
/// seed-data catalogue and grade, sized by <see cref="TrussSizer"/>; nothing is faked.
/// </summary>
public static class ReportFixture
{
    public static readonly CatalogueLoadResult Shapes =
        SectionCatalogue.Load(Path.Combine(AppContext.BaseDirectory, "seed-data", "sections"));

    public static readonly SteelGrade S355 =
        GradeCatalogue.Load(Path.Combine(AppContext.BaseDirectory, "seed-data", "grades.csv")).Find("S355JR");

    public static readonly DateTimeOffset ProducedAt = new(2026, 12, 1, 9, 30, 0, TimeSpan.Zero);

    private static readonly Lazy<TrussReportData> PrattLazy = new(() => Design("T1", Pratt(24_000, 12), Actions(1.0)));

    /// <summary>The sized 24 m Pratt truss (shared; immutable).</summary>
    public static TrussReportData Pratt24 => PrattLazy.Value;

    public static TrussModel Pratt(double span, int panels) => TrussGenerator.Generate(new TrussParameters
    {
        Type = TrussType.PitchedPratt,
        Span = span,
        PitchDegrees = 10,
        HeelDepth = 600,
        PanelCount = panels,
        TrussSpacing = 6_000,
        BottomRestraintEvery = 2,
    });

    public static TrussModel ParallelPratt(double span, int panels, double depth = 1_500) => TrussGenerator.Generate(new TrussParameters
    {
        Type = TrussType.ParallelPratt,
        Span = span,
        HeelDepth = depth,
        PanelCount = panels,
        TrussSpacing = 6_000,
        BottomRestraintEvery = 2,
    });

    /// <summary>Roof actions; <paramref name="scale"/> multiplies every pressure (the stress case uses large values to get 5-digit forces).</summary>
    public static AreaActions Actions(double scale) => new()
    {
        RoofCoveringKPa = 0.10 * scale,
        PurlinsAndServicesKPa = 0.15 * scale,
        ImposedKPaOnPlan = 0.50 * scale,
        WindCases = [new WindCase("W1", "Uplift, internal pressure", -1.2 * scale, -1.2 * scale)],
    };

    /// <summary>Sizes the truss (double-angle chords, single-angle webs, or any families given) and packs the report data.</summary>
    public static TrussReportData Design(string name, TrussModel model, AreaActions actions,
        IReadOnlySet<SectionFamily>? chordFamilies = null, IReadOnlySet<SectionFamily>? webFamilies = null,
        IReadOnlyDictionary<string, MemberReviewInfo>? reviews = null)
    {
        var cases = LoadBuilder.Build(model, actions).Cases;
        var chords = chordFamilies ?? new HashSet<SectionFamily> { SectionFamily.DoubleAngle };
        var webs = webFamilies ?? new HashSet<SectionFamily> { SectionFamily.Angle };
        GroupDesignSettings Group(string group, IReadOnlySet<SectionFamily> families) => new()
        {
            Group = group,
            Constraints = new SizingConstraints { Families = families, MinDimension = 40, MinThickness = 4 },
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
                ["TopChord"] = Group("TopChord", chords),
                ["BottomChord"] = Group("BottomChord", chords),
                ["Diagonals"] = Group("Diagonals", webs),
                ["Verticals"] = Group("Verticals", webs),
            },
        };
        var sized = TrussSizer.Size(input, Shapes);
        var final = sized.FinalInput;
        var usedCases = LoadBuilder.Build(final.Model, final.Actions with
        {
            MassPerMetreByMember = final.Model.Members.ToDictionary(m => m.Id, m => TrussDesigner.SectionOf(final, m).MassPerMetre, StringComparer.Ordinal),
            MassPerMetreByGroup = new Dictionary<string, double>(),
        }).Cases;
        return TrussReportData.From(name, final, sized.Design, usedCases, Shapes, reviews);
    }

    /// <summary>Every member of the trusses approved, or none.</summary>
    public static IReadOnlyList<TrussReportData> WithReviews(IReadOnlyList<TrussReportData> trusses, Func<string, int, string> state) =>
        trusses.Select(t => t with
        {
            Reviews = t.Design.Members.Select((m, i) => new MemberReviewInfo(m.Mark, state(m.Mark, i), "A. Checker", ""))
                .ToDictionary(r => r.Mark, StringComparer.Ordinal),
        }).ToList();

    public static ReportHeader Header(IReadOnlyList<TrussReportData> trusses, bool final = false)
    {
        var total = trusses.Sum(t => t.Design.Members.Count);
        var approved = trusses.Sum(t => t.Design.Members.Count(m => t.ReviewOf(m.Mark).State == "Approved"));
        return new ReportHeader
        {
            ProjectName = "Warehouse roof, bay 3",
            ProjectNumber = "P-2026-017",
            Client = "Example Client (Pty) Ltd",
            Location = "Midrand",
            Revision = "B",
            Designer = "D. Designer",
            Checker = "A. Checker",
            ProducedAtUtc = ProducedAt,
            AppVersion = "0.1.0",
            StandardEdition = Sans10162Standard.EditionText,
            TotalMembers = total,
            ApprovedCount = approved,
            IsFinal = final,
        };
    }
}
