using TrussWeb.Core.Analysis;
using TrussWeb.Core.Design;

namespace TrussWeb.Core.TrussDesign;

/// <summary>
/// One member's forces, lengths and design, with the combination that governs its utilization, the
/// section it was designed with and its mass (length × mass per metre, kg, without connection allowance).
/// </summary>
public sealed record MemberOutcome(
    string Mark,
    string Group,
    double Length,
    Envelope Envelope,
    EffectiveLengths Lengths,
    MemberDesignResult Design,
    string? GoverningCombination)
{
    /// <summary>The section the member was designed with.</summary>
    public Sections.SectionProperties? Section { get; init; }

    /// <summary>Member mass, kg (length in m × kg/m), without the connection allowance.</summary>
    public double Mass { get; init; }
}
