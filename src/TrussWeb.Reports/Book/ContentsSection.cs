using System.Globalization;
using PdfSharp.Drawing;
using TrussWeb.Reports.Pdf;

namespace TrussWeb.Reports.Book;

/// <summary>
/// The contents: pages are reserved before the content is laid out (the number of entries is known)
/// and filled in at the end, when every entry's page is known.
/// </summary>
internal static class ContentsSection
{
    private const double LineHeight = 11.5;
    private const double TitleSpace = 24;

    /// <summary>Pages needed for <paramref name="entries"/> lines.</summary>
    public static int PagesFor(PdfCanvas c, int entries)
    {
        var perPage = LinesPerPage(c);
        return Math.Max(1, (entries + perPage - 1) / perPage);
    }

    private static int LinesPerPage(PdfCanvas c) => (int)Math.Floor((c.Bottom - c.Top - TitleSpace) / LineHeight);

    /// <summary>Adds <paramref name="pages"/> blank contents pages; returns the index of the first.</summary>
    public static int Reserve(PdfCanvas c, int pages)
    {
        c.Context = PageContext.None;
        var first = c.Document.PageCount;
        for (var i = 0; i < pages; i++)
        {
            // The title is drawn now so that no page is left with an empty content stream (poppler rejects
            // an empty compressed stream); the entries follow in Fill.
            c.NewPage();
            c.G.DrawString(i == 0 ? "Contents" : "Contents (continued)", c.Style.Heading, ReportStyle.InkBrush, c.Left, c.Top, XStringFormats.TopLeft);
        }

        return first;
    }

    /// <summary>Writes the entries onto the reserved pages.</summary>
    public static void Fill(PdfCanvas c, int firstPageIndex, IReadOnlyList<ContentsEntry> entries)
    {
        var perPage = LinesPerPage(c);
        var style = c.Style;
        for (var p = 0; p * perPage < Math.Max(entries.Count, 1); p++)
        {
            using var g = XGraphics.FromPdfPage(c.Document.Pages[firstPageIndex + p], XGraphicsPdfPageOptions.Append);
            var y = c.Top + TitleSpace;
            foreach (var e in entries.Skip(p * perPage).Take(perPage))
            {
                var member = e.Member.Length > 0;
                var font = member ? style.Table : style.TableBold;
                var indent = member ? 14 : 0;
                var page = e.Page.ToString(CultureInfo.InvariantCulture);
                var pw = TextLayout.Width(g, page, font);
                var width = c.Width - indent - pw - 12;
                var title = Shorten(g, e.Title, font, width);
                TextLayout.DrawLine(g, title, font, ReportStyle.InkBrush, c.Left + indent, y, width);
                var tw = TextLayout.Width(g, title, font);
                g.DrawLine(new XPen(ReportStyle.Rule, 0.3) { DashStyle = XDashStyle.Dot }, c.Left + indent + tw + 3, y + 7, c.Right - pw - 3, y + 7);
                TextLayout.DrawLine(g, page, font, ReportStyle.InkBrush, c.Right - pw, y, pw, XStringAlignment.Far);
                y += LineHeight;
            }
        }
    }

    /// <summary>A contents line that does not fit is shortened with an ellipsis (the full title is on its page).</summary>
    private static string Shorten(XGraphics g, string text, XFont font, double width)
    {
        if (TextLayout.Width(g, text, font) <= width)
        {
            return text;
        }

        var t = text;
        while (t.Length > 1 && TextLayout.Width(g, t + "…", font) > width)
        {
            t = t[..^1];
        }

        return t + "…";
    }
}
