using System.Globalization;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;
using TrussWeb.Core;
using TrussWeb.Core.Records;
using TrussWeb.Reports.Summary;
using TrussWeb.Reports.Tests.Support;

namespace TrussWeb.Reports.Tests.Summary;

public class MemberSummaryXlsxTests
{
    [Fact]
    public void Workbook_holds_numeric_cells_equal_to_the_design_and_to_the_pdf()
    {
        var trusses = ReportFixture.WithReviews([ReportFixture.Pratt24], (_, i) => i % 2 == 0 ? "Approved" : "Submitted");
        var header = ReportFixture.Header(trusses);
        var sheet = Read(MemberSummaryXlsx.Render(header, trusses));
        var pdfText = string.Join(" ", PdfText.Pages(MemberSummaryReport.Render(header, trusses).Bytes));
        var design = trusses[0].Design;

        var headRow = sheet.FindIndex(r => r.Count > 1 && r[0].Text == "Truss" && r[1].Text == "Mark");
        var head = sheet[headRow].Select(c => c.Text).ToList();
        Assert.Contains("Mass (kg)", head);
        var members = sheet.Skip(headRow + 1).TakeWhile(r => r.Count > 1).ToList();
        Assert.Equal(design.Members.Count, members.Count);
        foreach (var (row, m) in members.Zip(design.Members))
        {
            var u = row[head.IndexOf("Utilization (-)")];
            Assert.True(u.IsNumber, "utilization must be a numeric cell");
            Assert.Equal(m.Design.Utilization, u.Number);
            Assert.True(row[head.IndexOf("Length (m)")].IsNumber);
            Assert.Equal(m.Length / 1000, row[head.IndexOf("Length (m)")].Number);
            Assert.Contains(Display.Sig(u.Number), pdfText, StringComparison.Ordinal);
        }

        var sectionRow = sheet.FindIndex(r => r.Count > 2 && r[0].Text == "Truss" && r[1].Text == "Section");
        foreach (var (row, total) in sheet.Skip(sectionRow + 1).Zip(design.Totals))
        {
            Assert.True(row[4].IsNumber);
            Assert.Equal(total.Mass, row[4].Number);
            Assert.Contains($"{total.Designation} {total.Count} {Display.Sig(total.Length / 1000)} {Display.Sig(row[4].Number)}", pdfText, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Workbook_header_block_carries_the_caution_and_approval_status()
    {
        var trusses = ReportFixture.WithReviews([ReportFixture.Pratt24], (_, _) => "Approved");
        var header = ReportFixture.Header(trusses, final: true);
        var sheet = Read(MemberSummaryXlsx.Render(header, trusses));
        string Value(string label) => sheet.First(r => r[0].Text == label)[1].Text;
        Assert.Equal(Caution.Text, Value("Caution"));
        Assert.Equal($"All {trusses[0].Design.Members.Count} members approved; final issue", Value("Approval status"));
        Assert.Equal("P-2026-017", Value("Project number"));
    }

    private sealed record CellValue(string Text, bool IsNumber, double Number);

    private static List<List<CellValue>> Read(byte[] bytes)
    {
        using var stream = new MemoryStream(bytes);
        using var doc = SpreadsheetDocument.Open(stream, false);
        var part = doc.WorkbookPart!.WorksheetParts.Single();
        return part.Worksheet.Descendants<Row>().Select(r => r.Elements<Cell>().Select(c =>
        {
            var isNumber = c.DataType?.Value == CellValues.Number || (c.DataType is null && c.CellValue is not null);
            var text = c.InlineString?.InnerText ?? c.CellValue?.Text ?? "";
            return new CellValue(text, isNumber, isNumber ? double.Parse(text, CultureInfo.InvariantCulture) : double.NaN);
        }).ToList()).ToList();
    }
}
