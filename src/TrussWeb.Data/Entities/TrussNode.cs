namespace TrussWeb.Data.Entities;

/// <summary>A truss joint in the truss plane (x along the span, y up), in mm.</summary>
public class TrussNode : TrackedEntity
{
    public Guid TrussId { get; set; }

    public Truss? Truss { get; set; }

    /// <summary>Label unique within the truss, e.g. "N3".</summary>
    public string Label { get; set; } = string.Empty;

    public double XMm { get; set; }

    public double YMm { get; set; }

    /// <summary>A purlin bears on this node (receives roof load).</summary>
    public bool IsPurlinPoint { get; set; }

    /// <summary>The node is braced out of the truss plane.</summary>
    public bool IsLaterallyRestrained { get; set; }

    /// <summary>The node's support, if any.</summary>
    public TrussSupport? Support { get; set; }
}
