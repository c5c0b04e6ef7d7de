using TrussWeb.Core.Model;
using TrussWeb.Core.Sections;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Api;

/// <summary>
/// One member to check, stateless (nothing is stored). Units: mm, MPa, N (tension and compression as
/// magnitudes). Give the section by catalogue <c>designation</c> or by exactly one of the dimension
/// objects; <c>doubleAngle</c> makes two of the angle back to back.
/// </summary>
public sealed record MemberCheckRequest(
    SectionInput Section,
    MaterialInput Material,
    LengthsInput Lengths,
    ForcesInput Forces,
    string? Mark = null,
    ConnectorsInput? Connectors = null,
    string? Standard = null,
    double? CompressionExponent = null);

/// <summary>A catalogue designation (e.g. "L90x90x8", "SHS 100x100x5"), or dimensions of one family; <c>doubleAngle</c> for two angles.</summary>
public sealed record SectionInput(
    string? Designation = null,
    AngleInput? Angle = null,
    RectangularHollowInput? RectangularHollow = null,
    CircularHollowInput? CircularHollow = null,
    DoubleAngleInput? DoubleAngle = null);

/// <summary>Angle dimensions, mm: long leg, short leg, thickness, root radius r1, toe radius r2.</summary>
public sealed record AngleInput(double LongLegMm, double ShortLegMm, double ThicknessMm, double RootRadiusMm, double ToeRadiusMm);

/// <summary>RHS/SHS dimensions, mm; outer corner radius defaults to the EN 10219 rule.</summary>
public sealed record RectangularHollowInput(double DepthMm, double WidthMm, double ThicknessMm, double? OuterRadiusMm = null);

public sealed record CircularHollowInput(double DiameterMm, double ThicknessMm);

/// <summary>Two angles back to back with a gap (mm) and arrangement.</summary>
public sealed record DoubleAngleInput(double GapMm, BackToBack Arrangement);

/// <summary>A grade by name (fy from its thickness bands), or fy and fu (E and G default to 200 000 and 77 000 MPa).</summary>
public sealed record MaterialInput(string? Grade = null, double? FyMPa = null, double? FuMPa = null, double? ElasticModulusMPa = null, double? ShearModulusMPa = null);

/// <summary>Member lengths (mm) and effective length factors; Lz defaults to Ly; KLu/KLv (mm) for single angles when known.</summary>
public sealed record LengthsInput(double LxMm, double LyMm, double? LzMm = null, double Kx = 1, double Ky = 1, double Kz = 1, double? KLuMm = null, double? KLvMm = null);

/// <summary>Largest tension and largest compression, N, as magnitudes (≥ 0).</summary>
public sealed record ForcesInput(double TensionN, double CompressionN);

/// <summary>Interconnectors of a double angle: a count of intermediate connectors or a spacing (mm); neither = proposed.</summary>
public sealed record ConnectorsInput(int? IntermediateCount = null, double? SpacingMm = null, bool UseModifiedSlenderness = true);

public sealed record MaterialUsed(string Grade, double FyMPa, double FuMPa, double ElasticModulusMPa, double ShearModulusMPa);

public sealed record SectionUsed(string Designation, SectionFamily Family, double AreaMm2, double MassPerMetreKg, double RxMm, double RyMm, double GoverningThicknessMm);

/// <summary>The result of a member check with its whole calculation record, as Core wrote it (values unrounded).</summary>
public sealed record MemberCheckResponse(
    string Mark,
    SectionUsed Section,
    MaterialUsed Material,
    string StandardCode,
    string StandardEdition,
    string StandardVersion,
    double Utilization,
    string GoverningCheck,
    string Status,
    IReadOnlyList<CheckView> Checks,
    IReadOnlyList<StepView> Steps,
    IReadOnlyList<string> Notes,
    string Caution);

/// <summary>A plane pin-jointed truss to analyse (mm, N). Loads are one case; member areas default to <c>defaultAreaMm2</c>.</summary>
public sealed record TrussAnalysisRequest(
    IReadOnlyList<AnalysisNode> Nodes,
    IReadOnlyList<AnalysisMember> Members,
    IReadOnlyList<AnalysisSupport> Supports,
    IReadOnlyList<AnalysisLoad> Loads,
    double DefaultAreaMm2 = 1000,
    double ElasticModulusMPa = 200_000);

public sealed record AnalysisNode(string Label, double XMm, double YMm);

/// <summary>A member between two nodes (by label); area in mm² (default: the request's).</summary>
public sealed record AnalysisMember(string Mark, string Start, string End, double? AreaMm2 = null);

public sealed record AnalysisSupport(string Node, SupportKind Kind);

/// <summary>A nodal load, N (x to the right, y up).</summary>
public sealed record AnalysisLoad(string Node, double FxN, double FyN);

/// <summary>Axial force per member (N, tension positive), displacement per node (mm), reaction per support (N).</summary>
public sealed record TrussAnalysisResponse(
    IReadOnlyList<MemberForceResult> Members,
    IReadOnlyList<NodeResult> Nodes,
    IReadOnlyList<NodeResult> Reactions,
    double AppliedFxN,
    double AppliedFyN,
    string Caution);

public sealed record MemberForceResult(string Mark, double LengthMm, double AxialN);

public sealed record NodeResult(string Node, double X, double Y);
