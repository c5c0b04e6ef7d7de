using System.Net;
using System.Text.RegularExpressions;
using TrussWeb.Data;
using TrussWeb.Services.Hosting;

namespace TrussWeb.Web.Tests.Http;

public partial class TrussPageAccessTests : IClassFixture<DemoAppFactory>
{
    private readonly DemoAppFactory _factory;

    public TrussPageAccessTests(DemoAppFactory factory) => _factory = factory;

    private async Task<(HttpClient Client, string TrussPath)> DesignerWithDemoTrussAsync()
    {
        var designer = DemoSeeder.Users.Single(u => u.Role == Roles.Designer);
        var client = _factory.CreateBrowser();
        await SignInForm.PostAsync(client, designer.Email, designer.Password);
        var projects = await client.GetStringAsync("/projects");
        var link = TrussLink().Match(projects);
        Assert.True(link.Success, "the demo project lists no truss for its designer");
        return (client, link.Value);
    }

    [Fact]
    public async Task Designer_of_the_demo_project_opens_its_truss_page()
    {
        var (client, path) = await DesignerWithDemoTrussAsync();
        using (client)
        {
            using var response = await client.GetAsync(path);
            var html = await response.Content.ReadAsStringAsync();

            Assert.Equal(HttpStatusCode.OK, response.StatusCode);
            Assert.Contains(DemoSeeder.TrussName, html);
            Assert.Contains("data-testid=\"member-results\"", html);
            Assert.Contains("data-testid=\"save-nodes\"", html);
        }
    }

    [Fact]
    public async Task A_user_who_is_not_a_member_gets_the_not_found_panel()
    {
        var (designer, path) = await DesignerWithDemoTrussAsync();
        designer.Dispose();
        const string email = "outsider@example.test";
        const string password = "outsider-pass-2026";
        await _factory.CreateUserAsync(email, password, Roles.Designer);
        using var client = _factory.CreateBrowser();
        await SignInForm.PostAsync(client, email, password);

        using var response = await client.GetAsync(path);
        var html = await response.Content.ReadAsStringAsync();

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Contains("data-testid=\"notfound-panel\"", html);
        Assert.DoesNotContain(DemoSeeder.TrussName, html);
    }

    [Fact]
    public async Task Checker_sees_the_truss_read_only()
    {
        var (designer, path) = await DesignerWithDemoTrussAsync();
        designer.Dispose();
        var checker = DemoSeeder.Users.Single(u => u.Role == Roles.Checker);
        using var client = _factory.CreateBrowser();
        await SignInForm.PostAsync(client, checker.Email, checker.Password);

        var html = await client.GetStringAsync(path);

        Assert.Contains("data-testid=\"read-only\"", html);
        Assert.DoesNotContain("data-testid=\"save-nodes\"", html);
        Assert.DoesNotContain("data-testid=\"sizing-run\"", html);
    }

    [GeneratedRegex("/trusses/[0-9a-f-]{36}")]
    private static partial Regex TrussLink();
}
