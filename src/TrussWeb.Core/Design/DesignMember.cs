using TrussWeb.Core.Materials;
using TrussWeb.Core.Sections;

namespace TrussWeb.Core.Design;

/// <summary>Everything a standard needs to check one member, apart from its forces.</summary>
public sealed record DesignMember
{
    /// <summary>Member mark, e.g. "TC3".</summary>
    public required string Mark { get; init; }

    public required SectionProperties Section { get; init; }

    public required Material Material { get; init; }

    public required EffectiveLengths Lengths { get; init; }

    /// <summary>End connection details for net area and shear lag; null = not yet detailed (gross area governs, stated in the record).</summary>
    public TensionConnection? Connection { get; init; }

    /// <summary>Interconnectors of a built-up member (double angle); null for single members.</summary>
    public ConnectorLayout? Connectors { get; init; }

    public DesignOptions Options { get; init; } = new();
}
