using System.Net;
using System.Text.Json;
using Microsoft.AspNetCore.Routing;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Api.Tests.Support;

namespace TrussWeb.Api.Tests;

/// <summary>The OpenAPI document: served anonymously, every API route in it, every referenced schema present, bearer security, example bodies.</summary>
public sealed class OpenApiTests(SqliteApp app) : IClassFixture<SqliteApp>
{
    private async Task<JsonElement> DocumentAsync()
    {
        var response = await app.Anonymous().GetAsync("/openapi/v1.json");
        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        return await response.JsonAsync();
    }

    [Fact]
    public async Task Every_api_route_and_method_is_in_the_document_with_bearer_security()
    {
        var doc = await DocumentAsync();
        Assert.StartsWith("3.", doc.GetProperty("openapi").GetString(), StringComparison.Ordinal);
        var scheme = doc.GetProperty("components").GetProperty("securitySchemes").GetProperty("bearer");
        Assert.Equal("http", scheme.GetProperty("type").GetString());
        Assert.Equal("bearer", scheme.GetProperty("scheme").GetString());
        var paths = doc.GetProperty("paths");
        var routes = app.Services.GetRequiredService<EndpointDataSource>().Endpoints.OfType<RouteEndpoint>()
            .Where(e => (e.RoutePattern.RawText ?? string.Empty).TrimStart('/').StartsWith("api/", StringComparison.Ordinal)).ToList();
        foreach (var route in routes)
        {
            var path = "/" + System.Text.RegularExpressions.Regex.Replace(route.RoutePattern.RawText!.Trim('/'), @"\{([^}:]+)(:[^}]+)?\}", "{$1}");
            Assert.True(paths.TryGetProperty(path, out var item), $"{path} is not in the document");
            foreach (var method in route.Metadata.GetMetadata<HttpMethodMetadata>()!.HttpMethods)
            {
                Assert.True(item.TryGetProperty(method.ToLowerInvariant(), out var operation), $"{method} {path} is not in the document");
                Assert.Contains(operation.GetProperty("security").EnumerateArray(), s => s.TryGetProperty("bearer", out _));
                Assert.True(operation.TryGetProperty("operationId", out _), $"{method} {path} has no operationId");
                if (operation.TryGetProperty("requestBody", out var body))
                {
                    var media = body.GetProperty("content").GetProperty("application/json");
                    Assert.True(media.TryGetProperty("schema", out _), $"{method} {path}: request without a schema");
                    Assert.True(media.TryGetProperty("example", out _), $"{method} {path}: request without an example");
                }
            }
        }

        Assert.DoesNotContain(paths.EnumerateObject(), p => !p.Name.StartsWith("/api/", StringComparison.Ordinal));
    }

    [Fact]
    public async Task Every_referenced_schema_is_present()
    {
        var doc = await DocumentAsync();
        var schemas = doc.GetProperty("components").GetProperty("schemas");
        var refs = System.Text.RegularExpressions.Regex.Matches(doc.GetRawText(), "\"\\$ref\":\\s*\"#/components/schemas/([^\"]+)\"")
            .Select(m => m.Groups[1].Value).Distinct().ToList();
        Assert.True(refs.Count > 20);
        foreach (var name in refs)
        {
            Assert.True(schemas.TryGetProperty(name, out _), $"schema {name} is referenced but missing");
        }

        foreach (var name in new[] { "MemberCheckRequest", "MemberCheckResponse", "TrussAnalysisRequest", "ProjectDetail", "TrussDetail", "MemberDesignDetail", "MemberReviewView", "ProblemDetails" })
        {
            Assert.True(schemas.TryGetProperty(name, out _), $"schema {name} missing");
        }

        var required = schemas.GetProperty("MemberCheckRequest").GetProperty("required").EnumerateArray().Select(r => r.GetString()).ToList();
        Assert.Contains("forces", required);
        Assert.DoesNotContain("mark", required);
    }

    [Fact]
    public async Task The_example_member_check_body_is_accepted_by_the_api()
    {
        var doc = await DocumentAsync();
        var example = doc.GetProperty("paths").GetProperty("/api/v1/calculations/member-check").GetProperty("post")
            .GetProperty("requestBody").GetProperty("content").GetProperty("application/json").GetProperty("example").GetRawText();
        var client = app.WithToken((await app.CreateTokenAsync(Demo.Designer)).Token);
        Assert.Equal(HttpStatusCode.OK, (await client.PostRawAsync("/api/v1/calculations/member-check", example)).StatusCode);
    }
}
