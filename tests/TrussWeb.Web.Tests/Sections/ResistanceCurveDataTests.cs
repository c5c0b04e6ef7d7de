using TrussWeb.Core.Design;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Standards.Sans10162;
using TrussWeb.Web.Components.Sections;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Sections;

public class ResistanceCurveDataTests
{
    public static TheoryData<string, double, double> Members => new()
    {
        { "L70x70x7", 2_200, 2_200 },
        { "L150x90x10", 3_000, 6_000 },
        { "CHS 114.3x3.6", 4_000, 4_000 },
    };

    private static SectionProperties SectionOf(string designation) =>
        TestData.Catalogue.TryFind(designation, out var e, out _) ? e.Properties : TestData.Catalogue.OfFamily(SectionFamily.CircularHollow).First().Properties;

    [Theory]
    [MemberData(nameof(Members))]
    public void Cr_never_rises_with_length(string designation, double lx, double ly)
    {
        var s = SectionOf(designation);
        var lengths = new EffectiveLengths { Lx = lx, Ly = ly, Lz = ly };

        var data = ResistanceCurveData.Build(s, TestData.MaterialFor(s), lengths, cf: 50_000);

        Assert.True(data.Points.Count > 10);
        for (var i = 1; i < data.Points.Count; i++)
        {
            Assert.True(data.Points[i].EffectiveLength > data.Points[i - 1].EffectiveLength);
            Assert.True(data.Points[i].Cr <= data.Points[i - 1].Cr * (1 + 1e-12),
                $"Cr rises from {data.Points[i - 1].Cr} N at {data.Points[i - 1].EffectiveLength} mm to {data.Points[i].Cr} N at {data.Points[i].EffectiveLength} mm");
        }
    }

    [Theory]
    [MemberData(nameof(Members))]
    public void Member_point_equals_the_core_resistance_at_its_own_lengths(string designation, double lx, double ly)
    {
        var s = SectionOf(designation);
        var m = TestData.MaterialFor(s);
        var lengths = new EffectiveLengths { Lx = lx, Ly = ly, Lz = ly };

        var data = ResistanceCurveData.Build(s, m, lengths, cf: 50_000);

        var direct = Compression.Resistance(s, m, lengths, 1.34, s.Area, null, null).Cr;
        Assert.Equal(direct, data.Member.Cr);
        Assert.Equal(Math.Max(lx, ly), data.Member.EffectiveLength);
        Assert.Contains(data.Member, data.Points);
        Assert.Equal(50_000, data.Cf);
    }

    [Fact]
    public void Member_point_matches_the_member_check_for_a_single_angle()
    {
        var s = TestData.Section("L70x70x7");
        var check = TestData.Check("L70x70x7", axial: -30_000, length: 2_000);
        var compression = check.Checks.Single(c => c.Name.StartsWith("Compression", StringComparison.Ordinal));

        var data = ResistanceCurveData.Build(s, TestData.MaterialFor(s), EffectiveLengths.Uniform(2_000), cf: 30_000);

        Assert.Equal(compression.Resistance, data.Member.Cr, 6);
    }
}
