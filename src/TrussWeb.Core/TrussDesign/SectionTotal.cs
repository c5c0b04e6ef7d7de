namespace TrussWeb.Core.TrussDesign;

/// <summary>Quantity of one section in a truss: number of members, total length (mm) and mass (kg, without connection allowance).</summary>
public sealed record SectionTotal(string Designation, int Count, double Length, double Mass);
