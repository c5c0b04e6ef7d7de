namespace TrussWeb.Core.Standards.Sans10162;

/// <summary>
/// Reference strings of the provisions this module applies, in number and words, so that a checker can
/// find each provision even where a clause number should be confirmed against the edition in use.
/// </summary>
public static class Sans10162References
{
    /// <summary>Short code of the standard.</summary>
    public const string Code = "SANS 10162-1";

    public const string ResistanceFactors = "SANS 10162-1 cl. 13.1 (resistance factors)";
    public const string SlendernessCompression = "SANS 10162-1 cl. 10.4.2.1 (maximum slenderness, compression members)";
    public const string SlendernessTension = "SANS 10162-1 cl. 10.4.2.2 (maximum slenderness, tension members)";
    public const string ClassTable4 = "SANS 10162-1 cl. 11, Table 4 (width-to-thickness limits, axial compression)";
    public const string Class4EffectiveArea = "CSA S16-14 cl. 13.3.5 method (class 4 effective area; confirm the SANS 10162-1 clause)";
    public const string TensionGross = "SANS 10162-1 cl. 13.2 (a)(i) (tension, gross section yield)";
    public const string TensionNet = "SANS 10162-1 cl. 13.2 (a)(iii) (tension, effective net section fracture)";
    public const string NetArea = "SANS 10162-1 cl. 12.3.1 (net area)";
    public const string ShearLagBolted = "SANS 10162-1 cl. 12.3.3.2 (effective net area, shear lag, bolted)";
    public const string ShearLagWelded = "SANS 10162-1 cl. 12.3.3.3 (effective net area, shear lag, welded; CSA S16 rule from memory)";
    public const string BlockShear = "SANS 10162-1 cl. 13.11 (block shear: tension and shear block failure)";
    public const string CompressionResistance = "SANS 10162-1 cl. 13.3.1 (axial compressive resistance)";
    public const string ElasticBuckling = "SANS 10162-1 cl. 13.3.2 (elastic buckling stress, flexural and flexural-torsional)";
    public const string Trusses = "SANS 10162-1:2005 cl. 15 (trusses; first web compression members, as reported in a published synopsis)";
    public const string BuiltUp = "SANS 10162-1 cl. 19 (built-up members; CSA S16-14 cl. 19.1.4 rule)";
    public const string ModifiedSlenderness = "CSA S16-14 cl. 19.1.4 (modified slenderness of built-up members; confirm for the SANS edition in use)";
    public const string EccentricAngle = "AISC 360-16 E5 (single-angle compression members, equivalent slenderness; optional method, not SANS 10162-1)";
}
