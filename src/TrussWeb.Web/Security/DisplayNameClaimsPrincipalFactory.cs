using System.Security.Claims;
using Microsoft.AspNetCore.Identity;
using Microsoft.Extensions.Options;
using TrussWeb.Data.Entities;

namespace TrussWeb.Web.Security;

/// <summary>Identity's principal (name = e-mail, roles) plus the user's display name for the app bar.</summary>
public sealed class DisplayNameClaimsPrincipalFactory(
    UserManager<AppUser> users,
    RoleManager<IdentityRole> roles,
    IOptions<IdentityOptions> options)
    : UserClaimsPrincipalFactory<AppUser, IdentityRole>(users, roles, options)
{
    /// <summary>Claim type holding <see cref="AppUser.DisplayName"/>.</summary>
    public const string DisplayNameClaim = "trussweb:display_name";

    protected override async Task<ClaimsIdentity> GenerateClaimsAsync(AppUser user)
    {
        ArgumentNullException.ThrowIfNull(user);
        var identity = await base.GenerateClaimsAsync(user).ConfigureAwait(false);
        if (!string.IsNullOrWhiteSpace(user.DisplayName))
        {
            identity.AddClaim(new Claim(DisplayNameClaim, user.DisplayName));
        }

        return identity;
    }
}
