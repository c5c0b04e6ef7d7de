namespace TrussWeb.Core.Analysis;

/// <summary>A vector at a node: a displacement (mm) or a force (N); x right, y up.</summary>
public readonly record struct NodeVector(double X, double Y);
