using TrussWeb.Core.Records;
using TrussWeb.Web.Components.Records;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Records;

public class CalcRecordViewTests : TrussWebTestContext
{
    private static CalcRecord RealRecord()
    {
        // A catalogue angle in compression, checked by the SANS 10162-1 module.
        var result = TestData.Check("L70x70x7", axial: -30_000, length: 2_000);
        Assert.NotNull(result.Record);
        return result.Record;
    }

    private static string Formatted(CalcStep step) =>
        step.Unit.Length == 0 ? Display.Sig(step.Value) : Display.Sig(step.Value) + " " + step.Unit;

    [Fact]
    public void Shows_every_step_with_symbol_substituted_values_and_formatted_value_in_order()
    {
        var record = RealRecord();

        var cut = Render<CalcRecordView>(p => p.Add(c => c.Record, record));

        Assert.Equal(record.Steps.Count, cut.FindAll("[data-testid=record-step]").Count);
        Assert.Equal(record.Steps.Select(s => s.Symbol), Texts(cut, "[data-testid=step-symbol]"));
        Assert.Equal(record.Steps.Select(s => s.Substituted), Texts(cut, "[data-testid=step-substituted]"));
        Assert.Equal(record.Steps.Select(s => s.Expression), Texts(cut, "[data-testid=step-expression]"));
        Assert.Equal(record.Steps.Select(Formatted), Texts(cut, "[data-testid=step-value]"));
    }

    [Fact]
    public void Shows_title_notes_and_a_reference_heading_at_each_change_of_reference()
    {
        var record = RealRecord();

        var cut = Render<CalcRecordView>(p => p.Add(c => c.Record, record));

        Assert.Equal(record.Title, cut.Find("[data-testid=record-title]").TextContent.Trim());
        Assert.Equal(record.Notes, Texts(cut, "[data-testid=record-notes] li"));
        var expected = new List<string>();
        foreach (var step in record.Steps)
        {
            if (expected.Count == 0 || expected[^1] != step.Reference)
            {
                expected.Add(step.Reference);
            }
        }

        Assert.True(expected.Count > 1, "a member record cites more than one clause");
        Assert.Equal(expected, Texts(cut, "[data-testid=record-group]"));
    }

    [Fact]
    public void Compression_resistance_step_of_the_record_is_on_the_page()
    {
        var record = RealRecord();
        var cr = record.Find("Cr");
        Assert.NotNull(cr);

        var cut = Render<CalcRecordView>(p => p.Add(c => c.Record, record));

        var row = cut.FindAll("[data-testid=record-step]").Single(r => r.QuerySelector("[data-testid=step-symbol]")!.TextContent == "Cr");
        Assert.Equal(Display.Sig(cr.Value) + " kN", row.QuerySelector("[data-testid=step-value]")!.TextContent.Trim());
    }
}
