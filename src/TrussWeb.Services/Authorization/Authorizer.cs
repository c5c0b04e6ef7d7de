using Microsoft.EntityFrameworkCore;
using TrussWeb.Data;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Authorization;

/// <summary>
/// Asks <see cref="PermissionTable"/> on every service call. Callers who are not members of a
/// project get NotFound (a project's existence is not revealed); members without the right get Forbidden.
/// </summary>
public sealed class Authorizer(ICallerContext caller)
{
    public ICallerContext Caller { get; } = caller;

    /// <summary>Null when allowed; else the refusal to return.</summary>
    public ServiceResult<T>? Check<T>(string operation)
    {
        if (!Caller.IsAuthenticated)
        {
            return ServiceResult<T>.Forbidden("Sign in first.");
        }

        var level = LevelOf(operation);
        if (level is null)
        {
            return ServiceResult<T>.Forbidden($"Operation {operation} has no permission entry.");
        }

        return PermissionTable.Allows(level.Value, Caller.Roles, null)
            ? null
            : ServiceResult<T>.Forbidden($"Your roles ({Describe(Caller.Roles)}) do not allow this.");
    }

    /// <summary>Checks a project operation; on success gives the caller's project role (null for an administrator who is not a member).</summary>
    public async Task<(ServiceResult<T>? Refusal, string? ProjectRole)> CheckProjectAsync<T>(
        TrussWebDbContext db, Guid projectId, string operation, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(db);
        if (!Caller.IsAuthenticated)
        {
            return (ServiceResult<T>.Forbidden("Sign in first."), null);
        }

        var level = LevelOf(operation);
        if (level is null)
        {
            return (ServiceResult<T>.Forbidden($"Operation {operation} has no permission entry."), null);
        }

        if (!await db.Projects.AnyAsync(p => p.Id == projectId, cancellationToken).ConfigureAwait(false))
        {
            return (ServiceResult<T>.NotFound("The project does not exist or you are not a member of it."), null);
        }

        var role = await db.ProjectMemberships.Where(m => m.ProjectId == projectId && m.UserId == Caller.UserId)
            .Select(m => m.Role).FirstOrDefaultAsync(cancellationToken).ConfigureAwait(false);
        var isAdmin = Caller.Roles.Contains(Roles.Administrator);
        if (role is null && !isAdmin)
        {
            return (ServiceResult<T>.NotFound("The project does not exist or you are not a member of it."), null);
        }

        return PermissionTable.Allows(level.Value, Caller.Roles, role)
            ? (null, role)
            : (ServiceResult<T>.Forbidden($"Your role in this project ({role}) does not allow this."), role);
    }

    public bool IsAdministrator => Caller.Roles.Contains(Roles.Administrator);

    private static AccessLevel? LevelOf(string operation) =>
        PermissionTable.Methods.TryGetValue(operation, out var level) ? level : null;

    private static string Describe(IReadOnlySet<string> roles) => roles.Count == 0 ? "none" : string.Join(", ", roles.Order(StringComparer.Ordinal));
}
