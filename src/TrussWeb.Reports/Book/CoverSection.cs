using PdfSharp.Drawing;
using TrussWeb.Core;
using TrussWeb.Reports.Model;
using TrussWeb.Reports.Pdf;

namespace TrussWeb.Reports.Book;

/// <summary>The cover: project, client, location, revision, date, designer, checker, approval status, standard, caution.</summary>
internal static class CoverSection
{
    public static void Write(PdfCanvas c, ReportHeader h, IReadOnlyList<TrussReportData> trusses)
    {
        c.Context = PageContext.None;
        c.NewPage();
        c.Space(40);
        c.Heading(CalculationBook.Title, new XFont(DejaVuFontResolver.Sans, 24, XFontStyleEx.Bold), 100);
        c.Paragraph("Steel roof truss members", c.Style.Heading, spaceAfter: 30);
        var t = new TableWriter(c, [new("", 6), new("", 16)], font: c.Style.Body, headFont: c.Style.BodyBold);
        t.Row([TableCell.Of(("Project", c.Style.BodyBold, null)), $"{h.ProjectName} ({h.ProjectNumber})"]);
        t.Row([TableCell.Of(("Client", c.Style.BodyBold, null)), Or(h.Client)]);
        t.Row([TableCell.Of(("Location", c.Style.BodyBold, null)), Or(h.Location)]);
        t.Row([TableCell.Of(("Revision", c.Style.BodyBold, null)), h.Revision]);
        t.Row([TableCell.Of(("Date", c.Style.BodyBold, null)), h.ProducedAtText]);
        t.Row([TableCell.Of(("Produced by", c.Style.BodyBold, null)), Or(h.ProducedBy)]);
        t.Row([TableCell.Of(("Designer", c.Style.BodyBold, null)), Or(h.Designer)]);
        t.Row([TableCell.Of(("Checker", c.Style.BodyBold, null)), Or(h.Checker)]);
        t.Row([TableCell.Of(("Status", c.Style.BodyBold, null)), TableCell.Of((h.ApprovalStatusText, c.Style.BodyBold, null), (h.BannerText ?? "For construction", null, null))]);
        t.Row([TableCell.Of(("Trusses", c.Style.BodyBold, null)), string.Join(", ", trusses.Select(x => $"{x.Name} ({x.Design.Members.Count} members)"))]);
        t.Row([TableCell.Of(("Design standard", c.Style.BodyBold, null)), h.StandardEdition]);
        t.Row([TableCell.Of(("Software", c.Style.BodyBold, null)), $"TrussWeb {h.AppVersion}"]);
        t.End(30);
        foreach (var note in h.Notes)
        {
            c.Paragraph(note, c.Style.BodyBold, spaceAfter: 3);
        }

        c.Heading("Caution", c.Style.SubHeading, 30);
        c.Paragraph(Caution.Text, c.Style.Body);
    }

    private static string Or(string s) => string.IsNullOrWhiteSpace(s) ? "-" : s;
}
