using TrussWeb.Core.Sections;
using TrussWeb.Reports.Book;
using TrussWeb.Reports.Tests.Support;
using UglyToad.PdfPig;

namespace TrussWeb.Reports.Tests.Book;

public class SectionFamiliesTests
{
    [Fact]
    public void Book_of_a_hollow_section_truss_draws_rhs_and_chs_members_inside_the_page()
    {
        var truss = ReportFixture.Design("H1", ReportFixture.Pratt(18_000, 8), ReportFixture.Actions(1.0),
            chordFamilies: new HashSet<SectionFamily> { SectionFamily.RectangularHollow },
            webFamilies: new HashSet<SectionFamily> { SectionFamily.CircularHollow });
        Assert.Contains(truss.MemberSections.Values, s => s.Family == SectionFamily.RectangularHollow);
        Assert.Contains(truss.MemberSections.Values, s => s.Family == SectionFamily.CircularHollow);
        Assert.All(truss.MemberSections.Values, s => Assert.NotNull(truss.DimensionsOf(s)));

        var trusses = new[] { truss };
        var book = CalculationBook.Render(ReportFixture.Header(trusses), trusses);
        Samples.Write("book-hollow.pdf", book.Bytes);
        var pages = PdfText.Pages(book.Bytes);

        foreach (var m in truss.Design.Members.Take(12))
        {
            var page = pages[book.Contents.Single(e => e.Member == m.Mark).Page - 1];
            Assert.Contains($"Member {m.Mark}: {m.Design.Designation}", page, StringComparison.Ordinal);
            Assert.DoesNotContain("outline not available", page, StringComparison.Ordinal);
            Assert.Contains("G centroid · S shear centre", page, StringComparison.Ordinal);
        }

        using var doc = PdfDocument.Open(book.Bytes);
        Assert.All(doc.GetPages(), p => Assert.All(p.Letters, l =>
            Assert.True(l.BoundingBox.Right <= p.MediaBox.Bounds.Right + 0.01 && l.BoundingBox.Left >= -0.01, $"page {p.Number}: '{l.Value}' outside")));
    }

    [Fact]
    public void A_section_without_dimensions_is_stated_not_drawn()
    {
        var truss = ReportFixture.Pratt24 with { SectionDimensions = new Dictionary<string, ISectionDimensions>() };
        var trusses = new[] { truss };
        var book = CalculationBook.Render(ReportFixture.Header(trusses), trusses);
        var first = book.Contents.First(e => e.Member.Length > 0);
        Assert.Contains("Section outline not available", PdfText.Pages(book.Bytes)[first.Page - 1], StringComparison.Ordinal);
    }
}
