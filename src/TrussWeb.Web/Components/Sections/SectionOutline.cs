using System.Globalization;
using System.Text;
using TrussWeb.Core.Sections;

namespace TrussWeb.Web.Components.Sections;

/// <summary>
/// The geometry of a section drawing, to scale from its dimensions, in section coordinates (mm, x to
/// the right, y up, origin at the reference corner of <see cref="SectionProperties"/>): closed loops of
/// the outline (outer and, for hollow sections, inner), the centroid and shear centre from the
/// computed properties, and the principal angle. Roundings (root fillet, toes, corners) are drawn as
/// polylines along their arcs. Nothing here is an engineering formula: it is plot geometry.
/// </summary>
public sealed class SectionOutline
{
    /// <summary>Straight segments per quarter circle of a rounding.</summary>
    public const int SegmentsPerQuarter = 8;

    /// <summary>Straight segments of a full circle (CHS walls are drawn large, so finer than the corner roundings).</summary>
    public const int SegmentsPerCircle = 96;

    private SectionOutline(string designation, SectionFamily family, IReadOnlyList<IReadOnlyList<OutlinePoint>> loops,
        OutlinePoint centroid, OutlinePoint shearCentre, double alpha, bool showPrincipalAxes)
    {
        Designation = designation;
        Family = family;
        Loops = loops;
        Centroid = centroid;
        ShearCentre = shearCentre;
        Alpha = alpha;
        ShowPrincipalAxes = showPrincipalAxes;
        var all = loops.SelectMany(l => l).ToList();
        MinX = all.Min(p => p.X);
        MaxX = all.Max(p => p.X);
        MinY = all.Min(p => p.Y);
        MaxY = all.Max(p => p.Y);
    }

    public string Designation { get; }

    public SectionFamily Family { get; }

    /// <summary>Closed loops of the outline (the last point joins the first); fill with the even-odd rule.</summary>
    public IReadOnlyList<IReadOnlyList<OutlinePoint>> Loops { get; }

    /// <summary>Centroid from the properties, mm.</summary>
    public OutlinePoint Centroid { get; }

    /// <summary>Shear centre from the properties (centroid + (X0, Y0)), mm.</summary>
    public OutlinePoint ShearCentre { get; }

    /// <summary>Angle from x-x to u-u, rad, counter-clockwise (from <see cref="SectionProperties.Alpha"/>).</summary>
    public double Alpha { get; }

    /// <summary>True for single angles, whose principal axes u, v differ from x, y.</summary>
    public bool ShowPrincipalAxes { get; }

    public double MinX { get; }

    public double MaxX { get; }

    public double MinY { get; }

    public double MaxY { get; }

    public double Width => MaxX - MinX;

    public double Height => MaxY - MinY;

    /// <summary>The outline of a catalogue entry (single angles, CHS, RHS).</summary>
    public static SectionOutline For(ISectionDimensions dimensions, SectionProperties properties, DoubleAngleArrangement? pair = null)
    {
        ArgumentNullException.ThrowIfNull(dimensions);
        ArgumentNullException.ThrowIfNull(properties);
        return dimensions switch
        {
            AngleDimensions a when pair is not null => ForDoubleAngle(a, pair, properties),
            AngleDimensions a => ForAngle(a, properties),
            CircularHollowDimensions c => ForCircular(c, properties),
            RectangularHollowDimensions r => ForRectangular(r, properties),
            _ => throw new NotSupportedException($"no drawing for {dimensions.GetType().Name}"),
        };
    }

    /// <summary>Single angle: long leg d along y, short leg b along x, heel at the origin.</summary>
    public static SectionOutline ForAngle(AngleDimensions a, SectionProperties properties)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(properties);
        var loop = AngleLoop(a);
        return new SectionOutline(properties.Designation, SectionFamily.Angle, [loop],
            new OutlinePoint(properties.CentroidX, properties.CentroidY),
            new OutlinePoint(properties.CentroidX + properties.X0, properties.CentroidY + properties.Y0),
            properties.Alpha, showPrincipalAxes: true);
    }

    /// <summary>
    /// Double angle: two angles mirrored about y-y with the gap between the backs; origin at the outer toe of
    /// the left outstanding leg, y from the back of the outstanding legs (as <see cref="DoubleAngle"/> measures).
    /// </summary>
    public static SectionOutline ForDoubleAngle(AngleDimensions a, DoubleAngleArrangement pair, SectionProperties properties)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(pair);
        ArgumentNullException.ThrowIfNull(properties);
        var one = AngleLoop(a);
        if (pair.Orientation == BackToBack.ShortLegsBackToBack)
        {
            // Turn the angle so that its short leg runs along y (reflection about y = x).
            one = one.Select(p => new OutlinePoint(p.Y, p.X)).Reverse().ToList();
        }

        var outstand = one.Max(p => p.X);
        var right = one.Select(p => new OutlinePoint(outstand + pair.Gap + p.X, p.Y)).ToList();
        var left = one.Select(p => new OutlinePoint(outstand - p.X, p.Y)).Reverse().ToList();
        return new SectionOutline(properties.Designation, SectionFamily.DoubleAngle, [left, right],
            new OutlinePoint(properties.CentroidX, properties.CentroidY),
            new OutlinePoint(properties.CentroidX + properties.X0, properties.CentroidY + properties.Y0),
            properties.Alpha, showPrincipalAxes: false);
    }

    /// <summary>CHS: outer and inner circles in the bounding square D × D.</summary>
    public static SectionOutline ForCircular(CircularHollowDimensions c, SectionProperties properties)
    {
        ArgumentNullException.ThrowIfNull(c);
        ArgumentNullException.ThrowIfNull(properties);
        var r = c.Diameter / 2;
        var centre = new OutlinePoint(r, r);
        var outer = Arc(centre, r, 0, 2 * Math.PI, SegmentsPerCircle, closeDuplicate: false);
        var inner = Arc(centre, r - c.Thickness, 0, 2 * Math.PI, SegmentsPerCircle, closeDuplicate: false);
        return new SectionOutline(properties.Designation, SectionFamily.CircularHollow, [outer, inner],
            new OutlinePoint(properties.CentroidX, properties.CentroidY),
            new OutlinePoint(properties.CentroidX + properties.X0, properties.CentroidY + properties.Y0),
            properties.Alpha, showPrincipalAxes: false);
    }

    /// <summary>RHS: width b along x, depth h along y, outer corner radius ro and inner ro − t.</summary>
    public static SectionOutline ForRectangular(RectangularHollowDimensions r, SectionProperties properties)
    {
        ArgumentNullException.ThrowIfNull(r);
        ArgumentNullException.ThrowIfNull(properties);
        var ro = r.EffectiveOuterRadius;
        var outer = RoundedRectangle(0, 0, r.Width, r.Depth, ro);
        var inner = RoundedRectangle(r.Thickness, r.Thickness, r.Width - r.Thickness, r.Depth - r.Thickness, Math.Max(0, ro - r.Thickness));
        return new SectionOutline(properties.Designation, SectionFamily.RectangularHollow, [outer, inner],
            new OutlinePoint(properties.CentroidX, properties.CentroidY),
            new OutlinePoint(properties.CentroidX + properties.X0, properties.CentroidY + properties.Y0),
            properties.Alpha, showPrincipalAxes: false);
    }

    /// <summary>An SVG path ("M … L … Z" per loop) in drawing units: x' = (x − MinX)·scale + margin, y' = (MaxY − y)·scale + margin.</summary>
    public string SvgPath(double scale, double margin)
    {
        var sb = new StringBuilder();
        foreach (var loop in Loops)
        {
            for (var i = 0; i < loop.Count; i++)
            {
                var (x, y) = ToDrawing(loop[i], scale, margin);
                sb.Append(i == 0 ? "M" : "L").Append(F(x)).Append(' ').Append(F(y)).Append(' ');
            }

            sb.Append("Z ");
        }

        return sb.ToString().TrimEnd();
    }

    /// <summary>A section point in drawing units (SVG: y down).</summary>
    public (double X, double Y) ToDrawing(OutlinePoint p, double scale, double margin) =>
        ((p.X - MinX) * scale + margin, (MaxY - p.Y) * scale + margin);

    private static string F(double v) => v.ToString("0.###", CultureInfo.InvariantCulture);

    private static List<OutlinePoint> AngleLoop(AngleDimensions a)
    {
        var d = a.LongLeg;
        var b = a.ShortLeg;
        var t = a.Thickness;
        var r1 = a.RootRadius;
        var r2 = a.ToeRadius;
        var pts = new List<OutlinePoint> { new(0, 0), new(b, 0) };
        // Toe of the short leg: rounding at the inner edge, centre (b − r2, t − r2), from 0 to 90°.
        pts.AddRange(Arc(new OutlinePoint(b - r2, t - r2), r2, 0, Math.PI / 2, SegmentsPerQuarter));
        // Root fillet between the inner faces: concave, centre (t + r1, t + r1), from 270° down to 180°.
        pts.AddRange(Arc(new OutlinePoint(t + r1, t + r1), r1, 1.5 * Math.PI, Math.PI, SegmentsPerQuarter));
        // Toe of the long leg: centre (t − r2, d − r2), from 0 to 90°.
        pts.AddRange(Arc(new OutlinePoint(t - r2, d - r2), r2, 0, Math.PI / 2, SegmentsPerQuarter));
        pts.Add(new OutlinePoint(0, d));
        return Dedupe(pts);
    }

    private static List<OutlinePoint> RoundedRectangle(double x0, double y0, double x1, double y1, double r)
    {
        var pts = new List<OutlinePoint>();
        pts.AddRange(Arc(new OutlinePoint(x1 - r, y0 + r), r, 1.5 * Math.PI, 2 * Math.PI, SegmentsPerQuarter));
        pts.AddRange(Arc(new OutlinePoint(x1 - r, y1 - r), r, 0, 0.5 * Math.PI, SegmentsPerQuarter));
        pts.AddRange(Arc(new OutlinePoint(x0 + r, y1 - r), r, 0.5 * Math.PI, Math.PI, SegmentsPerQuarter));
        pts.AddRange(Arc(new OutlinePoint(x0 + r, y0 + r), r, Math.PI, 1.5 * Math.PI, SegmentsPerQuarter));
        return Dedupe(pts);
    }

    private static List<OutlinePoint> Arc(OutlinePoint centre, double radius, double from, double to, int segments, bool closeDuplicate = true)
    {
        var pts = new List<OutlinePoint>(segments + 1);
        var count = closeDuplicate ? segments : segments - 1;
        for (var i = 0; i <= count; i++)
        {
            var a = from + (to - from) * i / segments;
            pts.Add(new OutlinePoint(centre.X + radius * Math.Cos(a), centre.Y + radius * Math.Sin(a)));
        }

        return pts;
    }

    private static List<OutlinePoint> Dedupe(List<OutlinePoint> pts)
    {
        const double tolerance = 1e-9;
        var result = new List<OutlinePoint>(pts.Count);
        foreach (var p in pts)
        {
            if (result.Count == 0 || Math.Abs(result[^1].X - p.X) > tolerance || Math.Abs(result[^1].Y - p.Y) > tolerance)
            {
                result.Add(p);
            }
        }

        return result;
    }
}
