using TrussWeb.Core.Design;
using TrussWeb.Core.Sections;

namespace TrussWeb.Core.Sizing;

/// <summary>
/// The sizer's answer for one group: the lightest admissible section that passes every check of every
/// member (with their full records), or null with the reason; and the next lighter admissible
/// candidate, which failed, with the member and check that made it fail (the proof that nothing lighter
/// would do).
/// </summary>
public sealed record GroupSizingResult(
    string Group,
    SectionProperties? Chosen,
    IReadOnlyList<MemberDesignResult> Results,
    string? FailureReason,
    SectionProperties? NextLighter,
    string? NextLighterFailure,
    int CandidatesTried);
