using TrussWeb.Core.Records;

namespace TrussWeb.Core.Tests.Records;

public class DisplayTests
{
    // Source: common practice — rounding to significant figures as taught for engineering calculations.
    [Theory]
    [InlineData(139.44, 3, "139")]
    [InlineData(0.93712, 3, "0.937")]
    [InlineData(2222.4, 3, "2220")]
    [InlineData(200000, 4, "200000")]
    [InlineData(-55.902, 4, "-55.90")]
    [InlineData(1.0, 3, "1.00")]
    [InlineData(0.0, 3, "0")]
    public void Sig_rounds_to_significant_figures(double value, int figures, string expected)
    {
        Assert.Equal(expected, Display.Sig(value, figures));
    }

    [Fact]
    public void Sig_never_prints_a_plausible_number_for_NaN()
    {
        Assert.Equal("NaN", Display.Sig(double.NaN));
    }
}
