namespace TrussWeb.Core.Model;

/// <summary>
/// A plane pin-jointed truss: nodes, members, supports, member groups, lateral (out-of-plane)
/// restraint points, purlin points, span and spacing. Immutable: edit with <c>with { ... }</c>
/// (a generated model is edited exactly like one built from node and member tables).
/// Units: mm. Check it with <see cref="TrussModelValidator.Validate"/> before analysis.
/// </summary>
public sealed record TrussModel
{
    /// <summary>Optional display name.</summary>
    public string Name { get; init; } = "Truss";

    public required IReadOnlyList<Node> Nodes { get; init; }

    public required IReadOnlyList<Member> Members { get; init; }

    public required IReadOnlyList<Support> Supports { get; init; }

    /// <summary>Member groups; defaults to the four standard groups.</summary>
    public IReadOnlyList<MemberGroup> Groups { get; init; } =
        [MemberGroup.TopChord, MemberGroup.BottomChord, MemberGroup.Diagonals, MemberGroup.Verticals];

    /// <summary>
    /// Ids of nodes restrained out of the truss plane (top chord: purlins with bracing; bottom chord:
    /// brace or tie points). A chord's out-of-plane length runs between these points.
    /// </summary>
    public IReadOnlyList<string> LateralRestraints { get; init; } = [];

    /// <summary>Ids of the top-chord nodes that carry a purlin (tributary roof loads go here).</summary>
    public IReadOnlyList<string> PurlinNodes { get; init; } = [];

    /// <summary>Span between supports, mm (used for the deflection limit span/250).</summary>
    public required double Span { get; init; }

    /// <summary>Centre-to-centre spacing of trusses, mm (tributary width of roof loads).</summary>
    public required double TrussSpacing { get; init; }

    /// <summary>The node with this id, or null.</summary>
    public Node? FindNode(string id)
    {
        foreach (var n in Nodes)
        {
            if (n.Id == id)
            {
                return n;
            }
        }

        return null;
    }

    /// <summary>The group with this name, or null.</summary>
    public MemberGroup? FindGroup(string name)
    {
        foreach (var g in Groups)
        {
            if (g.Name == name)
            {
                return g;
            }
        }

        return null;
    }

    /// <summary>Role of a member from its group (Web when the group is unknown).</summary>
    public MemberRole RoleOf(Member member)
    {
        ArgumentNullException.ThrowIfNull(member);
        return FindGroup(member.Group)?.Role ?? MemberRole.Web;
    }

    /// <summary>Node lookup by id (first occurrence wins; duplicates are a validation error).</summary>
    public Dictionary<string, Node> NodeMap()
    {
        var map = new Dictionary<string, Node>(Nodes.Count, StringComparer.Ordinal);
        foreach (var n in Nodes)
        {
            map.TryAdd(n.Id, n);
        }

        return map;
    }

    /// <summary>Length of a member, mm.</summary>
    public double LengthOf(Member member)
    {
        ArgumentNullException.ThrowIfNull(member);
        var a = FindNode(member.StartNode) ?? throw new ArgumentException($"unknown node '{member.StartNode}'", nameof(member));
        var b = FindNode(member.EndNode) ?? throw new ArgumentException($"unknown node '{member.EndNode}'", nameof(member));
        return Math.Sqrt(((b.X - a.X) * (b.X - a.X)) + ((b.Y - a.Y) * (b.Y - a.Y)));
    }
}
