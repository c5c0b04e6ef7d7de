namespace TrussWeb.Core.Loads;

/// <summary>A point load at a node, N: Fx to the right positive, Fy upwards positive (gravity is negative).</summary>
public sealed record NodalLoad(string Node, double Fx, double Fy);
