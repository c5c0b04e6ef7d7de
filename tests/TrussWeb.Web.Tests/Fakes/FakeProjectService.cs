using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Tests.Fakes;

/// <summary>IProjectService whose answers a test sets; records the calls it gets.</summary>
public sealed class FakeProjectService : IProjectService
{
    public List<string> Calls { get; } = [];

    public ProjectDetail? Project { get; set; }

    public List<ProjectMemberView> Members { get; } = [];

    public Func<ProjectInput, long, ServiceResult<ProjectDetail>> OnUpdate { get; set; } = (_, _) => ServiceResult<ProjectDetail>.Forbidden("not set up");

    public ProjectInput? LastUpdate { get; private set; }

    public long? LastUpdateVersion { get; private set; }

    public List<ProjectSummary> Summaries { get; } = [];

    public Task<ServiceResult<IReadOnlyList<ProjectSummary>>> ListMyProjectsAsync(CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<IReadOnlyList<ProjectSummary>>.Ok(Summaries));

    public Task<ServiceResult<ProjectDetail>> GetAsync(Guid projectId, CancellationToken cancellationToken = default)
    {
        Calls.Add(nameof(GetAsync));
        return Task.FromResult(Project is not null && Project.Id == projectId ? ServiceResult<ProjectDetail>.Ok(Project) : ServiceResult<ProjectDetail>.NotFound("No such project."));
    }

    public Task<ServiceResult<ProjectDetail>> CreateAsync(ProjectInput input, CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<ProjectDetail>.Forbidden("not set up"));

    public Task<ServiceResult<ProjectDetail>> UpdateSettingsAsync(Guid projectId, ProjectInput input, long version, CancellationToken cancellationToken = default)
    {
        Calls.Add(nameof(UpdateSettingsAsync));
        LastUpdate = input;
        LastUpdateVersion = version;
        return Task.FromResult(OnUpdate(input, version));
    }

    public Task<ServiceResult<IReadOnlyList<ProjectMemberView>>> GetMembersAsync(Guid projectId, CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<IReadOnlyList<ProjectMemberView>>.Ok(Members));

    public Task<ServiceResult<IReadOnlyList<UserPick>>> ListCandidateMembersAsync(Guid projectId, CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<IReadOnlyList<UserPick>>.Ok([]));

    public Task<ServiceResult<ProjectMemberView>> AddMemberAsync(Guid projectId, AddProjectMemberInput input, CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<ProjectMemberView>.Forbidden("not set up"));

    public Task<ServiceResult<Done>> RemoveMemberAsync(Guid projectId, RowRef membership, CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<Done>.Forbidden("not set up"));
}
