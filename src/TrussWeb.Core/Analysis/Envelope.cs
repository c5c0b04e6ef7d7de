using TrussWeb.Core.Design;

namespace TrussWeb.Core.Analysis;

/// <summary>
/// Extremes of one member's axial force over the ULS combinations, N, as magnitudes:
/// <see cref="MaxTension"/> ≥ 0 (0 and no combination when never in tension), <see cref="MaxCompression"/> ≥ 0.
/// </summary>
public sealed record Envelope(string MemberId, double MaxTension, string? TensionCombination, double MaxCompression, string? CompressionCombination)
{
    /// <summary>The design forces of the member for a design standard.</summary>
    public MemberForces ToMemberForces() => new(MaxTension, MaxCompression, TensionCombination, CompressionCombination);
}
