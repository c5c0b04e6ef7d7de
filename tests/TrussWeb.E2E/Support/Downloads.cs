using System.Text;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;
using Microsoft.Playwright;
using UglyToad.PdfPig;
using UglyToad.PdfPig.DocumentLayoutAnalysis.TextExtractor;

namespace TrussWeb.E2E.Support;

/// <summary>Downloads a journey triggers: saved next to its screenshots and opened as the office would open them.</summary>
public static class Downloads
{
    /// <summary>Clicks <paramref name="link"/>, waits for the browser's download and saves it under <c>downloads/</c> of the journey's folder.</summary>
    public static async Task<(string Path, string SuggestedName)> SaveAsync(IPage page, ILocator link, Screenshots shots)
    {
        var download = await page.RunAndWaitForDownloadAsync(() => link.ClickAsync());
        var failure = await download.FailureAsync();
        Assert.True(failure is null, $"the download of {download.SuggestedFilename} failed: {failure}");
        var path = System.IO.Path.Combine(shots.Folder, "downloads", download.SuggestedFilename);
        Directory.CreateDirectory(System.IO.Path.GetDirectoryName(path)!);
        await download.SaveAsAsync(path);
        return (path, download.SuggestedFilename);
    }

    /// <summary>Every page's text in drawing order, whitespace collapsed (PdfPig).</summary>
    public static IReadOnlyList<string> PdfPages(string path)
    {
        using var doc = PdfDocument.Open(path);
        return doc.GetPages().Select(p => Normalise(ContentOrderTextExtractor.GetText(p))).ToList();
    }

    /// <summary>Every word of every page (for marks, which must appear as a word of their own).</summary>
    public static IReadOnlySet<string> PdfWords(string path)
    {
        using var doc = PdfDocument.Open(path);
        return doc.GetPages().SelectMany(p => p.GetWords()).Select(w => w.Text).ToHashSet(StringComparer.Ordinal);
    }

    public static string Normalise(string text) => string.Join(" ", text.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries));

    /// <summary>The cell texts of every row of the first sheet (inline strings and numbers; empty cells left out of their row's position).</summary>
    public static IReadOnlyList<IReadOnlyList<string>> XlsxRows(string path)
    {
        using var doc = SpreadsheetDocument.Open(path, false);
        var sheet = doc.WorkbookPart!.WorksheetParts.Single().Worksheet;
        var shared = doc.WorkbookPart.SharedStringTablePart?.SharedStringTable.Elements<SharedStringItem>().Select(s => s.InnerText).ToList();
        return sheet.Descendants<Row>().Select(r => (IReadOnlyList<string>)r.Elements<Cell>().Select(c => CellText(c, shared)).ToList()).ToList();
    }

    private static string CellText(Cell cell, List<string>? shared)
    {
        if (cell.DataType?.Value == CellValues.InlineString)
        {
            return cell.InlineString?.InnerText ?? "";
        }

        if (cell.DataType?.Value == CellValues.SharedString && shared is not null && int.TryParse(cell.CellValue?.Text, out var i))
        {
            return shared[i];
        }

        return cell.CellValue?.Text ?? "";
    }

    /// <summary>RFC 4180 records of a CSV file (<see cref="Rfc4180Csv"/>).</summary>
    public static IReadOnlyList<IReadOnlyList<string>> CsvRecords(string text) => Rfc4180Csv.Read(text);

    /// <summary>The rows of the table whose column line starts with <paramref name="firstColumns"/>, up to the next blank line, as column → value.</summary>
    public static IReadOnlyList<IReadOnlyDictionary<string, string>> Table(IReadOnlyList<IReadOnlyList<string>> records, params string[] firstColumns)
    {
        var start = records.ToList().FindIndex(r => r.Count >= firstColumns.Length && r.Take(firstColumns.Length).SequenceEqual(firstColumns));
        Assert.True(start >= 0, $"no table with columns {string.Join(", ", firstColumns)}");
        var header = records[start];
        return records.Skip(start + 1)
            .TakeWhile(r => r.Count > 0 && !(r.Count == 1 && r[0].Length == 0))
            .Select(r => (IReadOnlyDictionary<string, string>)header.Select((h, k) => (h, v: k < r.Count ? r[k] : "")).ToDictionary(x => x.h, x => x.v))
            .ToList();
    }

    /// <summary>The value of a label line of the header block (label in the first column, value in the second).</summary>
    public static string HeaderValue(IReadOnlyList<IReadOnlyList<string>> records, string label) =>
        records.FirstOrDefault(r => r.Count >= 2 && r[0] == label)?[1] ?? throw new InvalidOperationException($"no header line '{label}'");
}
