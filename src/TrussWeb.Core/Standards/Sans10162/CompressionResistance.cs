namespace TrussWeb.Core.Standards.Sans10162;

/// <summary>
/// The numbers of one compressive resistance calculation (SANS 10162-1 cl. 13.3). Axis 1 and 2 are
/// x-x and y-y for symmetric sections and the principal axes u-u and v-v for single angles
/// (<see cref="Axis1"/>, <see cref="Axis2"/> name them). Stresses MPa, lengths mm, forces N.
/// </summary>
/// <param name="Axis1">"x" or "u".</param>
/// <param name="Axis2">"y" or "v".</param>
/// <param name="Slenderness1">K1L1/r1 (or the modified slenderness where used), dimensionless.</param>
/// <param name="Slenderness2">K2L2/r2 (or the modified slenderness ρe for built-up members about y), dimensionless.</param>
/// <param name="Fe1">Flexural elastic buckling stress about axis 1, MPa.</param>
/// <param name="Fe2">Flexural elastic buckling stress about axis 2, MPa.</param>
/// <param name="Fez">Torsional elastic buckling stress, MPa.</param>
/// <param name="Fe">Governing elastic buckling stress, MPa.</param>
/// <param name="Mode">Words naming the governing mode, e.g. "flexural about x-x".</param>
/// <param name="Area">Area used in Cr (gross, or effective for class 4), mm².</param>
/// <param name="Lambda">λ = √(Fy/Fe), dimensionless.</param>
/// <param name="Cr">Factored compressive resistance, N.</param>
public sealed record CompressionResistance(
    string Axis1,
    string Axis2,
    double Slenderness1,
    double Slenderness2,
    double Fe1,
    double Fe2,
    double Fez,
    double Fe,
    string Mode,
    double Area,
    double Lambda,
    double Cr);
