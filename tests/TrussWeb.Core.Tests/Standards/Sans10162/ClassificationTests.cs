using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Standards.Sans10162;
using TrussWeb.Core.Tests.Support;

namespace TrussWeb.Core.Tests.Standards.Sans10162;

public class ClassificationTests
{
    [Fact]
    public void Ac40_angle_legs_are_within_the_class_3_limit()
    {
        var c = Classification.Classify(SectionBuilder.Ac40DoubleAngle(), 300, null);
        var longLeg = c.Elements[0];
        // Source: Carleton University CIVE 3205 course notes (N. M. Holtz), Example AC40, to CSA S16-14: b/t = 11.2 < 200/√300 = 11.5.
        AssertClose.Relative(11.2, longLeg.Ratio, 0.005, "b/t");
        AssertClose.Relative(11.5, longLeg.Limit, 0.005, "limit");
        Assert.Equal(3, c.Class);
        Assert.Equal(2300, c.EffectiveArea);
    }

    [Fact]
    public void Slender_angle_legs_are_cut_back_to_the_class_3_width()
    {
        // [C] by hand: equal angle legs 100 × 6 mm (2 legs), Fy 355: limit 200/√355 = 10.615, b_lim = 63.69 mm;
        // Ae = A − 2 × (100 − 63.69) × 6 = A − 435.7 mm². A = 1163 mm² is an input of this test (a typical
        // 100x100x6 area, from memory) and only shifts Ae.
        var s = SectionBuilder.L4x4x1_2() with
        {
            Area = 1163,
            Elements = [new PlateElement("leg", ElementKind.AngleLeg, 100, 6, 2, 94)],
        };
        var record = new CalcRecord("class");
        var c = Classification.Classify(s, 355, record);
        Assert.Equal(4, c.Class);
        AssertClose.Relative(10.6149, c.Elements[0].Limit, 1e-4, "limit");
        AssertClose.Relative(435.727, c.Elements[0].AreaReduction, 1e-5, "reduction");
        AssertClose.Relative(1163 - 435.727, c.EffectiveArea, 1e-6, "Ae");
        AssertClose.Relative(c.EffectiveArea, record.Find("Ae")!.Value, 1e-12, "Ae in record");
        Assert.Contains(record.Notes, n => n.Contains("confirmed by the engineer", StringComparison.Ordinal));
    }

    [Theory]
    // Source: SANS 10162-1 Table 4 limits as ENGINEERING.md states them: 200/√Fy, 340/√Fy, 670/√Fy, 23 000/Fy.
    [InlineData(ElementKind.AngleLeg, 350, 10.690)]
    [InlineData(ElementKind.TeeStem, 350, 18.174)]
    [InlineData(ElementKind.HollowWall, 350, 35.813)]
    [InlineData(ElementKind.CircularWall, 350, 65.714)]
    public void Limits_follow_table_4(ElementKind kind, double fy, double expected)
    {
        AssertClose.Relative(expected, Classification.Limit(kind, fy), 1e-4, kind.ToString());
    }

    [Fact]
    public void Slender_circular_hollow_section_has_no_effective_area_and_is_out_of_scope()
    {
        var s = SectionBuilder.Doubly(1000, 1e6, 1e6, 2e6, 0) with
        {
            Family = SectionFamily.CircularHollow,
            Elements = [new PlateElement("wall", ElementKind.CircularWall, 200, 2, 1, 200)],
        };
        var c = Classification.Classify(s, 355, null);
        Assert.Equal(4, c.Class);
        Assert.False(c.EffectiveAreaInScope);
        Assert.Equal(TrussWeb.Core.Records.CheckStatus.OutOfScope, Classification.Check(c, null).Status);
    }
}
