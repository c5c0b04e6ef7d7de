namespace TrussWeb.Web.Components.Sections;

/// <summary>One point of a resistance curve: effective length max(KxLx, KyLy), mm, and Cr from Core, N.</summary>
public readonly record struct ResistancePoint(double EffectiveLength, double Cr);
