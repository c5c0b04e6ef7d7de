using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Tests.Fakes;

/// <summary>IDesignService for the sizing tests: a proposal the test sets, and a record of accept/discard calls.</summary>
public sealed class FakeDesignService : IDesignService
{
    public SizingProposal? Proposal { get; set; }

    public IReadOnlyList<SizingProgress> ProgressToReport { get; set; } = [];

    public List<SizingProposal> Accepted { get; } = [];

    public List<SizingProposal> Discarded { get; } = [];

    public TrussDesignView? DesignAfterAccept { get; set; }

    public Task<ServiceResult<TrussDesignView>> DesignTrussAsync(Guid trussId, CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<TrussDesignView>.Forbidden("not set up"));

    public TrussDesignView? StoredDesign { get; set; }

    public Task<ServiceResult<TrussDesignView>> GetTrussDesignAsync(Guid trussId, CancellationToken cancellationToken = default) =>
        Task.FromResult(StoredDesign is null ? ServiceResult<TrussDesignView>.NotFound("not set up") : ServiceResult<TrussDesignView>.Ok(StoredDesign));

    public Task<ServiceResult<MemberDesignDetail>> GetMemberDesignAsync(Guid trussId, Guid memberId, CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<MemberDesignDetail>.NotFound("not set up"));

    public Task<ServiceResult<SizingProposal>> ProposeSizingAsync(Guid trussId, IProgress<SizingProgress>? progress = null, CancellationToken cancellationToken = default)
    {
        foreach (var p in ProgressToReport)
        {
            progress?.Report(p);
        }

        return Task.FromResult(Proposal is null ? ServiceResult<SizingProposal>.NotFound("no truss") : ServiceResult<SizingProposal>.Ok(Proposal));
    }

    public Task<ServiceResult<TrussDesignView>> AcceptSizingAsync(SizingProposal proposal, CancellationToken cancellationToken = default)
    {
        Accepted.Add(proposal);
        return Task.FromResult(DesignAfterAccept is null ? ServiceResult<TrussDesignView>.Forbidden("not set up") : ServiceResult<TrussDesignView>.Ok(DesignAfterAccept));
    }

    public Task<ServiceResult<Done>> DiscardSizingAsync(SizingProposal proposal, CancellationToken cancellationToken = default)
    {
        Discarded.Add(proposal);
        return Task.FromResult(ServiceResult<Done>.Ok(default));
    }

    public Task<ServiceResult<MemberDesignDetail>> UpdateMemberDesignAsync(Guid trussId, Guid memberId, MemberDesignInput input, CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<MemberDesignDetail>.Forbidden("not set up"));
}
