using PdfSharp.Pdf;
using TrussWeb.Reports.Pdf;
using TrussWeb.Reports.Tests.Support;

namespace TrussWeb.Reports.Tests.Pdf;

public class TableWriterTests
{
    [Fact]
    public void A_row_taller_than_a_page_is_split_across_pages_with_the_headings_repeated()
    {
        var words = string.Join(" ", Enumerable.Range(1, 1500).Select(i => $"word{i}"));
        using var document = new PdfDocument();
        using var canvas = new PdfCanvas(document, landscape: false, headerHeight: 20, footerHeight: 20, new ReportStyle());
        canvas.NewPage();
        var table = new TableWriter(canvas, [new("Key", 1), new("Long text", 4)]);
        table.Row(["k", words]);
        canvas.Dispose();
        using var stream = new MemoryStream();
        document.Save(stream, false);

        var pages = PdfText.Pages(stream.ToArray());
        Assert.True(pages.Count >= 2, $"expected the row to continue on a new page, got {pages.Count}");
        Assert.All(pages, p => Assert.StartsWith("Key Long text", p, StringComparison.Ordinal));
        var all = string.Join(" ", pages);
        for (var i = 1; i <= 1500; i++)
        {
            Assert.Contains($"word{i} ", all + " ", StringComparison.Ordinal);
        }

        using var doc = UglyToad.PdfPig.PdfDocument.Open(stream.ToArray());
        Assert.All(doc.GetPages(), p => Assert.All(p.Letters, l => Assert.True(l.BoundingBox.Bottom >= 20, $"page {p.Number}: '{l.Value}' runs into the bottom margin")));
    }
}
