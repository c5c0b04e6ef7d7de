using System.Security.Claims;
using Microsoft.AspNetCore.Components.Authorization;
using TrussWeb.Data;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Security;

/// <summary>
/// The signed-in user for services (<see cref="ICallerContext"/>) and for the audit stamps
/// (<see cref="ICurrentUser"/>): the HTTP request's user, else the Blazor circuit's authentication state.
/// </summary>
public sealed class SignedInCaller(IHttpContextAccessor http, IServiceProvider services) : ICallerContext, ICurrentUser
{
    private ClaimsPrincipal Principal
    {
        get
        {
            if (http.HttpContext?.User is { Identity.IsAuthenticated: true } user)
            {
                return user;
            }

            var state = services.GetService<AuthenticationStateProvider>();
            try
            {
                var task = state?.GetAuthenticationStateAsync();
                return task is { IsCompletedSuccessfully: true } ? task.Result.User : new ClaimsPrincipal();
            }
            catch (InvalidOperationException)
            {
                return new ClaimsPrincipal();
            }
        }
    }

    public string? UserId => Principal.Identity?.IsAuthenticated == true ? Principal.FindFirstValue(ClaimTypes.NameIdentifier) : null;

    public string DisplayName => Principal.Identity?.Name ?? "anonymous";

    public IReadOnlySet<string> Roles => Principal.FindAll(ClaimTypes.Role).Select(c => c.Value).ToHashSet(StringComparer.Ordinal);
}
