namespace TrussWeb.Core.Model;

/// <summary>A pin joint of the truss. Coordinates in mm: x along the span (left to right), y upwards.</summary>
/// <param name="Id">Unique node id, e.g. "L0", "U3".</param>
/// <param name="X">Horizontal coordinate, mm.</param>
/// <param name="Y">Vertical coordinate, mm (up positive).</param>
public sealed record Node(string Id, double X, double Y);
