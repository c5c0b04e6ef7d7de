using BenchmarkDotNet.Attributes;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Model;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Standards.Sans10162;
using TrussWeb.Core.TrussDesign;
using TrussWeb.Reports.Book;
using TrussWeb.Reports.Model;
using TrussWeb.Reports.Summary;

namespace TrussWeb.Benchmarks;

/// <summary>
/// Rendering the documents of a 201-member truss (75 m parallel-chord Pratt, 50 panels; every member
/// designed with its full record): the calculation book, the member summary PDF, CSV and XLSX.
/// Target: book and summary together under 10 s and 400 MB allocated. The design runs once in setup.
/// </summary>
[MemoryDiagnoser]
public class ReportBenchmarks
{
    private ReportHeader _header = null!;
    private IReadOnlyList<TrussReportData> _trusses = null!;

    [GlobalSetup]
    public void Setup()
    {
        var catalogue = SectionCatalogue.Load(Path.Combine(AppContext.BaseDirectory, "seed-data", "sections"));
        var grade = GradeCatalogue.Load(Path.Combine(AppContext.BaseDirectory, "seed-data", "grades.csv")).Find("S355JR");
        var model = TrussGenerator.Generate(new TrussParameters
        {
            Type = TrussType.ParallelPratt,
            Span = 75_000,
            HeelDepth = 3_000,
            PanelCount = 50,
            TrussSpacing = 6_000,
            BottomRestraintEvery = 2,
        });
        if (model.Members.Count < 200)
        {
            throw new InvalidOperationException($"benchmark truss has {model.Members.Count} members");
        }

        var chord = DoubleAngle.Compute((AngleDimensions)catalogue.Find("L100x75x8").Dimensions, 10, BackToBack.LongLegsBackToBack);
        var web = catalogue.Find("L70x70x7").Properties;
        var groups = new Dictionary<string, GroupDesignSettings>
        {
            ["TopChord"] = new() { Group = "TopChord", Section = chord },
            ["BottomChord"] = new() { Group = "BottomChord", Section = chord },
            ["Diagonals"] = new() { Group = "Diagonals", Section = web },
            ["Verticals"] = new() { Group = "Verticals", Section = web },
        };
        var actions = new AreaActions
        {
            RoofCoveringKPa = 0.10,
            PurlinsAndServicesKPa = 0.15,
            ImposedKPaOnPlan = 0.50,
            WindCases = [new WindCase("W1", "uplift", -1.0, -1.0)],
        };
        var sections = model.Members.ToDictionary(m => m.Id, m => groups[m.Group].Section!, StringComparer.Ordinal);
        var cases = LoadBuilder.Build(model, actions with { MassPerMetreByMember = sections.ToDictionary(p => p.Key, p => p.Value.MassPerMetre, StringComparer.Ordinal) }).Cases;
        var input = new TrussDesignInput
        {
            Model = model,
            Actions = actions,
            Combinations = CombinationPresets.For(CombinationStandard.Sans10160, cases),
            Grade = grade,
            Standard = new Sans10162Standard(),
            Groups = groups,
        };
        var design = TrussDesigner.Design(input);
        _trusses = [TrussReportData.From("LONG-1", input, design, cases, catalogue)];
        _header = new ReportHeader
        {
            ProjectName = "Benchmark hall",
            ProjectNumber = "B-1",
            Revision = "A",
            Designer = "Benchmark",
            ProducedAtUtc = new DateTimeOffset(2026, 12, 1, 0, 0, 0, TimeSpan.Zero),
            AppVersion = "0.1.0",
            StandardEdition = Sans10162Standard.EditionText,
            TotalMembers = design.Members.Count,
            ApprovedCount = 0,
        };
    }

    [Benchmark]
    public int CalculationBook201Members() => CalculationBook.Render(_header, _trusses).Bytes.Length;

    [Benchmark]
    public int MemberSummaryPdf201Members() => MemberSummaryReport.Render(_header, _trusses).Bytes.Length;

    [Benchmark]
    public int MemberSummaryCsvAndXlsx201Members() => MemberSummaryCsv.Render(_header, _trusses).Length + MemberSummaryXlsx.Render(_header, _trusses).Length;
}
