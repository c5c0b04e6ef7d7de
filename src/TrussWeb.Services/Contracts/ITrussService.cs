using TrussWeb.Core.Loads;
using TrussWeb.Core.Model;
using TrussWeb.Core.Sections;

namespace TrussWeb.Services.Contracts;

/// <summary>
/// Trusses: create from a generator, read the whole input, and save each table. Every save takes the
/// Version of each row the caller loaded (0 for new rows), re-runs analysis and design of the truss,
/// refreshes its snapshots and returns the fresh detail; a lost race returns
/// <see cref="ResultKind.Conflict"/> with nothing saved.
/// Table saves are patches: rows listed are inserted (Id null) or updated, rows in Deleted are removed,
/// rows not mentioned stay as they are.
/// </summary>
public interface ITrussService
{
    Task<ServiceResult<TrussDetail>> CreateFromGeneratorAsync(Guid projectId, TrussGeneratorInput input, CancellationToken cancellationToken = default);

    Task<ServiceResult<TrussDetail>> GetAsync(Guid trussId, CancellationToken cancellationToken = default);

    Task<ServiceResult<TrussDetail>> SaveSettingsAsync(Guid trussId, TrussSettingsInput input, CancellationToken cancellationToken = default);

    Task<ServiceResult<TrussDetail>> SaveNodesAsync(Guid trussId, NodeTableInput input, CancellationToken cancellationToken = default);

    Task<ServiceResult<TrussDetail>> SaveMembersAsync(Guid trussId, MemberTableInput input, CancellationToken cancellationToken = default);

    Task<ServiceResult<TrussDetail>> SaveSupportsAsync(Guid trussId, IReadOnlyList<SupportRow> rows, CancellationToken cancellationToken = default);

    Task<ServiceResult<TrussDetail>> SaveRestraintsAsync(Guid trussId, IReadOnlyList<RestraintRow> rows, CancellationToken cancellationToken = default);

    Task<ServiceResult<TrussDetail>> SaveGroupsAsync(Guid trussId, GroupTableInput input, CancellationToken cancellationToken = default);

    Task<ServiceResult<TrussDetail>> SaveActionsAsync(Guid trussId, ActionsInput input, CancellationToken cancellationToken = default);

    Task<ServiceResult<TrussDetail>> SaveCombinationsAsync(Guid trussId, CombinationTableInput input, CancellationToken cancellationToken = default);

    /// <summary>Replaces every combination by the presets of <paramref name="preset"/>; <paramref name="loaded"/> are the combinations the caller saw.</summary>
    Task<ServiceResult<TrussDetail>> ResetCombinationsAsync(Guid trussId, CombinationStandard preset, IReadOnlyList<RowRef> loaded, CancellationToken cancellationToken = default);
}

/// <summary>Generator input (lengths mm, pitch degrees): give PitchDegrees or ApexHeightMm for pitched types.</summary>
public sealed record TrussGeneratorInput(
    string Name,
    TrussType Type,
    double SpanMm,
    double? PitchDegrees,
    double? ApexHeightMm,
    double HeelDepthMm,
    int PanelCount,
    double SpacingMm,
    int? BottomRestraintEvery);

public sealed record TrussSettingsInput(
    string Name,
    double SpacingMm,
    double? PurlinSpacingMm,
    double DeflectionLimitRatio,
    double ConnectionAllowanceFraction,
    string? Notes,
    long Version);

public sealed record TrussDetail(
    Guid Id,
    Guid ProjectId,
    long Version,
    string Name,
    string Kind,
    TrussGeneratorInput? Generator,
    double SpanMm,
    double SpacingMm,
    double? PurlinSpacingMm,
    double DeflectionLimitRatio,
    double ConnectionAllowanceFraction,
    string? Notes,
    string StandardCode,
    string? DefaultGradeName,
    IReadOnlyList<NodeView> Nodes,
    IReadOnlyList<MemberView> Members,
    IReadOnlyList<GroupView> Groups,
    ActionsView Actions,
    IReadOnlyList<CombinationView> Combinations,
    TrussDesignStatus Design,
    string? MyRole,
    bool CanEdit);

/// <summary>Short status of the stored design: overall status text ("Pass", "Fail", "OutOfScope", "NotDesigned"), max utilization, mass and the truss fingerprint.</summary>
public sealed record TrussDesignStatus(string Status, double? MaxUtilization, double? MassKg, string? Fingerprint, DateTime? DesignedUtc, IReadOnlyList<string> Messages);

/// <summary>A node with its support (null = free; SupportVersion 0 when none) and restraint.</summary>
public sealed record NodeView(
    Guid Id,
    long Version,
    string Label,
    double XMm,
    double YMm,
    bool IsPurlinPoint,
    bool IsLaterallyRestrained,
    SupportKind? Support,
    long SupportVersion);

public sealed record MemberView(
    Guid Id,
    long Version,
    string Mark,
    Guid StartNodeId,
    string StartNode,
    Guid EndNodeId,
    string EndNode,
    Guid GroupId,
    string Group,
    string? GroupSection,
    string? SectionOverride,
    double LengthMm,
    MemberOverrides Overrides,
    string ReviewState,
    string? Status,
    double? Utilization,
    string? Fingerprint);

/// <summary>Design inputs of one member; null = default (group section, K = 1, computed lengths, proposed connectors).</summary>
public sealed record MemberOverrides(
    string? SectionOverride,
    double? Kx,
    double? Ky,
    double? Kz,
    double? LengthXMm,
    double? LengthYMm,
    double? LengthZMm,
    double? KLuMm,
    double? KLvMm,
    int? ConnectorCount,
    double? ConnectorSpacingMm,
    bool UseModifiedSlenderness);

/// <summary>Sizing limits of a group: allowed families and dimensions (mm); null limits = none.</summary>
public sealed record SizingLimits(IReadOnlyList<SectionFamily> Families, double MinDimensionMm, double MinThicknessMm, double? MaxDimensionMm);

public sealed record GroupView(
    Guid Id,
    long Version,
    string Name,
    string Role,
    string? GradeName,
    string? SectionDesignation,
    SizingLimits? Limits,
    double? DoubleAngleGapMm,
    BackToBack? Orientation,
    int MemberCount);

public sealed record WindCaseRow(string Id, string Name, double LeftSlopeKPa, double RightSlopeKPa);

public sealed record ActionsView(Guid? Id, long Version, double CoveringKPa, double PurlinsAndServicesKPa, double ImposedKPa, IReadOnlyList<WindCaseRow> WindCases);

/// <summary>
/// One factor of a combination. Key is "kind:&lt;LoadKind&gt;" (e.g. "kind:Permanent") or "case:&lt;case id&gt;"
/// (e.g. "case:W1", wins over the kind factor). Label is for display.
/// </summary>
public sealed record CombinationFactor(string Key, string Label, double Factor);

public sealed record CombinationView(Guid Id, long Version, string Name, LimitState LimitState, int SortOrder, IReadOnlyList<CombinationFactor> Factors);

public sealed record NodeRow(Guid? Id, long Version, string Label, double XMm, double YMm, bool IsPurlinPoint);

public sealed record NodeTableInput(IReadOnlyList<NodeRow> Rows, IReadOnlyList<RowRef> Deleted);

/// <summary>A member row; nodes by label, group by name.</summary>
public sealed record MemberRow(Guid? Id, long Version, string Mark, string StartNode, string EndNode, string Group);

public sealed record MemberTableInput(IReadOnlyList<MemberRow> Rows, IReadOnlyList<RowRef> Deleted);

/// <summary>The support at a node; Kind null removes it. Version is the support row's Version the caller loaded (0 when none).</summary>
public sealed record SupportRow(Guid NodeId, SupportKind? Kind, long Version);

/// <summary>Lateral (out-of-plane) restraint of a node; Version is the node's Version.</summary>
public sealed record RestraintRow(Guid NodeId, bool IsLaterallyRestrained, long Version);

public sealed record GroupRow(
    Guid? Id,
    long Version,
    string Name,
    string Role,
    string? GradeName,
    string? SectionDesignation,
    SizingLimits? Limits,
    double? DoubleAngleGapMm,
    BackToBack? Orientation);

public sealed record GroupTableInput(IReadOnlyList<GroupRow> Rows, IReadOnlyList<RowRef> Deleted);

/// <summary>Area actions (kPa) and wind cases; Version of the actions row (0 when none yet).</summary>
public sealed record ActionsInput(double CoveringKPa, double PurlinsAndServicesKPa, double ImposedKPa, IReadOnlyList<WindCaseRow> WindCases, long Version);

public sealed record CombinationRow(Guid? Id, long Version, string Name, LimitState LimitState, int SortOrder, IReadOnlyList<CombinationFactor> Factors);

public sealed record CombinationTableInput(IReadOnlyList<CombinationRow> Rows, IReadOnlyList<RowRef> Deleted);
