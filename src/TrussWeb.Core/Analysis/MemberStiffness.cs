namespace TrussWeb.Core.Analysis;

/// <summary>Axial stiffness inputs of one member: E in MPa, A in mm².</summary>
public sealed record MemberStiffness(double ElasticModulus, double Area);
