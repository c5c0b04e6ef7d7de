namespace TrussWeb.Core.Sections;

/// <summary>The kind of plate element, which picks the width-to-thickness limit for the element class (SANS 10162-1 cl. 11, Table 4).</summary>
public enum ElementKind
{
    /// <summary>A leg of an angle (single or in a double angle), width = full leg length b.</summary>
    AngleLeg,

    /// <summary>The stem of a tee, width = full depth d.</summary>
    TeeStem,

    /// <summary>A flange outstand of a tee, width = half the flange width.</summary>
    FlangeOutstand,

    /// <summary>A wall of a rectangular hollow section, width = flat width b - 4t (CSA S16 convention).</summary>
    HollowWall,

    /// <summary>The wall of a circular hollow section, width = outside diameter D.</summary>
    CircularWall,
}
