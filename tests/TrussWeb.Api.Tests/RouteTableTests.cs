using System.Net;
using Microsoft.AspNetCore.Routing;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Api.Tests.Support;

namespace TrussWeb.Api.Tests;

/// <summary>
/// Walks every route of the app's endpoint table: each /api route answers 401 without a token, with a
/// revoked token and with an expired one; everything else must be on the explicit allow-list below, so
/// a new endpoint that is neither an API route nor listed fails here.
/// </summary>
public sealed class RouteTableTests(SqliteApp app) : IClassFixture<SqliteApp>
{
    /// <summary>Non-API endpoints, by route pattern (pages are listed by their @page templates; the rest by pattern).</summary>
    private static readonly HashSet<string> NonApiAllowList = new(StringComparer.OrdinalIgnoreCase)
    {
        "/openapi/{documentName}.json",
        "/health/live",
        "/health/ready",
        "/account/signout",
        "/_blazor",
        "/_blazor/negotiate",
        "/_blazor/initializers",
        "/_blazor/disconnect",
        "/_framework/blazor.server.js",
        "/_framework/blazor.web.js",
        "/_framework/opaque-redirect",
        "/{**path:file}",
        // Cookie-authorised downloads for the pages; their sign-in and access tests are in TrussWeb.Web.Tests
        // (Http/ExportDownloadTests, Http/AuditCsvEndpointTests).
        "/exports/{jobId:guid}/file",
        "/projects/{projectId:guid}/audit.csv",
    };

    /// <summary>The @page routes of the app's components (pages have their own sign-in tests in TrussWeb.Web.Tests).</summary>
    private static readonly string[] PageTemplates = typeof(Program).Assembly.GetTypes()
        .Where(t => typeof(Microsoft.AspNetCore.Components.IComponent).IsAssignableFrom(t))
        .SelectMany(t => System.Reflection.CustomAttributeExtensions.GetCustomAttributes<Microsoft.AspNetCore.Components.RouteAttribute>(t))
        .Select(r => r.Template)
        .ToArray();

    private List<RouteEndpoint> Endpoints()
    {
        _ = app.Anonymous(); // builds the host
        return app.Services.GetRequiredService<EndpointDataSource>().Endpoints.OfType<RouteEndpoint>().ToList();
    }

    private static string Pattern(RouteEndpoint e) => "/" + (e.RoutePattern.RawText ?? string.Empty).Trim('/');

    private static IEnumerable<string> Methods(RouteEndpoint e) =>
        e.Metadata.GetMetadata<HttpMethodMetadata>()?.HttpMethods is { Count: > 0 } m ? m : ["GET"];

    private static string Sample(string pattern) =>
        System.Text.RegularExpressions.Regex.Replace(pattern, @"\{([^}]+)\}", m =>
            m.Groups[1].Value.StartsWith('*') ? "anything/here" : m.Groups[1].Value.Contains(":guid", StringComparison.Ordinal) ? Guid.NewGuid().ToString() : "sample");

    [Fact]
    public void Every_endpoint_is_an_api_route_or_on_the_allow_list()
    {
        var unlisted = Endpoints()
            .Select(Pattern)
            .Where(p => !p.StartsWith("/api/", StringComparison.OrdinalIgnoreCase))
            .Where(p => !NonApiAllowList.Contains(p) && !PageTemplates.Contains(p, StringComparer.OrdinalIgnoreCase)
                        && !IsStaticAsset(p))
            .Distinct()
            .ToList();
        Assert.True(unlisted.Count == 0, "endpoints neither under /api nor on the allow-list: " + string.Join(", ", unlisted));
    }

    [Fact]
    public void The_table_holds_the_api_routes_of_each_area()
    {
        var api = Endpoints().Select(Pattern).Where(p => p.StartsWith("/api/v1", StringComparison.Ordinal)).ToList();
        foreach (var expected in new[]
                 {
                     "/api/v1/sections", "/api/v1/sections/{designation}", "/api/v1/calculations/member-check", "/api/v1/calculations/truss-analysis",
                     "/api/v1/projects", "/api/v1/projects/{projectId:guid}", "/api/v1/trusses/{trussId:guid}", "/api/v1/trusses/{trussId:guid}/members/{memberId:guid}",
                     "/api/v1/members/{memberId:guid}/review/approve", "/api/v1/projects/{projectId:guid}/audit", "/api/v1/projects/{projectId:guid}/audit.csv",
                 })
        {
            Assert.Contains(expected, api);
        }

        Assert.True(api.Count >= 30, $"only {api.Count} API endpoints");
    }

    public static TheoryData<string> Credentials => new() { "none", "revoked", "expired", "malformed", "unknown" };

    [Theory]
    [MemberData(nameof(Credentials))]
    public async Task Every_api_route_answers_401_without_a_valid_token(string credential)
    {
        var client = credential switch
        {
            "none" => app.Anonymous(),
            "revoked" => app.WithToken(await RevokedTokenAsync()),
            "expired" => app.WithToken(await ExpiredTokenAsync()),
            "malformed" => app.WithToken("not-a-token"),
            _ => app.WithToken("tw_AAAAAAAAA_" + new string('B', 43)),
        };
        var routes = Endpoints().Where(e => Pattern(e).StartsWith("/api/", StringComparison.OrdinalIgnoreCase)).ToList();
        Assert.NotEmpty(routes);
        var checkedCount = 0;
        foreach (var endpoint in routes)
        {
            foreach (var method in Methods(endpoint))
            {
                var url = Sample(Pattern(endpoint));
                using var request = new HttpRequestMessage(new HttpMethod(method), url);
                if (method is "POST" or "PUT" or "PATCH")
                {
                    request.Content = new StringContent("{}", System.Text.Encoding.UTF8, "application/json");
                }

                using var response = await client.SendAsync(request);
                Assert.True(response.StatusCode == HttpStatusCode.Unauthorized, $"{method} {url} ({credential} token) answered {(int)response.StatusCode}");
                Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
                Assert.Contains(response.Headers.WwwAuthenticate, h => h.Scheme == "Bearer");
                checkedCount++;
            }
        }

        Assert.True(checkedCount >= 30);
    }

    [Fact]
    public async Task A_signed_in_cookie_is_not_accepted_by_the_api()
    {
        // Sign in through the page's form as the designer, then call the API with the cookie only.
        var browser = app.CreateClient(new Microsoft.AspNetCore.Mvc.Testing.WebApplicationFactoryClientOptions { AllowAutoRedirect = false, HandleCookies = true });
        var page = await (await browser.GetAsync("/account/signin")).Content.ReadAsStringAsync();
        var token = System.Text.RegularExpressions.Regex.Match(page, "name=\"__RequestVerificationToken\"[^>]*value=\"([^\"]+)\"").Groups[1].Value;
        var form = new Dictionary<string, string>
        {
            ["__RequestVerificationToken"] = token,
            ["_handler"] = "signin",
            ["Input.Email"] = Demo.Designer,
            ["Input.Password"] = TrussWeb.Services.Hosting.DemoSeeder.Users.Single(u => u.Email == Demo.Designer).Password,
        };
        await browser.PostAsync("/account/signin", new FormUrlEncodedContent(form));
        var response = await browser.GetAsync("/api/v1/projects");
        await response.ProblemAsync(401);
    }

    private async Task<string> RevokedTokenAsync()
    {
        var created = await app.CreateTokenAsync(Demo.Designer, name: "to revoke");
        Assert.True((await app.RevokeAsync(Demo.Designer, created.View)).IsOk);
        return created.Token;
    }

    private async Task<string> ExpiredTokenAsync()
    {
        var created = await app.CreateTokenAsync(Demo.Designer, name: "to expire");
        await app.WithDbAsync(async db =>
        {
            var row = db.ApiTokens.Single(t => t.Id == created.View.Id);
            row.ExpiresUtc = DateTime.UtcNow.AddMinutes(-1);
            return await db.SaveChangesAsync();
        });
        return created.Token;
    }

    private static bool IsStaticAsset(string pattern) =>
        System.IO.Path.HasExtension(pattern) && !pattern.Contains('{', StringComparison.Ordinal)
        || pattern.StartsWith("/_content/", StringComparison.OrdinalIgnoreCase);
}
