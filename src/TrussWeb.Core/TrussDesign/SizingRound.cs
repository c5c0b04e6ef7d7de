namespace TrussWeb.Core.TrussDesign;

/// <summary>One round of sizing: the section chosen per group and the truss mass (kg) it gives.</summary>
public sealed record SizingRound(int Number, IReadOnlyDictionary<string, string> Sections, double Mass);
