using TrussWeb.Core.Loads;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Standards.Sans10162;
using TrussWeb.Core.TrussDesign;
using TrussWeb.Reports.Model;

namespace TrussWeb.Reports.Tests.Support;

/// <summary>
/// The layout stress case: the chords get the double angle with the longest designation and the webs
/// the catalogue section with the longest designation and the roof loads are scaled
/// up until chord forces run to five digits in kN. The design is real (TrussDesigner), it just fails.
/// </summary>
public static class StressCase
{
    public const double LoadScale = 60;

    private static readonly Lazy<TrussReportData> Lazy = new(Build);

    public static TrussReportData Truss => Lazy.Value;

    /// <summary>The catalogue section with the longest designation (any family).</summary>
    public static SectionProperties LongestSection() =>
        ReportFixture.Shapes.Entries.OrderByDescending(e => e.Designation.Length).ThenBy(e => e.Designation, StringComparer.Ordinal).First().Properties;

    /// <summary>The double angle with the longest designation: the longest unequal angle, long legs back to back ("2L… LLBB s=10").</summary>
    public static SectionProperties LongestDoubleAngle()
    {
        var entry = ReportFixture.Shapes.Entries.Where(e => e.Dimensions is AngleDimensions { IsEqualLeg: false })
            .OrderByDescending(e => e.Designation.Length).ThenBy(e => e.Designation, StringComparer.Ordinal).First();
        return DoubleAngle.Compute((AngleDimensions)entry.Dimensions, 10, BackToBack.LongLegsBackToBack);
    }

    private static TrussReportData Build()
    {
        var model = ReportFixture.Pratt(24_000, 12);
        var actions = ReportFixture.Actions(LoadScale);
        var chord = LongestDoubleAngle();
        var web = LongestSection();
        var groups = new[] { "TopChord", "BottomChord", "Diagonals", "Verticals" }.ToDictionary(g => g, g => new GroupDesignSettings
        {
            Group = g,
            Section = g.EndsWith("Chord", StringComparison.Ordinal) ? chord : web,
        });
        var withMass = actions with
        {
            MassPerMetreByMember = model.Members.ToDictionary(m => m.Id, m => groups[m.Group].Section!.MassPerMetre, StringComparer.Ordinal),
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
