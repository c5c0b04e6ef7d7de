using System.Globalization;
using System.Net;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using FsCheck;
using FsCheck.Fluent;
using Microsoft.AspNetCore.Http.Metadata;
using Microsoft.AspNetCore.Routing;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.FSharp.Core;
using TrussWeb.Api.Tests.Support;
using TrussWeb.Data.Entities;
using TrussWeb.Web.Api.OpenApi;

namespace TrussWeb.Api.Tests;

/// <summary>
/// FsCheck over every API body: each POST/PUT/PATCH route that takes a body gets its OpenAPI example mutated
/// (fields dropped, wrong types, "NaN"/"Infinity", 1e308 and beyond, negatives, huge strings, deep nesting,
/// unknown fields, nulls, broken JSON, other whole bodies) and sent with real ids of the demo project. Every
/// answer: never a 5xx; never a non-finite number (the answer parses as JSON, and no "NaN"/"Infinity" text the
/// request did not send); every 4xx is application/problem+json, and bad input (400, 413, 415) names the
/// field or the body; a refused request (any 4xx) changes nothing stored.
/// Cases per route: <c>TRUSSWEB_API_FUZZ_CASES</c> (default 100); seed: <c>TRUSSWEB_API_FUZZ_SEED</c>
/// (default fixed, so CI runs are repeatable; "random" for a fresh one; the "seed,gamma" pair FsCheck prints on
/// a failure replays it).
/// </summary>
public sealed class BodyPropertyTests(SqliteApp app) : IClassFixture<SqliteApp>
{
    private const string Prefix = "/api/v1";

    private static readonly string[] NonFiniteWords = ["NaN", "Infinity", "-Infinity", "+Infinity"];

    /// <summary>Every body route by endpoint name (the examples in the OpenAPI document).</summary>
    public static TheoryData<string> BodyRoutes()
    {
        var data = new TheoryData<string>();
        foreach (var name in ApiExamples.Requests.Keys.Order(StringComparer.Ordinal))
        {
            data.Add(name);
        }

        return data;
    }

    private List<RouteEndpoint> Endpoints()
    {
        _ = app.Anonymous();
        return app.Services.GetRequiredService<EndpointDataSource>().Endpoints.OfType<RouteEndpoint>()
            .Where(e => (e.RoutePattern.RawText ?? "").TrimStart('/').StartsWith("api/", StringComparison.Ordinal)).ToList();
    }

    [Fact]
    public void Every_api_route_that_takes_a_body_is_exercised()
    {
        var bodyRoutes = Endpoints()
            .Where(e => e.Metadata.GetMetadata<HttpMethodMetadata>()!.HttpMethods.Any(m => m is "POST" or "PUT" or "PATCH"))
            .Where(e => e.Metadata.GetMetadata<IAcceptsMetadata>() is not null)
            .Select(e => e.Metadata.GetMetadata<IEndpointNameMetadata>()?.EndpointName ?? e.RoutePattern.RawText!)
            .ToList();
        Assert.True(bodyRoutes.Count >= 20, $"only {bodyRoutes.Count} body routes");
        var missing = bodyRoutes.Where(n => !ApiExamples.Requests.ContainsKey(n)).ToList();
        Assert.True(missing.Count == 0, "body routes without an example (so not fuzzed): " + string.Join(", ", missing));
    }

    [Theory]
    [MemberData(nameof(BodyRoutes))]
    public async Task Hostile_bodies_get_a_named_problem_and_change_nothing(string endpointName)
    {
        var endpoint = Endpoints().Single(e => e.Metadata.GetMetadata<IEndpointNameMetadata>()?.EndpointName == endpointName);
        var method = endpoint.Metadata.GetMetadata<HttpMethodMetadata>()!.HttpMethods.Single();
        var token = (await app.CreateTokenAsync(Demo.Lead, name: "fuzz " + endpointName)).Token;
        var client = app.WithToken(token);
        var ids = await IdsAsync(client);
        var url = Fill(endpoint.RoutePattern.RawText!, ids);
        var example = ApiExamples.Requests[endpointName]
            .Replace("<checker user id from /projects/{id}/people>", ids["checker"], StringComparison.Ordinal)
            .Replace("<user id of another checker>", ids["checker"], StringComparison.Ordinal);
        var template = JsonNode.Parse(example)!;

        var cases = int.TryParse(Environment.GetEnvironmentVariable("TRUSSWEB_API_FUZZ_CASES"), CultureInfo.InvariantCulture, out var n) && n > 0 ? n : 100;
        var config = Config.QuickThrowOnFailure.WithMaxTest(cases).WithQuietOnSuccess(true);
        var seedText = Environment.GetEnvironmentVariable("TRUSSWEB_API_FUZZ_SEED");
        if (seedText?.Split(',') is [var seedPart, var gammaPart])
        {
            // The pair FsCheck prints on a failure, e.g. TRUSSWEB_API_FUZZ_SEED=4032304228207119147,9329138116987278731
            config = config.WithReplay(FSharpOption<Replay>.Some(new Replay(
                new Rnd(ulong.Parse(seedPart, CultureInfo.InvariantCulture), ulong.Parse(gammaPart, CultureInfo.InvariantCulture)), FSharpOption<int>.None)));
        }
        else if (!string.Equals(seedText, "random", StringComparison.OrdinalIgnoreCase))
        {
            var seed = ulong.TryParse(seedText, CultureInfo.InvariantCulture, out var s) ? s : 20260417UL;
            seed += (ulong)(uint)StableHash(endpointName);
            config = config.WithReplay(FSharpOption<Replay>.Some(new Replay(new Rnd(seed), FSharpOption<int>.None)));
        }

        Prop.ForAll(Mutations().ToArbitrary(), mutations =>
        {
            var body = Apply(template, mutations, ids, endpointName, client);
            var before = StoredStateAsync().GetAwaiter().GetResult();
            using var request = new HttpRequestMessage(new HttpMethod(method), url) { Content = new StringContent(body, Encoding.UTF8, "application/json") };
            using var response = client.SendAsync(request).GetAwaiter().GetResult();
            var text = response.Content.ReadAsStringAsync().GetAwaiter().GetResult();
            var status = (int)response.StatusCode;
            var label = $"{method} {url} ({endpointName}) answered {status} to {Shorten(body)}: {Shorten(text)}";

            Assert.True(status < 500, label);
            Assert.DoesNotContain("   at ", text, StringComparison.Ordinal);
            AssertFinite(text, label);
            if (status >= 400)
            {
                Assert.True(response.Content.Headers.ContentType?.MediaType == "application/problem+json", label);
                var problem = JsonDocument.Parse(text).RootElement;
                Assert.Equal(status, problem.GetProperty("status").GetInt32());
                Assert.False(string.IsNullOrWhiteSpace(problem.GetProperty("detail").GetString()), label);
                if (status is 400 or 413 or 415)
                {
                    var fields = problem.Fields();
                    Assert.True(fields.Count > 0 && fields.All(f => !string.IsNullOrWhiteSpace(f)), "no field named: " + label);
                }

                Assert.True(before == StoredStateAsync().GetAwaiter().GetResult(), "a refused request changed what is stored: " + label);
            }
        }).Check(config);
    }

    /// <summary>One change to the example body: what (kind), where (index into its values), which value (pick).</summary>
    public sealed record Mutation(int Kind, int Target, int Pick);

    private static Gen<Mutation[]> Mutations() =>
        from count in Gen.Choose(1, 3)
        from list in Gen.ArrayOf(from kind in Gen.Choose(0, 13) from target in Gen.Choose(0, 10_000) from pick in Gen.Choose(0, 1000) select new Mutation(kind, target, pick), count)
        select list;

    private static readonly string[] WrongTypes = ["\"text\"", "12345", "true", "false", "{}", "[]", "\"12\"", "[1,2,3]", "{\"a\":1}", "\"\""];
    private static readonly string[] NonFiniteStrings = ["\"NaN\"", "\"Infinity\"", "\"-Infinity\"", "\"nan\"", "\"1e999\"", "\"∞\""];
    private static readonly string[] HugeNumbers = ["1e308", "-1e308", "1e400", "-1e400", "1.7976931348623157e308", "4.9e-324", "1e11", "123456789012345678901234567890", "9223372036854775808"];
    private static readonly string[] Negatives = ["-1", "-0.0001", "-1e9", "-2147483648", "-0", "-9223372036854775808"];
    private static readonly string[] RawInvalid = ["NaN", "Infinity", "-Infinity", "undefined", "01", "1.", ".5", "+1", "0x10", "'single'"];
    private static readonly string[] WholeBodies = ["", "null", "[]", "{}", "\"text\"", "42", "true", "{", "}", "[{}]", "{\"\":null}", "\u0000"];

    /// <summary>The example with the mutations applied (a marker per raw text, replaced after serialising), or a whole other body.</summary>
    private string Apply(JsonNode template, Mutation[] mutations, IReadOnlyDictionary<string, string> ids, string endpointName, HttpClient client)
    {
        var root = template.DeepClone();
        CurrentVersion(root, endpointName, ids, client);
        var raws = new List<string>();
        string Raw(string text)
        {
            raws.Add(text);
            return $"RAW__{raws.Count - 1}__";
        }

        foreach (var m in mutations)
        {
            var slots = Slots(root);
            if (m.Kind == 13)
            {
                var whole = WholeBodies[m.Pick % WholeBodies.Length];
                if (m.Pick % 7 == 0)
                {
                    var full = root.ToJsonString();
                    return full[..(full.Length / 2)]; // truncated
                }

                return whole;
            }

            if (slots.Count == 0)
            {
                continue;
            }

            var (parent, key, index) = slots[m.Target % slots.Count];
            switch (m.Kind)
            {
                case 0: // drop the field (or the element)
                    if (parent is JsonObject o)
                    {
                        o.Remove(key!);
                    }
                    else
                    {
                        ((JsonArray)parent).RemoveAt(index);
                    }

                    break;
                case 1:
                    Set(parent, key, index, Raw(WrongTypes[m.Pick % WrongTypes.Length]));
                    break;
                case 2:
                    Set(parent, key, index, Raw(NonFiniteStrings[m.Pick % NonFiniteStrings.Length]));
                    break;
                case 3:
                    Set(parent, key, index, Raw(HugeNumbers[m.Pick % HugeNumbers.Length]));
                    break;
                case 4:
                    Set(parent, key, index, Raw(Negatives[m.Pick % Negatives.Length]));
                    break;
                case 5: // huge or odd strings (the largest is beyond the 256 KB body limit)
                    int[] lengths = [300, 5_000, 70_000, 300_000];
                    var text = (m.Pick % 5) switch
                    {
                        0 => new string('x', lengths[m.Pick % lengths.Length]),
                        1 => "\u0000\u0007\u001f",
                        2 => "<script>alert(1)</script>",
                        3 => "\u202Eevil\uFFFD" + new string('Ω', 2_000),
                        _ => "'; DROP TABLE \"TrussMembers\"; --",
                    };
                    Set(parent, key, index, JsonValue.Create(text));
                    break;
                case 6: // deep nesting
                    int[] depths = [10, 40, 100, 2_000];
                    var depth = depths[m.Pick % depths.Length];
                    Set(parent, key, index, Raw(m.Pick % 2 == 0 ? new string('[', depth) + new string(']', depth) : string.Concat(Enumerable.Repeat("{\"a\":", depth)) + "1" + new string('}', depth)));
                    break;
                case 7: // an unknown field next to the known ones
                    var target = parent as JsonObject ?? (parent is JsonArray a && a.Count > 0 && a[0] is JsonObject first ? first : root as JsonObject);
                    if (target is not null)
                    {
                        target["unexpected" + (m.Pick % 10).ToString(CultureInfo.InvariantCulture)] = Raw(WrongTypes[m.Pick % WrongTypes.Length]);
                    }

                    break;
                case 8:
                    Set(parent, key, index, null);
                    break;
                case 9:
                    Set(parent, key, index, Raw(RawInvalid[m.Pick % RawInvalid.Length]));
                    break;
                case 10:
                    Set(parent, key, index, Raw("0"));
                    break;
                case 11: // an ordinary value of the same kind, changed: so some requests are valid and are saved
                    var current = parent is JsonObject po ? po[key!] : ((JsonArray)parent)[index];
                    if (current is JsonValue v && v.TryGetValue<double>(out var d))
                    {
                        Set(parent, key, index, JsonValue.Create(Math.Round(d * (0.5 + (m.Pick % 10) / 10.0), 3)));
                    }
                    else if (current is JsonValue sv && sv.TryGetValue<string>(out var s))
                    {
                        Set(parent, key, index, JsonValue.Create(s + (m.Pick % 10).ToString(CultureInfo.InvariantCulture)));
                    }

                    break;
                default: // 12: a duplicate of the whole array element, or a huge array
                    if (parent is JsonArray arr)
                    {
                        for (var i = 0; i < (m.Pick % 2 == 0 ? 1 : 3_000); i++)
                        {
                            arr.Add(arr[index]?.DeepClone());
                        }
                    }
                    else
                    {
                        Set(parent, key, index, Raw("[" + string.Join(",", Enumerable.Repeat("1", 20_000)) + "]"));
                    }

                    break;
            }
        }

        var json = root.ToJsonString();
        for (var i = 0; i < raws.Count; i++)
        {
            json = json.Replace($"\"RAW__{i}__\"", raws[i], StringComparison.Ordinal);
        }

        return json;
    }

    /// <summary>The body's top-level version set to the stored one, so mutations reach the service's own checks (and some saves succeed).</summary>
    private static void CurrentVersion(JsonNode root, string endpointName, IReadOnlyDictionary<string, string> ids, HttpClient client)
    {
        var path = endpointName switch
        {
            "UpdateProject" => $"{Prefix}/projects/{ids["projectId"]}",
            "SaveTrussSettings" => $"{Prefix}/trusses/{ids["trussId"]}",
            "UpdateMemberDesign" => $"{Prefix}/trusses/{ids["trussId"]}/members/{ids["memberId"]}",
            _ => null,
        };
        if (path is null || root is not JsonObject o || !o.ContainsKey("version"))
        {
            return;
        }

        using var response = client.GetAsync(path).GetAwaiter().GetResult();
        if (response.Headers.ETag?.Tag is { } tag && long.TryParse(tag.Trim('"'), CultureInfo.InvariantCulture, out var version))
        {
            o["version"] = version;
        }
    }

    private static void Set(JsonNode parent, string? key, int index, JsonNode? value)
    {
        if (parent is JsonObject o)
        {
            o[key!] = value;
        }
        else
        {
            ((JsonArray)parent)[index] = value;
        }
    }

    /// <summary>Every value of the tree with its parent (object property or array element), depth first.</summary>
    private static List<(JsonNode Parent, string? Key, int Index)> Slots(JsonNode root)
    {
        var slots = new List<(JsonNode, string?, int)>();
        void Walk(JsonNode? node)
        {
            switch (node)
            {
                case JsonObject o:
                    foreach (var (k, v) in o.ToList())
                    {
                        slots.Add((o, k, -1));
                        Walk(v);
                    }

                    break;
                case JsonArray a:
                    for (var i = 0; i < a.Count; i++)
                    {
                        slots.Add((a, null, i));
                        Walk(a[i]);
                    }

                    break;
            }
        }

        Walk(root);
        return slots;
    }

    /// <summary>Text a person typed (a truss may be named "Infinity"), and the echo of a refused value: the only places "NaN" or "Infinity" may appear as text.</summary>
    private static readonly HashSet<string> TextProperties = new(StringComparer.OrdinalIgnoreCase)
    {
        "name", "mark", "label", "notes", "note", "comment", "answer", "client", "reference", "location", "revision", "startNode", "endNode", "group",
        "designation", "sectionOverride", "sectionDesignation", "groupSection", "gradeName", "defaultGradeName", "standardCode", "message", "messages", "stage",
        "fileName", "summary", "description", "title", "detail", "value", "key", "id", "node", "start", "end", "oldValue", "newValue", "yours", "theirs",
    };

    /// <summary>
    /// The answer parses as JSON (so no bare NaN/Infinity token), every number in it is finite, and no "NaN"/"Infinity" string stands where a
    /// number belongs (anywhere but a text property such as a name, or the echo of the refused value).
    /// </summary>
    private static void AssertFinite(string text, string label)
    {
        if (string.IsNullOrEmpty(text))
        {
            return;
        }

        JsonElement root;
        try
        {
            root = JsonDocument.Parse(text).RootElement;
        }
        catch (JsonException)
        {
            Assert.Fail("the answer is not JSON: " + label);
            return;
        }

        void Walk(JsonElement e, string property)
        {
            switch (e.ValueKind)
            {
                case JsonValueKind.Object:
                    foreach (var p in e.EnumerateObject())
                    {
                        Walk(p.Value, p.Name);
                    }

                    break;
                case JsonValueKind.Array:
                    foreach (var i in e.EnumerateArray())
                    {
                        Walk(i, property);
                    }

                    break;
                case JsonValueKind.String:
                    var s = e.GetString()!.Trim();
                    var text = TextProperties.Contains(property) || property.EndsWith("Name", StringComparison.Ordinal) || property.EndsWith("By", StringComparison.Ordinal);
                    Assert.False(!text && NonFiniteWords.Contains(s, StringComparer.OrdinalIgnoreCase), $"the answer holds \"{s}\" in {property}: {label}");
                    break;
                case JsonValueKind.Number:
                    Assert.True(double.IsFinite(e.GetDouble()), label);
                    break;
            }
        }

        Walk(root, "$");
    }

    /// <summary>What a refused request must leave alone: every edited table's rows and versions, the snapshots and the audit log (apart from export entries written by background jobs).</summary>
    private Task<string> StoredStateAsync() => app.WithDbAsync(async db =>
    {
        var sb = new StringBuilder();
        async Task Add<T>(IQueryable<T> rows)
            where T : class, IVersioned
        {
            var versions = await rows.AsNoTracking().Select(r => r.Version).ToListAsync();
            sb.Append(typeof(T).Name).Append(' ').Append(versions.Count).Append('/').Append(versions.Sum()).Append(';');
        }

        await Add(db.Projects);
        await Add(db.Trusses);
        await Add(db.TrussNodes);
        await Add(db.TrussSupports);
        await Add(db.MemberGroups);
        await Add(db.TrussMembers);
        await Add(db.TrussActions);
        await Add(db.LoadCombinations);
        sb.Append("memberships ").Append(await db.ProjectMemberships.CountAsync()).Append(';');
        sb.Append("snapshots ").Append(await db.DesignSnapshots.CountAsync()).Append(';');
        sb.Append("audit ").Append(await db.AuditEntries.CountAsync(a => a.Action != "ExportProduced")).Append(';');
        return sb.ToString();
    });

    /// <summary>The demo ids, read once per app (a valid mutated body may rename the project later).</summary>
    private static readonly System.Runtime.CompilerServices.ConditionalWeakTable<SqliteApp, Task<Dictionary<string, string>>> KnownIds = new();

    private Task<Dictionary<string, string>> IdsAsync(HttpClient client) => KnownIds.GetValue(app, _ => ReadIdsAsync(client));

    private async Task<Dictionary<string, string>> ReadIdsAsync(HttpClient client)
    {
        var (projectId, trussId) = await Demo.DemoProjectAsync(client);
        var truss = await (await client.GetAsync($"{Prefix}/trusses/{trussId}")).JsonAsync();
        var memberId = truss.GetProperty("members").EnumerateArray().First().GetProperty("id").GetGuid();
        return new Dictionary<string, string>(StringComparer.Ordinal)
        {
            ["projectId"] = projectId.ToString(),
            ["trussId"] = trussId.ToString(),
            ["memberId"] = memberId.ToString(),
            ["checker"] = await app.UserIdAsync(Demo.Checker),
        };
    }

    private static string Fill(string pattern, IReadOnlyDictionary<string, string> ids) =>
        "/" + System.Text.RegularExpressions.Regex.Replace(pattern.TrimStart('/'), @"\{([^}:]+)(:[^}]+)?\}", m =>
            ids.TryGetValue(m.Groups[1].Value, out var id) ? id : throw new InvalidOperationException($"no id for {m.Value} in {pattern}"));

    private static string Shorten(string text) => text.Length <= 600 ? text : text[..600] + $"… ({text.Length} characters)";

    private static int StableHash(string text)
    {
        var h = 17;
        foreach (var c in text)
        {
            h = unchecked((h * 31) + c);
        }

        return h;
    }
}
