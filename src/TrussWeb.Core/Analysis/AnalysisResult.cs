namespace TrussWeb.Core.Analysis;

/// <summary>Everything <see cref="TrussSolver"/> returns: per case, per combination, envelopes, deflection checks.</summary>
public sealed record AnalysisResult
{
    public required IReadOnlyList<LoadResult> Cases { get; init; }

    public required IReadOnlyList<LoadResult> Combinations { get; init; }

    /// <summary>Per member, over the ULS combinations (in member order).</summary>
    public required IReadOnlyList<Envelope> Envelopes { get; init; }

    /// <summary>One per SLS combination.</summary>
    public required IReadOnlyList<DeflectionCheck> Deflections { get; init; }

    /// <summary>Half-bandwidth of the factorised stiffness matrix after renumbering (DOFs).</summary>
    public int HalfBandwidth { get; init; }

    public LoadResult Case(string id) => Cases.FirstOrDefault(c => c.Name == id) ?? throw new KeyNotFoundException($"no load case '{id}'");

    public LoadResult Combination(string name) => Combinations.FirstOrDefault(c => c.Name == name) ?? throw new KeyNotFoundException($"no combination '{name}'");

    public Envelope EnvelopeOf(string memberId) => Envelopes.FirstOrDefault(e => e.MemberId == memberId) ?? throw new KeyNotFoundException($"no member '{memberId}'");
}
