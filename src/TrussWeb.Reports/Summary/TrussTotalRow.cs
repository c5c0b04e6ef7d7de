namespace TrussWeb.Reports.Summary;

/// <summary>A truss's totals (from <c>TrussDesignResult</c>): members, mass and mass with the connection allowance, kg.</summary>
public sealed record TrussTotalRow(string Truss, int Count, double MassKg, double MassWithAllowanceKg, double MaxUtilization);
