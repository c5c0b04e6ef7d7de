using System.Net;
using System.Net.Http.Headers;
using System.Text.Json;
using TrussWeb.Api.Tests.Support;
using TrussWeb.Services.Hosting;

namespace TrussWeb.Api.Tests;

/// <summary>
/// Projects, trusses and members over HTTP: read, create, update, results, and the Version / If-Match
/// concurrency (409 problem on a stale save). Runs on a SQLite file and on PostgreSQL 15.
/// </summary>
public abstract class CrudContractTests
{
    protected abstract ApiAppFactory App { get; }

    private async Task<HttpClient> LeadAsync() => App.WithToken((await App.CreateTokenAsync(Demo.Lead)).Token);

    [Fact]
    public async Task The_demo_project_reads_with_its_trusses_and_an_etag_of_its_version()
    {
        var client = await LeadAsync();
        var (projectId, trussId) = await Demo.DemoProjectAsync(client);
        var response = await client.GetAsync($"/api/v1/projects/{projectId}");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        var project = await response.JsonAsync();
        Assert.Equal(DemoSeeder.ProjectName, project.GetProperty("name").GetString());
        Assert.Equal($"\"{project.GetProperty("version").GetInt64()}\"", response.Headers.ETag?.Tag);
        Assert.Contains(project.GetProperty("trusses").EnumerateArray(), t => t.GetProperty("trussId").GetGuid() == trussId);
        await (await client.GetAsync($"/api/v1/projects/{Guid.NewGuid()}")).ProblemAsync(404);
    }

    [Fact]
    public async Task A_project_is_created_updated_and_a_stale_update_gets_409_with_nothing_saved()
    {
        var client = await LeadAsync();
        var create = await client.PostRawAsync("/api/v1/projects", """
            {"name":"Api Test Depot","client":"Invented Haulage","reference":"T-1","location":"Nowhere Flats","revision":"A","standardCode":"SANS 10162-1","defaultGradeName":"S355JR"}
            """);
        Assert.Equal(HttpStatusCode.Created, create.StatusCode);
        var created = await create.JsonAsync();
        var id = created.GetProperty("id").GetGuid();
        Assert.EndsWith($"/api/v1/projects/{id}", create.Headers.Location!.ToString(), StringComparison.Ordinal);
        var version = created.GetProperty("version").GetInt64();

        var update = await client.PutRawAsync($"/api/v1/projects/{id}", Settings("B", version));
        Assert.Equal(HttpStatusCode.OK, update.StatusCode);
        var updated = await update.JsonAsync();
        Assert.Equal("B", updated.GetProperty("revision").GetString());
        Assert.True(updated.GetProperty("version").GetInt64() > version);

        // The same (now stale) version again: 409, and the stored revision stays B.
        var stale = await client.PutRawAsync($"/api/v1/projects/{id}", Settings("C", version));
        var problem = await stale.ProblemAsync(409);
        Assert.True(problem.GetProperty("conflicts").GetArrayLength() >= 1);
        var now = await (await client.GetAsync($"/api/v1/projects/{id}")).JsonAsync();
        Assert.Equal("B", now.GetProperty("revision").GetString());

        // If-Match carries the version instead of the body.
        var request = new HttpRequestMessage(HttpMethod.Put, $"/api/v1/projects/{id}") { Content = new StringContent(Settings("D", 0), System.Text.Encoding.UTF8, "application/json") };
        request.Headers.IfMatch.Add(new EntityTagHeaderValue($"\"{now.GetProperty("version").GetInt64()}\""));
        Assert.Equal(HttpStatusCode.OK, (await client.SendAsync(request)).StatusCode);
        var staleIfMatch = new HttpRequestMessage(HttpMethod.Put, $"/api/v1/projects/{id}") { Content = new StringContent(Settings("E", 0), System.Text.Encoding.UTF8, "application/json") };
        staleIfMatch.Headers.IfMatch.Add(new EntityTagHeaderValue($"\"{version}\""));
        await (await client.SendAsync(staleIfMatch)).ProblemAsync(409);
    }

    [Fact]
    public async Task A_designer_may_not_create_a_project()
    {
        var client = App.WithToken((await App.CreateTokenAsync(Demo.Designer)).Token);
        await (await client.PostRawAsync("/api/v1/projects", """{"name":"Not mine","revision":"A","standardCode":"SANS 10162-1"}""")).ProblemAsync(403);
    }

    [Fact]
    public async Task A_truss_is_created_from_the_generator_read_with_its_design_and_its_settings_saved()
    {
        var client = await LeadAsync();
        var (projectId, _) = await Demo.DemoProjectAsync(client);
        var create = await client.PostRawAsync($"/api/v1/projects/{projectId}/trusses", """
            {"name":"API RT9","type":"PitchedHowe","spanMm":12000,"pitchDegrees":15,"apexHeightMm":null,"heelDepthMm":300,"panelCount":8,"spacingMm":6000,"bottomRestraintEvery":2}
            """);
        Assert.True(create.StatusCode == HttpStatusCode.Created, await create.Content.ReadAsStringAsync());
        var truss = await create.JsonAsync();
        var trussId = truss.GetProperty("id").GetGuid();
        Assert.True(truss.GetProperty("nodes").GetArrayLength() > 8);
        Assert.True(truss.GetProperty("members").GetArrayLength() > 8);

        var design = await (await client.GetAsync($"/api/v1/trusses/{trussId}/design")).JsonAsync();
        Assert.Equal(truss.GetProperty("members").GetArrayLength(), design.GetProperty("members").GetArrayLength());

        var version = truss.GetProperty("version").GetInt64();
        var settings = $$"""{"name":"API RT9","spacingMm":5000,"purlinSpacingMm":null,"deflectionLimitRatio":250,"connectionAllowanceFraction":0.1,"notes":"from the API","version":{{version}}}""";
        var saved = await client.PutRawAsync($"/api/v1/trusses/{trussId}/settings", settings);
        Assert.True(saved.StatusCode == HttpStatusCode.OK, await saved.Content.ReadAsStringAsync());
        Assert.Equal(5000, (await saved.JsonAsync()).GetProperty("spacingMm").GetDouble());
        await (await client.PutRawAsync($"/api/v1/trusses/{trussId}/settings", settings)).ProblemAsync(409);

        var huge = settings.Replace("\"spacingMm\":5000", "\"spacingMm\":1e308", StringComparison.Ordinal).Replace($"\"version\":{version}", $"\"version\":{version + 1}", StringComparison.Ordinal);
        var problem = await (await client.PutRawAsync($"/api/v1/trusses/{trussId}/settings", huge)).ProblemAsync(400);
        Assert.Contains("$.spacingMm", problem.Fields());
        Assert.Contains("1e10", problem.GetProperty("detail").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_member_reads_with_its_calculation_record_and_a_stale_override_gets_409()
    {
        var client = await LeadAsync();
        var (_, trussId) = await Demo.DemoProjectAsync(client);
        var truss = await (await client.GetAsync($"/api/v1/trusses/{trussId}")).JsonAsync();
        var member = truss.GetProperty("members").EnumerateArray().First();
        var memberId = member.GetProperty("id").GetGuid();
        var read = await client.GetAsync($"/api/v1/trusses/{trussId}/members/{memberId}");
        Assert.Equal(HttpStatusCode.OK, read.StatusCode);
        var detail = await read.JsonAsync();
        Assert.True(detail.GetProperty("steps").GetArrayLength() > 5);
        Assert.True(detail.GetProperty("checks").GetArrayLength() >= 1);
        Assert.Equal(member.GetProperty("mark").GetString(), detail.GetProperty("row").GetProperty("mark").GetString());
        var version = detail.GetProperty("memberVersion").GetInt64();

        var overrides = detail.GetProperty("overrides").Clone();
        var body = JsonSerializer.Serialize(new { overrides = Override(overrides, 0.9), version });
        var saved = await client.PutRawAsync($"/api/v1/trusses/{trussId}/members/{memberId}", body);
        Assert.True(saved.StatusCode == HttpStatusCode.OK, await saved.Content.ReadAsStringAsync());
        Assert.Equal(0.9, (await saved.JsonAsync()).GetProperty("row").GetProperty("lengths").GetProperty("kx").GetDouble());
        await (await client.PutRawAsync($"/api/v1/trusses/{trussId}/members/{memberId}", JsonSerializer.Serialize(new { overrides = Override(overrides, 0.8), version }))).ProblemAsync(409);
    }

    private static Dictionary<string, object?> Override(JsonElement overrides, double kx)
    {
        var d = JsonSerializer.Deserialize<Dictionary<string, object?>>(overrides.GetRawText())!;
        d["kx"] = kx;
        return d;
    }

    private static string Settings(string revision, long version) =>
        $$"""{"settings":{"name":"Api Test Depot","client":"Invented Haulage","reference":"T-1","location":"Nowhere Flats","revision":"{{revision}}","standardCode":"SANS 10162-1","defaultGradeName":"S355JR"},"version":{{version}}}""";
}

public sealed class SqliteCrudContractTests(SqliteApp app) : CrudContractTests, IClassFixture<SqliteApp>
{
    protected override ApiAppFactory App => app;
}

[Collection(PostgresCollection.Name)]
public sealed class PostgresCrudContractTests(PostgresApp app) : CrudContractTests, IClassFixture<PostgresApp>
{
    protected override ApiAppFactory App => app.App;
}

/// <summary>One app over a fresh PostgreSQL database for the test class.</summary>
public sealed class PostgresApp(PostgresClusterFixture cluster) : IAsyncLifetime
{
    private ApiAppFactory? _app;

    public ApiAppFactory App => _app!;

    public async Task InitializeAsync() => _app = new ApiAppFactory(await PostgresTestDatabase.CreateAsync(cluster.AdminConnectionString));

    public async Task DisposeAsync()
    {
        if (_app is not null)
        {
            await _app.DisposeAsync();
        }
    }
}
