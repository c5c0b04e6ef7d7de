using TrussWeb.Core.Validation;

namespace TrussWeb.Core.Materials;

/// <summary>
/// A steel grade with yield strength by thickness band (e.g. EN 10025-2 Table 7), ultimate strength
/// and elastic constants. Users may add grades; seed values live in seed-data/grades.csv.
/// </summary>
/// <param name="Name">e.g. "S355JR".</param>
/// <param name="Standard">e.g. "SANS 50025 / EN 10025-2".</param>
/// <param name="Bands">Ascending by <see cref="ThicknessBand.MaxThickness"/>.</param>
/// <param name="Fu">Ultimate tensile strength (lower bound of the range), MPa.</param>
/// <param name="E">Modulus of elasticity, MPa.</param>
/// <param name="G">Shear modulus, MPa.</param>
public sealed record SteelGrade(string Name, string Standard, IReadOnlyList<ThicknessBand> Bands, double Fu, double E, double G)
{
    /// <summary>Largest thickness the grade's bands cover, mm.</summary>
    public double MaxThickness => Bands.Count == 0 ? 0 : Bands[^1].MaxThickness;

    /// <summary>Yield strength for an element of thickness <paramref name="thickness"/> mm.</summary>
    /// <exception cref="OutOfScopeException">The thickness is beyond the last band.</exception>
    public double FyFor(double thickness)
    {
        if (!TryFyFor(thickness, out var fy))
        {
            throw new OutOfScopeException($"Grade {Name}: thickness {thickness} mm is beyond the largest band ({MaxThickness} mm).");
        }

        return fy;
    }

    public bool TryFyFor(double thickness, out double fy)
    {
        foreach (var band in Bands)
        {
            if (thickness <= band.MaxThickness)
            {
                fy = band.Fy;
                return true;
            }
        }

        fy = double.NaN;
        return false;
    }

    /// <summary>The material for a section whose thickest element is <paramref name="thickness"/> mm.</summary>
    public Material For(double thickness) => new(Name, FyFor(thickness), Fu, E, G);

    /// <summary>Checks the grade's own data: bands ascending, fy &gt; 0, fu ≥ fy, E and G &gt; 0.</summary>
    public IReadOnlyList<ValidationIssue> Validate()
    {
        var issues = new List<ValidationIssue>();
        if (string.IsNullOrWhiteSpace(Name))
        {
            issues.Add(new ValidationIssue(nameof(Name), "a grade needs a name"));
        }

        if (Bands.Count == 0)
        {
            issues.Add(new ValidationIssue(nameof(Bands), "at least one thickness band is needed"));
        }

        var previous = 0.0;
        foreach (var band in Bands)
        {
            if (band.MaxThickness <= previous)
            {
                issues.Add(new ValidationIssue(nameof(Bands), $"thickness bands must ascend (got {band.MaxThickness} mm after {previous} mm)"));
            }

            Guard.Positive(issues, "Fy", band.Fy, "MPa");
            if (band.Fy > 0 && Fu < band.Fy)
            {
                issues.Add(new ValidationIssue(nameof(Fu), $"fu = {Fu} MPa must not be less than fy = {band.Fy} MPa"));
            }

            previous = band.MaxThickness;
        }

        Guard.Positive(issues, nameof(Fu), Fu, "MPa");
        Guard.Positive(issues, nameof(E), E, "MPa");
        Guard.Positive(issues, nameof(G), G, "MPa");
        return issues;
    }
}
