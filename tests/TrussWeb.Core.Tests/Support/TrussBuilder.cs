using TrussWeb.Core.Loads;
using TrussWeb.Core.Model;

namespace TrussWeb.Core.Tests.Support;

/// <summary>Small builder for trusses entered as node and member tables (test data).</summary>
public sealed class TrussBuilder
{
    private readonly List<Node> _nodes = [];
    private readonly List<Member> _members = [];
    private readonly List<Core.Model.Support> _supports = [];
    private readonly List<string> _restraints = [];

    public TrussBuilder Node(string id, double x, double y)
    {
        _nodes.Add(new Node(id, x, y));
        return this;
    }

    public TrussBuilder Member(string id, string a, string b, string group = "Diagonals")
    {
        _members.Add(new Member(id, a, b, group));
        return this;
    }

    public TrussBuilder Pin(string node)
    {
        _supports.Add(new Core.Model.Support(node, SupportKind.Pin));
        return this;
    }

    public TrussBuilder Roller(string node, SupportKind kind = SupportKind.RollerX)
    {
        _supports.Add(new Core.Model.Support(node, kind));
        return this;
    }

    public TrussBuilder Restrain(params string[] nodes)
    {
        _restraints.AddRange(nodes);
        return this;
    }

    public TrussModel Build(double span = 12_000, double spacing = 6_000) => new()
    {
        Nodes = [.. _nodes],
        Members = [.. _members],
        Supports = [.. _supports],
        LateralRestraints = [.. _restraints],
        Span = span,
        TrussSpacing = spacing,
    };

    /// <summary>A load case of downward point loads, N.</summary>
    public static LoadCase Down(string id, params (string Node, double Newtons)[] loads)
        => new(id, id, LoadKind.Other, loads.Select(l => new NodalLoad(l.Node, 0, -l.Newtons)).ToList());
}
