using TrussWeb.Core.Records;

namespace TrussWeb.Core.Tests.Records;

public class CalcRecordTests
{
    [Fact]
    public void Find_returns_the_last_step_with_the_symbol()
    {
        var record = new CalcRecord("test")
            .Add("Fe", "first", "a", "1", 1, "MPa", "cl. 1")
            .Add("Fe", "second", "b", "2", 2, "MPa", "cl. 2");

        Assert.Equal(2, record.Find("Fe")!.Value);
        Assert.Null(record.Find("Cr"));
    }

    [Fact]
    public void Append_keeps_order_of_steps_and_notes()
    {
        var a = new CalcRecord("a").Add("x", "", "", "", 1, "", "").Note("note a");
        var b = new CalcRecord("b").Add("y", "", "", "", 2, "", "").Note("note b");

        a.Append(b);

        Assert.Equal(["x", "y"], a.Steps.Select(s => s.Symbol));
        Assert.Equal(["note a", "note b"], a.Notes);
    }
}
