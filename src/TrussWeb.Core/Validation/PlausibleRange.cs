namespace TrussWeb.Core.Validation;

/// <summary>
/// Outer limits of engineering inputs, far beyond any roof truss but small enough that no formula
/// overflows or underflows (2026-12-01: random hostile inputs such as 1e300 mm or 1e-300 mm passed the
/// positivity checks and produced infinities). Values outside are refused with a field-named message.
/// </summary>
public static class PlausibleRange
{
    /// <summary>Smallest section dimension (thickness, leg, radius when not zero), mm.</summary>
    public const double MinDimensionMm = 0.1;

    /// <summary>Largest section dimension, mm.</summary>
    public const double MaxDimensionMm = 5_000;

    /// <summary>Smallest member or effective length, mm.</summary>
    public const double MinLengthMm = 1;

    /// <summary>Largest member or effective length, span or spacing, mm (500 m).</summary>
    public const double MaxLengthMm = 500_000;

    /// <summary>Largest absolute node coordinate, mm (1 km).</summary>
    public const double MaxCoordinateMm = 1_000_000;

    /// <summary>Range of effective length factors K.</summary>
    public const double MinK = 0.1;

    /// <summary>Largest effective length factor K.</summary>
    public const double MaxK = 10;

    /// <summary>Range of strengths fy, fu, MPa.</summary>
    public const double MinStrengthMPa = 1;

    /// <summary>Largest strength, MPa.</summary>
    public const double MaxStrengthMPa = 5_000;

    /// <summary>Range of elastic and shear moduli, MPa.</summary>
    public const double MinModulusMPa = 1_000;

    /// <summary>Largest modulus, MPa.</summary>
    public const double MaxModulusMPa = 1_000_000;

    /// <summary>Largest force magnitude (member force or nodal load), N (10 GN).</summary>
    public const double MaxForceN = 1e10;

    /// <summary>Largest area pressure magnitude, kPa.</summary>
    public const double MaxPressureKPa = 100;
}
