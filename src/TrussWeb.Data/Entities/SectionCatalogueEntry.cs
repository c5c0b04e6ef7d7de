namespace TrussWeb.Data.Entities;

/// <summary>
/// One catalogue section (dimensions only; properties are computed by Core). Dimensions in mm; a
/// column is null where the family has no such dimension. Seeded from seed-data by a service.
/// </summary>
public class SectionCatalogueEntry : TrackedEntity
{
    /// <summary>Section family, e.g. "EqualAngle", "CHS"; designation is unique within it.</summary>
    public string Family { get; set; } = string.Empty;

    public string Designation { get; set; } = string.Empty;

    /// <summary>Depth or long leg, d.</summary>
    public double? DepthMm { get; set; }

    /// <summary>Width or short leg, b.</summary>
    public double? WidthMm { get; set; }

    /// <summary>Thickness, t.</summary>
    public double? ThicknessMm { get; set; }

    /// <summary>Root radius, r1.</summary>
    public double? RootRadiusMm { get; set; }

    /// <summary>Toe radius, r2.</summary>
    public double? ToeRadiusMm { get; set; }

    /// <summary>Outside diameter of a circular hollow section, D.</summary>
    public double? OutsideDiameterMm { get; set; }

    /// <summary>Height, h (families that use it).</summary>
    public double? HeightMm { get; set; }

    /// <summary>Further dimensions as JSON text; null when the columns suffice.</summary>
    public string? DimensionsJson { get; set; }

    /// <summary>Where the dimensions come from (catalogue file and edition).</summary>
    public string Source { get; set; } = string.Empty;

    public bool IsActive { get; set; } = true;
}
