using TrussWeb.Core.Sections;
using TrussWeb.Web.Components.Sections;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Sections;

public class SectionOutlineTests : TrussWebTestContext
{
    private const int Digits = 6;

    public static TheoryData<string> Angles => new() { "L100x100x10", "L150x90x10", "L70x70x7", "L50x50x5" };

    [Theory]
    [MemberData(nameof(Angles))]
    public void Angle_outline_spans_its_legs_to_scale(string designation)
    {
        var entry = TestData.Catalogue.Find(designation);
        var a = (AngleDimensions)entry.Dimensions;

        var outline = SectionOutline.For(a, entry.Properties);

        Assert.Equal(0, outline.MinX, Digits);
        Assert.Equal(0, outline.MinY, Digits);
        Assert.Equal(a.ShortLeg, outline.Width, Digits);
        Assert.Equal(a.LongLeg, outline.Height, Digits);
        Assert.Equal(entry.Properties.CentroidX, outline.Centroid.X, Digits);
        Assert.Equal(entry.Properties.CentroidY + entry.Properties.Y0, outline.ShearCentre.Y, Digits);
        Assert.True(outline.ShowPrincipalAxes);
    }

    [Fact]
    public void Angle_outline_follows_the_inner_faces_at_the_thickness()
    {
        var entry = TestData.Catalogue.Find("L150x90x10");
        var a = (AngleDimensions)entry.Dimensions;

        var loop = SectionOutline.For(a, entry.Properties).Loops.Single();

        // The inner face of the short leg lies at y = t between the toe rounding and the root fillet.
        Assert.Contains(loop, p => Math.Abs(p.Y - a.Thickness) < 1e-9 && Math.Abs(p.X - (a.Thickness + a.RootRadius)) < 1e-9);
        Assert.Contains(loop, p => Math.Abs(p.X - a.Thickness) < 1e-9 && Math.Abs(p.Y - (a.LongLeg - a.ToeRadius)) < 1e-9);
    }

    [Fact]
    public void Circular_outline_spans_the_diameter()
    {
        var entry = TestData.Catalogue.OfFamily(SectionFamily.CircularHollow).Last();
        var c = (CircularHollowDimensions)entry.Dimensions;

        var outline = SectionOutline.For(c, entry.Properties);

        Assert.Equal(c.Diameter, outline.Width, Digits);
        Assert.Equal(c.Diameter, outline.Height, Digits);
        Assert.Equal(2, outline.Loops.Count);
        var inner = outline.Loops[1];
        Assert.Equal(c.Diameter - 2 * c.Thickness, inner.Max(p => p.X) - inner.Min(p => p.X), Digits);
    }

    [Fact]
    public void Rectangular_outline_spans_width_and_depth()
    {
        var entry = TestData.Catalogue.OfFamily(SectionFamily.RectangularHollow).First(e => !((RectangularHollowDimensions)e.Dimensions).IsSquare);
        var r = (RectangularHollowDimensions)entry.Dimensions;

        var outline = SectionOutline.For(r, entry.Properties);

        Assert.Equal(r.Width, outline.Width, Digits);
        Assert.Equal(r.Depth, outline.Height, Digits);
        Assert.Equal(entry.Properties.CentroidX, outline.Centroid.X, Digits);
    }

    [Theory]
    [InlineData(BackToBack.LongLegsBackToBack)]
    [InlineData(BackToBack.ShortLegsBackToBack)]
    public void Double_angle_outline_spans_two_outstanding_legs_and_the_gap(BackToBack orientation)
    {
        var a = (AngleDimensions)TestData.Catalogue.Find("L100x75x8").Dimensions;
        const double gap = 12;
        var pair = DoubleAngle.Compute(a, gap, orientation);

        var outline = SectionOutline.For(a, pair, new DoubleAngleArrangement(gap, orientation));

        var (outstand, back) = orientation == BackToBack.LongLegsBackToBack ? (a.ShortLeg, a.LongLeg) : (a.LongLeg, a.ShortLeg);
        Assert.Equal(2 * outstand + gap, outline.Width, Digits);
        Assert.Equal(back, outline.Height, Digits);
        // The centroid Core computed lies on the axis of symmetry of the drawing.
        Assert.Equal(outline.MinX + outline.Width / 2, outline.Centroid.X, Digits);
        Assert.False(outline.ShowPrincipalAxes);
    }

    [Fact]
    public void Drawing_shows_caption_centroid_and_principal_axes_of_a_single_angle()
    {
        var entry = TestData.Catalogue.Find("L150x90x10");

        var cut = Render<SectionDrawing>(p => p.Add(c => c.Outline, SectionOutline.For(entry.Dimensions, entry.Properties)));

        Assert.Contains("L150x90x10", cut.Find("[data-testid=section-caption]").TextContent);
        Assert.NotNull(cut.Find("[data-testid=centroid]"));
        Assert.NotNull(cut.Find("[data-testid=axis-u]"));
        Assert.NotNull(cut.Find("[data-testid=shear-centre]"));
    }

    [Fact]
    public void Drawing_of_a_tube_has_no_principal_axes_and_no_separate_shear_centre()
    {
        var entry = TestData.Catalogue.OfFamily(SectionFamily.CircularHollow).First();

        var cut = Render<SectionDrawing>(p => p.Add(c => c.Outline, SectionOutline.For(entry.Dimensions, entry.Properties)));

        Assert.Empty(cut.FindAll("[data-testid=axis-u]"));
        Assert.Empty(cut.FindAll("[data-testid=shear-centre]"));
    }
}
