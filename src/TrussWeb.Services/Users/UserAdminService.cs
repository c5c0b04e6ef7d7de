using Microsoft.AspNetCore.Identity;
using Microsoft.EntityFrameworkCore;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Authorization;
using TrussWeb.Services.Common;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Users;

/// <summary>User administration through ASP.NET Core Identity's <see cref="UserManager{TUser}"/>.</summary>
internal sealed class UserAdminService(UserManager<AppUser> users, IDbContextFactory<TrussWebDbContext> factory, Authorizer authorizer, TimeProvider clock) : IUserAdminService
{
    private static string Op(string method) => PermissionTable.Key<IUserAdminService>(method);

    public async Task<ServiceResult<IReadOnlyList<UserView>>> ListUsersAsync(CancellationToken cancellationToken = default)
    {
        if (authorizer.Check<IReadOnlyList<UserView>>(Op(nameof(ListUsersAsync))) is { } refusal)
        {
            return refusal;
        }

        var all = await users.Users.OrderBy(u => u.Email).ToListAsync(cancellationToken).ConfigureAwait(false);
        var list = new List<UserView>();
        foreach (var u in all)
        {
            list.Add(await ViewAsync(u).ConfigureAwait(false));
        }

        return ServiceResult<IReadOnlyList<UserView>>.Ok(list);
    }

    public async Task<ServiceResult<UserView>> CreateUserAsync(CreateUserInput input, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(input);
        if (authorizer.Check<UserView>(Op(nameof(CreateUserAsync))) is { } refusal)
        {
            return refusal;
        }

        var (user, errors) = await CreateAsync(users, input).ConfigureAwait(false);
        if (user is null)
        {
            return ServiceResult<UserView>.Invalid(errors);
        }

        await AuditAsync(user.Id, "Created", "Roles", null, string.Join(",", input.Roles), cancellationToken).ConfigureAwait(false);
        return ServiceResult<UserView>.Ok(await ViewAsync(user).ConfigureAwait(false));
    }

    public async Task<ServiceResult<SystemInfoView>> GetSystemInfoAsync(CancellationToken cancellationToken = default)
    {
        if (authorizer.Check<SystemInfoView>(Op(nameof(GetSystemInfoAsync))) is { } refusal)
        {
            return refusal;
        }

        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var applied = (await db.Database.GetAppliedMigrationsAsync(cancellationToken).ConfigureAwait(false)).ToList();
        var pending = (await db.Database.GetPendingMigrationsAsync(cancellationToken).ConfigureAwait(false)).Count();
        var standard = new Core.Standards.Sans10162.Sans10162Standard();
        var core = typeof(Core.Caution).Assembly.GetName().Version?.ToString() ?? "unknown";
        return ServiceResult<SystemInfoView>.Ok(new SystemInfoView(
            db.Database.ProviderName ?? "unknown", applied.LastOrDefault(), pending, core, standard.Code, standard.Version));
    }

    /// <summary>Creates a user with roles; used by the service, start-up and the command line.</summary>
    internal static async Task<(AppUser? User, IReadOnlyList<FieldError> Errors)> CreateAsync(UserManager<AppUser> users, CreateUserInput input)
    {
        var errors = new List<FieldError>();
        var email = input.Email?.Trim() ?? string.Empty;
        if (!email.Contains('@', StringComparison.Ordinal) || email.Length < 3)
        {
            errors.Add(new FieldError(nameof(input.Email), $"give a valid e-mail address (got '{email}')"));
        }

        errors.AddRange(RoleErrors(input.Roles));
        if (errors.Count > 0)
        {
            return (null, errors);
        }

        if (await users.FindByEmailAsync(email).ConfigureAwait(false) is not null)
        {
            return (null, [new FieldError(nameof(input.Email), $"a user with e-mail {email} exists already")]);
        }

        var user = new AppUser { UserName = email, Email = email, EmailConfirmed = true, DisplayName = string.IsNullOrWhiteSpace(input.DisplayName) ? email : input.DisplayName.Trim() };
        var created = await users.CreateAsync(user, input.Password ?? string.Empty).ConfigureAwait(false);
        if (!created.Succeeded)
        {
            return (null, IdentityErrors(created, nameof(input.Password)));
        }

        if (input.Roles.Count > 0)
        {
            var roles = await users.AddToRolesAsync(user, input.Roles.Distinct()).ConfigureAwait(false);
            if (!roles.Succeeded)
            {
                await users.DeleteAsync(user).ConfigureAwait(false);
                return (null, IdentityErrors(roles, nameof(input.Roles)));
            }
        }

        return (user, []);
    }

    public async Task<ServiceResult<UserView>> SetRolesAsync(string userId, IReadOnlyList<string> roles, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(roles);
        if (authorizer.Check<UserView>(Op(nameof(SetRolesAsync))) is { } refusal)
        {
            return refusal;
        }

        var errors = RoleErrors(roles);
        if (errors.Count > 0)
        {
            return ServiceResult<UserView>.Invalid(errors);
        }

        var user = await users.FindByIdAsync(userId).ConfigureAwait(false);
        if (user is null)
        {
            return ServiceResult<UserView>.NotFound($"no user '{userId}'");
        }

        var current = await users.GetRolesAsync(user).ConfigureAwait(false);
        if (userId == authorizer.Caller.UserId && current.Contains(Roles.Administrator) && !roles.Contains(Roles.Administrator))
        {
            return ServiceResult<UserView>.Invalid(nameof(roles), "you cannot remove your own Administrator role");
        }

        var removed = await users.RemoveFromRolesAsync(user, current.Except(roles)).ConfigureAwait(false);
        var added = await users.AddToRolesAsync(user, roles.Except(current).Distinct()).ConfigureAwait(false);
        if (!removed.Succeeded || !added.Succeeded)
        {
            return ServiceResult<UserView>.Invalid(IdentityErrors(removed.Succeeded ? added : removed, nameof(roles)));
        }

        await AuditAsync(user.Id, "Updated", "Roles", string.Join(",", current.Order(StringComparer.Ordinal)), string.Join(",", roles.Order(StringComparer.Ordinal)), cancellationToken).ConfigureAwait(false);
        return ServiceResult<UserView>.Ok(await ViewAsync(user).ConfigureAwait(false));
    }

    public async Task<ServiceResult<UserView>> ResetPasswordAsync(string userId, string newPassword, CancellationToken cancellationToken = default)
    {
        if (authorizer.Check<UserView>(Op(nameof(ResetPasswordAsync))) is { } refusal)
        {
            return refusal;
        }

        var user = await users.FindByIdAsync(userId).ConfigureAwait(false);
        if (user is null)
        {
            return ServiceResult<UserView>.NotFound($"no user '{userId}'");
        }

        var errors = await ResetAsync(users, user, newPassword).ConfigureAwait(false);
        if (errors.Count > 0)
        {
            return ServiceResult<UserView>.Invalid(errors);
        }

        await AuditAsync(user.Id, "PasswordReset", null, null, null, cancellationToken).ConfigureAwait(false);
        return ServiceResult<UserView>.Ok(await ViewAsync(user).ConfigureAwait(false));
    }

    internal static async Task<IReadOnlyList<FieldError>> ResetAsync(UserManager<AppUser> users, AppUser user, string newPassword)
    {
        var token = await users.GeneratePasswordResetTokenAsync(user).ConfigureAwait(false);
        var result = await users.ResetPasswordAsync(user, token, newPassword ?? string.Empty).ConfigureAwait(false);
        return result.Succeeded ? [] : IdentityErrors(result, "NewPassword");
    }

    public async Task<ServiceResult<UserView>> SetLockedAsync(string userId, bool locked, CancellationToken cancellationToken = default)
    {
        if (authorizer.Check<UserView>(Op(nameof(SetLockedAsync))) is { } refusal)
        {
            return refusal;
        }

        if (locked && userId == authorizer.Caller.UserId)
        {
            return ServiceResult<UserView>.Invalid(nameof(userId), "you cannot lock yourself out");
        }

        var user = await users.FindByIdAsync(userId).ConfigureAwait(false);
        if (user is null)
        {
            return ServiceResult<UserView>.NotFound($"no user '{userId}'");
        }

        await users.SetLockoutEnabledAsync(user, true).ConfigureAwait(false);
        await users.SetLockoutEndDateAsync(user, locked ? DateTimeOffset.MaxValue : null).ConfigureAwait(false);
        if (!locked)
        {
            await users.ResetAccessFailedCountAsync(user).ConfigureAwait(false);
        }

        await AuditAsync(user.Id, locked ? "Locked" : "Unlocked", null, null, null, cancellationToken).ConfigureAwait(false);
        return ServiceResult<UserView>.Ok(await ViewAsync(user).ConfigureAwait(false));
    }

    private async Task<UserView> ViewAsync(AppUser u)
    {
        var roles = await users.GetRolesAsync(u).ConfigureAwait(false);
        var locked = u.LockoutEnd is { } end && end > clock.GetUtcNow();
        return new UserView(u.Id, u.Email ?? string.Empty, u.DisplayName, roles.Order(StringComparer.Ordinal).ToList(), locked, u.LockoutEnd);
    }

    private async Task AuditAsync(string userId, string action, string? field, string? oldValue, string? newValue, CancellationToken cancellationToken)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        AuditWriter.AddAction(db, authorizer.Caller, clock, null, nameof(AppUser), userId, action, field, oldValue, newValue);
        await db.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
    }

    private static List<FieldError> RoleErrors(IReadOnlyList<string> roles) =>
        roles.Where(r => !Roles.All.Contains(r)).Select(r => new FieldError("Roles", $"unknown role '{r}'; use {string.Join(", ", Roles.All)}")).ToList();

    private static List<FieldError> IdentityErrors(IdentityResult result, string field) =>
        result.Errors.Select(e => new FieldError(e.Code.StartsWith("Password", StringComparison.Ordinal) ? field : e.Code.Contains("Email", StringComparison.Ordinal) ? "Email" : field, e.Description)).ToList();
}
