using TrussWeb.Core.Sizing;

namespace TrussWeb.Core.TrussDesign;

/// <summary>
/// Outcome of automatic sizing: the final design (with records) for the chosen sections, each sized
/// group's result from the last round (the chosen section, or the reason none passes, and the next
/// lighter candidate that fails), the rounds, and whether the self-weight iteration settled.
/// </summary>
public sealed record TrussSizingResult(
    TrussDesignResult Design,
    TrussDesignInput FinalInput,
    IReadOnlyList<GroupSizingResult> Groups,
    IReadOnlyList<SizingRound> Rounds,
    bool Converged)
{
    /// <summary>Groups for which no admissible section passes.</summary>
    public IEnumerable<GroupSizingResult> Unsized => Groups.Where(g => g.Chosen is null);
}
