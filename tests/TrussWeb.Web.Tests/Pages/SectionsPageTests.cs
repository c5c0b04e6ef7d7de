using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;
using TrussWeb.Web.Components.Pages.Sections;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Pages;

public class SectionsPageTests : TrussWebTestContext
{
    private static int CountOf(SectionFamily family) => TestData.Catalogue.OfFamily(family).Count();

    [Fact]
    public void Lists_every_angle_of_the_catalogue_first()
    {
        var cut = Render<SectionsPage>();

        cut.WaitForAssertion(() => Assert.Equal(CountOf(SectionFamily.Angle), cut.FindAll("[data-testid=catalogue-row]").Count));
        Assert.True(CountOf(SectionFamily.Angle) > 20);
    }

    [Theory]
    [InlineData(SectionFamily.CircularHollow)]
    [InlineData(SectionFamily.RectangularHollow)]
    public void Family_filter_shows_the_entries_of_that_family(SectionFamily family)
    {
        var cut = Render<SectionsPage>();

        cut.Find($"[data-testid=family-{family}]").Click();

        cut.WaitForAssertion(() => Assert.Equal(
            TestData.Catalogue.OfFamily(family).Select(e => e.Designation),
            cut.FindAll("[data-testid=catalogue-row]").Select(r => r.GetAttribute("data-designation"))));
    }

    [Fact]
    public void Search_filters_the_rows_by_designation()
    {
        var cut = Render<SectionsPage>();
        var expected = TestData.Catalogue.OfFamily(SectionFamily.Angle)
            .Where(e => e.Designation.Contains("L100", StringComparison.OrdinalIgnoreCase)).Select(e => e.Designation).ToList();
        Assert.NotEmpty(expected);

        cut.Find("input").Input("l100");

        cut.WaitForAssertion(() => Assert.Equal(expected, cut.FindAll("[data-testid=catalogue-row]").Select(r => r.GetAttribute("data-designation"))));
    }

    [Fact]
    public void Sorting_by_mass_orders_the_rows_by_computed_mass()
    {
        var cut = Render<SectionsPage>();

        cut.Find("[data-testid=sort-mass]").Click();

        var expected = TestData.Catalogue.OfFamily(SectionFamily.Angle).OrderBy(e => e.Properties.MassPerMetre).Select(e => e.Designation);
        cut.WaitForAssertion(() => Assert.Equal(expected, cut.FindAll("[data-testid=catalogue-row]").Select(r => r.GetAttribute("data-designation"))));
    }

    [Fact]
    public void Sorting_by_designation_twice_gives_descending_natural_order()
    {
        var cut = Render<SectionsPage>();

        cut.Find("[data-testid=sort-designation]").Click();
        cut.Find("[data-testid=sort-designation]").Click();

        var expected = TestData.Catalogue.OfFamily(SectionFamily.Angle).Select(e => e.Designation)
            .OrderByDescending(d => d, Web.Components.Sections.DesignationOrder.Instance);
        cut.WaitForAssertion(() => Assert.Equal(expected, cut.FindAll("[data-testid=catalogue-row]").Select(r => r.GetAttribute("data-designation"))));
        Assert.Equal("descending", cut.Find("[data-testid=sort-designation]").GetAttribute("aria-sort"));
    }

    [Fact]
    public void Selecting_a_row_shows_its_drawing_and_properties()
    {
        var cut = Render<SectionsPage>();
        Assert.NotNull(cut.Find("[data-testid=no-selection]"));
        var entry = TestData.Catalogue.Find("L150x90x10");

        cut.FindAll("[data-testid=catalogue-row]").Single(r => r.GetAttribute("data-designation") == entry.Designation).Click();

        cut.WaitForAssertion(() => Assert.Contains(entry.Designation, cut.Find("[data-testid=section-caption]").TextContent));
        var rows = cut.FindAll("[data-testid=property-row]");
        string ValueOf(string symbol) => rows.Single(r => r.QuerySelector("th")!.TextContent == symbol).QuerySelector("td.tw-num")!.TextContent.Trim();
        Assert.Equal(Display.Sig(entry.Properties.Area) + " mm²", ValueOf("A"));
        Assert.Equal(Display.Sig(entry.Properties.Rv) + " mm", ValueOf("rv"));
        Assert.Equal(Display.Sig(entry.Properties.J) + " mm⁴", ValueOf("J"));
        Assert.NotNull(cut.Find("[data-testid=section-path]"));
        Assert.Equal(entry.Properties.Elements.Count, cut.FindAll("[data-testid=element-row]").Count);
        Assert.Contains(Display.Sig(entry.Properties.Elements[0].Slenderness), cut.FindAll("[data-testid=element-row]")[0].TextContent);
    }

    [Fact]
    public void Browser_opens_on_a_given_designation_in_its_family()
    {
        var entry = TestData.Catalogue.OfFamily(SectionFamily.RectangularHollow).First();

        var cut = Render<Web.Components.Sections.SectionCatalogueBrowser>(p => p
            .Add(c => c.Catalogue, TestData.Catalogue)
            .Add(c => c.InitialDesignation, entry.Designation.ToLowerInvariant()));

        Assert.Equal(CountOf(SectionFamily.RectangularHollow), cut.FindAll("[data-testid=catalogue-row]").Count);
        Assert.Contains(entry.Designation, cut.Find("[data-testid=section-caption]").TextContent);
        Assert.Equal("true", cut.Find($"[data-testid=family-{SectionFamily.RectangularHollow}]").GetAttribute("aria-pressed"));
    }

    [Fact]
    public void Selecting_raises_the_selected_entry()
    {
        SectionCatalogueEntry? raised = null;
        var cut = Render<Web.Components.Sections.SectionCatalogueBrowser>(p => p
            .Add(c => c.Catalogue, TestData.Catalogue)
            .Add(c => c.OnSelected, e => raised = e));

        cut.FindAll("[data-testid=catalogue-row]")[2].Click();

        Assert.Same(TestData.Catalogue.OfFamily(SectionFamily.Angle).ElementAt(2), raised);
    }
}
