using TrussWeb.Core.Records;
using TrussWeb.Web.Components.Records;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Records;

public class MemberResultViewTests : TrussWebTestContext
{
    [Fact]
    public void Passing_member_shows_pass_its_governing_check_and_every_check()
    {
        var result = TestData.Check("L70x70x7", axial: -30_000, length: 2_000);
        Assert.Equal(CheckStatus.Pass, result.Status);

        var cut = Render<MemberResultView>(p => p.Add(c => c.Result, result));

        Assert.Contains("Pass", cut.FindAll("[data-testid=status-chip]")[0].TextContent);
        Assert.Contains(result.GoverningCheck, cut.Find("[data-testid=governing-check]").TextContent);
        Assert.Equal(result.Checks.Select(c => c.Name), Texts(cut, "[data-testid=check-name]"));
        Assert.Equal(result.Designation, cut.Find("[data-testid=member-designation]").TextContent.Trim());
    }

    [Fact]
    public void Overloaded_member_shows_fail_and_its_utilization_label()
    {
        var result = TestData.Check("L50x50x5", axial: -400_000, length: 3_000);
        Assert.Equal(CheckStatus.Fail, result.Status);

        var cut = Render<MemberResultView>(p => p.Add(c => c.Result, result));

        Assert.Contains("Fail", cut.FindAll("[data-testid=status-chip]")[0].TextContent);
        Assert.StartsWith(Display.Sig(result.Utilization), cut.FindAll("[data-testid=utilization-label]")[0].TextContent.Trim());
        var governingRow = cut.FindAll("[data-testid=check-row]").Single(r => r.ClassList.Contains("tw-governing"));
        Assert.Equal(result.GoverningCheck, governingRow.QuerySelector("[data-testid=check-name]")!.TextContent.Trim());
    }

    [Fact]
    public void Record_panel_when_expanded_holds_the_member_record()
    {
        var result = TestData.Check("L70x70x7", axial: 80_000, length: 2_200);

        var cut = Render<MemberResultView>(p => p.Add(c => c.Result, result).Add(c => c.RecordExpanded, true));

        cut.WaitForAssertion(() => Assert.Equal(result.Record!.Steps.Count, cut.FindAll("[data-testid=record-step]").Count));
    }
}
