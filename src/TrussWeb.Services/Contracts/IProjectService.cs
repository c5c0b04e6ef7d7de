namespace TrussWeb.Services.Contracts;

/// <summary>Projects: the list with status roll-ups, settings and membership.</summary>
public interface IProjectService
{
    /// <summary>Projects the caller is a member of (every project for an administrator), each truss with its status roll-up.</summary>
    Task<ServiceResult<IReadOnlyList<ProjectSummary>>> ListMyProjectsAsync(CancellationToken cancellationToken = default);

    Task<ServiceResult<ProjectDetail>> GetAsync(Guid projectId, CancellationToken cancellationToken = default);

    /// <summary>Creates a project; the caller becomes its project lead.</summary>
    Task<ServiceResult<ProjectDetail>> CreateAsync(ProjectInput input, CancellationToken cancellationToken = default);

    /// <summary>Saves the settings; <paramref name="version"/> is the project Version the caller loaded.</summary>
    Task<ServiceResult<ProjectDetail>> UpdateSettingsAsync(Guid projectId, ProjectInput input, long version, CancellationToken cancellationToken = default);

    Task<ServiceResult<IReadOnlyList<ProjectMemberView>>> GetMembersAsync(Guid projectId, CancellationToken cancellationToken = default);

    /// <summary>Users who could be added to the project (active users not yet members).</summary>
    Task<ServiceResult<IReadOnlyList<UserPick>>> ListCandidateMembersAsync(Guid projectId, CancellationToken cancellationToken = default);

    Task<ServiceResult<ProjectMemberView>> AddMemberAsync(Guid projectId, AddProjectMemberInput input, CancellationToken cancellationToken = default);

    Task<ServiceResult<Done>> RemoveMemberAsync(Guid projectId, RowRef membership, CancellationToken cancellationToken = default);
}

/// <summary>Editable project settings. <see cref="Reference"/> is the office's job number.</summary>
public sealed record ProjectInput(
    string Name,
    string? Client,
    string? Reference,
    string? Location,
    string Revision,
    string StandardCode,
    string? DefaultGradeName);

public sealed record ProjectSummary(
    Guid Id,
    string Name,
    string? Client,
    string? Reference,
    string? Location,
    string Revision,
    string StandardCode,
    string? MyRole,
    DateTime UpdatedUtc,
    IReadOnlyList<TrussStatusRollup> Trusses);

/// <summary>Per truss: members passing / failing / not designed (no current snapshot) / out of scope, and members per review state.</summary>
public sealed record TrussStatusRollup(
    Guid TrussId,
    string Name,
    int MemberCount,
    int Passing,
    int Failing,
    int NotDesigned,
    int OutOfScope,
    IReadOnlyDictionary<string, int> ReviewStates);

public sealed record ProjectDetail(
    Guid Id,
    long Version,
    string Name,
    string? Client,
    string? Reference,
    string? Location,
    string Revision,
    string StandardCode,
    string? DefaultGradeName,
    string? MyRole,
    DateTime CreatedUtc,
    DateTime UpdatedUtc,
    IReadOnlyList<TrussStatusRollup> Trusses);

public sealed record ProjectMemberView(Guid MembershipId, long Version, string UserId, string Email, string DisplayName, string Role);

public sealed record UserPick(string UserId, string Email, string DisplayName);

/// <summary>Adds a user (by id or e-mail) with a project role (a <c>TrussWeb.Data.Roles</c> name).</summary>
public sealed record AddProjectMemberInput(string UserIdOrEmail, string Role);
