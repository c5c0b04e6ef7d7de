using System.Net;
using System.Security.Cryptography;
using System.Text;
using System.Text.RegularExpressions;
using Microsoft.AspNetCore.Mvc.Testing;
using TrussWeb.Web.Hosting;
using TrussWeb.Web.Tests.Http;

namespace TrussWeb.Web.Tests.Security;

/// <summary>The security headers on pages, static files and health, over the real app (WebApplicationFactory, demo SQLite file).</summary>
public sealed partial class SecurityHeadersTests(DemoAppFactory factory) : IClassFixture<DemoAppFactory>
{
    public static TheoryData<string> Urls() => new()
    {
        "/",
        "/account/signin",
        "/projects",
        "/_content/MudBlazor/MudBlazor.min.css",
        "/_framework/blazor.web.js",
        "/health/ready",
        "/no-such-page",
    };

    [Theory]
    [MemberData(nameof(Urls))]
    public async Task Every_response_carries_the_security_headers(string url)
    {
        using var client = factory.CreateBrowser();

        using var response = await client.GetAsync(url);

        Assert.True((int)response.StatusCode < 500, $"{url}: {response.StatusCode}");
        // Source: common practice (OWASP secure headers guidance, from memory)
        Assert.Equal("nosniff", Header(response, "X-Content-Type-Options"));
        Assert.Equal("DENY", Header(response, "X-Frame-Options"));
        Assert.Equal("strict-origin-when-cross-origin", Header(response, "Referrer-Policy"));
        Assert.Contains("camera=()", Header(response, "Permissions-Policy"));
        var csp = Header(response, "Content-Security-Policy");
        Assert.Contains("default-src 'self'", csp);
        Assert.Contains("frame-ancestors 'none'", csp);
        Assert.Contains("object-src 'none'", csp);
        Assert.Contains("base-uri 'self'", csp);
        Assert.Contains("form-action 'self'", csp);
        var scripts = Directive(csp, "script-src");
        Assert.DoesNotContain("'unsafe-inline'", scripts);
        Assert.DoesNotContain("'unsafe-eval'", scripts);
        Assert.DoesNotContain("*", scripts);
        Assert.False(response.Headers.Contains("Strict-Transport-Security"), "no HSTS over plain HTTP");
    }

    [Fact]
    public async Task Hsts_is_sent_only_on_https_requests()
    {
        using var client = factory.CreateClient(new WebApplicationFactoryClientOptions { BaseAddress = new Uri("https://localhost/"), AllowAutoRedirect = false });

        using var response = await client.GetAsync("/account/signin");

        Assert.Equal(SecurityHeaders.StrictTransportSecurity, Header(response, "Strict-Transport-Security"));
    }

    [Fact]
    public async Task The_inline_import_map_is_allowed_by_its_hash_and_nothing_else_inline()
    {
        using var client = factory.CreateBrowser();

        using var response = await client.GetAsync("/account/signin");
        var html = await response.Content.ReadAsStringAsync();

        var inline = InlineScript().Matches(html).Select(m => m.Groups["body"].Value).ToList();
        var map = Assert.Single(inline);
        var hash = Convert.ToBase64String(SHA256.HashData(Encoding.UTF8.GetBytes(map)));
        Assert.Contains($"'sha256-{hash}'", Directive(Header(response, "Content-Security-Policy"), "script-src"));
    }

    [Fact]
    public async Task Posting_the_sign_in_form_without_the_antiforgery_token_is_refused()
    {
        var demo = TrussWeb.Services.Hosting.DemoSeeder.Users[0];
        using var client = factory.CreateBrowser();
        await client.GetStringAsync("/account/signin");
        var form = new FormUrlEncodedContent(new Dictionary<string, string>
        {
            ["_handler"] = "signin",
            ["Input.Email"] = demo.Email,
            ["Input.Password"] = demo.Password,
        });

        using var response = await client.PostAsync("/account/signin", form);

        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.False(response.Headers.TryGetValues("Set-Cookie", out var cookies) && cookies.Any(c => c.StartsWith(".AspNetCore.Identity.Application=", StringComparison.Ordinal) && !c.Contains("expires=Thu, 01 Jan 1970", StringComparison.OrdinalIgnoreCase)),
            "no sign-in cookie was issued");
        using var projects = await client.GetAsync("/projects");
        Assert.NotEqual(HttpStatusCode.OK, projects.StatusCode);
    }

    [Fact]
    public async Task The_same_post_with_the_token_signs_in_so_the_refusal_above_is_the_token()
    {
        var demo = TrussWeb.Services.Hosting.DemoSeeder.Users[0];
        using var client = factory.CreateBrowser();

        using var response = await SignInForm.PostAsync(client, demo.Email, demo.Password, "/projects");

        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
    }

    private static string Header(HttpResponseMessage response, string name) =>
        response.Headers.TryGetValues(name, out var values) ? string.Join(", ", values)
        : response.Content.Headers.TryGetValues(name, out var contentValues) ? string.Join(", ", contentValues)
        : throw new Xunit.Sdk.XunitException($"{response.RequestMessage?.RequestUri}: no {name} header");

    private static string Directive(string csp, string name) =>
        csp.Split(';', StringSplitOptions.TrimEntries).Single(d => d.StartsWith(name + " ", StringComparison.Ordinal));

    [GeneratedRegex(@"<script(?![^>]*\bsrc=)[^>]*>(?<body>.*?)</script>", RegexOptions.Singleline)]
    private static partial Regex InlineScript();
}
