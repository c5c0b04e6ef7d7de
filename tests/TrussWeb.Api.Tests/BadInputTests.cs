using TrussWeb.Api.Tests.Support;

namespace TrussWeb.Api.Tests;

/// <summary>
/// Hostile and malformed requests each get a 400 problem naming what was wrong (and the limit), never
/// a stack trace: bad JSON, missing fields, wrong types, NaN and Infinity (literal and in quotes), huge
/// numbers, values beyond Core's outer limits, unknown properties and oversized bodies.
/// </summary>
public sealed class BadInputTests(SqliteApp app) : IClassFixture<SqliteApp>
{
    private const string Url = "/api/v1/calculations/member-check";

    private static string Member(string lengths = "\"lxMm\":2400,\"lyMm\":2400", string forces = "\"tensionN\":0,\"compressionN\":85000") =>
        "{\"section\":{\"designation\":\"L70x70x6\"},\"material\":{\"grade\":\"S355JR\"},\"lengths\":{" + lengths + "},\"forces\":{" + forces + "}}";

    public static TheoryData<string, string, string, string> Cases => new()
    {
        // case, body, field named, words in the message
        { "truncated JSON", """{"section":{"designation":"L70x70x6"}""", "$", "not valid JSON" },
        { "not JSON at all", "designation=L70", "$", "not valid JSON" },
        { "missing forces", """{"section":{"designation":"L70x70x6"},"material":{"grade":"S355JR"},"lengths":{"lxMm":1,"lyMm":1}}""", "$.forces", "required" },
        { "missing lx", Member(lengths: "\"lyMm\":2400"), "$.lengths.lxMm", "required" },
        { "null material", """{"section":{"designation":"L70x70x6"},"material":null,"lengths":{"lxMm":1,"lyMm":1},"forces":{"tensionN":0,"compressionN":0}}""", "$.material", "null" },
        { "string for a number", Member(lengths: "\"lxMm\":\"2400\",\"lyMm\":2400"), "$.lengths.lxMm", "JSON number" },
        { "object for a number", Member(lengths: "\"lxMm\":{},\"lyMm\":2400"), "$.lengths.lxMm", "JSON number" },
        { "number for a string", """{"section":{"designation":70},"material":{"grade":"S355JR"},"lengths":{"lxMm":1,"lyMm":1},"forces":{"tensionN":0,"compressionN":0}}""", "$.section.designation", "JSON string" },
        { "unknown enum", """{"section":{"designation":"L70x70x6","doubleAngle":{"gapMm":10,"arrangement":"Sideways"}},"material":{"grade":"S355JR"},"lengths":{"lxMm":1,"lyMm":1},"forces":{"tensionN":0,"compressionN":0}}""", "$.section.doubleAngle.arrangement", "must be one of" },
        { "NaN literal", Member(lengths: "\"lxMm\":NaN,\"lyMm\":2400"), "$.lengths.lxMm", "not valid JSON" },
        { "NaN in quotes", Member(lengths: "\"lxMm\":\"NaN\",\"lyMm\":2400"), "$.lengths.lxMm", "NaN and Infinity are refused" },
        { "Infinity literal", Member(forces: "\"tensionN\":0,\"compressionN\":Infinity"), "$.forces.compressionN", "not valid JSON" },
        { "-Infinity in quotes", Member(forces: "\"tensionN\":\"-Infinity\",\"compressionN\":0"), "$.forces.tensionN", "NaN and Infinity are refused" },
        { "1e308", Member(lengths: "\"lxMm\":1e308,\"lyMm\":2400"), "$.lengths.lxMm", "at most 1e10" },
        { "1e400 (beyond double)", Member(forces: "\"tensionN\":0,\"compressionN\":1e400"), "$.forces.compressionN", "at most 1e10" },
        { "length beyond PlausibleRange", Member(lengths: "\"lxMm\":600000,\"lyMm\":2400"), "lengths.lxMm", "at most 500000 mm" },
        { "K beyond PlausibleRange", Member(lengths: "\"lxMm\":2400,\"lyMm\":2400,\"kx\":11"), "lengths.kx", "at most 10" },
        { "negative force", Member(forces: "\"tensionN\":-5,\"compressionN\":0"), "forces.tensionN", "must not be negative" },
        { "unknown property", """{"section":{"designation":"L70x70x6"},"material":{"grade":"S355JR"},"lengths":{"lxMm":1,"lyMm":1},"forces":{"tensionN":0,"compressionN":0},"colour":"red"}""", "$.colour", "not a known property" },
        { "unknown section", """{"section":{"designation":"L999x999x99"},"material":{"grade":"S355JR"},"lengths":{"lxMm":1,"lyMm":1},"forces":{"tensionN":0,"compressionN":0}}""", "section.designation", "L999x999x99" },
        { "two sections", """{"section":{"designation":"L70x70x6","circularHollow":{"diameterMm":60,"thicknessMm":3}},"material":{"grade":"S355JR"},"lengths":{"lxMm":1,"lyMm":1},"forces":{"tensionN":0,"compressionN":0}}""", "section", "exactly one" },
        { "thickness beyond the leg", """{"section":{"angle":{"longLegMm":50,"shortLegMm":50,"thicknessMm":60,"rootRadiusMm":0,"toeRadiusMm":0}},"material":{"fyMPa":300,"fuMPa":450},"lengths":{"lxMm":1000,"lyMm":1000},"forces":{"tensionN":0,"compressionN":0}}""", "section.angle.", "" },
        { "unknown grade", """{"section":{"designation":"L70x70x6"},"material":{"grade":"Unobtainium"},"lengths":{"lxMm":1,"lyMm":1},"forces":{"tensionN":0,"compressionN":0}}""", "material.grade", "unknown grade" },
        { "empty body", "", "$", "empty" },
        { "null body", "null", "$", "null" },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public async Task Each_bad_request_gets_a_400_problem_naming_the_field(string @case, string body, string field, string words)
    {
        var client = app.WithToken((await app.CreateTokenAsync(Demo.Designer, name: @case)).Token);
        var problem = await (await client.PostRawAsync(Url, body)).ProblemAsync(400);
        var fields = problem.Fields();
        Assert.True(fields.Any(f => f.StartsWith(field, StringComparison.Ordinal)), $"{@case}: fields {string.Join(", ", fields)} do not name {field}");
        Assert.Contains(words, problem.GetProperty("detail").GetString() + " " + string.Join(" ", problem.GetProperty("errors").EnumerateArray().Select(e => e.GetProperty("message").GetString())), StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_null_entry_in_a_list_gets_400_naming_its_index_and_saves_nothing()
    {
        // Found by BodyPropertyTests: a null row used to reach the truss service and answer 500.
        var client = app.WithToken((await app.CreateTokenAsync(Demo.Lead)).Token);
        var (_, trussId) = await Demo.DemoProjectAsync(client);
        var before = (await client.GetAsync($"/api/v1/trusses/{trussId}")).Headers.ETag?.Tag;
        var supports = await (await client.PutRawAsync($"/api/v1/trusses/{trussId}/supports", "[null]")).ProblemAsync(400);
        Assert.Equal("$[0]", supports.Fields().Single());
        var combinations = await (await client.PutRawAsync($"/api/v1/trusses/{trussId}/combinations", """{"rows":[{"id":null,"version":0,"name":"x","limitState":"Uls","sortOrder":1,"factors":[]},null],"deleted":[]}""")).ProblemAsync(400);
        Assert.Equal("$.rows[1]", combinations.Fields().Single());
        Assert.Equal(before, (await client.GetAsync($"/api/v1/trusses/{trussId}")).Headers.ETag?.Tag);
    }

    [Fact]
    public async Task Renaming_a_truss_to_a_name_the_project_already_has_gets_400_naming_the_name()
    {
        // Found by BodyPropertyTests: the unique index used to refuse it at commit, as a 500.
        var client = app.WithToken((await app.CreateTokenAsync(Demo.Lead)).Token);
        var (projectId, trussId) = await Demo.DemoProjectAsync(client);
        var created = await client.PostRawAsync($"/api/v1/projects/{projectId}/trusses", """
            { "name": "Taken name", "type": "PitchedHowe", "spanMm": 12000, "pitchDegrees": 15, "apexHeightMm": null, "heelDepthMm": 300, "panelCount": 8, "spacingMm": 6000, "bottomRestraintEvery": 2 }
            """);
        Assert.Equal(System.Net.HttpStatusCode.Created, created.StatusCode);
        var truss = await client.GetAsync($"/api/v1/trusses/{trussId}");
        var version = (await truss.JsonAsync()).GetProperty("version").GetInt64();
        var problem = await (await client.PutRawAsync($"/api/v1/trusses/{trussId}/settings",
            $$"""{"name":"Taken name","spacingMm":6000,"purlinSpacingMm":1500,"deflectionLimitRatio":250,"connectionAllowanceFraction":0.1,"notes":null,"version":{{version}}}""")).ProblemAsync(400);
        Assert.Equal("Name", problem.Fields().Single());
        Assert.Contains("already has a truss named 'Taken name'", problem.GetProperty("detail").GetString(), StringComparison.Ordinal);
        Assert.Equal(truss.Headers.ETag?.Tag, (await client.GetAsync($"/api/v1/trusses/{trussId}")).Headers.ETag?.Tag);
    }

    [Fact]
    public async Task Values_beyond_a_limit_carry_the_value_and_the_limit()
    {
        var client = app.WithToken((await app.CreateTokenAsync(Demo.Designer)).Token);
        var problem = await (await client.PostRawAsync(Url, Member(lengths: "\"lxMm\":600000,\"lyMm\":2400"))).ProblemAsync(400);
        var error = problem.GetProperty("errors").EnumerateArray().Single();
        Assert.Equal("lengths.lxMm", error.GetProperty("field").GetString());
        // Source: TrussWeb.Core.Validation.PlausibleRange.MaxLengthMm (500 m), the outer limit of every length.
        Assert.Equal("at most 500000 mm", error.GetProperty("limit").GetString());
        Assert.Equal("600000 mm", error.GetProperty("value").GetString());
    }

    [Fact]
    public async Task An_oversized_body_gets_400_naming_the_256_KB_limit()
    {
        var client = app.WithToken((await app.CreateTokenAsync(Demo.Designer)).Token);
        var big = "{\"mark\":\"" + new string('x', 300_000) + "\"}";
        var problem = await (await client.PostRawAsync(Url, big)).ProblemAsync(400);
        Assert.Equal("body", problem.Fields().Single());
        Assert.Contains("262144 bytes (256 KB)", problem.GetProperty("detail").GetString(), StringComparison.Ordinal);

        // Without a Content-Length (chunked), the limit holds as the body is read.
        var chunked = new StreamContent(new MemoryStream(System.Text.Encoding.UTF8.GetBytes(big)));
        chunked.Headers.ContentType = new System.Net.Http.Headers.MediaTypeHeaderValue("application/json");
        var request = new HttpRequestMessage(HttpMethod.Post, Url) { Content = chunked };
        request.Headers.TransferEncodingChunked = true;
        var second = await (await client.SendAsync(request)).ProblemAsync(400);
        Assert.Equal("body", second.Fields().Single());
    }

    [Fact]
    public async Task A_body_that_is_not_json_gets_415_and_a_bad_query_value_gets_400()
    {
        var client = app.WithToken((await app.CreateTokenAsync(Demo.Designer)).Token);
        var form = await client.PostAsync(Url, new StringContent("lxMm=1", System.Text.Encoding.UTF8, "text/plain"));
        Assert.Equal("Content-Type", (await form.ProblemAsync(415)).Fields().Single());
        await (await client.GetAsync("/api/v1/sections?minSizeMm=abc")).ProblemAsync(400);
        var range = await (await client.GetAsync("/api/v1/sections?minSizeMm=1e9")).ProblemAsync(400);
        Assert.Contains("minSizeMm", range.Fields());
        await (await client.GetAsync("/api/v1/sections?kind=Banana")).ProblemAsync(400);
    }

    [Fact]
    public async Task An_unknown_api_path_gets_a_404_problem_not_the_html_page()
    {
        var client = app.WithToken((await app.CreateTokenAsync(Demo.Designer)).Token);
        await (await client.GetAsync("/api/v1/no-such-thing")).ProblemAsync(404);
        await (await client.GetAsync($"/api/v1/trusses/not-a-guid")).ProblemAsync(404);
    }
}
