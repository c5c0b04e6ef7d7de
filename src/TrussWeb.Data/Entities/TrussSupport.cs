namespace TrussWeb.Data.Entities;

/// <summary>The support at one node (at most one per node).</summary>
public class TrussSupport : TrackedEntity
{
    public Guid NodeId { get; set; }

    public TrussNode? Node { get; set; }

    public SupportKind Kind { get; set; }
}
