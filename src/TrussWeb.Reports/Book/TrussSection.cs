using System.Globalization;
using PdfSharp.Drawing;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Records;
using TrussWeb.Reports.Model;
using TrussWeb.Reports.Pdf;
using TrussWeb.Reports.Summary;

namespace TrussWeb.Reports.Book;

/// <summary>
/// The pages of one truss before its member sheets: elevation with member marks, design summary,
/// sections per group, actions, load cases and combinations with every factor, the axial force
/// diagram of each governing combination and the utilization diagram.
/// </summary>
internal static class TrussSection
{
    public static void Write(PdfCanvas c, TrussReportData t)
    {
        c.Context = new PageContext(t.Name);
        c.NewPage();
        c.Heading($"Truss {t.Name}", c.Style.Title, 200);
        Elevation(c, t);
        Summary(c, t);
        Groups(c, t);
        Actions(c, t);
        LoadCases(c, t);
        Combinations(c, t);
        ForceDiagrams(c, t);
        UtilizationDiagram(c, t);
    }

    private static void Elevation(PdfCanvas c, TrussReportData t)
    {
        c.Heading("Elevation and member marks", c.Style.SubHeading, 200);
        var h = TrussDiagram.Draw(c, t.Model, 200, _ => new TrussDiagram.MemberStyle(ReportStyle.Ink, 0.9, _.Id, ReportStyle.Ink), showNodes: true);
        c.Y += h;
        c.Paragraph("Triangles: supports (grey: restrains horizontal movement). Circled nodes: lateral (out-of-plane) restraints.", c.Style.Small, ReportStyle.GreyBrush, spaceAfter: 6);
    }

    private static void Summary(PdfCanvas c, TrussReportData t)
    {
        var d = t.Design;
        c.Heading("Design summary", c.Style.SubHeading, 40);
        var tw = new TableWriter(c, [new("Item", 8), new("Value", 14)]);
        tw.Row(["Status", MemberSummaryReport.StatusText(d.Status)]);
        tw.Row(["Members", d.Members.Count.ToString(CultureInfo.InvariantCulture)]);
        tw.Row(["Largest utilization", Display.Sig(d.MaxUtilization)]);
        tw.Row(["Mass (kg)", Display.Sig(d.Mass)]);
        tw.Row(["Mass with connection allowance (kg)", $"{Display.Sig(d.MassWithAllowance)} (allowance factor {Display.Sig(t.Actions.ConnectionAllowance)})"]);
        tw.Row(["Span, truss spacing (mm)", $"{Display.Sig(t.Model.Span)}, {Display.Sig(t.Model.TrussSpacing)}"]);
        foreach (var defl in d.Analysis.Deflections)
        {
            tw.Row([$"Deflection check ({defl.Combination})", $"{(defl.Passes ? "passes" : "FAILS")}: {Display.Sig(defl.Deflection)} mm at node {defl.Node}, limit span/{Display.Sig(defl.Divisor)} = {Display.Sig(defl.Limit)} mm"]);
        }

        foreach (var w in d.Warnings)
        {
            tw.Row(["Warning: " + w.Field, w.Message]);
        }

        tw.End();
    }

    private static void Groups(PdfCanvas c, TrussReportData t)
    {
        c.Heading("Member groups and sections", c.Style.SubHeading, 40);
        var tw = new TableWriter(c, [new("Group", 6), new("Section", 10), new("Members", 3, XStringAlignment.Far), new("Double-angle gap (mm), arrangement", 8),
            new("Connectors", 6), new("Sizing", 5)]);
        foreach (var (name, g) in t.Groups)
        {
            var members = t.Design.Members.Where(m => m.Group == name).ToList();
            var sections = string.Join(", ", members.Select(m => m.Design.Designation).Distinct(StringComparer.Ordinal));
            var conn = g.Connectors is null ? "proposed per member" : g.Connectors.IntermediateCount is { } n ? $"{n} intermediate" : g.Connectors.Spacing is { } a ? $"at {Display.Sig(a)} mm" : "proposed per member";
            tw.Row([name, sections.Length > 0 ? sections : g.Section?.Designation ?? "-", members.Count.ToString(CultureInfo.InvariantCulture),
                $"{Display.Sig(g.DoubleAngleGap)}, {g.Orientation}", conn, g.Constraints is null ? "fixed section" : "sized"]);
        }

        tw.End();
    }

    private static void Actions(PdfCanvas c, TrussReportData t)
    {
        var a = t.Actions;
        c.Heading("Actions", c.Style.SubHeading, 40);
        var tw = new TableWriter(c, [new("Action", 12), new("Value", 4, XStringAlignment.Far), new("Unit", 3), new("Applied to", 8)]);
        tw.Row(["Roof covering", Display.Sig(a.RoofCoveringKPa), "kPa", "slope area"]);
        tw.Row(["Purlins and services", Display.Sig(a.PurlinsAndServicesKPa), "kPa", "slope area"]);
        tw.Row(["Imposed roof load", Display.Sig(a.ImposedKPaOnPlan), "kPa", "plan area"]);
        foreach (var w in a.WindCases)
        {
            tw.Row([$"Wind {w.Id}: {w.Name}, left slope", Display.Sig(w.LeftSlopePressureKPa), "kPa", "normal to slope (+ onto the roof)"]);
            tw.Row([$"Wind {w.Id}: {w.Name}, right slope", Display.Sig(w.RightSlopePressureKPa), "kPa", "normal to slope (+ onto the roof)"]);
        }

        tw.Row(["Connection allowance on self-weight", Display.Sig(a.ConnectionAllowance), "-", "member self-weight"]);
        tw.End();
    }

    private static void LoadCases(PdfCanvas c, TrussReportData t)
    {
        c.Heading("Load cases", c.Style.SubHeading, 40);
        var tw = new TableWriter(c, [new("Case", 3), new("Description", 12), new("Kind", 4), new("Nodal loads", 3, XStringAlignment.Far),
            new("Total Fx (kN)", 4, XStringAlignment.Far), new("Total Fy (kN)", 4, XStringAlignment.Far)]);
        foreach (var lc in t.LoadCases)
        {
            tw.Row([lc.Id, lc.Name, lc.Kind.ToString(), lc.Loads.Count.ToString(CultureInfo.InvariantCulture), Display.Sig(lc.TotalFx / 1000), Display.Sig(lc.TotalFy / 1000)]);
        }

        tw.End();
    }

    private static void Combinations(PdfCanvas c, TrussReportData t)
    {
        c.Heading("Load combinations (factor on each case)", c.Style.SubHeading, 40);
        var cases = t.LoadCases;
        var columns = new List<TableColumn> { new("Combination", 10), new("Limit state", 3) };
        columns.AddRange(cases.Select(lc => new TableColumn(lc.Id, 2.2, XStringAlignment.Far)));
        var tw = new TableWriter(c, columns);
        foreach (var combo in t.Combinations)
        {
            var cells = new List<TableCell> { combo.Name, combo.LimitState == LimitState.Uls ? "ULS" : "SLS" };
            cells.AddRange(cases.Select(lc => (TableCell)Display.Sig(combo.FactorFor(lc))));
            tw.Row(cells);
        }

        tw.End();
    }

    /// <summary>The combinations that govern at least one member, in combination order.</summary>
    internal static IReadOnlyList<string> GoverningCombinations(TrussReportData t)
    {
        var used = t.Design.Members.Select(m => m.GoverningCombination).Where(n => n is not null).ToHashSet(StringComparer.Ordinal);
        return t.Combinations.Select(x => x.Name).Where(used.Contains).ToList();
    }

    private static void ForceDiagrams(PdfCanvas c, TrussReportData t)
    {
        foreach (var name in GoverningCombinations(t))
        {
            var result = t.Design.Analysis.Combinations.FirstOrDefault(r => r.Name == name);
            if (result is null)
            {
                continue;
            }

            var max = result.MemberForces.Values.Select(Math.Abs).DefaultIfEmpty(0).Max();
            var governed = t.Design.Members.Count(m => m.GoverningCombination == name);
            c.Heading($"Axial forces, {name} (governs {governed} member(s)), kN", c.Style.SubHeading, 230);
            var h = TrussDiagram.Draw(c, t.Model, 190, m =>
            {
                var n = result.MemberForces.TryGetValue(m.Id, out var f) ? f : 0;
                var colour = n > 0 ? ReportStyle.Tension : n < 0 ? ReportStyle.Compression : ReportStyle.Grey;
                var width = max > 0 ? 0.5 + (3.0 * Math.Abs(n) / max) : 0.5;
                var label = n > 0 ? $"T {Display.Sig(n / 1000)}" : n < 0 ? $"C {Display.Sig(-n / 1000)}" : "0";
                return new TrussDiagram.MemberStyle(colour, width, label, colour);
            }, showNodes: false);
            c.Y += h;
            Legend(c, [(ReportStyle.Tension, "T: tension (blue)"), (ReportStyle.Compression, "C: compression (orange-red)"), (ReportStyle.Grey, "0: no force")],
                "Line weight grows with the magnitude of the force.");
        }
    }

    private static void UtilizationDiagram(PdfCanvas c, TrussReportData t)
    {
        c.Heading("Utilization of each member (largest over all checks and ultimate combinations)", c.Style.SubHeading, 230);
        var byMark = t.Design.Members.ToDictionary(m => m.Mark, StringComparer.Ordinal);
        var h = TrussDiagram.Draw(c, t.Model, 190, m =>
        {
            var u = byMark.TryGetValue(m.Id, out var o) ? o.Design.Utilization : double.NaN;
            var colour = double.IsNaN(u) ? ReportStyle.Grey : ReportStyle.UtilizationColour(u);
            return new TrussDiagram.MemberStyle(colour, 2.2, double.IsNaN(u) ? "-" : Display.Sig(u), ReportStyle.Ink);
        }, showNodes: false);
        c.Y += h;
        Legend(c, ReportStyle.UtilizationBands.Select(b => (b.Colour, b.Label)).ToList(), "Labels give the utilization of each member.");
    }

    private static void Legend(PdfCanvas c, IReadOnlyList<(XColor Colour, string Label)> items, string note)
    {
        c.Ensure(24);
        var g = c.G;
        var x = c.Left;
        foreach (var (colour, label) in items)
        {
            var w = TextLayout.Width(g, label, c.Style.Small);
            if (x + 20 + w > c.Right)
            {
                x = c.Left;
                c.Y += 10;
            }

            g.DrawLine(new XPen(colour, 3), x, c.Y + 4, x + 14, c.Y + 4);
            g.DrawString(label, c.Style.Small, ReportStyle.InkBrush, x + 17, c.Y, XStringFormats.TopLeft);
            x += 17 + w + 12;
        }

        c.Y += 11;
        c.Paragraph(note, c.Style.Small, ReportStyle.GreyBrush, spaceAfter: 8);
    }
}
