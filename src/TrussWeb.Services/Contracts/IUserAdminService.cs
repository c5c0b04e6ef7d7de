namespace TrussWeb.Services.Contracts;

/// <summary>User administration (administrators only).</summary>
public interface IUserAdminService
{
    Task<ServiceResult<IReadOnlyList<UserView>>> ListUsersAsync(CancellationToken cancellationToken = default);

    Task<ServiceResult<UserView>> CreateUserAsync(CreateUserInput input, CancellationToken cancellationToken = default);

    Task<ServiceResult<UserView>> SetRolesAsync(string userId, IReadOnlyList<string> roles, CancellationToken cancellationToken = default);

    Task<ServiceResult<UserView>> ResetPasswordAsync(string userId, string newPassword, CancellationToken cancellationToken = default);

    /// <summary>Locks (until unlocked) or unlocks the user.</summary>
    Task<ServiceResult<UserView>> SetLockedAsync(string userId, bool locked, CancellationToken cancellationToken = default);

    /// <summary>What is installed: database provider, schema version (last applied migration), pending migrations, Core and standard module versions.</summary>
    Task<ServiceResult<SystemInfoView>> GetSystemInfoAsync(CancellationToken cancellationToken = default);
}

/// <summary>Installed versions for the administration page (the web app adds its own version).</summary>
public sealed record SystemInfoView(
    string DatabaseProvider,
    string? SchemaVersion,
    int PendingMigrations,
    string CoreVersion,
    string StandardCode,
    string StandardVersion);

public sealed record UserView(string Id, string Email, string DisplayName, IReadOnlyList<string> Roles, bool IsLockedOut, DateTimeOffset? LockoutEndUtc);

/// <summary>A new user; Roles are <c>TrussWeb.Data.Roles</c> names.</summary>
public sealed record CreateUserInput(string Email, string DisplayName, string Password, IReadOnlyList<string> Roles);
