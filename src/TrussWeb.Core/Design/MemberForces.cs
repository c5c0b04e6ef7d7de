namespace TrussWeb.Core.Design;

/// <summary>
/// Design forces of one member, N, as magnitudes: <see cref="Tension"/> ≥ 0 is the largest tension,
/// <see cref="Compression"/> ≥ 0 the largest compression, each with the combination that gives it.
/// </summary>
public sealed record MemberForces(double Tension, double Compression, string? TensionCombination = null, string? CompressionCombination = null)
{
    /// <summary>From a signed axial force (tension positive), N.</summary>
    public static MemberForces FromAxial(double axial, string? combination = null)
        => axial >= 0 ? new MemberForces(axial, 0, combination, null) : new MemberForces(0, -axial, null, combination);
}
