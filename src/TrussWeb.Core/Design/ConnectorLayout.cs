namespace TrussWeb.Core.Design;

/// <summary>
/// Interconnectors (packs or stitch plates) of a built-up member. Give either the number of
/// intermediate connectors (equal spaces) or a spacing; when neither is given the design proposes a
/// practical spacing from the component slenderness rule.
/// </summary>
public sealed record ConnectorLayout
{
    /// <summary>Number of intermediate connectors along the member; spaces = count + 1.</summary>
    public int? IntermediateCount { get; init; }

    /// <summary>Connector spacing a, mm.</summary>
    public double? Spacing { get; init; }

    /// <summary>Use the modified slenderness ρe = √(ρo² + ρi²) for buckling about the axis that shears the connectors (on by default: conservative).</summary>
    public bool UseModifiedSlenderness { get; init; } = true;
}
