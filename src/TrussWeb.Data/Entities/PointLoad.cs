namespace TrussWeb.Data.Entities;

/// <summary>A point load at a node in a named load case. Forces in N, global axes (y up).</summary>
public class PointLoad : TrackedEntity
{
    public Guid TrussId { get; set; }

    public Truss? Truss { get; set; }

    public Guid NodeId { get; set; }

    public TrussNode? Node { get; set; }

    public string CaseName { get; set; } = string.Empty;

    public double FxN { get; set; }

    public double FyN { get; set; }
}
