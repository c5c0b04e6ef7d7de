namespace TrussWeb.Data.Entities;

/// <summary>A roof truss: geometry source, spacing and serviceability settings. Lengths in mm.</summary>
public class Truss : TrackedEntity
{
    public Guid ProjectId { get; set; }

    public Project? Project { get; set; }

    public string Name { get; set; } = string.Empty;

    /// <summary>Generator type that produced the geometry (e.g. "Howe", "Custom" for a node/member table).</summary>
    public string Kind { get; set; } = string.Empty;

    /// <summary>The generator's parameters as JSON text (owned by Core's generator); "{}" when none.</summary>
    public string GeneratorParametersJson { get; set; } = "{}";

    public double SpanMm { get; set; }

    /// <summary>Centre-to-centre spacing of trusses.</summary>
    public double SpacingMm { get; set; }

    public double? PurlinSpacingMm { get; set; }

    /// <summary>Deflection limit as the ratio n of span/n, e.g. 250.</summary>
    public double DeflectionLimitRatio { get; set; }

    /// <summary>Allowance for connections added to member self-weight, as a fraction (0.10 = 10 %).</summary>
    public double ConnectionAllowanceFraction { get; set; }

    public string? Notes { get; set; }

    public List<TrussNode> Nodes { get; set; } = [];

    public List<MemberGroup> Groups { get; set; } = [];

    public List<TrussMember> Members { get; set; } = [];

    public TrussActions? Actions { get; set; }

    public List<PointLoad> PointLoads { get; set; } = [];

    public List<LoadCombination> Combinations { get; set; } = [];
}
