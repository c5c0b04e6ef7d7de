using TrussWeb.Core.Design;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;

namespace TrussWeb.Core.Standards.Sans10162;

/// <summary>
/// Built-up compression members (double angles with packs or stitch plates), SANS 10162-1 cl. 19,
/// following CSA S16-14 cl. 19.1.4:
/// <list type="bullet">
/// <item>component rule: a/r_i ≤ (KL/r) of the whole member, so a_max = r_i (KL/r)governing, with r_i the
/// least radius of gyration of one component (mm) and (KL/r)governing the larger of KxLx/rx and KyLy/ry;</item>
/// <item>modified slenderness for buckling about the axis that shears the connectors (the double angle's
/// axis of symmetry y-y): ρe = √(ρo² + ρi²), ρo = KyLy/ry, ρi = a/r_i (CSA S16-14 19.1.4; on by default,
/// switchable by <see cref="ConnectorLayout.UseModifiedSlenderness"/>; whether the SANS edition in use
/// requires it is for the engineer to confirm);</item>
/// <item>detailed check: one component between connectors as a single angle with KL = a about every axis
/// (u, v and torsion, asymmetric cubic); 2·Cr(component) is reported beside Cr(member) and the lower governs.</item>
/// </list>
/// <para>Proposed layout (common practice, 2026-12-01 definition): n = max(0, ⌈L/a_max⌉ − 1) intermediate
/// connectors at equal spaces a = L/(n + 1) ≤ a_max. The spacing is stated as a multiple of 50 mm only
/// when L/(n + 1) is one; otherwise rounding down to 50 mm would leave unequal spaces, so the exact equal
/// spacing is kept (the record says so and gives the rounded-down value for reference).</para>
/// </summary>
public static class BuiltUp
{
    /// <summary>Set-out module of a practical spacing, mm (common practice).</summary>
    public const double SpacingModuleMm = 50;

    /// <summary>a_max = r_i (KL/r)governing, mm.</summary>
    public static double MaxConnectorSpacing(double componentRadius, double governingSlenderness) => componentRadius * governingSlenderness;

    /// <summary>Number of intermediate connectors for equal spaces not above a_max: max(0, ⌈L/a_max⌉ − 1).</summary>
    public static int RequiredIntermediateCount(double length, double maxSpacing)
    {
        if (!(length > 0) || !(maxSpacing > 0))
        {
            throw new ArgumentOutOfRangeException(nameof(length), length, "length and a_max must be greater than 0");
        }

        // 2026-12-01: a ratio within 1e-9 of an integer counts as that integer, so L = 2 a_max gives 1 connector, not 2.
        var ratio = length / maxSpacing;
        var spaces = Math.Ceiling(ratio - 1e-9);
        return (int)Math.Max(0, spaces - 1);
    }

    /// <summary>ρe = √(ρo² + ρi²), dimensionless (CSA S16-14 19.1.4).</summary>
    public static double ModifiedSlenderness(double overall, double component) => Math.Sqrt(overall * overall + component * component);

    /// <summary>The connector layout to check: the user's count or spacing, or a proposed one.</summary>
    public static ConnectorSpacing Layout(SectionProperties section, EffectiveLengths lengths, ConnectorLayout? connectors, CalcRecord? record)
    {
        ArgumentNullException.ThrowIfNull(section);
        ArgumentNullException.ThrowIfNull(lengths);
        var component = section.Component ?? throw new ArgumentException("a built-up section needs its component properties", nameof(section));
        var ri = component.RMin;
        var rhoX = lengths.Kx * lengths.Lx / section.Rx;
        var rhoY = lengths.Ky * lengths.Ly / section.Ry;
        var governing = Math.Max(rhoX, rhoY);
        var aMax = MaxConnectorSpacing(ri, governing);
        var length = lengths.Lx;
        record?.Add("(KL/r)gov", "Governing slenderness of the whole member", "max(KxLx/rx, KyLy/ry)",
            $"max({Display.S(rhoX)}, {Display.S(rhoY)})", governing, "", Sans10162References.BuiltUp);
        record?.Add("a_max", "Largest connector spacing: component not more slender than the whole member", "r_i (KL/r)gov",
            $"{Display.S(ri)} × {Display.S(governing)}", aMax, "mm", Sans10162References.BuiltUp);

        int count;
        double a;
        var proposed = false;
        if (connectors?.IntermediateCount is { } n)
        {
            count = n;
            a = length / (n + 1);
            record?.Add("a", $"Connector spacing: {n} intermediate connector(s) at equal spaces (given)", "L / (n + 1)",
                $"{Display.S(length)} / ({n} + 1)", a, "mm", Sans10162References.BuiltUp);
        }
        else if (connectors?.Spacing is { } s)
        {
            a = s;
            count = RequiredIntermediateCount(length, s);
            record?.Add("a", "Connector spacing (given)", "a", Display.S(s), a, "mm", Sans10162References.BuiltUp);
        }
        else
        {
            proposed = true;
            count = RequiredIntermediateCount(length, aMax);
            a = length / (count + 1);
            var rounded = Math.Floor(a / SpacingModuleMm) * SpacingModuleMm;
            record?.Add("a", $"Proposed spacing: {count} intermediate connector(s) at equal spaces", "L / (⌈L/a_max⌉)",
                $"{Display.S(length)} / {count + 1}", a, "mm", Sans10162References.BuiltUp + "; layout by common practice");
            record?.Note(Math.Abs(rounded - a) <= 1e-6
                ? $"Proposed connector layout: {count} intermediate connector(s) at {Display.S(a)} mm equal spaces (a multiple of 50 mm)."
                : $"Proposed connector layout: {count} intermediate connector(s) at equal spaces of {Display.S(a)} mm; rounding down to {Display.S(rounded)} mm (50 mm module) would leave unequal spaces, so the exact equal spacing is used.");
        }

        record?.Add("n", "Number of intermediate connectors", connectors?.IntermediateCount is null ? "⌈L / a⌉ − 1" : "n (given)",
            connectors?.IntermediateCount is null ? $"⌈{Display.S(length)} / {Display.S(proposed ? aMax : a)}⌉ − 1" : count.ToString(System.Globalization.CultureInfo.InvariantCulture),
            count, "", Sans10162References.BuiltUp);
        record?.Note($"Connectors set out along the member's node-to-node length L = {Display.S(length)} mm.");
        return new ConnectorSpacing(length, count, a, aMax, governing, ri, proposed);
    }

    /// <summary>Component slenderness check a/r_i ≤ (KL/r)governing (demand and resistance dimensionless).</summary>
    public static CheckResult CheckSpacing(ConnectorSpacing layout, CalcRecord? record)
    {
        ArgumentNullException.ThrowIfNull(layout);
        var ratio = layout.ComponentSlenderness;
        var u = ratio / layout.GoverningSlenderness;
        record?.Add("a/r_i", "Component slenderness between connectors", "a / r_i",
            $"{Display.S(layout.Spacing)} / {Display.S(layout.ComponentRadius)}", ratio, "", Sans10162References.BuiltUp);
        record?.Add("a/a_max", "Connector spacing over its limit", "(a/r_i) / (KL/r)gov",
            $"{Display.S(ratio)} / {Display.S(layout.GoverningSlenderness)}", u, "", Sans10162References.BuiltUp);
        return new CheckResult("Built-up: connector spacing", ratio, layout.GoverningSlenderness, u,
            u <= 1 + 1e-12 ? CheckStatus.Pass : CheckStatus.Fail, "", Sans10162References.BuiltUp, record);
    }

    /// <summary>
    /// The slenderness used about y-y: ρe when the modified slenderness is on, otherwise ρo = KyLy/ry
    /// (returned as null so that the compression check uses its own KyLy/ry).
    /// </summary>
    public static double? SlendernessAboutSymmetryAxis(SectionProperties section, EffectiveLengths lengths, ConnectorSpacing layout,
        bool useModified, CalcRecord? record)
    {
        ArgumentNullException.ThrowIfNull(section);
        ArgumentNullException.ThrowIfNull(lengths);
        ArgumentNullException.ThrowIfNull(layout);
        if (!useModified)
        {
            record?.Note("Modified slenderness of the built-up member NOT used (switched off by the user): buckling about y-y uses KyLy/ry. CSA S16-14 19.1.4 requires it; confirm for the SANS edition in use.");
            return null;
        }

        var rhoO = lengths.Ky * lengths.Ly / section.Ry;
        var rhoI = layout.ComponentSlenderness;
        var rhoE = ModifiedSlenderness(rhoO, rhoI);
        record?.Add("ρo", "Slenderness of the whole member about the axis of symmetry y-y", "KyLy / ry",
            $"{Display.S(lengths.Ky * lengths.Ly)} / {Display.S(section.Ry)}", rhoO, "", Sans10162References.ModifiedSlenderness);
        record?.Add("ρi", "Slenderness of one component between connectors", "a / r_i",
            $"{Display.S(layout.Spacing)} / {Display.S(layout.ComponentRadius)}", rhoI, "", Sans10162References.ModifiedSlenderness);
        record?.Add("ρe", "Modified slenderness about y-y (connectors sheared by buckling about the axis of symmetry)", "√(ρo² + ρi²)",
            $"√({Display.S(rhoO)}² + {Display.S(rhoI)}²)", rhoE, "", Sans10162References.ModifiedSlenderness);
        record?.Note("Modified slenderness ρe = √(ρo² + ρi²) used for buckling about the axis of symmetry (CSA S16-14 19.1.4; on by default, conservative; confirm for the SANS edition in use).");
        return rhoE;
    }

    /// <summary>
    /// Detailed check of one component between connectors: a single angle with KL = a about u, v and for
    /// torsion (asymmetric cubic, principal axes). Returns the component's resistance; the member may
    /// carry 2·Cr of it (for two components).
    /// </summary>
    public static CompressionResistance ComponentResistance(SectionProperties component, Material material, double spacing, double n, CalcRecord? record)
    {
        ArgumentNullException.ThrowIfNull(component);
        ArgumentNullException.ThrowIfNull(material);
        if (!(spacing > 0) || !double.IsFinite(spacing))
        {
            throw new ArgumentOutOfRangeException(nameof(spacing), spacing, "the connector spacing must be finite and greater than 0");
        }

        var lengths = new EffectiveLengths { Lx = spacing, Ly = spacing, Lz = spacing, KLu = spacing, KLv = spacing };
        var cls = Classification.Classify(component, material.Fy, null);
        record?.Note($"Detailed check: one component between connectors as a single angle with KL = a = {Display.S(spacing)} mm about u-u, v-v and for torsion.");
        return Compression.Resistance(component, material, lengths, n, cls.EffectiveArea, null, record);
    }
}
