namespace TrussWeb.Reports.Summary;

/// <summary>Quantity of one section in one truss (from <c>TrussDesignResult.Totals</c>), in m and kg.</summary>
public sealed record SectionTotalRow(string Truss, string Section, int Count, double LengthM, double MassKg);
