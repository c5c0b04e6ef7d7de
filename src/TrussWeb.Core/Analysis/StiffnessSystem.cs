using TrussWeb.Core.Model;

namespace TrussWeb.Core.Analysis;

/// <summary>
/// The assembled and factorised stiffness of a truss (2 DOF per node: x then y), numbered by Reverse
/// Cuthill–McKee. Shared by <see cref="TrussSolver"/> and the mechanism check of
/// <see cref="TrussModelValidator"/>. Assumes a structurally valid model (known nodes, no duplicates).
/// </summary>
internal sealed class StiffnessSystem
{
    private StiffnessSystem(TrussModel model, Dictionary<string, int> nodeIndex, int[] position, double[] cos, double[] sin,
        double[] lengths, double[] axialStiffness, BandedLdlt ldlt, bool[] restrained)
    {
        Model = model;
        NodeIndex = nodeIndex;
        Position = position;
        Cos = cos;
        Sin = sin;
        Lengths = lengths;
        AxialStiffness = axialStiffness;
        Ldlt = ldlt;
        Restrained = restrained;
    }

    public TrussModel Model { get; }

    /// <summary>Node id → index in <see cref="TrussModel.Nodes"/>.</summary>
    public Dictionary<string, int> NodeIndex { get; }

    /// <summary>Original node index → position in the RCM order.</summary>
    public int[] Position { get; }

    public double[] Cos { get; }

    public double[] Sin { get; }

    public double[] Lengths { get; }

    /// <summary>EA/L per member, N/mm.</summary>
    public double[] AxialStiffness { get; }

    public BandedLdlt Ldlt { get; }

    /// <summary>Per original DOF (2·node + direction): restrained by a support.</summary>
    public bool[] Restrained { get; }

    /// <summary>Zero pivots mapped back to (node id, "x" or "y"), in elimination order.</summary>
    public IReadOnlyList<(string Node, string Direction)> Mechanisms()
    {
        var inverse = new int[Position.Length];
        for (var i = 0; i < Position.Length; i++)
        {
            inverse[Position[i]] = i;
        }

        var list = new List<(string, string)>();
        foreach (var dof in Ldlt.ZeroPivots)
        {
            var node = inverse[dof / 2];
            list.Add((Model.Nodes[node].Id, dof % 2 == 0 ? "x" : "y"));
        }

        return list;
    }

    /// <summary>Permuted DOF of original node index and direction (0 = x, 1 = y).</summary>
    public int Dof(int node, int direction) => (2 * Position[node]) + direction;

    /// <summary>Assembles and factorises. <paramref name="axialStiffness"/> gives EA/L per member (N/mm).</summary>
    public static StiffnessSystem Build(TrussModel model, Func<int, double, double> axialStiffness)
    {
        var n = model.Nodes.Count;
        var nodeIndex = new Dictionary<string, int>(n, StringComparer.Ordinal);
        for (var i = 0; i < n; i++)
        {
            nodeIndex.TryAdd(model.Nodes[i].Id, i);
        }

        var adjacency = new List<int>[n];
        for (var i = 0; i < n; i++)
        {
            adjacency[i] = [];
        }

        var m = model.Members.Count;
        var ends = new (int A, int B)[m];
        for (var e = 0; e < m; e++)
        {
            var a = nodeIndex[model.Members[e].StartNode];
            var b = nodeIndex[model.Members[e].EndNode];
            ends[e] = (a, b);
            adjacency[a].Add(b);
            adjacency[b].Add(a);
        }

        var order = ReverseCuthillMcKee.Order(adjacency);
        var position = new int[n];
        for (var i = 0; i < n; i++)
        {
            position[order[i]] = i;
        }

        var nodeBand = 0;
        foreach (var (a, b) in ends)
        {
            nodeBand = Math.Max(nodeBand, Math.Abs(position[a] - position[b]));
        }

        var ldlt = new BandedLdlt(2 * n, (2 * nodeBand) + 1);
        var cos = new double[m];
        var sin = new double[m];
        var lengths = new double[m];
        var ks = new double[m];
        for (var e = 0; e < m; e++)
        {
            var (a, b) = ends[e];
            var na = model.Nodes[a];
            var nb = model.Nodes[b];
            var dx = nb.X - na.X;
            var dy = nb.Y - na.Y;
            var length = Math.Sqrt((dx * dx) + (dy * dy));
            lengths[e] = length;
            cos[e] = dx / length;
            sin[e] = dy / length;
            var k = axialStiffness(e, length);
            ks[e] = k;
            var c = cos[e];
            var s = sin[e];
            int[] dofs = [(2 * position[a]), (2 * position[a]) + 1, (2 * position[b]), (2 * position[b]) + 1];
            double[] g = [-c, -s, c, s];
            for (var p = 0; p < 4; p++)
            {
                for (var q = 0; q <= p; q++)
                {
                    if (p == q || dofs[p] != dofs[q])
                    {
                        ldlt.Add(dofs[p], dofs[q], k * g[p] * g[q]);
                    }
                }
            }
        }

        var restrained = new bool[2 * n];
        foreach (var support in model.Supports)
        {
            if (!nodeIndex.TryGetValue(support.Node, out var idx))
            {
                continue;
            }

            if (support.RestrainsX)
            {
                restrained[2 * idx] = true;
                ldlt.Fix(2 * position[idx]);
            }

            if (support.RestrainsY)
            {
                restrained[(2 * idx) + 1] = true;
                ldlt.Fix((2 * position[idx]) + 1);
            }
        }

        ldlt.Factorize();
        return new StiffnessSystem(model, nodeIndex, position, cos, sin, lengths, ks, ldlt, restrained);
    }
}
