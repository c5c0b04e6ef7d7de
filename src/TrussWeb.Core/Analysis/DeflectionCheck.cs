namespace TrussWeb.Core.Analysis;

/// <summary>
/// Largest vertical deflection of one SLS combination against the limit span / divisor, mm.
/// <see cref="Deflection"/> is signed (down negative); the check uses its magnitude.
/// </summary>
public sealed record DeflectionCheck(string Combination, string Node, double Deflection, double Limit, double Divisor)
{
    public bool Passes => Math.Abs(Deflection) <= Limit;

    /// <summary>|deflection| / limit.</summary>
    public double Utilization => Math.Abs(Deflection) / Limit;
}
