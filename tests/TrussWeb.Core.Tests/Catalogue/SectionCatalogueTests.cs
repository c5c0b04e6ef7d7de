using TrussWeb.Core.Sections;
using TrussWeb.Core.Tests.Support;

namespace TrussWeb.Core.Tests.Catalogue;

/// <summary>Loading section catalogues: the shipped seed data, bad rows reported by file, line and field, lookups.</summary>
public class SectionCatalogueTests
{
    private static readonly string SeedFolder = Path.Combine(AppContext.BaseDirectory, "seed-data", "sections");

    private const string AngleHeader = "designation,d,b,t,r1,r2\n";

    [Fact]
    public void Shipped_seed_data_loads_without_errors()
    {
        var result = SectionCatalogue.Load(SeedFolder);

        Assert.Empty(result.Errors);
        Assert.All(result.Entries, e => Assert.True(e.Properties.Area > 0, e.Designation));
    }

    [Fact]
    public void Shipped_angles_cover_the_required_equal_and_unequal_ranges()
    {
        var angles = SectionCatalogue.Load(SeedFolder).OfFamily(SectionFamily.Angle).ToList();
        var dims = angles.Select(a => (AngleDimensions)a.Dimensions).ToList();

        Assert.True(angles.Count >= 40, $"{angles.Count} angles");
        Assert.Contains(new AngleDimensions(40, 40, 4, 6, 3), dims);
        Assert.Contains(dims, d => (d.LongLeg, d.ShortLeg, d.Thickness) == (200, 200, 20));
        Assert.Contains(dims, d => (d.LongLeg, d.ShortLeg, d.Thickness) == (60, 40, 5));
        Assert.Contains(dims, d => (d.LongLeg, d.ShortLeg, d.Thickness) == (200, 100, 15));
        Assert.True(dims.Count(d => d.IsEqualLeg) >= 20);
        Assert.True(dims.Count(d => !d.IsEqualLeg) >= 20);
        // Source: REFERENCES.md §2 [R]: published radii of these sizes.
        Assert.Contains(new AngleDimensions(60, 40, 6, 6, 3), dims);
        Assert.Contains(new AngleDimensions(65, 50, 5, 6, 3), dims);
        Assert.Contains(new AngleDimensions(120, 80, 12, 11, 5.5), dims);
        Assert.Contains(new AngleDimensions(200, 200, 24, 18, 9), dims);
    }

    [Fact]
    public void Shipped_hollow_sections_have_the_required_counts()
    {
        var result = SectionCatalogue.Load(SeedFolder);
        var rhs = result.OfFamily(SectionFamily.RectangularHollow).Select(e => (RectangularHollowDimensions)e.Dimensions).ToList();

        Assert.True(result.OfFamily(SectionFamily.CircularHollow).Count() >= 20);
        Assert.True(rhs.Count >= 30);
        Assert.Contains(rhs, r => r.IsSquare);
        Assert.Contains(rhs, r => !r.IsSquare);
    }

    [Fact]
    public void Catalogue_entry_properties_equal_the_direct_calculation()
    {
        var entry = SectionCatalogue.Load(SeedFolder).Find("l100x75x8");

        var direct = Angle.Compute(new AngleDimensions(100, 75, 8, 10, 5));

        Assert.Equal("L100x75x8", entry.Designation);
        Assert.Equal(SectionFamily.Angle, entry.Family);
        AssertClose.Relative(direct.Area, entry.Properties.Area, 1e-12, "A");
        AssertClose.Relative(direct.Iv, entry.Properties.Iv, 1e-12, "Iv");
        Assert.Same(entry.Properties, entry.Properties);
    }

    [Fact]
    public void Unknown_designation_gives_a_clear_error()
    {
        var result = SectionCatalogue.LoadFromText("a.csv", AngleHeader + "L50x50x5,50,50,5,7,3.5\n");

        Assert.False(result.TryFind("L55x55x5", out var entry, out var error));
        Assert.Null(entry);
        Assert.Equal("section 'L55x55x5' is not in the catalogue (1 sections loaded); enter it by its dimensions instead", error);
        var ex = Assert.Throws<KeyNotFoundException>(() => result.Find("L55x55x5"));
        Assert.Equal(error, ex.Message);
        Assert.True(result.TryFind(" l50X50X5 ", out var found, out _));
        Assert.Equal("L50x50x5", found.Designation);
    }

    [Fact]
    public void Bad_rows_report_file_line_and_field_and_good_rows_still_load()
    {
        const string csv =
            "# comment line\n" +                 // line 1
            AngleHeader +                         // line 2
            "L50x50x5,50,50,5,7,3.5\n" +          // line 3 good
            "L50x50x0,50,50,0,7,3.5\n" +          // line 4 t = 0
            "L50x50x6,50,50,6,7\n" +              // line 5 r2 missing
            "L60x60x6,60,60,six,8,4\n" +          // line 6 not a number
            "L60x60x8,60,60,8,-8,4\n" +           // line 7 negative r1
            "L40x40x40,40,40,40,0,0\n" +          // line 8 t >= b
            "\n" +                                // line 9 blank
            "L60x60x5,60,60,5,8,4\n" +            // line 10 good
            "l50x50x5,50,50,5,7,3.5\n" +          // line 11 duplicate
            "L70x70x7,70,70,7,9,4.5,extra\n" +    // line 12 too many values
            "L65x65x7,65,65,7.0.1,9,4.5\n";       // line 13 not a number

        var result = SectionCatalogue.LoadFromText("angles-test.csv", csv);

        Assert.Equal(["L50x50x5", "L60x60x5"], result.Entries.Select(e => e.Designation));
        Assert.Equal(
            [
                new CatalogueError("angles-test.csv", 4, "t", "thickness t = 0 mm must be greater than 0 mm"),
                new CatalogueError("angles-test.csv", 5, "r2", "missing value"),
                new CatalogueError("angles-test.csv", 6, "t", "'six' is not a number (use a point as the decimal separator)"),
                new CatalogueError("angles-test.csv", 7, "r1", "root radius r1 = -8 mm must not be negative"),
                new CatalogueError("angles-test.csv", 8, "t", "thickness t = 40 mm must be less than the short leg b = 40 mm"),
                new CatalogueError("angles-test.csv", 11, "designation", "'l50x50x5' is already defined (angles-test.csv line 3)"),
                new CatalogueError("angles-test.csv", 12, "row", "7 values but the header has 6 columns"),
                new CatalogueError("angles-test.csv", 13, "t", "'7.0.1' is not a number (use a point as the decimal separator)"),
            ],
            result.Errors);
        Assert.Equal("angles-test.csv line 4, field t: thickness t = 0 mm must be greater than 0 mm", result.Errors[0].ToString());
    }

    [Fact]
    public void Comma_decimal_separator_is_not_accepted()
    {
        var result = SectionCatalogue.LoadFromText("chs.csv", "designation;D;t\n");
        var semicolon = Assert.Single(result.Errors);
        Assert.Equal(("chs.csv", 1, "header"), (semicolon.File, semicolon.Line, semicolon.Field));

        var comma = SectionCatalogue.LoadFromText("chs.csv", "designation,D,t\nCHS 48.3x3.2,\"48,3\",3.2\n");
        Assert.Empty(comma.Entries);
        Assert.Contains(comma.Errors, e => e.Line == 2);
    }

    [Fact]
    public void Hollow_section_files_are_recognised_by_their_header()
    {
        var chs = SectionCatalogue.LoadFromText("tubes.csv", "designation,D,t\n,114.3,3.6\nCHS bad,40,20\n");
        var rhs = SectionCatalogue.LoadFromText("boxes.csv", "h,b,t,ro,designation\n200,100,8,,\n100,50,5,12,RHS 100x50x5 r12\n100,40,8,,RHS bad\n");

        var tube = Assert.Single(chs.Entries);
        Assert.Equal(("CHS 114.3x3.6", SectionFamily.CircularHollow), (tube.Designation, tube.Family));
        Assert.Equal(new CatalogueError("tubes.csv", 3, "t", "thickness t = 20 mm must be less than half the diameter, D/2 = 20 mm"), Assert.Single(chs.Errors));

        Assert.Equal(["RHS 200x100x8", "RHS 100x50x5 r12"], rhs.Entries.Select(e => e.Designation));
        Assert.Equal(12, ((RectangularHollowDimensions)rhs.Entries[1].Dimensions).OuterRadius);
        var bad = Assert.Single(rhs.Errors);
        Assert.Equal(("boxes.csv", 4, "b"), (bad.File, bad.Line, bad.Field));
    }

    [Fact]
    public void Unknown_header_and_missing_column_are_reported_once_for_the_file()
    {
        var unknown = SectionCatalogue.LoadFromText("x.csv", "name,size\nfoo,1\n");
        var missing = SectionCatalogue.LoadFromText("y.csv", "designation,d,b,t,r1\nL50x50x5,50,50,5,7\n");
        var empty = SectionCatalogue.LoadFromText("z.csv", "# only a comment\n");

        Assert.Equal("header", Assert.Single(unknown.Errors).Field);
        Assert.Equal(new CatalogueError("y.csv", 1, "header", "missing column(s) r2"), Assert.Single(missing.Errors));
        Assert.Equal(new CatalogueError("z.csv", 0, "header", "the file has no header row"), Assert.Single(empty.Errors));
        Assert.Empty(unknown.Entries);
    }

    [Fact]
    public void Missing_folder_is_an_error_not_an_exception()
    {
        var result = SectionCatalogue.Load(Path.Combine(SeedFolder, "no-such-folder"));

        Assert.Equal("file", Assert.Single(result.Errors).Field);
        Assert.Empty(result.Entries);
    }
}
