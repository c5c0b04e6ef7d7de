using TrussWeb.Core.Design;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;

namespace TrussWeb.Core.Standards.Sans10162;

/// <summary>
/// Tensile resistance, SANS 10162-1 cl. 13.2, with net area (cl. 12.3.1), shear lag (cl. 12.3.3) and
/// block shear (cl. 13.11); formulas as CSA S16:
/// <code>
/// Tr = φ Ag Fy                                   gross section yield
/// Tr = φu Ane Fu                                 effective net section fracture
/// An = Ag − Σ holes · (d + allowance) · t        net area (holes across the critical section)
/// Ane = U An                                     U = 0.80 (bolted angle, one leg, ≥ 4 transverse lines), 0.60 (fewer);
///                                                welded: L ≥ 2w 1.00, 2w &gt; L ≥ 1.5w 0.87, 1.5w &gt; L ≥ w 0.75 (CSA S16 12.3.3.3, from memory)
/// Tr = φu [Ut An Fu + 0.6 Agv (Fy + Fu)/2]       block shear
/// </code>
/// Symbols: Ag gross area, An net area, Ane effective net area, Agv gross shear area, mm²; t thickness
/// of the connected component, mm; Fy, Fu MPa; Ut block shear efficiency factor; L weld length and
/// w connected width, mm. Forces in N.
/// <para>Double angles: the connection data (<see cref="TensionConnection.HolesInCrossSection"/>,
/// <see cref="TensionConnection.BlockShear"/>, weld length and width) describe ONE angle; the same holes
/// are deducted from each of the two angles (bolts through both angles and the gusset), and the block
/// shear resistance of one angle is multiplied by the number of angles. The member resistance is for
/// both angles.</para>
/// <para>Scope: shear lag factors are implemented for angles (single and double) and for sections with
/// every element connected; other cases are out of scope (stated, no number). Staggered holes are not
/// covered: give the governing hole count.</para>
/// </summary>
public static class Tension
{
    /// <summary>U for angles bolted through one leg with at least 4 transverse lines of bolts. Source: SANS 10162-1 cl. 12.3.3.2 (as CSA S16).</summary>
    public const double ShearLagAngleFourOrMoreLines = 0.80;

    /// <summary>U for angles bolted through one leg with fewer than 4 transverse lines. Source: SANS 10162-1 cl. 12.3.3.2.</summary>
    public const double ShearLagAngleFewerLines = 0.60;

    /// <summary>Least number of transverse bolt lines for <see cref="ShearLagAngleFourOrMoreLines"/>. Source: SANS 10162-1 cl. 12.3.3.2.</summary>
    public const int FourLines = 4;

    /// <summary>Welded, L ≥ 2w. Source: CSA S16 cl. 12.3.3.3 (from memory; confirm).</summary>
    public const double ShearLagWeldLong = 1.00;

    /// <summary>Welded, 2w &gt; L ≥ 1.5w. Source: CSA S16 cl. 12.3.3.3 (from memory; confirm).</summary>
    public const double ShearLagWeldMedium = 0.87;

    /// <summary>Welded, 1.5w &gt; L ≥ w. Source: CSA S16 cl. 12.3.3.3 (from memory; confirm).</summary>
    public const double ShearLagWeldShort = 0.75;

    /// <summary>Factor on the gross shear area in block shear, dimensionless. Source: SANS 10162-1 cl. 13.11 (as CSA S16 13.11).</summary>
    public const double BlockShearShearFactor = 0.6;

    /// <summary>Gross section yield Tr = φ Ag Fy, N.</summary>
    public static double GrossYield(double grossArea, double fy) => ResistanceFactors.Phi * grossArea * fy;

    /// <summary>Net area An = Ag − n·dh·t, mm² (holes: total across the member's critical section).</summary>
    public static double NetArea(double grossArea, int holes, double holeAllowance, double thickness)
        => grossArea - holes * holeAllowance * thickness;

    /// <summary>Net section fracture Tr = φu Ane Fu, N.</summary>
    public static double NetFracture(double effectiveNetArea, double fu) => ResistanceFactors.PhiU * effectiveNetArea * fu;

    /// <summary>Block shear Tr = φu [Ut An Fu + 0.6 Agv (Fy + Fu)/2], N (cl. 13.11).</summary>
    public static double BlockShearResistance(BlockShearPath path, double fy, double fu)
    {
        ArgumentNullException.ThrowIfNull(path);
        return ResistanceFactors.PhiU * (path.Ut * path.NetTensionArea * fu + BlockShearShearFactor * path.GrossShearArea * (fy + fu) / 2);
    }

    /// <summary>Shear lag factor of a bolted angle connected by one leg, dimensionless.</summary>
    public static double BoltedAngleShearLag(int transverseLines)
        => transverseLines >= FourLines ? ShearLagAngleFourOrMoreLines : ShearLagAngleFewerLines;

    /// <summary>Shear lag factor of a welded element from weld length L and connected width w, mm; 0 when L &lt; w (outside the rule: the caller reports out of scope, never a resistance).</summary>
    public static double WeldedShearLag(double weldLength, double connectedWidth)
    {
        if (weldLength >= 2 * connectedWidth)
        {
            return ShearLagWeldLong;
        }

        if (weldLength >= 1.5 * connectedWidth)
        {
            return ShearLagWeldMedium;
        }

        return weldLength >= connectedWidth ? ShearLagWeldShort : 0;
    }

    /// <summary>
    /// The tension checks of a member under factored tension Tf (N): gross yield, and where the end
    /// connection is given, effective net section fracture and block shear. Each is a separate
    /// <see cref="CheckResult"/>; their records are appended to <paramref name="record"/> in order.
    /// </summary>
    public static IReadOnlyList<CheckResult> Check(SectionProperties section, Material material, TensionConnection? connection,
        double tension, CalcRecord? record)
    {
        ArgumentNullException.ThrowIfNull(section);
        ArgumentNullException.ThrowIfNull(material);
        var results = new List<CheckResult>(3);
        var ag = section.Area;
        var tg = GrossYield(ag, material.Fy);
        record?.Add("Tr,g", "Tensile resistance, gross section yield", "φ Ag Fy",
            $"{Display.S(ResistanceFactors.Phi)} × {Display.S(ag)} × {Display.S(material.Fy)} / 1000", tg / 1000, "kN", Sans10162References.TensionGross);
        results.Add(Result("Tension: gross section yield", tension, tg, Sans10162References.TensionGross, record));

        if (connection is null)
        {
            record?.Note("End connection not given: net section fracture and block shear are NOT checked (only gross section yield). Detail the connection to complete the tension check.");
            return results;
        }

        var component = section.Component ?? section;
        var components = section.Component is null ? 1 : Math.Max(1, (int)Math.Round(section.Area / section.Component.Area));
        var t = component.GoverningThickness;
        var isAngle = section.Family is SectionFamily.Angle or SectionFamily.DoubleAngle;
        if (components > 1)
        {
            record?.Note($"Built-up member of {components} components: the connection data describe one component; the holes are deducted from each component and block shear of one component is multiplied by {components}. Resistances are for the whole member.");
        }

        double an;
        if (connection.Kind == ConnectionKind.Bolted)
        {
            var holes = connection.HolesInCrossSection * components;
            an = NetArea(ag, holes, connection.HoleAllowance, t);
            record?.Add("An", "Net area across the critical section", "Ag − n dh t",
                $"{Display.S(ag)} − {holes} × {Display.S(connection.HoleAllowance)} × {Display.S(t)}", an, "mm²", Sans10162References.NetArea);
        }
        else
        {
            an = ag;
            record?.Add("An", "Net area of a welded connection (no holes)", "Ag", Display.S(ag), an, "mm²", Sans10162References.NetArea);
        }

        double u;
        string uRef;
        if (connection.AllElementsConnected)
        {
            u = 1.0;
            uRef = Sans10162References.ShearLagBolted;
            record?.Add("U", "Shear lag factor: every element connected", "1.0", "1.0", u, "", uRef);
        }
        else if (connection.Kind == ConnectionKind.Bolted && isAngle)
        {
            u = BoltedAngleShearLag(connection.TransverseBoltLines);
            uRef = Sans10162References.ShearLagBolted;
            record?.Add("U", connection.TransverseBoltLines >= FourLines
                    ? "Shear lag factor: angle bolted through one leg, four or more transverse lines of bolts"
                    : "Shear lag factor: angle bolted through one leg, fewer than four transverse lines of bolts",
                connection.TransverseBoltLines >= FourLines ? "0.80" : "0.60", $"{connection.TransverseBoltLines} lines", u, "", uRef);
        }
        else if (connection.Kind == ConnectionKind.Welded)
        {
            u = WeldedShearLag(connection.WeldLength, connection.ConnectedWidth);
            uRef = Sans10162References.ShearLagWelded;
            if (u == 0)
            {
                record?.Note($"Welded connection with weld length L = {Display.S(connection.WeldLength)} mm shorter than the connected width w = {Display.S(connection.ConnectedWidth)} mm: outside the shear lag rule implemented; net section fracture is out of scope.");
                results.Add(OutOfScope("Tension: effective net section fracture", tension, Sans10162References.ShearLagWelded, record));
                AddBlockShear(results, connection, material, components, tension, record);
                return results;
            }

            record?.Add("U", "Shear lag factor, welded: weld length L against connected width w (CSA S16 12.3.3.3 rule, from memory)",
                "L ≥ 2w: 1.00; 2w > L ≥ 1.5w: 0.87; 1.5w > L ≥ w: 0.75", $"L = {Display.S(connection.WeldLength)}, w = {Display.S(connection.ConnectedWidth)}", u, "", uRef);
        }
        else
        {
            record?.Note("Bolted connection of a section other than an angle with not every element connected: no shear lag rule is implemented; net section fracture is out of scope.");
            results.Add(OutOfScope("Tension: effective net section fracture", tension, Sans10162References.ShearLagBolted, record));
            AddBlockShear(results, connection, material, components, tension, record);
            return results;
        }

        var ane = u * an;
        record?.Add("Ane", "Effective net area", "U An", $"{Display.S(u)} × {Display.S(an)}", ane, "mm²", uRef);
        var tn = NetFracture(ane, material.Fu);
        record?.Add("Tr,n", "Tensile resistance, effective net section fracture", "φu Ane Fu",
            $"{Display.S(ResistanceFactors.PhiU)} × {Display.S(ane)} × {Display.S(material.Fu)} / 1000", tn / 1000, "kN", Sans10162References.TensionNet);
        results.Add(Result("Tension: effective net section fracture", tension, tn, Sans10162References.TensionNet, record));
        AddBlockShear(results, connection, material, components, tension, record);
        return results;
    }

    private static void AddBlockShear(List<CheckResult> results, TensionConnection connection, Material material, int components, double tension, CalcRecord? record)
    {
        if (connection.BlockShear is not { } path)
        {
            record?.Note("Block shear path not given: block shear is not checked.");
            return;
        }

        var one = BlockShearResistance(path, material.Fy, material.Fu);
        var tr = one * components;
        record?.Add("Tr,bs", components > 1 ? $"Block shear resistance ({components} components × one path)" : "Block shear resistance",
            components > 1 ? "n φu [Ut An Fu + 0.6 Agv (Fy + Fu)/2]" : "φu [Ut An Fu + 0.6 Agv (Fy + Fu)/2]",
            $"{(components > 1 ? components + " × " : "")}{Display.S(ResistanceFactors.PhiU)} × [{Display.S(path.Ut)} × {Display.S(path.NetTensionArea)} × {Display.S(material.Fu)} + 0.6 × {Display.S(path.GrossShearArea)} × ({Display.S(material.Fy)} + {Display.S(material.Fu)})/2] / 1000",
            tr / 1000, "kN", Sans10162References.BlockShear);
        results.Add(Result("Tension: block shear", tension, tr, Sans10162References.BlockShear, record));
    }

    private static CheckResult Result(string name, double demand, double resistance, string reference, CalcRecord? record)
    {
        var u = resistance > 0 ? demand / resistance : double.PositiveInfinity;
        record?.Add("Tf/Tr", $"Utilization, {name}", "Tf / Tr", $"{Display.S(demand / 1000)} / {Display.S(resistance / 1000)}", u, "", reference);
        return new CheckResult(name, demand, resistance, u, u <= 1 ? CheckStatus.Pass : CheckStatus.Fail, "N", reference, record);
    }

    // Out of scope: resistance and utilization 0 with status OutOfScope (no number that could pass for a resistance).
    private static CheckResult OutOfScope(string name, double demand, string reference, CalcRecord? record)
        => new(name, demand, 0, 0, CheckStatus.OutOfScope, "N", reference, record);
}
