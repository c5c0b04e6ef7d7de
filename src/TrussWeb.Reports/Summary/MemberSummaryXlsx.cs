using System.Globalization;
using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;
using TrussWeb.Reports.Model;

namespace TrussWeb.Reports.Summary;

/// <summary>
/// The member summary as an XLSX workbook (Open XML SDK): sheet "Summary" with the header block (and the
/// caution text), the member table, section totals and truss totals. Numbers are numeric cells
/// (unrounded), units are in the column headings; text is inline so no shared-string table is needed.
/// </summary>
public static class MemberSummaryXlsx
{
    public const string SheetName = "Summary";

    /// <summary>Writes the workbook.</summary>
    public static byte[] Render(ReportHeader header, IReadOnlyList<TrussReportData> trusses)
    {
        ArgumentNullException.ThrowIfNull(header);
        var table = MemberSummaryTable.From(trusses);
        using var stream = new MemoryStream();
        using (var doc = SpreadsheetDocument.Create(stream, SpreadsheetDocumentType.Workbook))
        {
            var workbook = doc.AddWorkbookPart();
            workbook.Workbook = new Workbook();
            var sheetPart = workbook.AddNewPart<WorksheetPart>();
            var data = new SheetData();
            sheetPart.Worksheet = new Worksheet(data);
            workbook.Workbook.AppendChild(new Sheets(new Sheet { Id = workbook.GetIdOfPart(sheetPart), SheetId = 1, Name = SheetName }));

            var rowIndex = 0u;
            foreach (var (label, value) in ExportHeaderBlock.Lines(header, MemberSummaryCsv.Title))
            {
                data.AppendChild(Row(++rowIndex, Text(label), Text(value)));
            }

            data.AppendChild(new Row { RowIndex = ++rowIndex });
            data.AppendChild(Row(++rowIndex, ExportHeaderBlock.MemberColumns.Select(Text).ToArray()));
            foreach (var r in table.Rows)
            {
                data.AppendChild(Row(++rowIndex, Text(r.Truss), Text(r.Mark), Text(r.Group), Text(r.Section), Number(r.LengthM), Number(r.MaxTensionKN),
                    Text(r.TensionCombination), Number(r.MaxCompressionKN), Text(r.CompressionCombination), Number(r.Utilization), Text(r.GoverningCheck),
                    Text(r.Status.ToString()), r.ConnectorCount is { } n ? Number(n) : Text(""), r.ConnectorSpacingMm is { } a ? Number(a) : Text(""),
                    Text(r.ReviewState), Number(r.MassKg)));
            }

            data.AppendChild(new Row { RowIndex = ++rowIndex });
            data.AppendChild(Row(++rowIndex, ExportHeaderBlock.SectionColumns.Select(Text).ToArray()));
            foreach (var s in table.SectionTotals)
            {
                data.AppendChild(Row(++rowIndex, Text(s.Truss), Text(s.Section), Number(s.Count), Number(s.LengthM), Number(s.MassKg)));
            }

            data.AppendChild(new Row { RowIndex = ++rowIndex });
            data.AppendChild(Row(++rowIndex, ExportHeaderBlock.TrussColumns.Select(Text).ToArray()));
            foreach (var t in table.TrussTotals)
            {
                data.AppendChild(Row(++rowIndex, Text(t.Truss), Number(t.Count), Number(t.MassKg), Number(t.MassWithAllowanceKg), Number(t.MaxUtilization)));
            }

            workbook.Workbook.Save();
        }

        return stream.ToArray();
    }

    private static Row Row(uint index, params Cell[] cells)
    {
        var row = new Row { RowIndex = index };
        for (var i = 0; i < cells.Length; i++)
        {
            cells[i].CellReference = ColumnName(i) + index.ToString(CultureInfo.InvariantCulture);
            row.AppendChild(cells[i]);
        }

        return row;
    }

    private static Cell Text(string text) => new() { DataType = CellValues.InlineString, InlineString = new InlineString(new Text(text) { Space = SpaceProcessingModeValues.Preserve }) };

    private static Cell Number(double value) => double.IsFinite(value)
        ? new Cell { DataType = CellValues.Number, CellValue = new CellValue(value.ToString("R", CultureInfo.InvariantCulture)) }
        : Text("");

    private static string ColumnName(int index)
    {
        var name = "";
        for (var i = index + 1; i > 0; i = (i - 1) / 26)
        {
            name = (char)('A' + ((i - 1) % 26)) + name;
        }

        return name;
    }
}
