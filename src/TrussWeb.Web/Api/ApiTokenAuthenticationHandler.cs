using System.Security.Claims;
using System.Text.Encodings.Web;
using Microsoft.AspNetCore.Authentication;
using Microsoft.Extensions.Options;
using TrussWeb.Services.Tokens;

namespace TrussWeb.Web.Api;

/// <summary>
/// The API's only authentication: <c>Authorization: Bearer &lt;personal access token&gt;</c>. The
/// principal carries the owner's id, name and global roles and a <see cref="ScopeClaim"/>. Challenges
/// and refusals answer with problem details (401 with <c>WWW-Authenticate: Bearer</c>, 403).
/// </summary>
public sealed class ApiTokenAuthenticationHandler(
    IOptionsMonitor<AuthenticationSchemeOptions> options, ILoggerFactory logger, UrlEncoder encoder, ApiTokenAuthenticator authenticator)
    : AuthenticationHandler<AuthenticationSchemeOptions>(options, logger, encoder)
{
    public const string SchemeName = "ApiToken";

    public const string ScopeClaim = "trussweb:scope";

    public const string TokenIdClaim = "trussweb:token";

    private const string FailureKey = "trussweb:token-failure";

    protected override async Task<AuthenticateResult> HandleAuthenticateAsync()
    {
        string? header = Request.Headers.Authorization;
        if (string.IsNullOrEmpty(header))
        {
            return AuthenticateResult.NoResult();
        }

        if (!header.StartsWith("Bearer ", StringComparison.OrdinalIgnoreCase))
        {
            return Fail("Use the Authorization scheme Bearer with a personal access token.");
        }

        var check = await authenticator.CheckAsync(header["Bearer ".Length..].Trim(), Context.RequestAborted).ConfigureAwait(false);
        if (!check.Succeeded)
        {
            return Fail(check.Failure!);
        }

        var id = check.Identity!;
        var claims = new List<Claim>
        {
            new(ClaimTypes.NameIdentifier, id.UserId),
            new(ClaimTypes.Name, id.DisplayName),
            new(ScopeClaim, id.Scope),
            new(TokenIdClaim, id.TokenId.ToString()),
        };
        claims.AddRange(id.Roles.Select(r => new Claim(ClaimTypes.Role, r)));
        var principal = new ClaimsPrincipal(new ClaimsIdentity(claims, SchemeName));
        return AuthenticateResult.Success(new AuthenticationTicket(principal, SchemeName));
    }

    protected override async Task HandleChallengeAsync(AuthenticationProperties properties)
    {
        var failure = Context.Items[FailureKey] as string;
        var detail = failure ?? "Send Authorization: Bearer <token> with a personal access token (profile page, or the create-token admin verb).";
        Response.Headers.WWWAuthenticate = failure is null ? "Bearer" : "Bearer error=\"invalid_token\"";
        await ApiProblems.Problem(StatusCodes.Status401Unauthorized, "A valid access token is required.", detail).ExecuteAsync(Context).ConfigureAwait(false);
    }

    protected override async Task HandleForbiddenAsync(AuthenticationProperties properties)
    {
        var scope = Context.User.FindFirstValue(ScopeClaim);
        var detail = scope == Services.Contracts.ApiTokenScopes.Read
            ? "This token has the read scope; changes need a read-write token."
            : "Your access does not allow this.";
        await ApiProblems.Forbidden(detail).ExecuteAsync(Context).ConfigureAwait(false);
    }

    private AuthenticateResult Fail(string reason)
    {
        Context.Items[FailureKey] = reason;
        return AuthenticateResult.Fail(reason);
    }
}
