using TrussWeb.Core.Design;
using TrussWeb.Core.Records;
using TrussWeb.Core.Standards.Sans10162;
using TrussWeb.Core.Tests.Support;

namespace TrussWeb.Core.Tests.Standards.Sans10162;

public class SlendernessTests
{
    [Fact]
    public void Compression_slenderness_of_ac40_is_the_x_axis_value()
    {
        var r = Slenderness.CheckCompression(SectionBuilder.Ac40DoubleAngle(), EffectiveLengths.Uniform(3000), 200, null);
        // Source: Carleton University CIVE 3205 course notes (N. M. Holtz), Example AC40, to CSA S16-14: (KL/r)x = 162.2; limit 200 (cl. 10.4.2.1).
        AssertClose.Relative(162.2, r.Demand, 0.001, "KL/r");
        Assert.Equal(200, r.Resistance);
        Assert.Equal(CheckStatus.Pass, r.Status);
    }

    [Fact]
    public void Single_angle_over_200_fails_the_compression_limit()
    {
        var s = SectionBuilder.L4x3x3_8();
        // [C] L = 3400 mm: 3400 / rv (16.10 mm) = 211.2 > 200.
        var r = Slenderness.CheckCompression(s, EffectiveLengths.Uniform(3400), 200, null);
        AssertClose.Relative(3400 / s.Rv, r.Demand, 1e-12, "KLv/rv");
        Assert.Equal(CheckStatus.Fail, r.Status);
    }

    [Fact]
    public void Tension_limit_is_300_on_L_over_r()
    {
        var s = SectionBuilder.L4x3x3_8();
        // [C] 4000 / 16.10 = 248.5 ≤ 300 (cl. 10.4.2.2).
        var r = Slenderness.CheckTension(s, EffectiveLengths.Uniform(4000), 300, null);
        Assert.Equal(CheckStatus.Pass, r.Status);
        AssertClose.Relative(4000 / s.Rv / 300, r.Utilization, 1e-12, "ratio");
    }
}
