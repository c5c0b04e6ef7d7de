using TrussWeb.Core.Loads;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Tests.Fakes;

/// <summary>ITrussService whose node and action saves a test answers; records the inputs.</summary>
public sealed class FakeTrussService : ITrussService
{
    public Func<NodeTableInput, ServiceResult<TrussDetail>> OnSaveNodes { get; set; } = _ => ServiceResult<TrussDetail>.Forbidden("not set up");

    public Func<ActionsInput, ServiceResult<TrussDetail>> OnSaveActions { get; set; } = _ => ServiceResult<TrussDetail>.Forbidden("not set up");

    public List<NodeTableInput> NodeSaves { get; } = [];

    public List<ActionsInput> ActionSaves { get; } = [];

    private static Task<ServiceResult<TrussDetail>> No() => Task.FromResult(ServiceResult<TrussDetail>.Forbidden("not set up"));

    public Task<ServiceResult<TrussDetail>> CreateFromGeneratorAsync(Guid projectId, TrussGeneratorInput input, CancellationToken cancellationToken = default) => No();

    public TrussDetail? Truss { get; set; }

    public Task<ServiceResult<TrussDetail>> GetAsync(Guid trussId, CancellationToken cancellationToken = default) =>
        Task.FromResult(Truss is not null && Truss.Id == trussId ? ServiceResult<TrussDetail>.Ok(Truss) : ServiceResult<TrussDetail>.NotFound("No such truss."));

    public Task<ServiceResult<TrussDetail>> SaveSettingsAsync(Guid trussId, TrussSettingsInput input, CancellationToken cancellationToken = default) => No();

    public Task<ServiceResult<TrussDetail>> SaveNodesAsync(Guid trussId, NodeTableInput input, CancellationToken cancellationToken = default)
    {
        NodeSaves.Add(input);
        return Task.FromResult(OnSaveNodes(input));
    }

    public Task<ServiceResult<TrussDetail>> SaveMembersAsync(Guid trussId, MemberTableInput input, CancellationToken cancellationToken = default) => No();

    public Task<ServiceResult<TrussDetail>> SaveSupportsAsync(Guid trussId, IReadOnlyList<SupportRow> rows, CancellationToken cancellationToken = default) => No();

    public Task<ServiceResult<TrussDetail>> SaveRestraintsAsync(Guid trussId, IReadOnlyList<RestraintRow> rows, CancellationToken cancellationToken = default) => No();

    public Task<ServiceResult<TrussDetail>> SaveGroupsAsync(Guid trussId, GroupTableInput input, CancellationToken cancellationToken = default) => No();

    public Task<ServiceResult<TrussDetail>> SaveActionsAsync(Guid trussId, ActionsInput input, CancellationToken cancellationToken = default)
    {
        ActionSaves.Add(input);
        return Task.FromResult(OnSaveActions(input));
    }

    public Task<ServiceResult<TrussDetail>> SaveCombinationsAsync(Guid trussId, CombinationTableInput input, CancellationToken cancellationToken = default) => No();

    public Task<ServiceResult<TrussDetail>> ResetCombinationsAsync(Guid trussId, CombinationStandard preset, IReadOnlyList<RowRef> loaded, CancellationToken cancellationToken = default) => No();
}
