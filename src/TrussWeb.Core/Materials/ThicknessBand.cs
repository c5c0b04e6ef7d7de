namespace TrussWeb.Core.Materials;

/// <summary>Yield strength for element thicknesses up to and including <see cref="MaxThickness"/>, mm and MPa.</summary>
public sealed record ThicknessBand(double MaxThickness, double Fy);
