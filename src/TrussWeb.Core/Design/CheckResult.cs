using TrussWeb.Core.Records;

namespace TrussWeb.Core.Design;

/// <summary>
/// The outcome of one check: demand and resistance in the same unit (N for forces, a pure number for
/// ratio limits such as KL/r against 200), utilization = demand / resistance, status and its record.
/// </summary>
public sealed record CheckResult(
    string Name,
    double Demand,
    double Resistance,
    double Utilization,
    CheckStatus Status,
    string Unit,
    string Reference,
    CalcRecord? Record);
