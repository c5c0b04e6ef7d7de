namespace TrussWeb.Web.Components.Sections;

/// <summary>A point of a section drawing in section coordinates, mm (x to the right, y up).</summary>
public readonly record struct OutlinePoint(double X, double Y);
