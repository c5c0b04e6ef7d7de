namespace TrussWeb.Data.Entities;

/// <summary>Support condition of a node; stored as its name.</summary>
public enum SupportKind
{
    /// <summary>Restrained in x and y.</summary>
    Pin,

    /// <summary>Free to move in x, restrained in y.</summary>
    RollerX,

    /// <summary>Free to move in y, restrained in x.</summary>
    RollerY,
}
