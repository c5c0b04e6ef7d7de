namespace TrussWeb.Core.Standards.Sans10162;

/// <summary>
/// Resistance factors of SANS 10162-1 (cl. 13.1; the same values as CSA S16 cl. 13.1).
/// </summary>
public static class ResistanceFactors
{
    /// <summary>φ for structural steel (yielding, buckling), dimensionless. Source: SANS 10162-1 cl. 13.1 (a), as CSA S16 13.1.</summary>
    public const double Phi = 0.90;

    /// <summary>φu for the ultimate tensile strength (net section fracture, block shear), dimensionless. Source: SANS 10162-1 cl. 13.1, as CSA S16 13.1.</summary>
    public const double PhiU = 0.75;
}
