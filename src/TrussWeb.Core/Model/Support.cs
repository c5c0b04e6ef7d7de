namespace TrussWeb.Core.Model;

/// <summary>A support at a node.</summary>
/// <param name="Node">Id of the supported node.</param>
/// <param name="Kind">Which directions it restrains.</param>
public sealed record Support(string Node, SupportKind Kind)
{
    /// <summary>True when the support restrains horizontal movement.</summary>
    public bool RestrainsX => Kind is SupportKind.Pin or SupportKind.RollerY;

    /// <summary>True when the support restrains vertical movement.</summary>
    public bool RestrainsY => Kind is SupportKind.Pin or SupportKind.RollerX;
}
