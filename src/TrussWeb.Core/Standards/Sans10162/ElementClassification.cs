using TrussWeb.Core.Sections;

namespace TrussWeb.Core.Standards.Sans10162;

/// <summary>
/// Class of one plate element in axial compression (SANS 10162-1 cl. 11, Table 4).
/// </summary>
/// <param name="Element">The element classified.</param>
/// <param name="Ratio">Width-to-thickness ratio as Table 4 defines it (b/t, d/t, (b − 4t)/t, D/t), dimensionless.</param>
/// <param name="Limit">Class 3 limit of the ratio, dimensionless.</param>
/// <param name="Class">3 when within the limit ("class 1 to 3": no local buckling before yield in compression), 4 beyond.</param>
/// <param name="AreaReduction">Class 4 only: area removed, Count·(b − b_lim)·t, mm²; 0 otherwise.</param>
public sealed record ElementClassification(PlateElement Element, double Ratio, double Limit, int Class, double AreaReduction);
