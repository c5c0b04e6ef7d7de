using System.Globalization;
using PdfSharp.Drawing;
using TrussWeb.Core.Sections;
using TrussWeb.Reports.Pdf;

namespace TrussWeb.Reports.Book;

/// <summary>
/// Draws a cross-section to scale from its dimensions: single angle (heel at the reference corner,
/// long leg along y), double angle with its gap, CHS, RHS; marks the centroid G, the shear centre S,
/// the geometric axes x-x and y-y and, for single angles, the principal axes u-u and v-v at α.
/// Only drawing geometry is worked out here; every property comes from <see cref="SectionProperties"/>.
/// </summary>
internal static class SectionDrawing
{
    private static readonly XPen Outline = new(XColor.FromArgb(30, 30, 30), 0.8);
    private static readonly XBrush Steel = new XSolidBrush(XColor.FromArgb(200, 206, 214));
    private static readonly XPen Axis = new(XColor.FromArgb(90, 90, 90), 0.4) { DashStyle = XDashStyle.DashDot };
    private static readonly XPen Principal = new(XColor.FromArgb(30, 90, 200), 0.5) { DashStyle = XDashStyle.Dash };

    /// <summary>Draws the section in the square box at (x, y) of side <paramref name="size"/>.</summary>
    public static void Draw(XGraphics g, ReportStyle style, double x, double y, double size, SectionProperties section, ISectionDimensions? dims, BackToBack orientation)
    {
        g.DrawRectangle(new XPen(ReportStyle.Rule, 0.4), x, y, size, size);
        if (dims is null)
        {
            TextLayout.Draw(g, "Section outline not available (no dimensions for " + section.Designation + ")", style.Small, ReportStyle.GreyBrush, x + 6, y + (size / 2) - 8, size - 12, XStringAlignment.Center);
            return;
        }

        // Local section coordinates (mm, y up) of the outline, centroid and shear centre.
        var (outlines, holes, centroid, width, height, originX, originY) = Geometry(section, dims, orientation);
        var inner = size - 44;
        var s = Math.Min(inner / width, inner / height);
        var cx = x + ((size - (width * s)) / 2) - (originX * s);
        var cy = y + 14 + ((inner - (height * s)) / 2) + (height * s) + (originY * s);
        XPoint P(double px, double py) => new(cx + (px * s), cy - (py * s));

        foreach (var poly in outlines)
        {
            g.DrawPolygon(Outline, Steel, poly.Select(p => P(p.X, p.Y)).ToArray(), XFillMode.Winding);
        }

        foreach (var poly in holes)
        {
            g.DrawPolygon(Outline, XBrushes.White, poly.Select(p => P(p.X, p.Y)).ToArray(), XFillMode.Winding);
        }

        var gc = P(centroid.X, centroid.Y);
        var reach = (Math.Max(width, height) * s * 0.62) + 6;
        Axes(g, style, gc, reach, section);
        g.DrawEllipse(XBrushes.Black, gc.X - 1.8, gc.Y - 1.8, 3.6, 3.6);
        g.DrawString("G", style.LabelBold, ReportStyle.InkBrush, gc.X + 2.5, gc.Y + 0.5, XStringFormats.TopLeft);
        var sc = P(centroid.X + section.X0, centroid.Y + section.Y0);
        g.DrawEllipse(new XPen(XColor.FromArgb(176, 28, 28), 0.7), sc.X - 2.5, sc.Y - 2.5, 5, 5);
        g.DrawLine(new XPen(XColor.FromArgb(176, 28, 28), 0.5), sc.X - 3.5, sc.Y, sc.X + 3.5, sc.Y);
        g.DrawLine(new XPen(XColor.FromArgb(176, 28, 28), 0.5), sc.X, sc.Y - 3.5, sc.X, sc.Y + 3.5);
        g.DrawString("S", style.LabelBold, new XSolidBrush(XColor.FromArgb(176, 28, 28)), sc.X - 8, sc.Y + 1.5, XStringFormats.TopLeft);

        var scale = 72.0 / 25.4 / s;
        var caption = string.Create(CultureInfo.InvariantCulture, $"Scale 1:{scale:0.#} · G centroid · S shear centre");
        TextLayout.Draw(g, caption, style.Label, ReportStyle.GreyBrush, x + 3, y + size - 11, size - 6, XStringAlignment.Center);
        TextLayout.Draw(g, section.Designation, style.LabelBold, ReportStyle.InkBrush, x + 3, y + 2, size - 6, XStringAlignment.Center);
    }

    private static void Axes(XGraphics g, ReportStyle style, XPoint gc, double reach, SectionProperties section)
    {
        g.DrawLine(Axis, gc.X - reach, gc.Y, gc.X + reach, gc.Y);
        g.DrawLine(Axis, gc.X, gc.Y - reach, gc.X, gc.Y + reach);
        g.DrawString("x", style.Label, ReportStyle.GreyBrush, gc.X + reach + 1, gc.Y - 4, XStringFormats.TopLeft);
        g.DrawString("y", style.Label, ReportStyle.GreyBrush, gc.X + 1, gc.Y - reach - 7, XStringFormats.TopLeft);
        if (section.Family != SectionFamily.Angle)
        {
            return;
        }

        // u-u at alpha counter-clockwise from x-x (page y points down, hence the sign).
        var ux = Math.Cos(section.Alpha);
        var uy = -Math.Sin(section.Alpha);
        g.DrawLine(Principal, gc.X - (reach * ux), gc.Y - (reach * uy), gc.X + (reach * ux), gc.Y + (reach * uy));
        g.DrawLine(Principal, gc.X + (reach * uy), gc.Y - (reach * ux), gc.X - (reach * uy), gc.Y + (reach * ux));
        var blue = new XSolidBrush(XColor.FromArgb(30, 90, 200));
        g.DrawString("u", style.LabelBold, blue, gc.X + (reach * ux) + 1, gc.Y + (reach * uy) - 3, XStringFormats.TopLeft);
        g.DrawString("v", style.LabelBold, blue, gc.X - (reach * uy) + 1, gc.Y + (reach * ux) - 3, XStringFormats.TopLeft);
        var alpha = string.Create(CultureInfo.InvariantCulture, $"α = {section.Alpha * 180 / Math.PI:0.0}°");
        g.DrawString(alpha, style.Label, blue, gc.X + 4, gc.Y + 4, XStringFormats.TopLeft);
    }

    private static (List<XPoint[]> Outlines, List<XPoint[]> Holes, XPoint Centroid, double Width, double Height, double OriginX, double OriginY)
        Geometry(SectionProperties section, ISectionDimensions dims, BackToBack orientation)
    {
        switch (dims)
        {
            case AngleDimensions a when section.Family == SectionFamily.DoubleAngle:
            {
                var shortBack = orientation == BackToBack.ShortLegsBackToBack && !a.IsEqualLeg;
                var back = shortBack ? a.ShortLeg : a.LongLeg;
                var outstand = shortBack ? a.LongLeg : a.ShortLeg;
                var half = section.Gap / 2;
                var right = AnglePolygon(outstand, back, a.Thickness, a.RootRadius).Select(p => new XPoint(p.X + half, p.Y)).ToArray();
                var left = right.Select(p => new XPoint(-p.X, p.Y)).Reverse().ToArray();
                var w = (2 * outstand) + section.Gap;
                return ([left, right], [], new XPoint(0, section.CentroidY), w, back, -w / 2, 0);
            }

            case AngleDimensions a:
                return ([AnglePolygon(a.ShortLeg, a.LongLeg, a.Thickness, a.RootRadius)], [], new XPoint(section.CentroidX, section.CentroidY), a.ShortLeg, a.LongLeg, 0, 0);
            case CircularHollowDimensions c:
            {
                var r = c.Diameter / 2;
                return ([Circle(r)], [Circle(r - c.Thickness)], new XPoint(0, 0), c.Diameter, c.Diameter, -r, -r);
            }

            case RectangularHollowDimensions r:
            {
                var ro = r.EffectiveOuterRadius;
                var ri = Math.Max(0, ro - r.Thickness);
                return ([RoundedRect(r.Width, r.Depth, ro)], [RoundedRect(r.Width - (2 * r.Thickness), r.Depth - (2 * r.Thickness), ri)],
                    new XPoint(0, 0), r.Width, r.Depth, -r.Width / 2, -r.Depth / 2);
            }

            default:
                return ([], [], new XPoint(0, 0), 1, 1, 0, 0);
        }
    }

    /// <summary>An angle with the heel at the origin, leg <paramref name="alongX"/> on x, leg <paramref name="alongY"/> on y, thickness t and root fillet r1.</summary>
    private static XPoint[] AnglePolygon(double alongX, double alongY, double t, double r1)
    {
        var pts = new List<XPoint> { new(0, 0), new(alongX, 0), new(alongX, t) };
        const int steps = 6;
        for (var i = 0; i <= steps; i++)
        {
            var phi = (Math.PI * 1.5) - (Math.PI / 2 * i / steps);
            pts.Add(new XPoint(t + r1 + (r1 * Math.Cos(phi)), t + r1 + (r1 * Math.Sin(phi))));
        }

        pts.Add(new XPoint(t, alongY));
        pts.Add(new XPoint(0, alongY));
        return [.. pts];
    }

    private static XPoint[] Circle(double r) =>
        Enumerable.Range(0, 48).Select(i => new XPoint(r * Math.Cos(2 * Math.PI * i / 48), r * Math.Sin(2 * Math.PI * i / 48))).ToArray();

    private static XPoint[] RoundedRect(double w, double h, double r)
    {
        var pts = new List<XPoint>();
        var corners = new[] { (w / 2 - r, h / 2 - r, 0.0), (-w / 2 + r, h / 2 - r, 90.0), (-w / 2 + r, -h / 2 + r, 180.0), (w / 2 - r, -h / 2 + r, 270.0) };
        foreach (var (x0, y0, start) in corners)
        {
            for (var i = 0; i <= 6; i++)
            {
                var phi = (start + (90.0 * i / 6)) * Math.PI / 180;
                pts.Add(new XPoint(x0 + (r * Math.Cos(phi)), y0 + (r * Math.Sin(phi))));
            }
        }

        return [.. pts];
    }
}
