using PdfSharp.Drawing;
using PdfSharp.Pdf;
using TrussWeb.Core;
using TrussWeb.Reports.Model;

namespace TrussWeb.Reports.Pdf;

/// <summary>
/// The band at the top and bottom of every page, drawn after the content so that "page x of y" is
/// known: project, number, client, revision, designer, checker, standard edition, app version; the
/// page's truss, member and review state; the not-for-construction banner when it applies; the full
/// caution text, the produced-at time and the page number.
/// </summary>
internal static class PageFrame
{
    public const double HeaderHeight = 52;
    public const double BannerHeight = 15;
    public const double FooterHeight = 38;
    private const int CautionLines = 3;

    /// <summary>Space the frame takes at the top of the content area.</summary>
    public static double TopBand(ReportHeader header) => HeaderHeight + (header.BannerText is null ? 0 : BannerHeight + 4);

    /// <summary>Draws the frame on every page of the canvas's document.</summary>
    public static void DrawAll(PdfCanvas canvas, ReportHeader header, string documentTitle)
    {
        var doc = canvas.Document;
        var total = doc.PageCount;
        for (var i = 0; i < total; i++)
        {
            using var g = XGraphics.FromPdfPage(doc.Pages[i], XGraphicsPdfPageOptions.Append);
            var context = i < canvas.PageContexts.Count ? canvas.PageContexts[i] : PageContext.None;
            Header(g, canvas, header, context, documentTitle);
            Banner(g, canvas, header);
            Footer(g, canvas, header, i + 1, total);
        }
    }

    private static void Header(XGraphics g, PdfCanvas c, ReportHeader h, PageContext context, string documentTitle)
    {
        var s = c.Style;
        var y = PdfCanvas.Margin;
        var rightWidth = c.Width * 0.38;
        var leftWidth = c.Width - rightWidth - 8;
        var project = $"{h.ProjectName} ({h.ProjectNumber})" + (h.Client.Length > 0 ? $" · {h.Client}" : "");
        var f1 = TextLayout.Fit(g, project, DejaVuFontResolver.Sans, 9, XFontStyleEx.Bold, leftWidth, 5.5);
        TextLayout.DrawLine(g, Clip(g, project, f1, leftWidth), f1, ReportStyle.InkBrush, c.Left, y, leftWidth);
        var rev = $"{documentTitle} · Rev {h.Revision} · {h.ProducedDateText}";
        var f1r = TextLayout.Fit(g, rev, DejaVuFontResolver.Sans, 9, XFontStyleEx.Bold, rightWidth, 5.5);
        TextLayout.DrawLine(g, Clip(g, rev, f1r, rightWidth), f1r, ReportStyle.InkBrush, c.Left + leftWidth + 8, y, rightWidth, XStringAlignment.Far);
        y += 12;

        var about = $"Truss: {Or(context.Truss)} · Member: {Or(context.Member)} · Review: {Or(context.Review)}";
        var f2 = TextLayout.Fit(g, about, DejaVuFontResolver.Condensed, 7.5, XFontStyleEx.Bold, leftWidth, 5);
        TextLayout.DrawLine(g, Clip(g, about, f2, leftWidth), f2, ReportStyle.InkBrush, c.Left, y, leftWidth);
        var people = $"Designer: {Or(h.Designer)} · Checker: {Or(h.Checker)}";
        var f2r = TextLayout.Fit(g, people, DejaVuFontResolver.Condensed, 7.5, XFontStyleEx.Regular, rightWidth, 5);
        TextLayout.DrawLine(g, Clip(g, people, f2r, rightWidth), f2r, ReportStyle.InkBrush, c.Left + leftWidth + 8, y, rightWidth, XStringAlignment.Far);
        y += 10;

        var standard = $"{h.StandardEdition} · TrussWeb {h.AppVersion} · {h.ApprovalStatusText}";
        var (f3, lines) = TextLayout.FitLines(g, standard, DejaVuFontResolver.Condensed, 6.5, XFontStyleEx.Regular, c.Width, 2, 4.5);
        foreach (var line in lines.Take(2))
        {
            TextLayout.DrawLine(g, line, f3, ReportStyle.GreyBrush, c.Left, y, c.Width);
            y += TextLayout.LineHeight(f3);
        }

        var ruleY = PdfCanvas.Margin + HeaderHeight - 6;
        g.DrawLine(new XPen(ReportStyle.Rule, 0.6), c.Left, ruleY, c.Right, ruleY);
    }

    private static void Banner(XGraphics g, PdfCanvas c, ReportHeader h)
    {
        if (h.BannerText is not { } text)
        {
            return;
        }

        var y = PdfCanvas.Margin + HeaderHeight - 2;
        g.DrawRectangle(new XSolidBrush(ReportStyle.Banner), c.Left, y, c.Width, BannerHeight);
        var f = TextLayout.Fit(g, text, DejaVuFontResolver.Sans, 9, XFontStyleEx.Bold, c.Width - 8, 5);
        TextLayout.DrawLine(g, text, f, ReportStyle.White, c.Left + 4, y + ((BannerHeight - TextLayout.LineHeight(f)) / 2) + 1, c.Width - 8, XStringAlignment.Center);
    }

    private static void Footer(XGraphics g, PdfCanvas c, ReportHeader h, int page, int total)
    {
        var top = c.PageHeight - PdfCanvas.Margin - FooterHeight + 4;
        g.DrawLine(new XPen(ReportStyle.Rule, 0.6), c.Left, top, c.Right, top);
        var (font, lines) = TextLayout.FitLines(g, Caution.Text, DejaVuFontResolver.Condensed, 6.5, XFontStyleEx.Regular, c.Width, CautionLines, 4);
        var y = top + 3;
        foreach (var line in lines)
        {
            TextLayout.DrawLine(g, line, font, ReportStyle.InkBrush, c.Left, y, c.Width);
            y += TextLayout.LineHeight(font);
        }

        var bottom = c.PageHeight - PdfCanvas.Margin - 8;
        var produced = $"Produced {h.ProducedAtText} · Rev {h.Revision} · {h.ProjectNumber}" + (string.IsNullOrWhiteSpace(h.ProducedBy) ? "" : $" · by {h.ProducedBy}");
        var pageText = $"Page {page} of {total}";
        var pf = c.Style.SubHeading;
        var pw = TextLayout.Width(g, pageText, pf);
        var f = TextLayout.Fit(g, produced, DejaVuFontResolver.Condensed, 7, XFontStyleEx.Regular, c.Width - pw - 10, 4.5);
        TextLayout.DrawLine(g, Clip(g, produced, f, c.Width - pw - 10), f, ReportStyle.GreyBrush, c.Left, bottom, c.Width - pw - 10);
        TextLayout.DrawLine(g, pageText, pf, ReportStyle.InkBrush, c.Right - pw, bottom - 1, pw, XStringAlignment.Far);
    }

    private static string Or(string text) => string.IsNullOrWhiteSpace(text) ? "-" : text;

    /// <summary>Last resort for a header line that does not fit even at the smallest size: cut with an ellipsis (headers only; never data).</summary>
    private static string Clip(XGraphics g, string text, XFont font, double width)
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
