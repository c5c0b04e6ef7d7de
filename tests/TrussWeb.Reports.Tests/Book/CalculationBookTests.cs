using System.Globalization;
using TrussWeb.Core;
using TrussWeb.Core.Records;
using TrussWeb.Reports.Book;
using TrussWeb.Reports.Model;
using TrussWeb.Reports.Tests.Support;
using UglyToad.PdfPig;

namespace TrussWeb.Reports.Tests.Book;

public class CalculationBookTests
{
    private static readonly Lazy<(IReadOnlyList<TrussReportData> Trusses, ReportHeader Header, TrussWeb.Reports.Pdf.RenderedPdf Book, IReadOnlyList<string> Pages)> PartlyApproved = new(() =>
    {
        var trusses = ReportFixture.WithReviews([ReportFixture.Pratt24], (_, i) => i % 4 == 1 ? "Returned" : "Approved");
        var header = ReportFixture.Header(trusses, final: true);
        var book = CalculationBook.Render(header, trusses);
        return (trusses, header, book, PdfText.Pages(book.Bytes));
    });

    [Fact]
    public void Page_count_read_back_equals_the_count_the_layout_reports()
    {
        var (_, _, book, pages) = PartlyApproved.Value;
        using var doc = PdfDocument.Open(book.Bytes);
        Assert.Equal(book.PageCount, doc.NumberOfPages);
        Assert.Equal(book.PageCount, pages.Count);
    }

    [Fact]
    public void Contents_page_numbers_are_the_pages_where_each_member_sheet_starts()
    {
        var (trusses, _, book, pages) = PartlyApproved.Value;
        var members = book.Contents.Where(e => e.Member.Length > 0).ToList();
        Assert.Equal(trusses[0].Design.Members.Count, members.Count);
        foreach (var e in members)
        {
            var title = $"Member {e.Member}: ";
            Assert.Contains(title, pages[e.Page - 1], StringComparison.Ordinal);
            Assert.DoesNotContain(title, pages[e.Page - 2], StringComparison.Ordinal);
        }

        // The contents pages print those same numbers next to each entry.
        var contents = string.Join(" ", pages.Where(p => p.Contains("Contents", StringComparison.Ordinal)).Take(3));
        foreach (var e in members)
        {
            Assert.Contains($"{e.Member} · ", contents, StringComparison.Ordinal);
            Assert.Matches($@"{System.Text.RegularExpressions.Regex.Escape(e.Member)} · [^·]+ · U = [^·]+ · \w+ {e.Page}\b", contents);
        }
    }

    [Fact]
    public void Every_page_carries_the_full_caution_text()
    {
        var (_, _, _, pages) = PartlyApproved.Value;
        var caution = PdfText.Normalise(Caution.Text);
        Assert.All(pages, p => Assert.Contains(caution, p, StringComparison.Ordinal));
    }

    [Fact]
    public void Every_page_is_numbered_page_x_of_y()
    {
        var (_, _, book, pages) = PartlyApproved.Value;
        for (var i = 0; i < pages.Count; i++)
        {
            Assert.Contains($"Page {i + 1} of {book.PageCount}", pages[i], StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Every_page_shows_the_not_approved_banner_while_members_are_unapproved()
    {
        var (trusses, header, _, pages) = PartlyApproved.Value;
        var unapproved = trusses[0].Design.Members.Count(m => trusses[0].ReviewOf(m.Mark).State != "Approved");
        Assert.True(unapproved > 0);
        var banner = $"NOT FOR CONSTRUCTION: {unapproved} of {header.TotalMembers} members not approved";
        Assert.All(pages, p => Assert.Contains(banner, p, StringComparison.Ordinal));
    }

    [Fact]
    public void No_page_shows_a_banner_when_every_member_is_approved_and_the_issue_is_final()
    {
        var trusses = ReportFixture.WithReviews([ReportFixture.Pratt24], (_, _) => "Approved");
        var header = ReportFixture.Header(trusses, final: true);
        var pages = PdfText.Pages(CalculationBook.Render(header, trusses).Bytes);
        Assert.All(pages, p => Assert.DoesNotContain("NOT FOR CONSTRUCTION", p, StringComparison.Ordinal));
        Assert.All(pages, p => Assert.Contains("Produced 2026-12-01 09:30 UTC · Rev B", p, StringComparison.Ordinal));
    }

    [Fact]
    public void Member_sheet_prints_the_compression_resistance_and_utilization_the_design_produced()
    {
        var (trusses, _, book, pages) = PartlyApproved.Value;
        var truss = trusses[0];
        var member = truss.Design.Members.First(m => m.Design.Record?.Find("Cr") is not null && m.Envelope.MaxCompression > 1000);
        var cr = member.Design.Record!.Find("Cr")!;
        var sheet = SheetText(book, pages, member.Mark);

        Assert.Contains($"Cr Factored compressive resistance", sheet, StringComparison.Ordinal);
        Assert.Contains($"{Display.Sig(cr.Value)} kN", sheet, StringComparison.Ordinal);
        Assert.Contains($"Result: utilization U = {Display.Sig(member.Design.Utilization)} ({member.Design.GoverningCheck})", sheet, StringComparison.Ordinal);
        Assert.Contains($"Review: {truss.ReviewOf(member.Mark).State}", sheet, StringComparison.Ordinal);
    }

    [Fact]
    public void Member_sheet_prints_every_step_of_the_record_with_substitution_and_reference()
    {
        var (trusses, _, book, pages) = PartlyApproved.Value;
        var member = trusses[0].Design.Members.OrderByDescending(m => m.Design.Record!.Steps.Count).First();
        var sheet = SheetText(book, pages, member.Mark).Replace(" ", "", StringComparison.Ordinal);
        foreach (var step in member.Design.Record!.Steps)
        {
            Assert.Contains(("= " + step.Substituted).Replace(" ", "", StringComparison.Ordinal), sheet, StringComparison.Ordinal);
            Assert.Contains(Display.Sig(step.Value).Replace(" ", "", StringComparison.Ordinal), sheet, StringComparison.Ordinal);
            Assert.Contains(step.Reference.Replace(" ", "", StringComparison.Ordinal), sheet, StringComparison.Ordinal);
        }

        foreach (var note in member.Design.Record.Notes)
        {
            Assert.Contains(note.Replace(" ", "", StringComparison.Ordinal), sheet, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Member_pages_name_the_truss_member_and_review_state_in_the_header()
    {
        var (trusses, _, book, pages) = PartlyApproved.Value;
        var member = trusses[0].Design.Members[1];
        var state = trusses[0].ReviewOf(member.Mark).State;
        var entry = book.Contents.Single(e => e.Member == member.Mark);
        Assert.Contains($"Truss: {trusses[0].Name} · Member: {member.Mark} · Review: {state}", pages[entry.Page - 1], StringComparison.Ordinal);
    }

    [Fact]
    public void Stress_case_keeps_every_letter_inside_the_page()
    {
        var trusses = new[] { StressCase.Truss };
        Assert.Contains(trusses[0].Design.Members, m => Math.Max(m.Envelope.MaxCompression, m.Envelope.MaxTension) >= 10_000_000);
        var book = CalculationBook.Render(ReportFixture.Header(trusses), trusses);
        using var doc = PdfDocument.Open(book.Bytes);
        foreach (var page in doc.GetPages())
        {
            var box = page.MediaBox.Bounds;
            foreach (var letter in page.Letters.Where(l => !string.IsNullOrWhiteSpace(l.Value)))
            {
                var r = letter.BoundingBox;
                Assert.True(r.Left >= box.Left - 0.01 && r.Right <= box.Right + 0.01 && r.Bottom >= box.Bottom - 0.01 && r.Top <= box.Top + 0.01,
                    string.Create(CultureInfo.InvariantCulture, $"page {page.Number}: '{letter.Value}' at {r.Left:F1},{r.Bottom:F1}-{r.Right:F1},{r.Top:F1} outside {box.Width:F0}x{box.Height:F0}"));
            }
        }
    }

    [Fact]
    public void Missing_font_folder_fails_with_a_message_naming_the_folder()
    {
        var folder = Path.Combine(Path.GetTempPath(), "no-fonts-" + Guid.NewGuid().ToString("N"));
        var ex = Assert.Throws<FileNotFoundException>(() => new TrussWeb.Reports.Pdf.DejaVuFontResolver(folder));
        Assert.Contains(folder, ex.Message, StringComparison.Ordinal);
        Assert.Contains("DejaVuSans.ttf", ex.Message, StringComparison.Ordinal);
    }

    /// <summary>The text of a member's sheet: from its contents page up to the next entry's page.</summary>
    private static string SheetText(TrussWeb.Reports.Pdf.RenderedPdf book, IReadOnlyList<string> pages, string mark)
    {
        var entries = book.Contents.ToList();
        var i = entries.FindIndex(e => e.Member == mark);
        var first = entries[i].Page;
        var last = i + 1 < entries.Count ? entries[i + 1].Page - 1 : book.PageCount;
        return string.Join(" ", pages.Skip(first - 1).Take(last - first + 1));
    }
}
