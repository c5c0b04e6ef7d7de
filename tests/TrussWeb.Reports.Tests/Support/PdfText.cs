using UglyToad.PdfPig;
using UglyToad.PdfPig.Content;
using UglyToad.PdfPig.DocumentLayoutAnalysis.TextExtractor;

namespace TrussWeb.Reports.Tests.Support;

/// <summary>Reads a PDF back with PdfPig: the words of each page joined by single spaces.</summary>
public static class PdfText
{
    public static IReadOnlyList<string> Pages(byte[] pdf)
    {
        using var doc = PdfDocument.Open(pdf);
        return doc.GetPages().Select(Text).ToList();
    }

    /// <summary>The page text in content-stream order (the order it was drawn: cell by cell), whitespace collapsed.</summary>
    public static string Text(Page page) => Normalise(ContentOrderTextExtractor.GetText(page));

    public static string Normalise(string text) => string.Join(" ", text.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries));
}
