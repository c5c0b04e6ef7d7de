using TrussWeb.Reports.Book;
using TrussWeb.Reports.Summary;
using TrussWeb.Reports.Tests.Support;

namespace TrussWeb.Reports.Tests.Book;

public class SampleOutputTests
{
    [Fact]
    public void Sample_documents_render_and_are_written_when_a_folder_is_given()
    {
        var trusses = ReportFixture.WithReviews([ReportFixture.Pratt24], (_, i) => i % 3 == 0 ? "Submitted" : "Approved");
        var header = ReportFixture.Header(trusses);

        var book = CalculationBook.Render(header, trusses);
        var summary = MemberSummaryReport.Render(header, trusses);

        Assert.True(book.PageCount > trusses[0].Design.Members.Count);
        Assert.True(summary.PageCount >= 1);
        Samples.Write("book.pdf", book.Bytes);
        Samples.Write("summary.pdf", summary.Bytes);
        Samples.Write("first-member-page.txt", System.Text.Encoding.ASCII.GetBytes(book.Contents.First(e => e.Member.Length > 0).Page.ToString(System.Globalization.CultureInfo.InvariantCulture)));
        Samples.Write("summary.csv", MemberSummaryCsv.RenderBytes(header, trusses));
        Samples.Write("summary.xlsx", MemberSummaryXlsx.Render(header, trusses));
    }
}
