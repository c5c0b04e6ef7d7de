namespace TrussWeb.Core.Loads;

/// <summary>Standards with preset combinations in <see cref="CombinationPresets"/>.</summary>
public enum CombinationStandard
{
    /// <summary>SANS 10160-1 (from memory).</summary>
    Sans10160,

    /// <summary>ASCE 7 LRFD strength combinations (IBC 1605.2 forms).</summary>
    Asce7Lrfd,

    /// <summary>EN 1990 expression 6.10.</summary>
    En1990,
}
