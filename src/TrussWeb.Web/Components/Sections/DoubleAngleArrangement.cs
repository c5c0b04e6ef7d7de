namespace TrussWeb.Web.Components.Sections;

/// <summary>How two angles are paired for a drawing: the gap between the backs (mm) and which legs meet.</summary>
public sealed record DoubleAngleArrangement(double Gap, TrussWeb.Core.Sections.BackToBack Orientation);
