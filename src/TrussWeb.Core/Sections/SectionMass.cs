using TrussWeb.Core.Materials;

namespace TrussWeb.Core.Sections;

/// <summary>Mass per metre of a prismatic steel member.</summary>
internal static class SectionMass
{
    /// <summary>Square millimetres per square metre.</summary>
    private const double SquareMillimetresPerSquareMetre = 1e6;

    /// <summary>Mass per metre, kg/m, of a gross area in mm² at <see cref="Material.Density"/> (7 850 kg/m³, common practice).</summary>
    public static double PerMetre(double areaMm2) => areaMm2 / SquareMillimetresPerSquareMetre * Material.Density;
}
