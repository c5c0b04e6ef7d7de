using TrussWeb.Core.Loads;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Standards.Sans10162;
using TrussWeb.Core.TrussDesign;
using TrussWeb.Reports.Model;

namespace TrussWeb.Reports.Tests.Support;

/// <summary>
/// The layout stress case: every group gets the catalogue section with the longest designation (as a
/// double angle when it is an angle, which makes the name longer still) and the roof loads are scaled
/// up until chord forces run to five digits in kN. The design is real (TrussDesigner), it just fails.
/// </summary>
public static class StressCase
{
    public const double LoadScale = 60;

    private static readonly Lazy<TrussReportData> Lazy = new(Build);

    public static TrussReportData Truss => Lazy.Value;

    public static SectionProperties LongestSection()
    {
        var entry = ReportFixture.Shapes.Entries.OrderByDescending(e => e.Designation.Length).ThenBy(e => e.Designation, StringComparer.Ordinal).First();
        return entry.Dimensions is AngleDimensions a ? DoubleAngle.Compute(a, 10, a.IsEqualLeg ? BackToBack.EqualLegs : BackToBack.LongLegsBackToBack) : entry.Properties;
    }

    private static TrussReportData Build()
    {
        var model = ReportFixture.Pratt(24_000, 12);
        var actions = ReportFixture.Actions(LoadScale);
        var section = LongestSection();
        var groups = new[] { "TopChord", "BottomChord", "Diagonals", "Verticals" }.ToDictionary(g => g, g => new GroupDesignSettings { Group = g, Section = section });
        var withMass = actions with
        {
            MassPerMetreByMember = model.Members.ToDictionary(m => m.Id, _ => section.MassPerMetre, StringComparer.Ordinal),
        };
        var cases = LoadBuilder.Build(model, withMass).Cases;
        var input = new TrussDesignInput
        {
            Model = model,
            Actions = actions,
            Combinations = CombinationPresets.For(CombinationStandard.Sans10160, cases),
            Grade = ReportFixture.S355,
            Standard = new Sans10162Standard(),
            Groups = groups,
        };
        var design = TrussDesigner.Design(input);
        return TrussReportData.From("T-STRESS-LONG-NAME-01", input, design, cases, ReportFixture.Shapes);
    }
}
