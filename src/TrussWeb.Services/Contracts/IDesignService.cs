namespace TrussWeb.Services.Contracts;

/// <summary>
/// Design of trusses and members. Results shown are always read from stored snapshots; a design run
/// stores new snapshots (one per member and one for the truss) with their fingerprints.
/// </summary>
public interface IDesignService
{
    /// <summary>Analyses and designs the truss with its current inputs and stores the snapshots.</summary>
    Task<ServiceResult<TrussDesignView>> DesignTrussAsync(Guid trussId, CancellationToken cancellationToken = default);

    /// <summary>The stored design (no recalculation); Status "NotDesigned" when there is none.</summary>
    Task<ServiceResult<TrussDesignView>> GetTrussDesignAsync(Guid trussId, CancellationToken cancellationToken = default);

    /// <summary>One member's stored design with its full calculation record.</summary>
    Task<ServiceResult<MemberDesignDetail>> GetMemberDesignAsync(Guid trussId, Guid memberId, CancellationToken cancellationToken = default);

    /// <summary>Runs automatic sizing; nothing is saved until the proposal is accepted.</summary>
    Task<ServiceResult<SizingProposal>> ProposeSizingAsync(Guid trussId, IProgress<SizingProgress>? progress = null, CancellationToken cancellationToken = default);

    /// <summary>Applies the proposed sections to the groups (conflict if a group changed since the proposal) and re-designs.</summary>
    Task<ServiceResult<TrussDesignView>> AcceptSizingAsync(SizingProposal proposal, CancellationToken cancellationToken = default);

    /// <summary>Drops the proposal (recorded in the audit); nothing changes.</summary>
    Task<ServiceResult<Done>> DiscardSizingAsync(SizingProposal proposal, CancellationToken cancellationToken = default);

    /// <summary>Saves one member's section, K, length and connector overrides, re-designs and returns its new design.</summary>
    Task<ServiceResult<MemberDesignDetail>> UpdateMemberDesignAsync(Guid trussId, Guid memberId, MemberDesignInput input, CancellationToken cancellationToken = default);
}

public sealed record MemberDesignInput(MemberOverrides Overrides, long Version);

/// <summary>Buckling lengths (mm) and factors with where each length came from.</summary>
public sealed record LengthsView(
    double LxMm,
    double LyMm,
    double LzMm,
    double Kx,
    double Ky,
    double Kz,
    double? KLuMm,
    double? KLvMm,
    string LxSource,
    string LySource,
    string LzSource);

/// <summary>Forces in N as magnitudes, with the combination giving each.</summary>
public sealed record ForcesView(double MaxTensionN, string? TensionCombination, double MaxCompressionN, string? CompressionCombination);

public sealed record MemberDesignRow(
    Guid MemberId,
    string Mark,
    string Group,
    string Section,
    string Grade,
    double LengthMm,
    ForcesView Forces,
    LengthsView Lengths,
    double Utilization,
    string GoverningCheck,
    string? GoverningCombination,
    string Status,
    string ReviewState,
    string Fingerprint);

public sealed record SectionTotalView(string Designation, int Count, double LengthMm, double MassKg);

public sealed record TrussDesignView(
    Guid TrussId,
    string Status,
    double MaxUtilization,
    double MassKg,
    double MassWithAllowanceKg,
    IReadOnlyList<SectionTotalView> Totals,
    IReadOnlyList<MemberDesignRow> Members,
    IReadOnlyList<FieldError> Warnings,
    string? Fingerprint,
    string StandardCode,
    string StandardVersion,
    string CoreVersion,
    DateTime? DesignedUtc);

public sealed record CheckView(string Name, double Demand, double Resistance, double Utilization, string Status, string Unit, string Reference);

/// <summary>One step of the calculation record, as Core wrote it (value unrounded).</summary>
public sealed record StepView(string Section, string Symbol, string Description, string Expression, string Substituted, double Value, string Unit, string Reference);

public sealed record MemberDesignDetail(
    MemberDesignRow Row,
    MemberOverrides Overrides,
    long MemberVersion,
    IReadOnlyList<CheckView> Checks,
    IReadOnlyList<StepView> Steps,
    IReadOnlyList<string> Notes,
    string InputsJson,
    string CoreVersion,
    string StandardCode,
    string StandardVersion,
    DateTime DesignedUtc);

public sealed record SizingProgress(int Round, string Message);

/// <summary>A group's proposed section; GroupVersion is the group Version when the proposal was made. Reason is set when no section passes.</summary>
public sealed record GroupProposal(Guid GroupId, long GroupVersion, string Group, string? CurrentSection, string? ProposedSection, double? Utilization, string? Reason);

public sealed record SizingRoundView(int Number, IReadOnlyDictionary<string, string> Sections, double MassKg);

public sealed record SizingProposal(
    Guid ProposalId,
    Guid TrussId,
    IReadOnlyList<GroupProposal> Groups,
    double MassBeforeKg,
    double MassAfterKg,
    IReadOnlyList<SizingRoundView> Rounds,
    bool Converged,
    string Status)
{
    public IEnumerable<GroupProposal> Unsized => Groups.Where(g => g.ProposedSection is null);
}
