using TrussWeb.Core.Design;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Standards.Sans10162;

namespace TrussWeb.Web.Components.Sections;

/// <summary>
/// Points of the factored compressive resistance Cr against effective length for one section and
/// material, each from <see cref="Compression.Resistance"/> (SANS 10162-1 cl. 13.3). The member's own
/// lengths are scaled together (ratios Lx : Ly : Lz kept), so the curve passes through the member's
/// point; the abscissa is KL = max(KxLx, KyLy). Whole-member buckling only: a built-up member's
/// connector effects and a class 4 effective area enter only through <c>area</c> as given.
/// </summary>
public sealed class ResistanceCurveData
{
    /// <summary>Points on the curve, besides the member's own.</summary>
    public const int DefaultPointCount = 60;

    /// <summary>The curve spans 0 &lt; KL ≤ this multiple of the member's KL.</summary>
    public const double SpanFactor = 2.5;

    private ResistanceCurveData(IReadOnlyList<ResistancePoint> points, ResistancePoint member, double cf)
    {
        Points = points;
        Member = member;
        Cf = cf;
    }

    /// <summary>Ascending in effective length; includes <see cref="Member"/>.</summary>
    public IReadOnlyList<ResistancePoint> Points { get; }

    /// <summary>The member's own effective length and Cr.</summary>
    public ResistancePoint Member { get; }

    /// <summary>The member's factored compressive force Cf, N.</summary>
    public double Cf { get; }

    /// <summary>The member's KL = max(KxLx, KyLy), mm (the abscissa of its point).</summary>
    public static double EffectiveLengthOf(EffectiveLengths l)
    {
        ArgumentNullException.ThrowIfNull(l);
        return Math.Max(l.Kx * l.Lx, l.Ky * l.Ly);
    }

    /// <param name="section">Section, mm.</param>
    /// <param name="material">Material, MPa.</param>
    /// <param name="lengths">The member's effective lengths, mm.</param>
    /// <param name="cf">Factored compressive force Cf, N (≥ 0).</param>
    /// <param name="n">Compression exponent (see <see cref="DesignOptions.CompressionExponent"/>).</param>
    /// <param name="area">Area for Cr, mm²; null = the gross area.</param>
    /// <param name="pointCount">Points on the curve.</param>
    public static ResistanceCurveData Build(SectionProperties section, Material material, EffectiveLengths lengths, double cf,
        double n = 1.34, double? area = null, int pointCount = DefaultPointCount)
    {
        ArgumentNullException.ThrowIfNull(section);
        ArgumentNullException.ThrowIfNull(material);
        ArgumentNullException.ThrowIfNull(lengths);
        ArgumentOutOfRangeException.ThrowIfLessThan(pointCount, 2);
        var a = area ?? section.Area;
        var kl = EffectiveLengthOf(lengths);
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(kl, nameof(lengths));
        var member = new ResistancePoint(kl, Compression.Resistance(section, material, lengths, n, a, null, null).Cr);
        var points = new List<ResistancePoint>(pointCount + 1);
        for (var i = 1; i <= pointCount; i++)
        {
            var f = SpanFactor * i / pointCount;
            if (Math.Abs(f - 1) < 1e-9)
            {
                continue;
            }

            points.Add(new ResistancePoint(kl * f, Compression.Resistance(section, material, Scaled(lengths, f), n, a, null, null).Cr));
        }

        points.Add(member);
        points.Sort((p, q) => p.EffectiveLength.CompareTo(q.EffectiveLength));
        return new ResistanceCurveData(points, member, cf);
    }

    private static EffectiveLengths Scaled(EffectiveLengths l, double f) => l with
    {
        Lx = l.Lx * f,
        Ly = l.Ly * f,
        Lz = l.Lz * f,
        KLu = l.KLu * f,
        KLv = l.KLv * f,
    };
}
