using TrussWeb.Core.Records;
using TrussWeb.Web.Components.Records;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Records;

public class UtilizationBarTests : TrussWebTestContext
{
    [Theory]
    [InlineData(0.4321, "0.432", "calm")]
    [InlineData(0.9, "0.900", "near")]
    [InlineData(1.237, "1.24 over limit", "over")]
    public void Label_shows_the_value_and_the_band_is_a_class(double value, string label, string band)
    {
        var cut = Render<UtilizationBar>(p => p.Add(c => c.Value, value));

        Assert.Equal(label, cut.Find("[data-testid=utilization-label]").TextContent.Trim());
        Assert.NotNull(cut.Find($".tw-ubar-{band}"));
    }

    [Fact]
    public void Out_of_scope_check_is_labelled_in_words_not_as_zero()
    {
        var cut = Render<UtilizationBar>(p => p.Add(c => c.Value, 0).Add(c => c.Status, CheckStatus.OutOfScope));

        Assert.Equal("out of scope", cut.Find("[data-testid=utilization-label]").TextContent.Trim());
    }
}
