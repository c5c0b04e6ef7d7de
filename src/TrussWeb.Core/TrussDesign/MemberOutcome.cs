using TrussWeb.Core.Analysis;
using TrussWeb.Core.Design;

namespace TrussWeb.Core.TrussDesign;

/// <summary>One member's forces, lengths and design, with the combination that governs its utilization.</summary>
public sealed record MemberOutcome(
    string Mark,
    string Group,
    double Length,
    Envelope Envelope,
    EffectiveLengths Lengths,
    MemberDesignResult Design,
    string? GoverningCombination);
