namespace TrussWeb.Core.Model;

/// <summary>How a support restrains its node in the truss plane.</summary>
public enum SupportKind
{
    /// <summary>Restrains x and y.</summary>
    Pin,

    /// <summary>Roller free to move in x: restrains y only.</summary>
    RollerX,

    /// <summary>Roller free to move in y: restrains x only.</summary>
    RollerY,
}
