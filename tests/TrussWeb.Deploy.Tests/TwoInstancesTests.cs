using System.Net;
using System.Text.Json;
using System.Text.RegularExpressions;
using Npgsql;
using TrussWeb.Deploy.Tests.Support;

namespace TrussWeb.Deploy.Tests;

/// <summary>
/// Two app instances over one PostgreSQL database, as docs/DEPLOY.md describes for scaling out: A migrates at
/// start, B runs with <c>TrussWeb:Database:MigrateOnStart=false</c>. Key sharing is shown with the
/// anti-forgery cookie every page sets: it is data-protected, and an instance that cannot unprotect a cookie
/// it receives replaces it (a new Set-Cookie), while one that can keeps it. Then a user created with the
/// <c>create-user</c> verb on A's settings signs in through A's sign-in form, and B serves /projects to A's
/// authentication cookie (and the other way round), while without the cookie B sends to the sign-in page.
/// </summary>
[Collection(ProcessCollection.Name)]
public sealed partial class TwoInstancesTests(PostgresClusterFixture cluster)
{
    private const string AntiforgeryCookiePrefix = ".AspNetCore.Antiforgery.";

    private const string AuthCookie = ".AspNetCore.Identity.Application";

    [Fact]
    public async Task Two_instances_over_one_PostgreSQL_database_share_schema_users_and_data_protection_keys()
    {
        await using var database = await PostgresTestDatabase.CreateAsync(cluster.AdminConnectionString);
        using var http = new HttpClient(new HttpClientHandler { UseCookies = false, AllowAutoRedirect = false }) { Timeout = TimeSpan.FromSeconds(30) };
        var settings = new Dictionary<string, string>
        {
            ["TrussWeb__Database__Provider"] = "Postgres",
            ["TrussWeb__Database__ConnectionString"] = database.ConnectionString,
            ["TrussWeb__Admin__Password"] = "first-admin-2026",
        };
        var noMigrate = new Dictionary<string, string>(settings) { ["TrussWeb__Database__MigrateOnStart"] = "false" };

        // An instance with the start-up migration off refuses an unmigrated database, naming the remedy.
        await using (var early = AppProcess.Start(Repo.WebDll, noMigrate))
        {
            var code = await early.WaitExitAsync();
            Assert.NotEqual(0, code);
            Assert.Contains("pending migration", early.Output, StringComparison.Ordinal);
            Assert.Contains("TrussWeb.Web migrate", early.Output, StringComparison.Ordinal);
        }

        await using var a = AppProcess.Start(Repo.WebDll, settings);
        var readyA = await a.WaitReadyAsync(http);
        await using var b = AppProcess.Start(Repo.WebDll, noMigrate);
        var readyB = await b.WaitReadyAsync(http);

        // Same build, same schema: B did not migrate, it reads the schema A applied.
        var schema = readyA.GetProperty("schema").GetString();
        Assert.False(string.IsNullOrEmpty(schema));
        Assert.Equal(schema, readyB.GetProperty("schema").GetString());
        Assert.Equal(readyA.GetProperty("version").GetString(), readyB.GetProperty("version").GetString());
        Assert.Equal(await LastMigrationAsync(database.ConnectionString), schema);

        // A created the first administrator; B found that user in the shared database and created none.
        Assert.Contains("created the first administrator", a.Output, StringComparison.Ordinal);
        Assert.DoesNotContain("created the first administrator", b.Output, StringComparison.Ordinal);

        // Anti-forgery cookie issued by A is accepted by B (no replacement cookie), and the other way round.
        var fromA = await AntiforgeryCookieAsync(http, a.BaseAddress, cookie: null);
        Assert.NotNull(fromA);
        Assert.Null(await AntiforgeryCookieAsync(http, b.BaseAddress, fromA));
        var fromB = await AntiforgeryCookieAsync(http, b.BaseAddress, cookie: null);
        Assert.NotNull(fromB);
        Assert.Null(await AntiforgeryCookieAsync(http, a.BaseAddress, fromB));

        // Control: a cookie B cannot unprotect is replaced, so the check above can fail.
        var (name, value) = Split(fromA!);
        var tampered = $"{name}={value[..^4]}AAAA";
        Assert.NotNull(await AntiforgeryCookieAsync(http, b.BaseAddress, tampered));

        // One key ring in the database, written once and used by both.
        Assert.Equal(1L, await CountAsync(database.ConnectionString, "DataProtectionKeys"));
        Assert.Equal(1L, await CountAsync(database.ConnectionString, "AspNetUsers"));

        // A user created with A's settings (the create-user verb), signed in through A's real sign-in form:
        // B accepts A's authentication cookie and serves the signed-in page; without it B sends to sign-in.
        var email = $"deploy-{Guid.NewGuid():N}"[..20] + "@example.test";
        var password = $"test-only-{Guid.NewGuid():N}-7";
        var (created, createOutput) = await AppProcess.RunVerbAsync(Repo.WebDll, settings, "create-user", email, "Designer", "--password", password);
        Assert.True(created == 0, $"create-user exited {created}: {createOutput}");
        Assert.Equal(2L, await CountAsync(database.ConnectionString, "AspNetUsers"));

        var authFromA = await SignInThroughFormAsync(http, a.BaseAddress, email, password);
        await AssertSignedInPageAsync(http, b.BaseAddress, authFromA, email);
        await AssertSentToSignInAsync(http, b.BaseAddress, cookie: null);
        var (authName, authValue) = Split(authFromA);
        await AssertSentToSignInAsync(http, b.BaseAddress, $"{authName}={authValue[..^4]}AAAA");

        // The same user signs in on B's form (B reads the user A's settings wrote) and A accepts B's cookie.
        var authFromB = await SignInThroughFormAsync(http, b.BaseAddress, email, password);
        await AssertSignedInPageAsync(http, a.BaseAddress, authFromB, email);
    }

    /// <summary>
    /// GET /account/signin, read the hidden fields (anti-forgery token, form handler) and the names of the e-mail and
    /// password inputs, POST them with the anti-forgery cookie; the sign-in must redirect and set the
    /// authentication cookie, returned as "name=value".
    /// </summary>
    private static async Task<string> SignInThroughFormAsync(HttpClient http, Uri baseAddress, string email, string password)
    {
        var signIn = new Uri(baseAddress, "account/signin");
        using var page = await http.GetAsync(signIn);
        Assert.Equal(HttpStatusCode.OK, page.StatusCode);
        var antiforgery = CookiesOf(page).Where(c => c.StartsWith(AntiforgeryCookiePrefix, StringComparison.Ordinal)).ToList();
        Assert.NotEmpty(antiforgery);
        var inputs = InputPattern().Matches(await page.Content.ReadAsStringAsync())
            .Select(m => AttributePattern().Matches(m.Value).ToDictionary(x => x.Groups[1].Value, x => WebUtility.HtmlDecode(x.Groups[2].Value), StringComparer.OrdinalIgnoreCase))
            .ToList();
        var fields = inputs
            .Where(i => i.TryGetValue("type", out var type) && type == "hidden" && i.ContainsKey("name"))
            .ToDictionary(i => i["name"], i => i.GetValueOrDefault("value") ?? string.Empty);
        Assert.True(fields.ContainsKey("__RequestVerificationToken"), "the sign-in form has no anti-forgery token");
        fields[NameOf(inputs, "signin-email")] = email;
        fields[NameOf(inputs, "signin-password")] = password;

        using var post = new HttpRequestMessage(HttpMethod.Post, signIn) { Content = new FormUrlEncodedContent(fields) };
        post.Headers.Add("Cookie", string.Join("; ", antiforgery));
        using var response = await http.SendAsync(post);
        var body = await response.Content.ReadAsStringAsync();
        Assert.True(response.StatusCode == HttpStatusCode.Redirect, $"sign-in on {baseAddress} answered {(int)response.StatusCode}: {body}");
        var auth = CookiesOf(response).Where(c => c.StartsWith(AuthCookie + "=", StringComparison.Ordinal)).ToList();
        return Assert.Single(auth);
    }

    private static string NameOf(List<Dictionary<string, string>> inputs, string id)
    {
        var input = inputs.SingleOrDefault(i => i.TryGetValue("id", out var value) && value == id);
        Assert.True(input is not null && input.TryGetValue("name", out var name) && name.Length > 0, $"the sign-in form has no named input #{id}");
        return input["name"];
    }

    /// <summary>GET /projects with the authentication cookie: 200 with the signed-in user's badge and the projects page.</summary>
    private static async Task AssertSignedInPageAsync(HttpClient http, Uri baseAddress, string cookie, string email)
    {
        using var request = new HttpRequestMessage(HttpMethod.Get, new Uri(baseAddress, "projects"));
        request.Headers.Add("Cookie", cookie);
        using var response = await http.SendAsync(request);
        Assert.True(response.StatusCode == HttpStatusCode.OK, $"/projects on {baseAddress} answered {(int)response.StatusCode} {response.Headers.Location}");
        var html = await response.Content.ReadAsStringAsync();
        var badge = BadgePattern().Match(html);
        Assert.True(badge.Success, "no signed-in user badge on /projects");
        Assert.Contains(email, badge.Groups[1].Value, StringComparison.Ordinal);
        Assert.Contains("Designer", badge.Groups[1].Value, StringComparison.Ordinal);
        Assert.Contains("Your projects", html, StringComparison.Ordinal);
    }

    /// <summary>GET /projects with an optional cookie: a redirect to the sign-in page.</summary>
    private static async Task AssertSentToSignInAsync(HttpClient http, Uri baseAddress, string? cookie)
    {
        using var request = new HttpRequestMessage(HttpMethod.Get, new Uri(baseAddress, "projects"));
        if (cookie is not null)
        {
            request.Headers.Add("Cookie", cookie);
        }

        using var response = await http.SendAsync(request);
        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        Assert.Equal("/account/signin", new Uri(baseAddress, response.Headers.Location!).AbsolutePath);
    }

    private static IEnumerable<string> CookiesOf(HttpResponseMessage response) =>
        (response.Headers.TryGetValues("Set-Cookie", out var values) ? values : []).Select(c => c.Split(';')[0].Trim());

    /// <summary>GET / with an optional cookie; the anti-forgery cookie the response sets ("name=value"), or null when it sets none.</summary>
    private static async Task<string?> AntiforgeryCookieAsync(HttpClient http, Uri baseAddress, string? cookie)
    {
        using var request = new HttpRequestMessage(HttpMethod.Get, baseAddress);
        if (cookie is not null)
        {
            request.Headers.Add("Cookie", cookie);
        }

        using var response = await http.SendAsync(request);
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var setCookies = response.Headers.TryGetValues("Set-Cookie", out var values) ? values : [];
        return setCookies
            .Select(c => c.Split(';')[0].Trim())
            .FirstOrDefault(c => c.StartsWith(AntiforgeryCookiePrefix, StringComparison.Ordinal));
    }

    private static (string Name, string Value) Split(string cookie)
    {
        var i = cookie.IndexOf('=', StringComparison.Ordinal);
        return (cookie[..i], cookie[(i + 1)..]);
    }

    private static async Task<long> CountAsync(string connectionString, string table)
    {
        await using var connection = new NpgsqlConnection(connectionString);
        await connection.OpenAsync();
        await using var command = new NpgsqlCommand($"SELECT COUNT(*) FROM \"{table}\"", connection);
        return (long)(await command.ExecuteScalarAsync())!;
    }

    private static async Task<string> LastMigrationAsync(string connectionString)
    {
        await using var connection = new NpgsqlConnection(connectionString);
        await connection.OpenAsync();
        await using var command = new NpgsqlCommand("SELECT \"MigrationId\" FROM \"__EFMigrationsHistory\" ORDER BY \"MigrationId\" DESC LIMIT 1", connection);
        return (string)(await command.ExecuteScalarAsync())!;
    }

    [GeneratedRegex("<input\\b[^>]*>", RegexOptions.IgnoreCase)]
    private static partial Regex InputPattern();

    [GeneratedRegex("([A-Za-z_][\\w.:-]*)=\"([^\"]*)\"")]
    private static partial Regex AttributePattern();

    [GeneratedRegex("data-testid=\"signed-in-user\"[^>]*>(.*?)</", RegexOptions.Singleline)]
    private static partial Regex BadgePattern();
}
