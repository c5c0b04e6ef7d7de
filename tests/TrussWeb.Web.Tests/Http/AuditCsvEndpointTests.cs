using System.Net;
using System.Text;
using System.Text.RegularExpressions;
using Microsoft.AspNetCore.Identity;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Hosting;

namespace TrussWeb.Web.Tests.Http;

/// <summary>GET /projects/{id}/audit.csv over the real app in demo mode: sign-in required, members only, the log as CSV.</summary>
public partial class AuditCsvEndpointTests : IClassFixture<DemoAppFactory>
{
    private readonly DemoAppFactory _factory;

    public AuditCsvEndpointTests(DemoAppFactory factory) => _factory = factory;

    private async Task<string> DemoProjectPathAsync()
    {
        var designer = DemoSeeder.Users.Single(u => u.Role == Roles.Designer);
        using var client = _factory.CreateBrowser();
        await SignInForm.PostAsync(client, designer.Email, designer.Password);
        var link = ProjectLink().Match(await client.GetStringAsync("/projects"));
        Assert.True(link.Success, "the demo project is not listed for its designer");
        return link.Value;
    }

    [Fact]
    public async Task An_anonymous_request_is_sent_to_the_sign_in_page()
    {
        var path = await DemoProjectPathAsync();
        using var client = _factory.CreateBrowser();

        using var response = await client.GetAsync(path + "/audit.csv");

        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        Assert.StartsWith("/account/signin", response.Headers.Location!.IsAbsoluteUri ? response.Headers.Location.AbsolutePath : response.Headers.Location.OriginalString, StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_user_who_is_not_a_member_gets_404_and_no_log()
    {
        var path = await DemoProjectPathAsync();
        const string email = "csv-outsider@example.test";
        const string password = "csv-outsider-2026";
        await _factory.CreateUserAsync(email, password, Roles.Designer);
        using var client = _factory.CreateBrowser();
        await SignInForm.PostAsync(client, email, password);

        using var response = await client.GetAsync(path + "/audit.csv");

        Assert.Equal(HttpStatusCode.NotFound, response.StatusCode);
        Assert.DoesNotContain("EntityType", await response.Content.ReadAsStringAsync(), StringComparison.Ordinal);
    }

    [Fact]
    public async Task A_member_downloads_the_log_with_a_review_step_in_it()
    {
        var path = await DemoProjectPathAsync();
        var projectId = Guid.Parse(path.Split('/')[^1]);
        await SubmitOneDemoMemberAsync(projectId, "CSV check please");
        var checker = DemoSeeder.Users.Single(u => u.Role == Roles.Checker);
        using var client = _factory.CreateBrowser();
        await SignInForm.PostAsync(client, checker.Email, checker.Password);

        using var response = await client.GetAsync(path + "/audit.csv");
        var bytes = await response.Content.ReadAsByteArrayAsync();
        var text = Encoding.UTF8.GetString(bytes);

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("text/csv", response.Content.Headers.ContentType!.MediaType);
        Assert.Equal("attachment", response.Content.Headers.ContentDisposition!.DispositionType);
        Assert.NotEqual(0xEF, bytes[0]); // UTF-8 without a byte order mark (docs/dev/review.md)
        Assert.StartsWith("Id,UtcTime,UserId,UserName,EntityType,EntityId,Action,Field,OldValue,NewValue,Comment,Fingerprint\r\n", text, StringComparison.Ordinal);
        Assert.Contains(",ReviewSubmit,ReviewState,NotSubmitted,AwaitingCheck,CSV check please,", text, StringComparison.Ordinal);
    }

    [Fact]
    public async Task The_endpoint_answers_only_reads()
    {
        var path = await DemoProjectPathAsync();
        var designer = DemoSeeder.Users.Single(u => u.Role == Roles.Designer);
        using var client = _factory.CreateBrowser();
        await SignInForm.PostAsync(client, designer.Email, designer.Password);

        foreach (var method in new[] { HttpMethod.Post, HttpMethod.Put, HttpMethod.Delete })
        {
            using var response = await client.SendAsync(new HttpRequestMessage(method, path + "/audit.csv"));
            Assert.True(response.StatusCode is HttpStatusCode.MethodNotAllowed or HttpStatusCode.NotFound or HttpStatusCode.BadRequest,
                $"{method} answered {(int)response.StatusCode}");
        }
    }

    private async Task SubmitOneDemoMemberAsync(Guid projectId, string note)
    {
        using var scope = _factory.Services.CreateScope();
        var users = scope.ServiceProvider.GetRequiredService<UserManager<AppUser>>();
        var designer = await users.FindByEmailAsync(DemoSeeder.Users.Single(u => u.Role == Roles.Designer).Email);
        var checker = await users.FindByEmailAsync(DemoSeeder.Users.Single(u => u.Role == Roles.Checker).Email);
        var services = ServiceCollectionExtensions.ServicesFor(scope.ServiceProvider, new FixedCaller(designer!.Id, designer.DisplayName, Roles.Designer));
        var project = await services.Projects.GetAsync(projectId);
        var truss = await services.Trusses.GetAsync(project.Value!.Trusses[0].TrussId);
        var member = truss.Value!.Members.OrderBy(m => m.Mark, StringComparer.Ordinal).First(m => m.ReviewState is "Draft" or "NotSubmitted");
        var submitted = await services.Review.SubmitAsync(member.Id, checker!.Id, note);
        Assert.True(submitted.IsOk, submitted.Message);
    }

    [GeneratedRegex("/projects/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}")]
    private static partial Regex ProjectLink();
}
