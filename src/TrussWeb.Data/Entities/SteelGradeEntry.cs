namespace TrussWeb.Data.Entities;

/// <summary>A steel grade. Stresses in MPa. Seeded from seed-data by a service.</summary>
public class SteelGradeEntry : TrackedEntity
{
    /// <summary>Grade name, unique, e.g. "S355JR".</summary>
    public string Name { get; set; } = string.Empty;

    /// <summary>Material standard the grade belongs to.</summary>
    public string Standard { get; set; } = string.Empty;

    /// <summary>Yield strength by thickness band as JSON text: <c>[{"maxThicknessMm": n, "fyMPa": n}, ...]</c>.</summary>
    public string BandsJson { get; set; } = "[]";

    public double FuMPa { get; set; }

    public double EMPa { get; set; }

    public double GMPa { get; set; }
}
