namespace TrussWeb.Web.Components.Truss;

/// <summary>Sense of a member's axial force as drawn.</summary>
public enum ForceSense
{
    /// <summary>No force (or too small to show a sense).</summary>
    None,

    /// <summary>Tension (Core: positive axial force).</summary>
    Tension,

    /// <summary>Compression (Core: negative axial force).</summary>
    Compression,
}
