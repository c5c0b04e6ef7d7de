using TrussWeb.Core.Loads;

namespace TrussWeb.Core.Analysis;

/// <summary>
/// Results of one load case or combination: member axial forces (N, tension positive), node
/// displacements (mm) and support reactions (N) by id, and the applied load total (N).
/// </summary>
public sealed record LoadResult
{
    /// <summary>Case id or combination name.</summary>
    public required string Name { get; init; }

    /// <summary>Null for a load case.</summary>
    public LimitState? LimitState { get; init; }

    public bool IsCombination => LimitState is not null;

    public required IReadOnlyDictionary<string, double> MemberForces { get; init; }

    public required IReadOnlyDictionary<string, NodeVector> Displacements { get; init; }

    public required IReadOnlyDictionary<string, NodeVector> Reactions { get; init; }

    /// <summary>Sum of applied nodal loads, N.</summary>
    public required NodeVector AppliedTotal { get; init; }

    /// <summary>Sum of reactions, N (equals −<see cref="AppliedTotal"/> to round-off).</summary>
    public NodeVector ReactionTotal => new(Reactions.Values.Sum(r => r.X), Reactions.Values.Sum(r => r.Y));
}
