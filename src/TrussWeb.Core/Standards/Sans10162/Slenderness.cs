using TrussWeb.Core.Design;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;

namespace TrussWeb.Core.Standards.Sans10162;

/// <summary>
/// Maximum slenderness, SANS 10162-1 cl. 10.4.2: compression members KL/r ≤ 200 (cl. 10.4.2.1),
/// tension members L/r ≤ 300 (cl. 10.4.2.2). Demand = slenderness, resistance = limit (both
/// dimensionless). Single angles use the principal axes (KL = max(KxLx, KyLy) unless KLu/KLv are
/// given; for tension L/rv with L = max(Lx, Ly)); other sections x-x and y-y.
/// </summary>
public static class Slenderness
{
    /// <summary>Largest effective slenderness KL/r of the member about its buckling axes, dimensionless.</summary>
    public static double CompressionSlenderness(SectionProperties section, EffectiveLengths lengths)
    {
        ArgumentNullException.ThrowIfNull(section);
        ArgumentNullException.ThrowIfNull(lengths);
        if (section.Family == SectionFamily.Angle)
        {
            var klMax = Math.Max(lengths.Kx * lengths.Lx, lengths.Ky * lengths.Ly);
            return Math.Max((lengths.KLu ?? klMax) / section.Ru, (lengths.KLv ?? klMax) / section.Rv);
        }

        return Math.Max(lengths.Kx * lengths.Lx / section.Rx, lengths.Ky * lengths.Ly / section.Ry);
    }

    /// <summary>Largest unbraced slenderness L/r of a tension member, dimensionless (K not applied).</summary>
    public static double TensionSlenderness(SectionProperties section, EffectiveLengths lengths)
    {
        ArgumentNullException.ThrowIfNull(section);
        ArgumentNullException.ThrowIfNull(lengths);
        if (section.Family == SectionFamily.Angle)
        {
            return Math.Max(lengths.Lx, lengths.Ly) / section.Rv;
        }

        return Math.Max(lengths.Lx / section.Rx, lengths.Ly / section.Ry);
    }

    /// <summary>Compression slenderness check KL/r ≤ limit (200 by default, cl. 10.4.2.1).</summary>
    public static CheckResult CheckCompression(SectionProperties section, EffectiveLengths lengths, double limit, CalcRecord? record)
    {
        var kl = CompressionSlenderness(section, lengths);
        record?.Add("(KL/r)max", "Largest effective slenderness of the compression member", "max(KL/r)", Display.S(kl), kl, "", Sans10162References.SlendernessCompression);
        return Limit("Slenderness (compression)", kl, limit, Sans10162References.SlendernessCompression, record);
    }

    /// <summary>Tension slenderness check L/r ≤ limit (300 by default, cl. 10.4.2.2).</summary>
    public static CheckResult CheckTension(SectionProperties section, EffectiveLengths lengths, double limit, CalcRecord? record)
    {
        var lr = TensionSlenderness(section, lengths);
        record?.Add("(L/r)max", "Largest slenderness of the tension member", "max(L/r)", Display.S(lr), lr, "", Sans10162References.SlendernessTension);
        return Limit("Slenderness (tension)", lr, limit, Sans10162References.SlendernessTension, record);
    }

    private static CheckResult Limit(string name, double value, double limit, string reference, CalcRecord? record)
    {
        if (!(limit > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(limit), limit, "the slenderness limit must be greater than 0");
        }

        var u = value / limit;
        record?.Add("limit", "Slenderness limit", "limit", Display.S(limit), limit, "", reference);
        record?.Add("ratio", "Slenderness over its limit", "(KL/r) / limit", $"{Display.S(value)} / {Display.S(limit)}", u, "", reference);
        return new CheckResult(name, value, limit, u, u <= 1 ? CheckStatus.Pass : CheckStatus.Fail, "", reference, record);
    }
}
