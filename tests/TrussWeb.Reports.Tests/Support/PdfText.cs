using UglyToad.PdfPig;
using UglyToad.PdfPig.Content;

namespace TrussWeb.Reports.Tests.Support;

/// <summary>Reads a PDF back with PdfPig: the words of each page joined by single spaces.</summary>
public static class PdfText
{
    public static IReadOnlyList<string> Pages(byte[] pdf)
    {
        using var doc = PdfDocument.Open(pdf);
        return doc.GetPages().Select(Text).ToList();
    }

    public static string Text(Page page) => Normalise(string.Join(" ", page.GetWords().Select(w => w.Text)));

    public static string Normalise(string text) => string.Join(" ", text.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries));
}
