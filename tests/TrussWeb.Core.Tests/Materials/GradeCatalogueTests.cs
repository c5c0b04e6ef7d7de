using TrussWeb.Core.Materials;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Tests.Materials;

/// <summary>Loading steel grades from seed-data/grades.csv and from text.</summary>
public class GradeCatalogueTests
{
    private static readonly string SeedFile = Path.Combine(AppContext.BaseDirectory, "seed-data", "grades.csv");

    private const string Header = "name,standard,fu,E,G,bands\n";

    [Fact]
    public void Shipped_grades_load_without_errors()
    {
        var catalogue = GradeCatalogue.Load(SeedFile);

        Assert.Empty(catalogue.Errors);
        Assert.Equal(["S275JR", "S355JR", "A36", "A572 Gr 50", "350W"], catalogue.Grades.Select(g => g.Name));
        Assert.All(catalogue.Grades, g => Assert.Equal((200_000.0, 77_000.0), (g.E, g.G)));
    }

    [Theory]
    // Source: EN 10025-2 Table 7 (REFERENCES.md §7): S275JR 275/265/255/245/235 for t <= 16/40/63/80/100 mm.
    [InlineData("S275JR", 10, 275)]
    [InlineData("S275JR", 16, 275)]
    [InlineData("S275JR", 16.1, 265)]
    [InlineData("S275JR", 40, 265)]
    [InlineData("S275JR", 63, 255)]
    [InlineData("S275JR", 80, 245)]
    [InlineData("S275JR", 100, 235)]
    // Source: EN 10025-2 Table 7 (REFERENCES.md §7): S355JR 355/345/335/325/315.
    [InlineData("S355JR", 8, 355)]
    [InlineData("S355JR", 20, 345)]
    [InlineData("S355JR", 50, 335)]
    [InlineData("S355JR", 70, 325)]
    [InlineData("S355JR", 90, 315)]
    // Source: ASTM A36 250 MPa, A572 Gr 50 345 MPa (REFERENCES.md §7, from memory); CSA G40.21 350W 350 MPa [R].
    [InlineData("a36", 25, 250)]
    [InlineData("A572 GR 50", 25, 345)]
    [InlineData("350W", 20, 350)]
    public void Yield_strength_follows_the_thickness_band(string grade, double thickness, double fy)
    {
        var catalogue = GradeCatalogue.Load(SeedFile);

        Assert.Equal(fy, catalogue.Find(grade).FyFor(thickness));
    }

    [Theory]
    // Source: EN 10025-2 (REFERENCES.md §7) S275 410, S355 470; ASTM A36 400, A572 Gr 50 450 (from memory); CSA G40.21 350W 450 [R].
    [InlineData("S275JR", 410)]
    [InlineData("S355JR", 470)]
    [InlineData("A36", 400)]
    [InlineData("A572 Gr 50", 450)]
    [InlineData("350W", 450)]
    public void Ultimate_strength_is_the_lower_bound_of_the_standard(string grade, double fu)
    {
        Assert.Equal(fu, GradeCatalogue.Load(SeedFile).Find(grade).Fu);
    }

    [Fact]
    public void Thickness_beyond_the_last_band_is_out_of_scope()
    {
        var s355 = GradeCatalogue.Load(SeedFile).Find("S355JR");

        Assert.Throws<OutOfScopeException>(() => s355.FyFor(101));
    }

    [Fact]
    public void Bad_rows_report_line_and_field_and_good_rows_still_load()
    {
        const string csv =
            "# grades\n" +
            Header +                                               // line 2
            "S275JR,EN 10025-2,410,200000,77000,16:275;40:265\n" + // 3 good
            "BadFu,X,abc,200000,77000,16:275\n" +                  // 4 fu not a number
            "LowFu,X,200,200000,77000,16:275\n" +                  // 5 fu < fy
            "BadBand,X,410,200000,77000,16-275\n" +                // 6 band not a pair
            "Down,X,410,200000,77000,40:265;16:275\n" +            // 7 bands not ascending
            ",X,410,200000,77000,16:275\n" +                       // 8 no name
            "s275jr,X,410,200000,77000,16:275\n";                  // 9 duplicate

        var catalogue = GradeCatalogue.LoadFromText("grades-test.csv", csv);

        Assert.Equal(["S275JR"], catalogue.Grades.Select(g => g.Name));
        Assert.Equal(
            [
                new CatalogueError("grades-test.csv", 4, "fu", "'abc' is not a number (use a point as the decimal separator)"),
                new CatalogueError("grades-test.csv", 5, "fu", "fu = 200 MPa must not be less than fy = 275 MPa"),
                new CatalogueError("grades-test.csv", 6, "bands", "'16-275' is not a 'tmax:fy' pair of numbers (mm:MPa)"),
                new CatalogueError("grades-test.csv", 7, "bands", "thickness bands must ascend (got 16 mm after 40 mm)"),
                new CatalogueError("grades-test.csv", 8, "name", "missing value"),
                new CatalogueError("grades-test.csv", 9, "name", "grade 's275jr' is already defined"),
            ],
            catalogue.Errors);
    }

    [Fact]
    public void Unknown_grade_names_the_known_ones()
    {
        var catalogue = GradeCatalogue.LoadFromText("g.csv", Header + "S275JR,EN 10025-2,410,200000,77000,16:275\n");

        Assert.False(catalogue.TryFind("S460", out var grade, out var error));
        Assert.Null(grade);
        Assert.Equal("steel grade 'S460' is not in the catalogue (known: S275JR)", error);
        Assert.Throws<KeyNotFoundException>(() => catalogue.Find("S460"));
    }

    [Fact]
    public void Missing_file_or_column_is_an_error_entry()
    {
        var missingFile = GradeCatalogue.Load(Path.Combine(AppContext.BaseDirectory, "no-such-grades.csv"));
        var missingColumn = GradeCatalogue.LoadFromText("g.csv", "name,standard,fu,E,bands\n");

        Assert.Equal("file", Assert.Single(missingFile.Errors).Field);
        Assert.Equal(new CatalogueError("g.csv", 1, "header", "missing column(s) G"), Assert.Single(missingColumn.Errors));
    }
}
