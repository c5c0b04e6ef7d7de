using System.Net;
using System.Security.Cryptography;
using System.Text;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Api.Tests.Support;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Hosting;

namespace TrussWeb.Api.Tests;

/// <summary>Personal access tokens: hash-only storage, expiry, revocation, scopes, the admin verb.</summary>
public sealed class TokenTests(SqliteApp app) : IClassFixture<SqliteApp>
{
    [Fact]
    public async Task The_database_holds_only_the_hash_and_prefix_of_a_token()
    {
        var created = await app.CreateTokenAsync(Demo.Designer, name: "hash check");
        var row = await app.WithDbAsync(db => db.ApiTokens.AsNoTracking().SingleAsync(t => t.Id == created.View.Id));
        // Common practice: the stored value is the SHA-256 of the token text, never the text itself.
        Assert.Equal(Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(created.Token))), row.TokenHash);
        Assert.True(created.Token.StartsWith(row.Prefix, StringComparison.Ordinal));
        Assert.True(row.Prefix.Length < created.Token.Length / 4);
        var secret = created.Token[(row.Prefix.Length + 1)..];
        foreach (var value in new[] { row.Name, row.Prefix, row.TokenHash, row.Scope, row.UserId })
        {
            Assert.DoesNotContain(secret, value, StringComparison.Ordinal);
        }

        // Nor anywhere else in the database file (audit entries included).
        var dbFile = ((SqliteTestDatabase)app.Database).FilePath;
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        var bytes = await ReadSharedAsync(dbFile);
        Assert.DoesNotContain(secret, Encoding.UTF8.GetString(bytes), StringComparison.Ordinal);
        var list = await app.WithToken(created.Token).GetAsync("/api/v1/projects");
        Assert.Equal(HttpStatusCode.OK, list.StatusCode);
    }

    [Fact]
    public async Task A_revoked_token_is_refused_at_once()
    {
        var created = await app.CreateTokenAsync(Demo.Designer, name: "revoke me");
        var client = app.WithToken(created.Token);
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync("/api/v1/sections")).StatusCode);
        Assert.True((await app.RevokeAsync(Demo.Designer, created.View)).IsOk);
        var problem = await (await client.GetAsync("/api/v1/sections")).ProblemAsync(401);
        Assert.Contains("revoked", problem.GetProperty("detail").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task An_expired_token_is_refused()
    {
        var created = await app.CreateTokenAsync(Demo.Designer, name: "expire me");
        await app.WithDbAsync(db => db.ApiTokens.Where(t => t.Id == created.View.Id).ExecuteUpdateAsync(s => s.SetProperty(t => t.ExpiresUtc, DateTime.UtcNow.AddSeconds(-1))));
        var problem = await (await app.WithToken(created.Token).GetAsync("/api/v1/sections")).ProblemAsync(401);
        Assert.Contains("expired", problem.GetProperty("detail").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Another_users_token_cannot_be_revoked_by_you()
    {
        var created = await app.CreateTokenAsync(Demo.Designer, name: "mine");
        var result = await app.RevokeAsync(Demo.Checker, created.View);
        Assert.Equal(ResultKind.NotFound, result.Kind);
        Assert.Equal(HttpStatusCode.OK, (await app.WithToken(created.Token).GetAsync("/api/v1/sections")).StatusCode);
    }

    [Theory]
    [InlineData("", "read", 30, "Name")]
    [InlineData("ok", "admin", 30, "Scope")]
    [InlineData("ok", "read", -1, "ExpiresUtc")]
    [InlineData("ok", "read", 400, "ExpiresUtc")]
    public async Task Token_requests_outside_the_limits_are_refused_naming_the_field(string name, string scope, int days, string field)
    {
        using var scope1 = app.Services.CreateScope();
        var userId = await app.UserIdAsync(Demo.Designer);
        var service = ServiceCollectionExtensions.TokenServiceFor(scope1.ServiceProvider, new FixedCaller(userId, "d", "Designer"));
        var result = await service.CreateAsync(new ApiTokenInput(name, scope, DateTime.UtcNow.AddDays(days)));
        Assert.Equal(ResultKind.Invalid, result.Kind);
        Assert.Contains(result.Errors, e => e.Field == field);
    }

    [Fact]
    public async Task A_read_token_reads_and_checks_but_may_not_change_anything()
    {
        var created = await app.CreateTokenAsync(Demo.Lead, ApiTokenScopes.Read, "read only");
        var client = app.WithToken(created.Token);
        var (projectId, _) = await Demo.DemoProjectAsync(client);
        Assert.Equal(HttpStatusCode.OK, (await client.GetAsync($"/api/v1/projects/{projectId}")).StatusCode);
        var check = await client.PostRawAsync("/api/v1/calculations/member-check", TrussWeb.Web.Api.OpenApi.ApiExamples.MemberCheck);
        Assert.Equal(HttpStatusCode.OK, check.StatusCode);
        var write = await client.PostRawAsync("/api/v1/projects", """{"name":"Read token project","revision":"A","standardCode":"SANS 10162-1"}""");
        var problem = await write.ProblemAsync(403);
        Assert.Contains("read scope", problem.GetProperty("detail").GetString(), StringComparison.Ordinal);
        var count = await app.WithDbAsync(db => db.Projects.CountAsync(p => p.Name == "Read token project"));
        Assert.Equal(0, count);
    }

    [Fact]
    public async Task The_admin_verb_creates_a_token_that_works_and_prints_it_once()
    {
        var output = new StringWriter();
        var error = new StringWriter();
        var code = await AdminCommands.RunAsync(["create-token", Demo.Checker, "batch", "--scope", "read", "--days", "7"], app.Services, output, error);
        Assert.True(code == 0, error.ToString());
        var lines = output.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        var token = lines[^1];
        Assert.StartsWith("tw_", token, StringComparison.Ordinal);
        Assert.Single(lines, l => l.Contains(token, StringComparison.Ordinal));
        Assert.Equal(HttpStatusCode.OK, (await app.WithToken(token).GetAsync("/api/v1/review/queue")).StatusCode);
        var row = await app.WithDbAsync(db => db.ApiTokens.AsNoTracking().SingleAsync(t => t.Prefix == token.Substring(0, 12)));
        Assert.Equal("read", row.Scope);
        Assert.InRange((row.ExpiresUtc - DateTime.UtcNow).TotalDays, 6.9, 7.01);
    }

    [Fact]
    public async Task The_admin_verb_refuses_an_unknown_user_and_a_bad_lifetime()
    {
        var error = new StringWriter();
        Assert.Equal(1, await AdminCommands.RunAsync(["create-token", "nobody@invalid", "x"], app.Services, new StringWriter(), error));
        Assert.Contains("no user", error.ToString(), StringComparison.Ordinal);
        error = new StringWriter();
        Assert.Equal(1, await AdminCommands.RunAsync(["create-token", Demo.Checker, "x", "--days", "999"], app.Services, new StringWriter(), error));
        Assert.Contains("ExpiresUtc", error.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Using_a_token_records_when_it_was_last_used()
    {
        var created = await app.CreateTokenAsync(Demo.Designer, name: "last used");
        Assert.Null(created.View.LastUsedUtc);
        await app.WithToken(created.Token).GetAsync("/api/v1/standards");
        var row = await app.WithDbAsync(db => db.ApiTokens.AsNoTracking().SingleAsync(t => t.Id == created.View.Id));
        Assert.NotNull(row.LastUsedUtc);
    }

    private static async Task<byte[]> ReadSharedAsync(string path)
    {
        var all = new List<byte>();
        foreach (var file in new[] { path, path + "-wal" }.Where(File.Exists))
        {
            await using var stream = new FileStream(file, FileMode.Open, FileAccess.Read, FileShare.ReadWrite | FileShare.Delete);
            var buffer = new byte[stream.Length];
            await stream.ReadExactlyAsync(buffer);
            all.AddRange(buffer);
        }

        return [.. all];
    }
}

/// <summary>Rate limit per token: the sixth request in a minute with a limit of 5 gets 429 and Retry-After; another token is not affected.</summary>
public sealed class RateLimitTests(RateLimitedApp app) : IClassFixture<RateLimitedApp>
{
    [Fact]
    public async Task Requests_beyond_the_limit_get_429_with_retry_after_and_other_tokens_are_not_affected()
    {
        var first = app.WithToken((await app.CreateTokenAsync(Demo.Designer, name: "busy")).Token);
        var second = app.WithToken((await app.CreateTokenAsync(Demo.Designer, name: "quiet")).Token);
        for (var i = 0; i < 5; i++)
        {
            Assert.Equal(HttpStatusCode.OK, (await first.GetAsync("/api/v1/standards")).StatusCode);
        }

        var limited = await first.GetAsync("/api/v1/standards");
        var problem = await limited.ProblemAsync(429);
        Assert.NotNull(limited.Headers.RetryAfter?.Delta);
        Assert.InRange(limited.Headers.RetryAfter!.Delta!.Value.TotalSeconds, 1, 60);
        Assert.Equal(5, problem.GetProperty("limit").GetInt32());
        Assert.Equal(HttpStatusCode.OK, (await second.GetAsync("/api/v1/standards")).StatusCode);
    }
}
