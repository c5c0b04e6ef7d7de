using System.Net;
using System.Text.Json;
using Microsoft.AspNetCore.Routing;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Api.Tests.Support;

namespace TrussWeb.Api.Tests;

/// <summary>
/// Review actions over HTTP under the same rules as the pages: four eyes (the designer of record never
/// approves their own member, whatever a page shows), roles, and an audit log no endpoint can change.
/// </summary>
public sealed class ReviewContractTests(SqliteApp app) : IClassFixture<SqliteApp>
{
    private async Task<(HttpClient Designer, HttpClient Checker, HttpClient Lead, Guid ProjectId, Guid TrussId, string CheckerId)> SetUpAsync()
    {
        var designer = app.WithToken((await app.CreateTokenAsync(Demo.Designer)).Token);
        var checker = app.WithToken((await app.CreateTokenAsync(Demo.Checker)).Token);
        var lead = app.WithToken((await app.CreateTokenAsync(Demo.Lead)).Token);
        var (projectId, trussId) = await Demo.DemoProjectAsync(designer);
        var people = await (await designer.GetAsync($"/api/v1/projects/{projectId}/people")).JsonAsync();
        var checkerId = people.EnumerateArray().Single(p => p.GetProperty("email").GetString() == Demo.Checker).GetProperty("userId").GetString()!;
        return (designer, checker, lead, projectId, trussId, checkerId);
    }

    private static async Task<Guid> MemberAsync(HttpClient client, Guid trussId, int index)
    {
        var review = await (await client.GetAsync($"/api/v1/trusses/{trussId}/review")).JsonAsync();
        return review.EnumerateArray().Where(m => m.GetProperty("state").GetString() == "NotSubmitted").Skip(index).First().GetProperty("memberId").GetGuid();
    }

    [Fact]
    public async Task A_designer_cannot_approve_their_own_member_over_http_and_the_checker_can()
    {
        var (designer, checker, _, _, trussId, checkerId) = await SetUpAsync();
        var memberId = await MemberAsync(designer, trussId, 0);
        var submit = await designer.PostJsonAsync($"/api/v1/members/{memberId}/review/submit", new { checkerUserId = checkerId, note = "ready" });
        Assert.True(submit.StatusCode == HttpStatusCode.OK, await submit.Content.ReadAsStringAsync());
        Assert.Equal("AwaitingCheck", (await submit.JsonAsync()).GetProperty("state").GetString());

        await (await designer.PostJsonAsync($"/api/v1/members/{memberId}/review/approve", new { comment = "mine" })).ProblemAsync(403);
        var state = await (await designer.GetAsync($"/api/v1/members/{memberId}/review")).JsonAsync();
        Assert.Equal("AwaitingCheck", state.GetProperty("state").GetString());

        var approve = await checker.PostJsonAsync($"/api/v1/members/{memberId}/review/approve", new { comment = "checked" });
        Assert.True(approve.StatusCode == HttpStatusCode.OK, await approve.Content.ReadAsStringAsync());
        Assert.Equal("Approved", (await approve.JsonAsync()).GetProperty("state").GetString());
    }

    [Fact]
    public async Task A_lead_who_is_designer_of_record_gets_403_from_the_four_eyes_rule()
    {
        var (_, _, lead, _, trussId, checkerId) = await SetUpAsync();
        var memberId = await MemberAsync(lead, trussId, 1);
        Assert.Equal(HttpStatusCode.OK, (await lead.PostJsonAsync($"/api/v1/members/{memberId}/review/submit", new { checkerUserId = checkerId })).StatusCode);
        // The lead's project role passes the ProjectCheck row of the permission table; the four-eyes rule refuses.
        var problem = await (await lead.PostJsonAsync($"/api/v1/members/{memberId}/review/approve", new { })).ProblemAsync(403);
        Assert.Contains("designer of record", problem.GetProperty("detail").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task Return_without_a_comment_is_a_400_naming_the_comment_and_resubmit_answers_it()
    {
        var (designer, checker, _, _, trussId, checkerId) = await SetUpAsync();
        var memberId = await MemberAsync(designer, trussId, 2);
        await designer.PostJsonAsync($"/api/v1/members/{memberId}/review/submit", new { checkerUserId = checkerId });
        var problem = await (await checker.PostJsonAsync($"/api/v1/members/{memberId}/review/return", new { })).ProblemAsync(400);
        Assert.Contains("comment", problem.Fields());
        Assert.Equal(HttpStatusCode.OK, (await checker.PostJsonAsync($"/api/v1/members/{memberId}/review/return", new { comment = "check Ly" })).StatusCode);
        var resubmit = await designer.PostJsonAsync($"/api/v1/members/{memberId}/review/resubmit", new { answer = "Ly is the purlin spacing" });
        Assert.Equal("AwaitingCheck", (await resubmit.JsonAsync()).GetProperty("state").GetString());
        var queue = await (await checker.GetAsync("/api/v1/review/queue")).JsonAsync();
        Assert.Contains(queue.EnumerateArray(), q => q.GetProperty("memberId").GetGuid() == memberId);
    }

    [Fact]
    public async Task Roll_up_audit_and_audit_csv_read_the_project()
    {
        var (designer, _, _, projectId, _, _) = await SetUpAsync();
        var rollUp = await (await designer.GetAsync($"/api/v1/projects/{projectId}/review/roll-up")).JsonAsync();
        Assert.True(rollUp.GetProperty("totals").EnumerateObject().Count() >= 5);
        var audit = await (await designer.GetAsync($"/api/v1/projects/{projectId}/audit")).JsonAsync();
        Assert.True(audit.GetArrayLength() > 0);
        var csv = await designer.GetAsync($"/api/v1/projects/{projectId}/audit.csv");
        Assert.Equal("text/csv", csv.Content.Headers.ContentType?.MediaType);
        var text = await csv.Content.ReadAsStringAsync();
        Assert.Contains("\r\n", text, StringComparison.Ordinal);
    }

    [Fact]
    public async Task No_endpoint_changes_or_removes_audit_entries()
    {
        var (designer, _, lead, projectId, _, _) = await SetUpAsync();
        var routes = app.Services.GetRequiredService<EndpointDataSource>().Endpoints.OfType<RouteEndpoint>()
            .Where(e => (e.RoutePattern.RawText ?? string.Empty).Contains("audit", StringComparison.OrdinalIgnoreCase))
            // Razor component routes (the read-only audit page) accept POST for forms; the page has none, and a
            // POST without an antiforgery token is refused before any component runs (Web.Tests security tests).
            .Where(e => e.Metadata.GetMetadata<Microsoft.AspNetCore.Components.Endpoints.ComponentTypeMetadata>() is null)
            .ToList();
        Assert.NotEmpty(routes);
        foreach (var route in routes)
        {
            var methods = route.Metadata.GetMetadata<HttpMethodMetadata>()?.HttpMethods ?? [];
            Assert.Equal(["GET"], methods);
        }

        var before = await app.WithDbAsync(db => db.AuditEntries.CountAsync());
        var firstId = (await (await lead.GetAsync($"/api/v1/projects/{projectId}/audit")).JsonAsync())[0].GetProperty("id").GetInt64();
        foreach (var method in new[] { HttpMethod.Put, HttpMethod.Delete, HttpMethod.Patch, HttpMethod.Post })
        {
            foreach (var url in new[] { $"/api/v1/projects/{projectId}/audit", $"/api/v1/projects/{projectId}/audit/{firstId}", $"/api/v1/projects/{projectId}/audit.csv" })
            {
                var request = new HttpRequestMessage(method, url) { Content = new StringContent("""{"comment":"rewritten"}""", System.Text.Encoding.UTF8, "application/json") };
                var response = await lead.SendAsync(request);
                Assert.True((int)response.StatusCode is 404 or 405, $"{method} {url} answered {(int)response.StatusCode}");
            }
        }

        // Designer saves nothing; the entries are as they were (only new reads, which write nothing).
        Assert.Equal(before, await app.WithDbAsync(db => db.AuditEntries.CountAsync()));
        var first = await app.WithDbAsync(db => db.AuditEntries.AsNoTracking().SingleAsync(a => a.Id == firstId));
        Assert.NotEqual("rewritten", first.Comment);
        _ = designer;
    }
}
