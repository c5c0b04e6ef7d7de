using TrussWeb.Core;
using TrussWeb.Core.Records;
using TrussWeb.Reports.Model;
using TrussWeb.Reports.Summary;
using TrussWeb.Reports.Tests.Support;
using UglyToad.PdfPig;
using UglyToad.PdfPig.Core;

namespace TrussWeb.Reports.Tests.Summary;

public class MemberSummaryReportTests
{
    private static readonly Lazy<IReadOnlyList<TrussReportData>> TwoTrusses = new(() =>
        ReportFixture.WithReviews([ReportFixture.Pratt24, ReportFixture.Pratt24 with { Name = "T2" }], (_, i) => i % 5 == 0 ? "Submitted" : "Approved"));

    [Fact]
    public void Summary_prints_every_member_utilization_and_the_totals_of_the_design()
    {
        var trusses = TwoTrusses.Value;
        var pdf = MemberSummaryReport.Render(ReportFixture.Header(trusses), trusses);
        var text = string.Join(" ", PdfText.Pages(pdf.Bytes));
        var design = trusses[0].Design;

        foreach (var total in design.Totals)
        {
            Assert.Contains($"{total.Designation} {total.Count} {Display.Sig(total.Length / 1000)} {Display.Sig(total.Mass)}", text, StringComparison.Ordinal);
        }

        Assert.Contains($"T1 {design.Members.Count} {Display.Sig(design.Mass)} {Display.Sig(design.MassWithAllowance)} {Display.Sig(design.MaxUtilization)}", text, StringComparison.Ordinal);
        foreach (var m in design.Members)
        {
            Assert.Contains($"T1 {m.Mark} {m.Group} ", text, StringComparison.Ordinal);
        }

        var governing = design.Members.MaxBy(m => m.Design.Utilization)!;
        Assert.Contains($"{Display.Sig(governing.Design.Utilization)} {governing.Design.GoverningCheck}", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Table_continues_across_pages_with_the_column_headings_repeated()
    {
        var trusses = TwoTrusses.Value;
        var pdf = MemberSummaryReport.Render(ReportFixture.Header(trusses), trusses);
        var pages = PdfText.Pages(pdf.Bytes);
        Assert.True(pages.Count >= 3, $"expected the 98-member table to need several pages, got {pages.Count}");
        var memberPages = pages.Where(p => p.Contains(" T2 ", StringComparison.Ordinal) || p.Contains(" T1 ", StringComparison.Ordinal)).ToList();
        Assert.All(memberPages.SkipLast(1), p => Assert.Contains("Max compression (kN)", p, StringComparison.Ordinal));
        for (var i = 0; i < pages.Count; i++)
        {
            Assert.Contains($"Page {i + 1} of {pages.Count}", pages[i], StringComparison.Ordinal);
            Assert.Contains(PdfText.Normalise(Caution.Text), pages[i], StringComparison.Ordinal);
            Assert.Contains("NOT FOR CONSTRUCTION", pages[i], StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Stress_case_words_stay_inside_the_page_and_do_not_overlap()
    {
        var trusses = new[] { StressCase.Truss };
        var longest = StressCase.LongestSection().Designation;
        var pdf = MemberSummaryReport.Render(ReportFixture.Header(trusses), trusses);
        Samples.Write("summary-stress.pdf", pdf.Bytes);
        var text = string.Join(" ", PdfText.Pages(pdf.Bytes));
        var force = trusses[0].Design.Members.Max(m => m.Envelope.MaxCompression) / 1000;
        Assert.True(force >= 10_000, $"stress case needs 5-digit forces, got {force} kN");
        Assert.Contains(Display.Sig(force), text, StringComparison.Ordinal);

        using var doc = PdfDocument.Open(pdf.Bytes);
        foreach (var page in doc.GetPages())
        {
            var box = page.MediaBox.Bounds;
            var words = page.GetWords().Where(w => !string.IsNullOrWhiteSpace(w.Text)).ToList();
            foreach (var w in words)
            {
                var r = w.BoundingBox;
                Assert.True(r.Left >= box.Left && r.Right <= box.Right && r.Bottom >= box.Bottom && r.Top <= box.Top, $"page {page.Number}: '{w.Text}' outside the page");
            }

            for (var i = 0; i < words.Count; i++)
            {
                for (var j = i + 1; j < words.Count; j++)
                {
                    Assert.False(Overlap(words[i].BoundingBox, words[j].BoundingBox),
                        $"page {page.Number}: '{words[i].Text}' overlaps '{words[j].Text}'");
                }
            }
        }

        // The longest designations are printed whole (wrapped at their spaces if need be).
        Assert.Contains(PdfText.Normalise(longest), text, StringComparison.Ordinal);
        Assert.Contains(PdfText.Normalise(StressCase.LongestDoubleAngle().Designation), text, StringComparison.Ordinal);
    }

    private static bool Overlap(PdfRectangle a, PdfRectangle b)
    {
        const double tolerance = 0.3;
        var w = Math.Min(a.Right, b.Right) - Math.Max(a.Left, b.Left);
        var h = Math.Min(a.Top, b.Top) - Math.Max(a.Bottom, b.Bottom);
        return w > tolerance && h > tolerance;
    }
}
