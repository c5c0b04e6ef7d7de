using TrussWeb.Core.Design;
using TrussWeb.Core.Sections;
using TrussWeb.Core.Sizing;

namespace TrussWeb.Core.TrussDesign;

/// <summary>
/// How one member group is designed: its section (fixed or chosen by sizing within
/// <see cref="Constraints"/>), the double-angle gap and arrangement shared by the whole group, and
/// the connection, connectors and options its members share.
/// </summary>
public sealed record GroupDesignSettings
{
    public required string Group { get; init; }

    /// <summary>The group's current section. Sizing replaces it; when null, sizing starts from the lightest admissible candidate.</summary>
    public SectionProperties? Section { get; init; }

    /// <summary>Sizing limits; null = the section is fixed and only checked.</summary>
    public SizingConstraints? Constraints { get; init; }

    /// <summary>Gap between the backs of double angles (gusset thickness), mm.</summary>
    public double DoubleAngleGap { get; init; } = 10;

    public BackToBack Orientation { get; init; } = BackToBack.LongLegsBackToBack;

    public TensionConnection? Connection { get; init; }

    public ConnectorLayout? Connectors { get; init; }

    public DesignOptions Options { get; init; } = new();
}
