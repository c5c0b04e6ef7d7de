using TrussWeb.Core.Design;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;

namespace TrussWeb.Core.Standards.Sans10162;

/// <summary>
/// Optional method for single angles loaded through one leg: the equivalent slenderness of
/// AISC 360-16 E5 (an AISC method offered as an option beside the SANS 10162-1 concentric check;
/// formulas from memory, confirm against the specification):
/// <code>
/// planar trusses: L/ra ≤ 80: Lc/r = 72 + 0.75 L/ra;  L/ra &gt; 80: Lc/r = 32 + 1.25 L/ra ≤ 200
/// space trusses:  L/ra ≤ 75: Lc/r = 60 + 0.8 L/ra;   L/ra &gt; 75: Lc/r = 45 + L/ra ≤ 200
/// unequal legs, connected through the short leg (bl/bs &lt; 1.7): add 4[(bl/bs)² − 1] (planar) or
/// 6[(bl/bs)² − 1] (space), and Lc/r ≥ 0.95 L/rz (planar) or 0.82 L/rz (space)
/// </code>
/// L = member length between work points, mm (max(Lx, Ly) used, K not applied); ra = radius of gyration
/// about the geometric axis parallel to the connected leg, mm (ry for the long leg, rx for the short leg
/// in TrussWeb's axes); rz = minor principal radius rv, mm; bl, bs = long and short leg, mm. Then
/// Fe = π²E/(Lc/r)² (flexural only) and Cr from SANS 10162-1 cl. 13.3.1.
/// Scope: single angles, end loads through the same leg, no transverse loads; bl/bs &lt; 1.7 when
/// connected through the short leg; Lc/r ≤ 200. Outside these: OutOfScope.
/// </summary>
public static class EccentricAngle
{
    /// <summary>Branch point of L/ra for planar trusses. Source: AISC 360-16 E5(a) (from memory).</summary>
    public const double PlanarBranch = 80;

    /// <summary>Branch point of L/ra for space trusses. Source: AISC 360-16 E5(b) (from memory).</summary>
    public const double SpaceBranch = 75;

    /// <summary>Largest equivalent slenderness covered. Source: AISC 360-16 E5 (from memory).</summary>
    public const double MaxEquivalentSlenderness = 200;

    /// <summary>Largest leg ratio bl/bs for connection through the short leg. Source: AISC 360-16 E5 (from memory).</summary>
    public const double MaxLegRatio = 1.7;

    /// <summary>Lc/r before the short-leg addition, dimensionless.</summary>
    public static double BaseEquivalentSlenderness(double lOverRa, bool planarTruss)
    {
        if (!(lOverRa > 0) || !double.IsFinite(lOverRa))
        {
            throw new ArgumentOutOfRangeException(nameof(lOverRa), lOverRa, "L/ra must be finite and greater than 0");
        }

        return planarTruss
            ? (lOverRa <= PlanarBranch ? 72 + 0.75 * lOverRa : 32 + 1.25 * lOverRa)
            : (lOverRa <= SpaceBranch ? 60 + 0.8 * lOverRa : 45 + lOverRa);
    }

    /// <summary>Lc/r with the short-leg addition and lower bound when <paramref name="throughShortLeg"/> (unequal legs), dimensionless.</summary>
    public static double EquivalentSlenderness(double lOverRa, bool planarTruss, bool throughShortLeg, double longLeg, double shortLeg, double lOverRz)
    {
        var lc = BaseEquivalentSlenderness(lOverRa, planarTruss);
        if (!throughShortLeg || longLeg <= shortLeg)
        {
            return lc;
        }

        var ratio = longLeg / shortLeg;
        var addition = (planarTruss ? 4 : 6) * (ratio * ratio - 1);
        var lowerBound = (planarTruss ? 0.95 : 0.82) * lOverRz;
        return Math.Max(lc + addition, lowerBound);
    }

    /// <summary>The optional eccentric-angle compression check of a single angle.</summary>
    public static CheckResult Check(SectionProperties section, Material material, EffectiveLengths lengths, DesignOptions options,
        double area, double compression, CalcRecord? record)
    {
        ArgumentNullException.ThrowIfNull(section);
        ArgumentNullException.ThrowIfNull(material);
        ArgumentNullException.ThrowIfNull(lengths);
        ArgumentNullException.ThrowIfNull(options);
        const string name = "Compression: eccentrically connected single angle (AISC 360-16 E5 option)";
        const string reference = Sans10162References.EccentricAngle;
        record?.Note("Option on: equivalent slenderness for a single angle connected through one leg, AISC 360-16 E5 (an AISC method offered as an option; not a SANS 10162-1 provision). Formulas from memory: confirm.");
        if (section.Family != SectionFamily.Angle)
        {
            record?.Note("The equivalent slenderness method applies to single angles only: out of scope for this section.");
            return new CheckResult(name, compression, 0, 0, CheckStatus.OutOfScope, "N", reference, record);
        }

        var legs = section.Elements.Where(e => e.Kind == ElementKind.AngleLeg).Select(e => e.Width).ToArray();
        var longLeg = legs.Length > 0 ? legs.Max() : 0;
        var shortLeg = legs.Length > 0 ? legs.Min() : 0;
        var unequal = longLeg > shortLeg;
        var throughShort = options.ConnectedThroughShortLeg && unequal;
        if (throughShort && longLeg / shortLeg >= MaxLegRatio)
        {
            record?.Note($"Connected through the short leg with bl/bs = {Display.S(longLeg / shortLeg)} ≥ 1.7: outside AISC 360-16 E5; out of scope.");
            return new CheckResult(name, compression, 0, 0, CheckStatus.OutOfScope, "N", reference, record);
        }

        var l = Math.Max(lengths.Lx, lengths.Ly);
        var ra = throughShort ? section.Rx : section.Ry;
        var lra = l / ra;
        var lrz = l / section.Rv;
        record?.Add("L/ra", $"Slenderness about the geometric axis parallel to the connected ({(throughShort ? "short" : "long")}) leg", "L / ra",
            $"{Display.S(l)} / {Display.S(ra)}", lra, "", reference);
        var baseLc = BaseEquivalentSlenderness(lra, options.PlanarTruss);
        var branch = options.PlanarTruss
            ? (lra <= PlanarBranch ? "72 + 0.75 L/ra" : "32 + 1.25 L/ra")
            : (lra <= SpaceBranch ? "60 + 0.8 L/ra" : "45 + L/ra");
        record?.Add("(Lc/r)0", $"Equivalent slenderness, {(options.PlanarTruss ? "planar" : "space")} truss web member", branch,
            branch.Replace("L/ra", Display.S(lra), StringComparison.Ordinal), baseLc, "", reference);
        var lc = EquivalentSlenderness(lra, options.PlanarTruss, throughShort, longLeg, shortLeg, lrz);
        if (throughShort)
        {
            record?.Add("Lc/r", "Equivalent slenderness with the short-leg addition and lower bound",
                options.PlanarTruss ? "max((Lc/r)0 + 4[(bl/bs)² − 1], 0.95 L/rz)" : "max((Lc/r)0 + 6[(bl/bs)² − 1], 0.82 L/rz)",
                $"bl = {Display.S(longLeg)}, bs = {Display.S(shortLeg)}, L/rz = {Display.S(lrz)}", lc, "", reference);
        }

        if (lc > MaxEquivalentSlenderness)
        {
            record?.Note($"Lc/r = {Display.S(lc)} > 200: outside AISC 360-16 E5; out of scope.");
            return new CheckResult(name, compression, 0, 0, CheckStatus.OutOfScope, "N", reference, record);
        }

        var fe = Compression.FlexuralBucklingStress(material.E, lc);
        record?.Add("Fe", "Elastic buckling stress from the equivalent slenderness (flexural only)", "π²E / (Lc/r)²",
            $"π² × {Display.S(material.E)} / {Display.S(lc)}²", fe, "MPa", reference);
        var lambda = Compression.NonDimensionalSlenderness(material.Fy, fe);
        record?.Add("λ", "Non-dimensional slenderness", "√(Fy / Fe)", $"√({Display.S(material.Fy)} / {Display.S(fe)})", lambda, "", Sans10162References.CompressionResistance);
        var cr = Compression.FactoredResistance(ResistanceFactors.Phi, area, material.Fy, lambda, options.CompressionExponent);
        record?.Add("Cr", "Factored compressive resistance (equivalent slenderness)", "φ A Fy (1 + λ^(2n))^(−1/n)",
            $"{Display.S(ResistanceFactors.Phi)} × {Display.S(area)} × {Display.S(material.Fy)} × (1 + {Display.S(lambda)}^(2 × {Display.S(options.CompressionExponent)}))^(−1/{Display.S(options.CompressionExponent)}) / 1000",
            cr / 1000, "kN", Sans10162References.CompressionResistance);
        return Compression.Check(compression, cr, options, name, record);
    }
}
