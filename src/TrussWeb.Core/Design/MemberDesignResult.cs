using TrussWeb.Core.Records;

namespace TrussWeb.Core.Design;

/// <summary>
/// A member's design under one standard: every check, the largest utilization and the check that gives
/// it, overall status, and the member's whole calculation record (null when run without records).
/// </summary>
public sealed record MemberDesignResult(
    string Mark,
    string Designation,
    string StandardCode,
    string StandardVersion,
    IReadOnlyList<CheckResult> Checks,
    double Utilization,
    string GoverningCheck,
    CheckStatus Status,
    CalcRecord? Record);
