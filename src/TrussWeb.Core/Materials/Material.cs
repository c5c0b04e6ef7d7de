using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Materials;

/// <summary>The material of one member: a grade resolved for the member's thickness. MPa.</summary>
/// <param name="Grade">Grade name, for the record.</param>
/// <param name="Fy">Yield strength for the member's thickness, MPa.</param>
/// <param name="Fu">Ultimate tensile strength, MPa.</param>
/// <param name="E">Modulus of elasticity, MPa.</param>
/// <param name="G">Shear modulus, MPa.</param>
public sealed record Material(string Grade, double Fy, double Fu, double E, double G)
{
    /// <summary>SANS 10162-1 / CSA S16 modulus of elasticity, MPa (cl. 5.1, common practice value).</summary>
    public const double SansE = 200_000;

    /// <summary>SANS 10162-1 / CSA S16 shear modulus, MPa.</summary>
    public const double SansG = 77_000;

    /// <summary>Steel density, kg/m³ (common practice).</summary>
    public const double Density = 7_850;

    /// <summary>Issues with the values: fy &gt; 0, fu ≥ fy, E, G &gt; 0, all finite.</summary>
    public IReadOnlyList<ValidationIssue> Validate()
    {
        var issues = new List<ValidationIssue>();
        Guard.InRange(issues, nameof(Fy), Fy, PlausibleRange.MinStrengthMPa, PlausibleRange.MaxStrengthMPa, "MPa");
        Guard.InRange(issues, nameof(Fu), Fu, PlausibleRange.MinStrengthMPa, PlausibleRange.MaxStrengthMPa, "MPa");
        Guard.InRange(issues, nameof(E), E, PlausibleRange.MinModulusMPa, PlausibleRange.MaxModulusMPa, "MPa");
        Guard.InRange(issues, nameof(G), G, PlausibleRange.MinModulusMPa, PlausibleRange.MaxModulusMPa, "MPa");
        if (Fy > 0 && Fu > 0 && Fu < Fy)
        {
            issues.Add(new ValidationIssue(nameof(Fu), $"fu = {Fu} MPa must not be less than fy = {Fy} MPa"));
        }

        return issues;
    }
}
