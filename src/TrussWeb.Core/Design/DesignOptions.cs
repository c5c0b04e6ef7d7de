namespace TrussWeb.Core.Design;

/// <summary>Options of a member check; each one that is on is stated in the record.</summary>
public sealed record DesignOptions
{
    /// <summary>Compression exponent n: 1.34 hot-rolled and cold-formed non-stress-relieved HSS, 2.24 stress-relieved HSS (SANS 10162-1 cl. 13.3.1).</summary>
    public double CompressionExponent { get; init; } = 1.34;

    /// <summary>Also apply the equivalent slenderness method for single angles connected through one leg (AISC 360-16 E5).</summary>
    public bool EccentricAngleMethod { get; init; }

    /// <summary>For <see cref="EccentricAngleMethod"/>: the member is a web member of a planar truss (true) or of a space truss (false).</summary>
    public bool PlanarTruss { get; init; } = true;

    /// <summary>For <see cref="EccentricAngleMethod"/>: connected through the short leg of an unequal angle.</summary>
    public bool ConnectedThroughShortLeg { get; init; }

    /// <summary>Optional further 0.85 factor on the resistance of the first web compression members (SANS 10162-1:2005 cl. 15, as reported).</summary>
    public bool FirstWebMemberFactor { get; init; }

    /// <summary>Compression slenderness limit KL/r (SANS 10162-1 cl. 10.4.2.1).</summary>
    public double CompressionSlendernessLimit { get; init; } = 200;

    /// <summary>Tension slenderness limit L/r (SANS 10162-1 cl. 10.4.2.2).</summary>
    public double TensionSlendernessLimit { get; init; } = 300;
}
