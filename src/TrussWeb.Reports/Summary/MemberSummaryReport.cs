using PdfSharp.Drawing;
using PdfSharp.Pdf;
using TrussWeb.Core.Records;
using TrussWeb.Reports.Model;
using TrussWeb.Reports.Pdf;

namespace TrussWeb.Reports.Summary;

/// <summary>
/// The member summary as a landscape A4 PDF: one row per member (mark, group, section, length, the
/// largest tension and compression with their combinations, utilization, governing check,
/// connectors, review state, mass per metre), the table continuing across pages with its headings
/// repeated; then the quantities per section and per truss. Every page has the frame (header,
/// banner when not for construction, caution, page x of y).
/// </summary>
public static class MemberSummaryReport
{
    public const string Title = "Member summary";

    private static readonly TableColumn[] MemberColumns =
    [
        new("Truss", 4.6), new("Mark", 3.8), new("Group", 6.8), new("Section", 10), new("Length (m)", 4.2, XStringAlignment.Far),
        new("Max tension (kN)", 5.4, XStringAlignment.Far), new("Tension combination", 8), new("Max compression (kN)", 7, XStringAlignment.Far),
        new("Compression combination", 8), new("Utilization", 6, XStringAlignment.Far), new("Governing check", 9.2), new("Status", 4.4),
        new("Connectors", 6), new("Review", 5.4), new("Mass (kg)", 4.4, XStringAlignment.Far),
    ];

    /// <summary>Renders the summary.</summary>
    public static RenderedPdf Render(ReportHeader header, IReadOnlyList<TrussReportData> trusses)
    {
        ArgumentNullException.ThrowIfNull(header);
        ArgumentNullException.ThrowIfNull(trusses);
        var table = MemberSummaryTable.From(trusses);
        var style = new ReportStyle();
        using var document = new PdfDocument();
        document.Info.Title = $"{header.ProjectName}: {Title}";
        document.Info.Creator = $"TrussWeb {header.AppVersion}";
        using var canvas = new PdfCanvas(document, landscape: true, PageFrame.TopBand(header), PageFrame.FooterHeight, style);
        canvas.NewPage();
        TitleBlock(canvas, header, table);
        Members(canvas, table);
        SectionTotals(canvas, table);
        TrussTotals(canvas, table);
        canvas.Dispose();
        PageFrame.DrawAll(canvas, header, Title);
        var pageCount = document.PageCount;
        using var stream = new MemoryStream();
        document.Save(stream, false);
        return new RenderedPdf(stream.ToArray(), pageCount, []);
    }

    private static void TitleBlock(PdfCanvas c, ReportHeader h, MemberSummaryTable table)
    {
        c.Heading($"{Title}: {h.ProjectName}", c.Style.Heading, 20);
        c.Paragraph($"{table.Rows.Count} members in {table.TrussTotals.Count} truss(es). {h.ApprovalStatusText}. Forces are the largest over the ultimate " +
            "combinations; utilization is the largest demand over resistance of all checks of the member.", c.Style.Body, spaceAfter: 5);
        foreach (var note in h.Notes)
        {
            c.Paragraph(note, c.Style.BodyBold, spaceAfter: 3);
        }
    }

    private static void Members(PdfCanvas c, MemberSummaryTable table)
    {
        var t = new TableWriter(c, MemberColumns);
        foreach (var r in table.Rows)
        {
            var fail = r.Status != CheckStatus.Pass;
            t.Row(
            [
                r.Truss, r.Mark, r.Group, r.Section, Display.Sig(r.LengthM), Force(r.MaxTensionKN), r.TensionCombination,
                Force(r.MaxCompressionKN), r.CompressionCombination,
                TableCell.Of((Display.Sig(r.Utilization), fail ? c.Style.TableBold : null, null)), r.GoverningCheck,
                TableCell.Of((StatusText(r.Status), fail ? c.Style.TableBold : null, null)), r.ConnectorText, r.ReviewState, Display.Sig(r.MassKg),
            ]);
        }

        t.End(10);
    }

    private static void SectionTotals(PdfCanvas c, MemberSummaryTable table)
    {
        c.Heading("Quantities per section", c.Style.SubHeading, 30);
        var t = new TableWriter(c, [new("Truss", 6), new("Section", 12), new("Members", 4, XStringAlignment.Far), new("Length (m)", 5, XStringAlignment.Far),
            new("Mass (kg)", 5, XStringAlignment.Far)], width: c.Width * 0.6);
        foreach (var s in table.SectionTotals)
        {
            t.Row([s.Truss, s.Section, s.Count.ToString(System.Globalization.CultureInfo.InvariantCulture), Display.Sig(s.LengthM), Display.Sig(s.MassKg)]);
        }

        t.End(10);
    }

    private static void TrussTotals(PdfCanvas c, MemberSummaryTable table)
    {
        c.Heading("Totals per truss", c.Style.SubHeading, 30);
        var t = new TableWriter(c, [new("Truss", 6), new("Members", 4, XStringAlignment.Far), new("Mass (kg)", 5, XStringAlignment.Far),
            new("Mass with connection allowance (kg)", 7, XStringAlignment.Far), new("Max utilization", 5, XStringAlignment.Far)], width: c.Width * 0.6);
        foreach (var x in table.TrussTotals)
        {
            t.Row([x.Truss, x.Count.ToString(System.Globalization.CultureInfo.InvariantCulture), Display.Sig(x.MassKg), Display.Sig(x.MassWithAllowanceKg),
                Display.Sig(x.MaxUtilization)], bold: true);
        }

        t.End();
        c.Paragraph("Masses exclude the connection allowance unless stated; the allowance factor is the one in the truss actions.", c.Style.Small, ReportStyle.GreyBrush);
    }

    internal static string Force(double kn) => kn > 0 ? Display.Sig(kn) : "-";

    internal static string StatusText(CheckStatus s) => s switch
    {
        CheckStatus.Pass => "Pass",
        CheckStatus.Fail => "FAIL",
        CheckStatus.OutOfScope => "Out of scope",
        _ => "n/a",
    };
}
