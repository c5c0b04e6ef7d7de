namespace TrussWeb.Core.Sections;

/// <summary>Which legs of two angles face each other across the gusset in a double angle.</summary>
public enum BackToBack
{
    /// <summary>Long legs back to back (LLBB): the long legs are parallel to the symmetry axis y-y, the short legs stand out.</summary>
    LongLegsBackToBack,

    /// <summary>Short legs back to back (SLBB): the short legs are parallel to y-y, the long legs stand out.</summary>
    ShortLegsBackToBack,

    /// <summary>Equal-leg angles back to back (requires d = b).</summary>
    EqualLegs,
}
