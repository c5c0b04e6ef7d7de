namespace TrussWeb.Core.Model;

/// <summary>What a member does in the truss; chords and webs get different design lengths.</summary>
public enum MemberRole
{
    /// <summary>Top chord (rafter): purlins bear on it; its out-of-plane length runs between lateral restraints.</summary>
    TopChord,

    /// <summary>Bottom chord (tie): its out-of-plane length runs between brace or tie points.</summary>
    BottomChord,

    /// <summary>Inclined web member.</summary>
    Diagonal,

    /// <summary>Vertical web member.</summary>
    Vertical,

    /// <summary>Any other web member.</summary>
    Web,
}
