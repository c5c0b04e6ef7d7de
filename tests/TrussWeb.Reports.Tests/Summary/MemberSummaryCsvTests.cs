using System.Globalization;
using TrussWeb.Core;
using TrussWeb.Core.Records;
using TrussWeb.Reports.Summary;
using TrussWeb.Reports.Tests.Support;

namespace TrussWeb.Reports.Tests.Summary;

public class MemberSummaryCsvTests
{
    [Fact]
    public void Csv_rows_hold_the_design_numbers_the_pdf_prints()
    {
        var trusses = ReportFixture.WithReviews([ReportFixture.Pratt24], (_, i) => i % 2 == 0 ? "Approved" : "Submitted");
        var header = ReportFixture.Header(trusses);
        var rows = ReadCsv(MemberSummaryCsv.Render(header, trusses));
        var pdfText = string.Join(" ", PdfText.Pages(MemberSummaryReport.Render(header, trusses).Bytes));

        var headIndex = rows.FindIndex(r => r.Count > 1 && r[0] == "Truss" && r[1] == "Mark");
        var head = rows[headIndex];
        var members = rows.Skip(headIndex + 1).TakeWhile(r => r.Count > 1).ToList();
        var design = trusses[0].Design;
        Assert.Equal(design.Members.Count, members.Count);
        foreach (var (row, m) in members.Zip(design.Members))
        {
            Assert.Equal(m.Mark, row[head.IndexOf("Mark")]);
            var u = double.Parse(row[head.IndexOf("Utilization (-)")], CultureInfo.InvariantCulture);
            Assert.Equal(m.Design.Utilization, u);
            Assert.Equal(m.Envelope.MaxCompression / 1000, double.Parse(row[head.IndexOf("Max compression (kN)")], CultureInfo.InvariantCulture));
            Assert.Contains($"{m.Mark} {m.Group} {m.Design.Designation}", pdfText, StringComparison.Ordinal);
            Assert.Contains(Display.Sig(u), pdfText, StringComparison.Ordinal);
        }

        var sectionHead = rows.FindIndex(r => r.Count > 2 && r[0] == "Truss" && r[1] == "Section");
        var sections = rows.Skip(sectionHead + 1).TakeWhile(r => r.Count > 1).ToList();
        Assert.Equal(design.Totals.Count, sections.Count);
        foreach (var (row, total) in sections.Zip(design.Totals))
        {
            var mass = double.Parse(row[4], CultureInfo.InvariantCulture);
            Assert.Equal(total.Mass, mass);
            Assert.Contains($"{total.Designation} {total.Count} {Display.Sig(total.Length / 1000)} {Display.Sig(mass)}", pdfText, StringComparison.Ordinal);
        }

        var trussHead = rows.FindIndex(r => r.Count > 2 && r[0] == "Truss" && r[1] == "Members (-)");
        Assert.Equal(design.Mass, double.Parse(rows[trussHead + 1][2], CultureInfo.InvariantCulture));
    }

    [Fact]
    public void Csv_header_block_carries_project_revision_time_status_and_caution()
    {
        var trusses = ReportFixture.WithReviews([ReportFixture.Pratt24], (_, _) => "Submitted");
        var header = ReportFixture.Header(trusses);
        var rows = ReadCsv(MemberSummaryCsv.Render(header, trusses));
        string Value(string label) => rows.First(r => r[0] == label)[1];
        Assert.Equal(header.ProjectName, Value("Project"));
        Assert.Equal("B", Value("Revision"));
        Assert.Equal("2026-12-01 09:30 UTC", Value("Produced at (UTC)"));
        Assert.Equal($"0 of {trusses[0].Design.Members.Count} members approved; preliminary", Value("Approval status"));
        Assert.Equal(Caution.Text, Value("Caution"));
    }

    [Theory]
    [InlineData("plain", "plain")]
    [InlineData("1.2D + 1.3W(W1), left", "\"1.2D + 1.3W(W1), left\"")]
    [InlineData("say \"hi\"", "\"say \"\"hi\"\"\"")]
    [InlineData("two\r\nlines", "\"two\r\nlines\"")]
    public void Fields_are_quoted_as_rfc_4180_requires(string field, string expected)
    {
        Assert.Equal(expected, MemberSummaryCsv.Quote(field));
        Assert.Equal([field], ReadCsv(MemberSummaryCsv.Quote(field) + "\r\n")[0]);
    }

    [Fact]
    public void Csv_uses_crlf_line_ends_and_invariant_decimal_points()
    {
        var trusses = new[] { ReportFixture.Pratt24 };
        var text = MemberSummaryCsv.Render(ReportFixture.Header(trusses), trusses);
        Assert.DoesNotContain("\n", text.Replace("\r\n", "", StringComparison.Ordinal), StringComparison.Ordinal);
        var rows = ReadCsv(text);
        var head = rows.First(r => r.Count > 1 && r[0] == "Truss" && r[1] == "Mark");
        var first = rows[rows.IndexOf(head) + 1];
        Assert.Matches(@"^\d+\.\d+$", first[head.IndexOf("Length (m)")]);
    }

    private static List<List<string>> ReadCsv(string text) => Rfc4180Csv.Read(text).Select(r => r.ToList()).ToList();
}
