using System.Globalization;
using PdfSharp.Drawing;
using TrussWeb.Core.Design;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;
using TrussWeb.Core.TrussDesign;
using TrussWeb.Reports.Model;
using TrussWeb.Reports.Pdf;
using TrussWeb.Reports.Summary;

namespace TrussWeb.Reports.Book;

/// <summary>
/// The calculation sheet of one member: section drawing and properties, forces, lengths and their
/// sources, the checks, connectors of built-up members, then every step and note of the record,
/// flowing over as many pages as it needs; the result line last.
/// </summary>
internal static class MemberSheet
{
    private const double DrawingSize = 178;

    public static void Write(PdfCanvas c, TrussReportData truss, MemberOutcome m)
    {
        var review = truss.ReviewOf(m.Mark);
        c.Context = new PageContext(truss.Name, m.Mark, review.State);
        c.NewPage();
        var section = truss.MemberSections.TryGetValue(m.Mark, out var s) ? s : null;
        Title(c, m, review);
        if (section is not null)
        {
            SectionBlock(c, truss, m, section);
        }

        Forces(c, m);
        Lengths(c, m.Lengths);
        Checks(c, m.Design);
        if (section?.Family == SectionFamily.DoubleAngle)
        {
            Connectors(c, truss, m, section);
        }

        Record(c, m.Design);
        Result(c, m.Design);
    }

    private static void Title(PdfCanvas c, MemberOutcome m, MemberReviewInfo review)
    {
        c.Heading($"Member {m.Mark}: {m.Design.Designation}", c.Style.Heading, 60);
        var record = m.Design.Record?.Title ?? "";
        c.Paragraph($"Group {m.Group} · length {Display.Sig(m.Length / 1000)} m · {record}", c.Style.Body, spaceAfter: 1);
        var who = review.Checker.Length > 0 ? $" by {review.Checker}" : "";
        var comment = review.Comment.Length > 0 ? $": “{review.Comment}”" : "";
        c.Paragraph($"Review: {review.State}{who}{comment}", c.Style.BodyBold, spaceAfter: 4);
    }

    private static void SectionBlock(PdfCanvas c, TrussReportData truss, MemberOutcome m, SectionProperties p)
    {
        c.Ensure(DrawingSize + 8);
        var top = c.Y;
        var orientation = truss.Groups.TryGetValue(m.Group, out var g) ? g.Orientation : BackToBack.LongLegsBackToBack;
        SectionDrawing.Draw(c.G, c.Style, c.Left, top, DrawingSize, p, truss.DimensionsOf(p), orientation);

        var left = c.Left + DrawingSize + 10;
        var width = c.Right - left;
        var t = new TableWriter(c, [new("Property", 9), new("Value", 5, XStringAlignment.Far), new("Unit", 3), new("Property", 9), new("Value", 5, XStringAlignment.Far), new("Unit", 3)],
            width: width, left: left);
        var rows = Properties(p);
        for (var i = 0; i < rows.Count; i += 2)
        {
            var a = rows[i];
            var b = i + 1 < rows.Count ? rows[i + 1] : (Name: "", Value: "", Unit: "");
            t.Row([a.Name, a.Value, a.Unit, b.Name, b.Value, b.Unit]);
        }

        c.Y = Math.Max(c.Y, top + DrawingSize) + 4;
        if (p.Method.Length > 0)
        {
            c.Paragraph("Properties: " + p.Method, c.Style.Small, ReportStyle.GreyBrush, spaceAfter: 5);
        }
    }

    private static List<(string Name, string Value, string Unit)> Properties(SectionProperties p)
    {
        var rows = new List<(string, string, string)>
        {
            ("Area A", Display.Sig(p.Area), "mm²"),
            ("Mass per metre", Display.Sig(p.MassPerMetre), "kg/m"),
            ("Ix", Display.Sig(p.Ix), "mm⁴"),
            ("Iy", Display.Sig(p.Iy), "mm⁴"),
            ("rx", Display.Sig(p.Rx), "mm"),
            ("ry", Display.Sig(p.Ry), "mm"),
        };
        if (p.Family == SectionFamily.Angle)
        {
            rows.Add(("Iu", Display.Sig(p.Iu), "mm⁴"));
            rows.Add(("Iv", Display.Sig(p.Iv), "mm⁴"));
            rows.Add(("ru", Display.Sig(p.Ru), "mm"));
            rows.Add(("rv", Display.Sig(p.Rv), "mm"));
            rows.Add(("Ixy", Display.Sig(p.Ixy), "mm⁴"));
            rows.Add(("α (x-x to u-u)", Display.Sig(p.Alpha * 180 / Math.PI), "°"));
        }

        rows.Add(("Centroid ex", Display.Sig(p.CentroidX), "mm"));
        rows.Add(("Centroid ey", Display.Sig(p.CentroidY), "mm"));
        rows.Add(("Shear centre x0", Display.Sig(p.X0), "mm"));
        rows.Add(("Shear centre y0", Display.Sig(p.Y0), "mm"));
        rows.Add(("r0", Display.Sig(p.R0), "mm"));
        rows.Add(("H (Ω)", Display.Sig(p.H), ""));
        rows.Add(("J", Display.Sig(p.J), "mm⁴"));
        rows.Add(("Cw", Display.Sig(p.Cw), "mm⁶"));
        rows.Add(("Sx", Display.Sig(p.Sx), "mm³"));
        rows.Add(("Sy", Display.Sig(p.Sy), "mm³"));
        rows.Add(("Governing thickness", Display.Sig(p.GoverningThickness), "mm"));
        if (p.Family == SectionFamily.DoubleAngle)
        {
            rows.Add(("Gap s", Display.Sig(p.Gap), "mm"));
            if (p.Component is { } one)
            {
                rows.Add(("One angle: A1", Display.Sig(one.Area), "mm²"));
                rows.Add(("One angle: r min", Display.Sig(one.RMin), "mm"));
            }
        }

        return rows;
    }

    private static void Forces(PdfCanvas c, MemberOutcome m)
    {
        c.Heading("Design forces (largest over the ultimate combinations)", c.Style.SubHeading, 30);
        var t = new TableWriter(c, [new("Force", 6), new("Value (kN)", 4, XStringAlignment.Far), new("Combination", 12)]);
        t.Row(["Largest tension Tf", MemberSummaryReport.Force(m.Envelope.MaxTension / 1000), m.Envelope.TensionCombination ?? "-"]);
        t.Row(["Largest compression Cf", MemberSummaryReport.Force(m.Envelope.MaxCompression / 1000), m.Envelope.CompressionCombination ?? "-"]);
        t.Row(["Combination governing the utilization", "", m.GoverningCombination ?? "-"]);
        t.End();
    }

    private static void Lengths(PdfCanvas c, EffectiveLengths l)
    {
        c.Heading("Buckling lengths and their sources", c.Style.SubHeading, 30);
        var t = new TableWriter(c, [new("Axis", 8), new("L (mm)", 4, XStringAlignment.Far), new("K", 3, XStringAlignment.Far), new("Source", 14)]);
        t.Row(["x-x, in plane (Lx)", Display.Sig(l.Lx), Display.Sig(l.Kx), l.LxSource]);
        t.Row(["y-y, out of plane (Ly)", Display.Sig(l.Ly), Display.Sig(l.Ky), l.LySource]);
        t.Row(["torsion (Lz)", Display.Sig(l.Lz), Display.Sig(l.Kz), l.LzSource]);
        if (l.KLu is { } klu)
        {
            t.Row(["u-u, given KLu", Display.Sig(klu), "incl.", "given by the user"]);
        }

        if (l.KLv is { } klv)
        {
            t.Row(["v-v, given KLv", Display.Sig(klv), "incl.", "given by the user"]);
        }

        t.End();
    }

    private static void Checks(PdfCanvas c, MemberDesignResult d)
    {
        c.Heading("Checks", c.Style.SubHeading, 30);
        var t = new TableWriter(c, [new("Check", 10), new("Demand", 4, XStringAlignment.Far), new("Resistance", 4, XStringAlignment.Far), new("Unit", 2.5),
            new("Utilization", 4, XStringAlignment.Far), new("Status", 4), new("Reference", 10)]);
        foreach (var check in d.Checks)
        {
            var (demand, resistance, unit) = check.Unit == "N"
                ? (check.Demand / 1000, check.Resistance / 1000, "kN")
                : (check.Demand, check.Resistance, check.Unit);
            var governs = check.Name == d.GoverningCheck;
            t.Row([TableCell.Of((check.Name, governs ? c.Style.TableBold : null, null)), Display.Sig(demand), Display.Sig(resistance), unit,
                TableCell.Of((Display.Sig(check.Utilization), governs ? c.Style.TableBold : null, null)), MemberSummaryReport.StatusText(check.Status), check.Reference]);
        }

        t.End();
    }

    private static void Connectors(PdfCanvas c, TrussReportData truss, MemberOutcome m, SectionProperties section)
    {
        c.Heading("Connectors of the built-up member", c.Style.SubHeading, 20);
        var given = truss.Groups.TryGetValue(m.Group, out var g) ? g.Connectors : null;
        var (count, spacing) = MemberSummaryTable.Connectors(m.Design.Record, section, given?.IntermediateCount);
        var text = spacing is { } a
            ? $"Interconnectors (packs) between the two angles: {(count is { } n ? n.ToString(CultureInfo.InvariantCulture) + " intermediate, " : "")}spacing a = {Display.Sig(a)} mm " +
              $"({(given?.IntermediateCount is not null || given?.Spacing is not null ? "given" : "proposed by TrussWeb")}); the steps of the connector check are in the record below."
            : "No connector check in the record: the member is never in compression, so the connector spacing is not governed by buckling. Provide connectors to detailing practice.";
        c.Paragraph(text, c.Style.Body, spaceAfter: 5);
    }

    private static void Record(PdfCanvas c, MemberDesignResult d)
    {
        c.Heading("Calculation record", c.Style.SubHeading, 40);
        if (d.Record is null)
        {
            c.Paragraph("No calculation record: this design was run without records.", c.Style.Body);
            return;
        }

        var (memberNotes, groups) = RecordGroups.Split(d);
        foreach (var note in memberNotes)
        {
            c.Paragraph("• " + note, c.Style.Small, indent: 4, spaceAfter: 1);
        }

        c.Space(3);
        foreach (var group in groups)
        {
            c.Heading(group.Title, c.Style.BodyBold, 30);
            var t = new TableWriter(c, [new("Symbol", 6), new("Description · expression · substituted values", 30), new("Value", 6, XStringAlignment.Far),
                new("Unit", 3.5), new("Reference", 13)]);
            foreach (var step in group.Steps)
            {
                t.Row(
                [
                    TableCell.Of((step.Symbol, c.Style.TableBold, null)),
                    TableCell.Of((step.Description, null, null), (step.Expression, c.Style.Mono, ReportStyle.GreyBrush), ("= " + step.Substituted, c.Style.Mono, null)),
                    TableCell.Of((Display.Sig(step.Value), c.Style.TableBold, null)),
                    step.Unit,
                    TableCell.Of((step.Reference, c.Style.Small, ReportStyle.GreyBrush)),
                ]);
            }

            t.End(2);
            foreach (var note in group.Notes)
            {
                c.Paragraph("Note: " + note, c.Style.Small, indent: 4, spaceAfter: 1);
            }

            c.Space(4);
        }
    }

    private static void Result(PdfCanvas c, MemberDesignResult d)
    {
        var text = $"Result: utilization U = {Display.Sig(d.Utilization)} ({d.GoverningCheck}) · status {MemberSummaryReport.StatusText(d.Status)} · {d.StandardCode} module {d.StandardVersion}";
        var h = TextLayout.Measure(c.G, text, c.Style.BodyBold, c.Width - 8) + 6;
        c.Ensure(h);
        var fill = d.Status == CheckStatus.Pass ? XColor.FromArgb(226, 240, 228) : XColor.FromArgb(248, 222, 220);
        c.G.DrawRectangle(new XSolidBrush(fill), c.Left, c.Y, c.Width, h);
        TextLayout.Draw(c.G, text, c.Style.BodyBold, ReportStyle.InkBrush, c.Left + 4, c.Y + 3, c.Width - 8);
        c.Y += h + 4;
    }
}
