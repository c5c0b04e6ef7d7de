namespace TrussWeb.Web.Components.Truss;

/// <summary>A node as drawn: id and position, m.</summary>
public sealed record ElevationNode(string Id, double X, double Y, bool Supported);
