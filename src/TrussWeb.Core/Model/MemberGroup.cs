namespace TrussWeb.Core.Model;

/// <summary>
/// A named set of members sized together (one section per group), with its role. The four standard
/// groups are given as presets; users may add their own names ("End diagonals") with any role.
/// </summary>
/// <param name="Name">Unique group name, referred to by <see cref="Member.Group"/>.</param>
/// <param name="Role">Chord or web role of every member in the group.</param>
public sealed record MemberGroup(string Name, MemberRole Role)
{
    public static MemberGroup TopChord { get; } = new("TopChord", MemberRole.TopChord);

    public static MemberGroup BottomChord { get; } = new("BottomChord", MemberRole.BottomChord);

    public static MemberGroup Diagonals { get; } = new("Diagonals", MemberRole.Diagonal);

    public static MemberGroup Verticals { get; } = new("Verticals", MemberRole.Vertical);

    /// <summary>True for top and bottom chord roles.</summary>
    public bool IsChord => Role is MemberRole.TopChord or MemberRole.BottomChord;
}
