using System.Net.Http.Json;
using System.Text.Json;
using TrussWeb.Services.Hosting;

namespace TrussWeb.Api.Tests.Support;

/// <summary>The demo sign-ins (from the demo seeder) and JSON helpers.</summary>
public static class Demo
{
    public static string Designer => DemoSeeder.Users.Single(u => u.Role == "Designer").Email;

    public static string Checker => DemoSeeder.Users.Single(u => u.Role == "Checker").Email;

    public static string Lead => DemoSeeder.Users.Single(u => u.Role == "ProjectLead").Email;

    public static string Admin => DemoSeeder.Users.Single(u => u.Role == "Administrator").Email;

    public static async Task<JsonElement> JsonAsync(this HttpResponseMessage response)
    {
        var text = await response.Content.ReadAsStringAsync();
        return JsonDocument.Parse(text).RootElement.Clone();
    }

    public static Task<HttpResponseMessage> PostRawAsync(this HttpClient client, string url, string json) =>
        client.PostAsync(url, new StringContent(json, System.Text.Encoding.UTF8, "application/json"));

    public static Task<HttpResponseMessage> PutRawAsync(this HttpClient client, string url, string json) =>
        client.PutAsync(url, new StringContent(json, System.Text.Encoding.UTF8, "application/json"));

    public static Task<HttpResponseMessage> PostJsonAsync<T>(this HttpClient client, string url, T body) => client.PostAsJsonAsync(url, body);

    /// <summary>The demo project's id and its first truss's id, read through the API.</summary>
    public static async Task<(Guid ProjectId, Guid TrussId)> DemoProjectAsync(HttpClient client)
    {
        var list = await (await client.GetAsync("/api/v1/projects")).JsonAsync();
        var project = list.EnumerateArray().Single(p => p.GetProperty("name").GetString() == DemoSeeder.ProjectName);
        var truss = project.GetProperty("trusses").EnumerateArray().First();
        return (project.GetProperty("id").GetGuid(), truss.GetProperty("trussId").GetGuid());
    }

    /// <summary>Asserts an RFC 9457 problem with this status and returns it.</summary>
    public static async Task<JsonElement> ProblemAsync(this HttpResponseMessage response, int status)
    {
        var text = await response.Content.ReadAsStringAsync();
        Assert.True((int)response.StatusCode == status, $"expected {status}, got {(int)response.StatusCode}: {text}");
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        Assert.DoesNotContain("   at ", text, StringComparison.Ordinal);
        var problem = JsonDocument.Parse(text).RootElement.Clone();
        Assert.Equal(status, problem.GetProperty("status").GetInt32());
        Assert.False(string.IsNullOrWhiteSpace(problem.GetProperty("title").GetString()));
        Assert.False(string.IsNullOrWhiteSpace(problem.GetProperty("detail").GetString()));
        return problem;
    }

    /// <summary>The fields named in a problem's errors.</summary>
    public static IReadOnlyList<string> Fields(this JsonElement problem) =>
        problem.TryGetProperty("errors", out var errors) ? errors.EnumerateArray().Select(e => e.GetProperty("field").GetString()!).ToList() : [];
}
