using System.Globalization;
using PdfSharp.Drawing;
using TrussWeb.Core.Model;
using TrussWeb.Reports.Pdf;

namespace TrussWeb.Reports.Book;

/// <summary>Draws a truss elevation to scale in a band of the page, each member styled by the caller (colour, line weight, label).</summary>
internal static class TrussDiagram
{
    /// <summary>How one member is drawn.</summary>
    internal readonly record struct MemberStyle(XColor Colour, double Width, string Label, XColor LabelColour);

    /// <summary>Draws the truss scaled to fit <paramref name="maxHeight"/> and the page width; returns the height used (pt).</summary>
    public static double Draw(PdfCanvas c, TrussModel model, double maxHeight, Func<Member, MemberStyle> style, bool showNodes)
    {
        var g = c.G;
        var nodes = model.NodeMap();
        var minX = model.Nodes.Min(n => n.X);
        var maxX = model.Nodes.Max(n => n.X);
        var minY = model.Nodes.Min(n => n.Y);
        var maxY = model.Nodes.Max(n => n.Y);
        var dx = Math.Max(maxX - minX, 1);
        var dy = Math.Max(maxY - minY, 1);
        const double pad = 14;
        var s = Math.Min((c.Width - (2 * pad)) / dx, (maxHeight - (2 * pad)) / dy);
        var height = (dy * s) + (2 * pad);
        var ox = c.Left + ((c.Width - (dx * s)) / 2);
        var oy = c.Y + pad + (dy * s);
        XPoint P(Node n) => new(ox + ((n.X - minX) * s), oy - ((n.Y - minY) * s));

        var labelSize = Math.Clamp(s * 350, 4.2, 6.5);
        var labelFont = TextLayout.Font(DejaVuFontResolver.Condensed, Math.Round(labelSize * 4) / 4);
        var styles = model.Members.Select(m => (Member: m, Style: style(m))).ToList();
        foreach (var (m, st) in styles)
        {
            if (nodes.TryGetValue(m.StartNode, out var a) && nodes.TryGetValue(m.EndNode, out var b))
            {
                g.DrawLine(new XPen(st.Colour, st.Width) { LineCap = XLineCap.Round }, P(a), P(b));
            }
        }

        if (showNodes)
        {
            Supports(g, model, nodes, P);
            foreach (var n in model.Nodes)
            {
                var p = P(n);
                g.DrawEllipse(XBrushes.Black, p.X - 1.2, p.Y - 1.2, 2.4, 2.4);
                if (model.LateralRestraints.Contains(n.Id))
                {
                    g.DrawEllipse(new XPen(XColors.Black, 0.5), p.X - 3, p.Y - 3, 6, 6);
                }
            }
        }

        var placed = new List<XRect>(styles.Count);
        foreach (var (m, st) in styles)
        {
            if (st.Label.Length == 0 || !nodes.TryGetValue(m.StartNode, out var a) || !nodes.TryGetValue(m.EndNode, out var b))
            {
                continue;
            }

            var size = g.MeasureString(st.Label, labelFont);
            var box = LabelBox(P(a), P(b), size, placed);
            placed.Add(box);
            g.DrawRectangle(new XSolidBrush(XColor.FromArgb(235, 255, 255, 255)), box);
            g.DrawString(st.Label, labelFont, new XSolidBrush(st.LabelColour), box.X + 0.8, box.Y, XStringFormats.TopLeft);
        }

        var scale = 72.0 / 25.4 / s;
        var scaleText = string.Create(CultureInfo.InvariantCulture, $"Scale 1:{scale:F0} on A4 · span {dx / 1000:0.###} m · height {dy / 1000:0.###} m");
        TextLayout.DrawLine(g, scaleText, c.Style.Label, ReportStyle.GreyBrush, c.Left, c.Y + height - 7, c.Width, XStringAlignment.Far);
        return height;
    }

    /// <summary>Where along its member a label goes: the middle, else the first of a few points along the member where it overlaps no label placed before.</summary>
    private static XRect LabelBox(XPoint a, XPoint b, XSize size, List<XRect> placed)
    {
        XRect At(double t)
        {
            var x = a.X + ((b.X - a.X) * t);
            var y = a.Y + ((b.Y - a.Y) * t);
            return new XRect(x - (size.Width / 2) - 0.8, y - (size.Height / 2), size.Width + 1.6, size.Height);
        }

        foreach (var t in AlongMember)
        {
            var box = At(t);
            if (!placed.Exists(p => p.IntersectsWith(box)))
            {
                return box;
            }
        }

        return At(0.5);
    }

    private static readonly double[] AlongMember = [0.5, 0.38, 0.62, 0.27, 0.73];

    private static void Supports(XGraphics g, TrussModel model, Dictionary<string, Node> nodes, Func<Node, XPoint> at)
    {
        foreach (var support in model.Supports)
        {
            if (!nodes.TryGetValue(support.Node, out var n))
            {
                continue;
            }

            var p = at(n);
            var tri = new[] { p, new XPoint(p.X - 4, p.Y + 6), new XPoint(p.X + 4, p.Y + 6) };
            g.DrawPolygon(new XPen(XColors.Black, 0.6), support.RestrainsX ? XBrushes.Gray : XBrushes.White, tri, XFillMode.Winding);
        }
    }
}
