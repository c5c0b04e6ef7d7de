using System.Net;
using System.Text.Json;
using Npgsql;
using TrussWeb.Deploy.Tests.Support;

namespace TrussWeb.Deploy.Tests;

/// <summary>
/// Two app instances over one PostgreSQL database, as docs/DEPLOY.md describes for scaling out: A migrates at
/// start, B runs with <c>TrussWeb:Database:MigrateOnStart=false</c>. Key sharing is shown with the
/// anti-forgery cookie every page sets: it is data-protected, and an instance that cannot unprotect a cookie
/// it receives replaces it (a new Set-Cookie), while one that can keeps it.
/// </summary>
[Collection(ProcessCollection.Name)]
public sealed class TwoInstancesTests(PostgresClusterFixture cluster)
{
    private const string AntiforgeryCookiePrefix = ".AspNetCore.Antiforgery.";

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
    }

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
}
