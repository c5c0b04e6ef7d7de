using TrussWeb.Core.Design;
using TrussWeb.Core.Records;
using TrussWeb.Web.Components.Sections;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Sections;

public class ResistanceCurveTests : TrussWebTestContext
{
    [Fact]
    public void Caption_gives_the_members_KL_Cr_and_Cf_from_the_curve_data()
    {
        var s = TestData.Section("L90x90x8");
        var m = TestData.MaterialFor(s);
        var lengths = EffectiveLengths.Uniform(2_500);

        var cut = Render<ResistanceCurve>(p => p
            .Add(c => c.Section, s).Add(c => c.Material, m).Add(c => c.Lengths, lengths).Add(c => c.Cf, 75_000));

        var d = cut.Instance.Data;
        var caption = cut.Find("[data-testid=resistance-member-point]").TextContent;
        Assert.Contains($"KL = {Display.Sig(2.5)} m", caption);
        Assert.Contains($"Cr = {Display.Sig(d.Member.Cr / 1000)} kN", caption);
        Assert.Contains($"Cf = {Display.Sig(75)} kN", caption);
    }
}
