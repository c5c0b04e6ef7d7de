using TrussWeb.Core.Model;

namespace TrussWeb.Core.Analysis;

/// <summary>
/// Stiffness inputs and serviceability limit of an analysis. E and A per member: an entry in
/// <see cref="Members"/> wins; otherwise <see cref="DefaultElasticModulus"/> and <see cref="DefaultArea"/>.
/// Forces in a statically determinate truss do not depend on them; displacements do.
/// </summary>
public sealed record AnalysisOptions
{
    /// <summary>E of steel, MPa (SANS 10162-1 / CSA S16, ENGINEERING.md).</summary>
    public const double SteelElasticModulusMPa = 200_000;

    /// <summary>Deflection limit divisor: span/250 (common practice, editable).</summary>
    public const double DefaultDeflectionLimitDivisor = 250;

    /// <summary>Area of a member not listed in <see cref="Members"/>, mm².</summary>
    public required Func<Member, double> DefaultArea { get; init; }

    public double DefaultElasticModulus { get; init; } = SteelElasticModulusMPa;

    /// <summary>Per-member E and A by member id.</summary>
    public IReadOnlyDictionary<string, MemberStiffness> Members { get; init; } = new Dictionary<string, MemberStiffness>();

    /// <summary>SLS vertical deflection limit = span / this.</summary>
    public double DeflectionLimitDivisor { get; init; } = DefaultDeflectionLimitDivisor;

    /// <summary>Every member with the same area, mm².</summary>
    public static AnalysisOptions UniformArea(double areaMm2) => new() { DefaultArea = _ => areaMm2 };
}
