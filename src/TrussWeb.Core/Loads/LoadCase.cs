namespace TrussWeb.Core.Loads;

/// <summary>One load case: a set of nodal loads of one kind of action. Loads at the same node add.</summary>
/// <param name="Id">Unique id, e.g. "D", "Q", "W1".</param>
/// <param name="Name">Description, e.g. "Wind 0°, internal suction".</param>
/// <param name="Kind">Kind of action (selects the combination factor).</param>
/// <param name="Loads">Nodal loads, N.</param>
public sealed record LoadCase(string Id, string Name, LoadKind Kind, IReadOnlyList<NodalLoad> Loads)
{
    /// <summary>Sum of Fx, N.</summary>
    public double TotalFx => Loads.Sum(l => l.Fx);

    /// <summary>Sum of Fy, N.</summary>
    public double TotalFy => Loads.Sum(l => l.Fy);
}
