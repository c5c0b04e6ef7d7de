using TrussWeb.Core.Sections;
using TrussWeb.Reports.Summary;
using TrussWeb.Reports.Tests.Support;

namespace TrussWeb.Reports.Tests.Summary;

public class MemberSummaryTableTests
{
    [Fact]
    public void Connector_spacing_is_read_from_the_record_step_of_each_double_angle_member()
    {
        var truss = ReportFixture.Pratt24;
        var table = MemberSummaryTable.From([truss]);
        var doubles = truss.Design.Members.Where(m => truss.MemberSections[m.Mark].Family == SectionFamily.DoubleAngle).ToList();
        Assert.NotEmpty(doubles);
        foreach (var m in doubles)
        {
            var row = table.Rows.Single(r => r.Mark == m.Mark);
            var step = m.Design.Record!.Steps.LastOrDefault(s => s.Symbol == "a" && s.Unit == "mm");
            Assert.Equal(step?.Value, row.ConnectorSpacingMm);
            if (step is not null)
            {
                Assert.Contains($"{row.ConnectorCount} intermediate connector", step.Description, StringComparison.Ordinal);
            }
        }

        Assert.All(table.Rows.Where(r => truss.MemberSections[r.Mark].Family == SectionFamily.Angle), r => Assert.Equal("", r.ConnectorText));
    }

    [Fact]
    public void Rows_and_totals_are_the_design_values_in_display_units()
    {
        var truss = ReportFixture.Pratt24;
        var table = MemberSummaryTable.From([truss]);
        Assert.Equal(truss.Design.Members.Count, table.Rows.Count);
        foreach (var (row, m) in table.Rows.Zip(truss.Design.Members))
        {
            Assert.Equal(m.Length / 1000, row.LengthM);
            Assert.Equal(m.Envelope.MaxTension / 1000, row.MaxTensionKN);
            Assert.Equal(m.Envelope.TensionCombination ?? "", row.TensionCombination);
            Assert.Equal(m.Design.Utilization, row.Utilization);
            Assert.Equal(m.Length / 1000 * truss.MemberSections[m.Mark].MassPerMetre, row.MassKg, 12);
        }

        Assert.Equal(truss.Design.Totals.Select(t => t.Mass), table.SectionTotals.Select(t => t.MassKg));
        Assert.Equal(truss.Design.MassWithAllowance, table.TrussTotals.Single().MassWithAllowanceKg);
    }
}
