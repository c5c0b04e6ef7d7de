namespace TrussWeb.Core.Design;

/// <summary>How the end of a tension member is connected, for net area and shear lag (SANS 10162-1 cl. 12.3).</summary>
public enum ConnectionKind
{
    /// <summary>Bolted: holes reduce the area; shear lag from the number of transverse bolt lines.</summary>
    Bolted,

    /// <summary>Welded: shear lag from weld length to connected width.</summary>
    Welded,
}

/// <summary>
/// End connection of a member. Bolted: <see cref="HolesInCrossSection"/> holes of
/// <see cref="HoleAllowance"/> mm (hole diameter plus the standard's allowance) across the critical
/// section, <see cref="TransverseBoltLines"/> lines of bolts in the direction of force; whether all
/// elements are connected. Welded: <see cref="WeldLength"/> and the connected element width.
/// </summary>
public sealed record TensionConnection
{
    public required ConnectionKind Kind { get; init; }

    /// <summary>True when every element of the section is connected (no shear lag reduction).</summary>
    public bool AllElementsConnected { get; init; }

    public int HolesInCrossSection { get; init; }

    /// <summary>Width deducted per hole, mm (hole diameter + 2 mm per SANS 10162-1 cl. 12.3.2, from memory).</summary>
    public double HoleAllowance { get; init; }

    /// <summary>Number of bolt lines (bolts per row) in the direction of force.</summary>
    public int TransverseBoltLines { get; init; }

    /// <summary>Welded: length of the longitudinal welds, mm.</summary>
    public double WeldLength { get; init; }

    /// <summary>Welded: width of the connected element (distance between welds), mm.</summary>
    public double ConnectedWidth { get; init; }

    /// <summary>Block shear inputs, optional: net tension area, gross shear area, mm², and Ut.</summary>
    public BlockShearPath? BlockShear { get; init; }
}

/// <summary>Block shear failure path (SANS 10162-1 cl. 13.11): An net tension area, Agv gross shear area, mm²; Ut efficiency factor.</summary>
public sealed record BlockShearPath(double NetTensionArea, double GrossShearArea, double Ut);
