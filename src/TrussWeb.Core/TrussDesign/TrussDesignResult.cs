using TrussWeb.Core.Analysis;
using TrussWeb.Core.Records;
using TrussWeb.Core.Validation;

namespace TrussWeb.Core.TrussDesign;

/// <summary>
/// The design of a whole truss: analysis, every member's outcome, serviceability, warnings (e.g. a
/// purlin off a node), the truss status (Fail if any member or deflection fails; OutOfScope if any
/// member is not fully verified), mass and quantities per section.
/// </summary>
public sealed record TrussDesignResult(
    AnalysisResult Analysis,
    IReadOnlyList<MemberOutcome> Members,
    IReadOnlyList<ValidationIssue> Warnings,
    CheckStatus Status,
    double Mass,
    double MassWithAllowance,
    IReadOnlyList<SectionTotal> Totals)
{
    /// <summary>The load cases the analysis used (self-weight from the sections included), N at nodes.</summary>
    public IReadOnlyList<Loads.LoadCase> LoadCases { get; init; } = [];

    /// <summary>Largest member utilization.</summary>
    public double MaxUtilization => Members.Count == 0 ? 0 : Members.Max(m => m.Design.Utilization);
}
