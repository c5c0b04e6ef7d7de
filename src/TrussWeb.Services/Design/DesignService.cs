using Microsoft.EntityFrameworkCore;
using TrussWeb.Core.TrussDesign;
using TrussWeb.Core.Validation;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Authorization;
using TrussWeb.Services.Common;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Design;

/// <summary>Design runs, stored results, sizing proposals and member design edits.</summary>
internal sealed class DesignService(TrussUnitOfWork work) : IDesignService
{
    private static string Op(string method) => PermissionTable.Key<IDesignService>(method);

    public async Task<ServiceResult<TrussDesignView>> DesignTrussAsync(Guid trussId, CancellationToken cancellationToken = default)
    {
        await using var db = await work.CreateAsync(cancellationToken).ConfigureAwait(false);
        var (truss, refusal, _) = await work.LoadForWriteAsync<TrussDesignView>(db, trussId, Op(nameof(DesignTrussAsync)), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        var (failure, issues, outcome) = await work.CommitAsync<TrussDesignView>(db, truss!, "Designed", cancellationToken).ConfigureAwait(false);
        if (failure is not null)
        {
            return failure;
        }

        if (outcome is null)
        {
            return ServiceResult<TrussDesignView>.Invalid(issues.Select(i => new FieldError(i.Field, i.Message)).ToList());
        }

        return await ReadAsync(trussId, [], cancellationToken).ConfigureAwait(false);
    }

    public async Task<ServiceResult<TrussDesignView>> GetTrussDesignAsync(Guid trussId, CancellationToken cancellationToken = default)
    {
        await using var db = await work.CreateAsync(cancellationToken).ConfigureAwait(false);
        var (_, refusal, _) = await work.LoadAsync<TrussDesignView>(db, trussId, Op(nameof(GetTrussDesignAsync)), cancellationToken).ConfigureAwait(false);
        return refusal ?? await ReadAsync(trussId, [], cancellationToken).ConfigureAwait(false);
    }

    public async Task<ServiceResult<MemberDesignDetail>> GetMemberDesignAsync(Guid trussId, Guid memberId, CancellationToken cancellationToken = default)
    {
        await using var db = await work.CreateAsync(cancellationToken).ConfigureAwait(false);
        var (truss, refusal, _) = await work.LoadAsync<MemberDesignDetail>(db, trussId, Op(nameof(GetMemberDesignAsync)), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        var member = truss!.Members.FirstOrDefault(m => m.Id == memberId);
        if (member is null)
        {
            return ServiceResult<MemberDesignDetail>.NotFound("The member does not exist in this truss.");
        }

        var snapshot = await db.DesignSnapshots.AsNoTracking().FirstOrDefaultAsync(s => s.MemberId == memberId, cancellationToken).ConfigureAwait(false);
        return snapshot is null
            ? ServiceResult<MemberDesignDetail>.NotFound($"Member {member.Mark} has no stored design; complete the truss inputs and design it.")
            : ServiceResult<MemberDesignDetail>.Ok(DesignViews.Detail(snapshot, member));
    }

    public async Task<ServiceResult<SizingProposal>> ProposeSizingAsync(Guid trussId, IProgress<SizingProgress>? progress = null, CancellationToken cancellationToken = default)
    {
        await using var db = await work.CreateAsync(cancellationToken).ConfigureAwait(false);
        var (truss, refusal, _) = await work.LoadAsync<SizingProposal>(db, trussId, Op(nameof(ProposeSizingAsync)), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        var (context, issues) = await DesignInputBuilder.BuildAsync(db, truss!, forSizing: true, cancellationToken).ConfigureAwait(false);
        if (context is null)
        {
            return ServiceResult<SizingProposal>.Invalid(issues.Select(i => new FieldError(i.Field, i.Message)).ToList());
        }

        var input = context.Input;
        if (input.Groups.Values.All(g => g.Constraints is null))
        {
            return ServiceResult<SizingProposal>.Invalid("Groups", "no group has sizing limits (allowed section families); set them on the groups first");
        }

        var before = TrussDesigner.Validate(input).Count == 0 ? TrussDesigner.Design(input, withRecords: false).Mass : 0;
        TrussSizingResult sized;
        try
        {
            var relay = progress is null ? null : new SyncProgress(progress);
            sized = await Task.Run(() => TrussSizer.Size(input, context.Sections.Catalogue, relay, cancellationToken), cancellationToken)
                .ConfigureAwait(false);
        }
        catch (InputValidationException ex)
        {
            return ServiceResult<SizingProposal>.Invalid(ex.Issues.Select(i => new FieldError(i.Field, i.Message)).ToList());
        }

        var bySize = sized.Groups.ToDictionary(g => g.Group, StringComparer.Ordinal);
        var proposals = truss!.Groups.OrderBy(g => g.Name, StringComparer.Ordinal).Select(g =>
        {
            if (bySize.TryGetValue(g.Name, out var r))
            {
                var utilization = r.Results.Count == 0 ? (double?)null : r.Results.Max(x => x.Utilization);
                return new GroupProposal(g.Id, g.Version, g.Name, g.SectionDesignation, r.Chosen?.Designation, r.Chosen is null ? null : utilization,
                    r.Chosen is null ? r.FailureReason ?? "no admissible section passes" : null);
            }

            return new GroupProposal(g.Id, g.Version, g.Name, g.SectionDesignation, g.SectionDesignation, null,
                g.SectionDesignation is null ? "the group has no sizing limits and no section" : null);
        }).ToList();
        var proposal = new SizingProposal(Guid.NewGuid(), trussId, proposals, before, sized.Design.Mass,
            sized.Rounds.Select(r => new SizingRoundView(r.Number, r.Sections, r.Mass)).ToList(), sized.Converged, sized.Design.Status.ToString());
        AuditWriter.AddAction(db, work.Caller, work.Clock, truss.ProjectId, nameof(Truss), trussId.ToString(), "SizingProposed", null, Mass(before), Mass(sized.Design.Mass));
        await db.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        return ServiceResult<SizingProposal>.Ok(proposal);
    }

    public async Task<ServiceResult<TrussDesignView>> AcceptSizingAsync(SizingProposal proposal, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(proposal);
        await using var db = await work.CreateAsync(cancellationToken).ConfigureAwait(false);
        var (truss, refusal, _) = await work.LoadForWriteAsync<TrussDesignView>(db, proposal.TrussId, Op(nameof(AcceptSizingAsync)), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        var conflicts = new List<ConflictDetail>();
        foreach (var p in proposal.Groups.Where(p => p.ProposedSection is not null && p.ProposedSection != p.CurrentSection))
        {
            var group = truss!.Groups.FirstOrDefault(g => g.Id == p.GroupId);
            if (group is null)
            {
                conflicts.Add(Conflicts.Deleted(nameof(MemberGroup), p.GroupId, p.Group));
                continue;
            }

            if (group.Version != p.GroupVersion)
            {
                var name = group.UpdatedBy is null ? null : await db.Users.Where(u => u.Id == group.UpdatedBy).Select(u => u.DisplayName).FirstOrDefaultAsync(cancellationToken).ConfigureAwait(false);
                conflicts.Add(Conflicts.Stale(nameof(MemberGroup), group.Id, group.Name, p.GroupVersion, group.Version, group.UpdatedBy, name, group.UpdatedUtc,
                    new Dictionary<string, string?> { [nameof(MemberGroup.SectionDesignation)] = p.ProposedSection }));
                continue;
            }

            TrussUnitOfWork.ExpectVersion(db, group, p.GroupVersion);
            group.SectionDesignation = p.ProposedSection;
        }

        if (conflicts.Count > 0)
        {
            return ServiceResult<TrussDesignView>.Conflict(conflicts);
        }

        var (failure, issues, outcome) = await work.CommitAsync<TrussDesignView>(db, truss!, "SizingAccepted", cancellationToken).ConfigureAwait(false);
        if (failure is not null)
        {
            return failure;
        }

        return await ReadAsync(proposal.TrussId, outcome is null ? issues.Select(i => new FieldError(i.Field, i.Message)).ToList() : [], cancellationToken).ConfigureAwait(false);
    }

    public async Task<ServiceResult<Done>> DiscardSizingAsync(SizingProposal proposal, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(proposal);
        await using var db = await work.CreateAsync(cancellationToken).ConfigureAwait(false);
        var (truss, refusal, _) = await work.LoadAsync<Done>(db, proposal.TrussId, Op(nameof(DiscardSizingAsync)), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        AuditWriter.AddAction(db, work.Caller, work.Clock, truss!.ProjectId, nameof(Truss), truss.Id.ToString(), "SizingDiscarded", null, null, Mass(proposal.MassAfterKg));
        await db.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        return ServiceResult<Done>.Ok(default);
    }

    public async Task<ServiceResult<MemberDesignDetail>> UpdateMemberDesignAsync(Guid trussId, Guid memberId, MemberDesignInput input, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(input);
        await using var db = await work.CreateAsync(cancellationToken).ConfigureAwait(false);
        var (truss, refusal, _) = await work.LoadForWriteAsync<MemberDesignDetail>(db, trussId, Op(nameof(UpdateMemberDesignAsync)), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        var member = truss!.Members.FirstOrDefault(m => m.Id == memberId);
        if (member is null)
        {
            return ServiceResult<MemberDesignDetail>.NotFound("The member does not exist in this truss.");
        }

        var o = input.Overrides;
        var errors = new List<FieldError>();
        // Core's plausible limits (Validation/PlausibleRange), checked here so a refused value is never saved.
        InRangeOrNull(errors, nameof(o.Kx), o.Kx, PlausibleRange.MinK, PlausibleRange.MaxK, "");
        InRangeOrNull(errors, nameof(o.Ky), o.Ky, PlausibleRange.MinK, PlausibleRange.MaxK, "");
        InRangeOrNull(errors, nameof(o.Kz), o.Kz, PlausibleRange.MinK, PlausibleRange.MaxK, "");
        InRangeOrNull(errors, nameof(o.LengthXMm), o.LengthXMm, PlausibleRange.MinLengthMm, PlausibleRange.MaxLengthMm, " mm");
        InRangeOrNull(errors, nameof(o.LengthYMm), o.LengthYMm, PlausibleRange.MinLengthMm, PlausibleRange.MaxLengthMm, " mm");
        InRangeOrNull(errors, nameof(o.LengthZMm), o.LengthZMm, PlausibleRange.MinLengthMm, PlausibleRange.MaxLengthMm, " mm");
        InRangeOrNull(errors, nameof(o.KLuMm), o.KLuMm, PlausibleRange.MinLengthMm, PlausibleRange.MaxLengthMm, " mm");
        InRangeOrNull(errors, nameof(o.KLvMm), o.KLvMm, PlausibleRange.MinLengthMm, PlausibleRange.MaxLengthMm, " mm");
        InRangeOrNull(errors, nameof(o.ConnectorSpacingMm), o.ConnectorSpacingMm, PlausibleRange.MinLengthMm, PlausibleRange.MaxLengthMm, " mm");
        if (o.ConnectorCount is < 0)
        {
            errors.Add(new FieldError(nameof(o.ConnectorCount), $"must be at least 0 (got {o.ConnectorCount})"));
        }

        if (errors.Count > 0)
        {
            return ServiceResult<MemberDesignDetail>.Invalid(errors);
        }

        TrussUnitOfWork.ExpectVersion(db, member, input.Version);
        member.SectionDesignationOverride = string.IsNullOrWhiteSpace(o.SectionOverride) ? null : o.SectionOverride.Trim();
        member.Kx = o.Kx;
        member.Ky = o.Ky;
        member.Kz = o.Kz;
        member.LengthXMm = o.LengthXMm;
        member.LengthYMm = o.LengthYMm;
        member.LengthZMm = o.LengthZMm;
        member.KLuMm = o.KLuMm;
        member.KLvMm = o.KLvMm;
        member.ConnectorCount = o.ConnectorCount;
        member.ConnectorSpacingMm = o.ConnectorSpacingMm;
        member.UseModifiedSlenderness = o.UseModifiedSlenderness;

        var (_, issues) = await DesignInputBuilder.BuildAsync(db, truss, forSizing: false, cancellationToken).ConfigureAwait(false);
        var sectionIssue = issues.FirstOrDefault(i => i.Field == $"Members[{member.Mark}].SectionOverride");
        if (sectionIssue is not null)
        {
            return ServiceResult<MemberDesignDetail>.Invalid(nameof(o.SectionOverride), sectionIssue.Message);
        }

        // A truss that had a design and cannot be designed with this edit keeps its stored inputs: the edit is refused, not saved.
        var hadDesign = await db.DesignSnapshots.AnyAsync(s => s.TrussId == trussId, cancellationToken).ConfigureAwait(false);
        var (failure, designIssues, outcome) = await work.CommitAsync<MemberDesignDetail>(db, truss, null, cancellationToken,
            refuseUndesignable: hadDesign ? issues => ServiceResult<MemberDesignDetail>.Invalid(issues.Select(ToOverrideError).ToList()) : null).ConfigureAwait(false);
        if (failure is not null)
        {
            return failure;
        }

        if (outcome is null)
        {
            return ServiceResult<MemberDesignDetail>.Invalid(designIssues.Select(ToOverrideError).ToList());
        }

        await using var read = await work.CreateAsync(cancellationToken).ConfigureAwait(false);
        var fresh = await read.TrussMembers.AsNoTracking().FirstAsync(m => m.Id == memberId, cancellationToken).ConfigureAwait(false);
        var snapshot = await read.DesignSnapshots.AsNoTracking().FirstAsync(s => s.MemberId == memberId, cancellationToken).ConfigureAwait(false);
        return ServiceResult<MemberDesignDetail>.Ok(DesignViews.Detail(snapshot, fresh));
    }

    private async Task<ServiceResult<TrussDesignView>> ReadAsync(Guid trussId, IReadOnlyList<FieldError> messages, CancellationToken cancellationToken)
    {
        await using var db = await work.CreateAsync(cancellationToken).ConfigureAwait(false);
        var snapshots = await db.DesignSnapshots.AsNoTracking().Where(s => s.TrussId == trussId).ToListAsync(cancellationToken).ConfigureAwait(false);
        var members = await db.TrussMembers.AsNoTracking().Where(m => m.TrussId == trussId).ToListAsync(cancellationToken).ConfigureAwait(false);
        if (snapshots.Count == 0 && messages.Count == 0)
        {
            var truss = await DesignInputBuilder.LoadTrussAsync(db, trussId, cancellationToken).ConfigureAwait(false);
            if (truss is not null)
            {
                messages = (await DesignInputBuilder.BuildAsync(db, truss, false, cancellationToken).ConfigureAwait(false)).Issues
                    .Select(i => new FieldError(i.Field, i.Message)).ToList();
            }
        }

        return ServiceResult<TrussDesignView>.Ok(DesignViews.Truss(trussId, snapshots, members, messages));
    }

    private static void InRangeOrNull(List<FieldError> errors, string field, double? value, double min, double max, string unit)
    {
        if (value is { } v && !(v >= min && v <= max))
        {
            var inv = System.Globalization.CultureInfo.InvariantCulture;
            errors.Add(new FieldError(field,
                $"must be from {min.ToString(inv)}{unit} to {max.ToString(inv)}{unit}, or left empty for the default (got {v.ToString(inv)}{unit})"));
        }
    }

    /// <summary>Core's names of a member's design inputs as the fields of <see cref="MemberOverrides"/>.</summary>
    private static FieldError ToOverrideError(ValidationIssue issue) => new(issue.Field switch
    {
        "KLu" => nameof(MemberOverrides.KLuMm),
        "KLv" => nameof(MemberOverrides.KLvMm),
        "Connectors.Spacing" => nameof(MemberOverrides.ConnectorSpacingMm),
        "Connectors.Count" => nameof(MemberOverrides.ConnectorCount),
        var other => other,
    }, issue.Message);

    private static string Mass(double kg) => $"{kg.ToString("0.0", System.Globalization.CultureInfo.InvariantCulture)} kg";

    /// <summary>Reports progress synchronously on the sizing thread (the caller's IProgress marshals to its own context).</summary>
    private sealed class SyncProgress(IProgress<SizingProgress> target) : IProgress<(int Round, string Group)>
    {
        public void Report((int Round, string Group) value) => target.Report(new SizingProgress(value.Round, $"round {value.Round}: sized {value.Group}"));
    }
}
