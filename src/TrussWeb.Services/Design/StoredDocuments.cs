using TrussWeb.Core.Loads;
using TrussWeb.Core.Sections;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Design;

/// <summary>A wind case as stored in <c>TrussActions.WindCasesJson</c>.</summary>
internal sealed record WindCaseDoc(string? Id, string Name, double LeftSlopeKPa, double RightSlopeKPa);

/// <summary>Sizing limits as stored in <c>MemberGroup.AllowedSectionsJson</c> ("{}" = fixed section).</summary>
internal sealed record AllowedSectionsDoc(IReadOnlyList<SectionFamily>? Families, double MinDimensionMm, double MinThicknessMm, double? MaxDimensionMm);

/// <summary>A grade's thickness band as stored in <c>SteelGradeEntry.BandsJson</c>.</summary>
internal sealed record BandDoc(double MaxThicknessMm, double FyMPa);

/// <summary>The section of a member, normalised: designation, family, every dimension (mm), and for double angles gap and arrangement.</summary>
internal sealed record SectionDoc(string Designation, SectionFamily Family, SortedDictionary<string, double> Dimensions, double? Gap, BackToBack? Orientation,
    double AreaMm2, double MassPerMetreKg);

internal sealed record MaterialDoc(string Grade, double FyMPa, double FuMPa, double EMPa, double GMPa);

/// <summary>Normalised inputs of one member design; serialised as <c>DesignSnapshot.InputsJson</c> and hashed into the fingerprint.</summary>
internal sealed record MemberInputsDoc(
    string Mark,
    string Group,
    double LengthMm,
    SectionDoc Section,
    MaterialDoc Material,
    LengthsView Lengths,
    Core.Design.ConnectorLayout? Connectors,
    Core.Design.DesignOptions Options,
    ForcesView Forces,
    string StandardCode,
    string StandardVersion,
    string CoreVersion);

/// <summary>Results of one member design; serialised as <c>DesignSnapshot.ResultJson</c> (checks and outcome are hashed; the record is not).</summary>
internal sealed record MemberResultDoc(
    double Utilization,
    string GoverningCheck,
    string? GoverningCombination,
    string Status,
    IReadOnlyList<CheckView> Checks,
    IReadOnlyList<StepView> Steps,
    IReadOnlyList<string> Notes);

internal sealed record TrussInputsDoc(
    string Name,
    double SpanMm,
    double SpacingMm,
    double DeflectionLimitDivisor,
    double ConnectionAllowance,
    IReadOnlyList<string> Nodes,
    IReadOnlyList<string> Members,
    IReadOnlyList<string> Supports,
    IReadOnlyList<string> LateralRestraints,
    IReadOnlyList<string> PurlinNodes,
    AreaActions Actions,
    IReadOnlyList<CombinationDoc> Combinations,
    string Grade,
    string StandardCode,
    string StandardVersion,
    string CoreVersion);

internal sealed record CombinationDoc(string Name, LimitState LimitState, SortedDictionary<string, double> Factors);

internal sealed record TrussResultDoc(
    string Status,
    double MaxUtilization,
    double MassKg,
    double MassWithAllowanceKg,
    IReadOnlyList<SectionTotalView> Totals,
    IReadOnlyList<FieldError> Warnings,
    IReadOnlyList<string> DeflectionChecks,
    SortedDictionary<string, string> MemberFingerprints);
