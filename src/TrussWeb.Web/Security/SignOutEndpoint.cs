using Microsoft.AspNetCore.Identity;
using TrussWeb.Data.Entities;

namespace TrussWeb.Web.Security;

/// <summary>POST /account/signout: ends the cookie session (antiforgery-checked form post) and goes to the start page.</summary>
public static class SignOutEndpoint
{
    public static IEndpointRouteBuilder MapSignOut(this IEndpointRouteBuilder endpoints)
    {
        ArgumentNullException.ThrowIfNull(endpoints);
        endpoints.MapPost(ReturnUrls.SignOutPath, async (HttpContext context, SignInManager<AppUser> signIn) =>
        {
            // Minimal APIs only check antiforgery for form-bound parameters; check it here explicitly.
            var antiforgery = context.RequestServices.GetRequiredService<Microsoft.AspNetCore.Antiforgery.IAntiforgery>();
            if (!await antiforgery.IsRequestValidAsync(context))
            {
                return Results.BadRequest("The sign-out form has expired. Reload the page and try again.");
            }

            await signIn.SignOutAsync();
            return Results.LocalRedirect("/");
        }).DisableAntiforgery();
        return endpoints;
    }
}
