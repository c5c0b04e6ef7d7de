using System.Net;

namespace TrussWeb.Web.Tests.Http;

public class SignInRequiredTests : IClassFixture<DemoAppFactory>
{
    /// <summary>Pages an anonymous user may open; every other route must send them to the sign-in page.</summary>
    private static readonly HashSet<string> Anonymous = new(StringComparer.OrdinalIgnoreCase)
    {
        "/", "/sections", "/account/signin", "/account/denied", "/not-found", "/Error",
    };

    private readonly DemoAppFactory _factory;

    public SignInRequiredTests(DemoAppFactory factory) => _factory = factory;

    public static TheoryData<string> ProtectedRoutes()
    {
        var data = new TheoryData<string>();
        foreach (var t in RouteCatalog.Templates().Where(t => !Anonymous.Contains(t)))
        {
            data.Add(t);
        }

        return data;
    }

    [Fact]
    public void The_app_has_the_pages_this_suite_protects()
    {
        var templates = RouteCatalog.Templates();

        Assert.Contains("/projects", templates);
        Assert.Contains("/projects/{ProjectId:guid}", templates);
        Assert.Contains("/trusses/{TrussId:guid}", templates);
        Assert.Contains("/account/signin", templates);
    }

    [Theory]
    [MemberData(nameof(ProtectedRoutes))]
    public async Task Anonymous_user_is_sent_to_the_sign_in_page(string template)
    {
        using var client = _factory.CreateBrowser();
        var path = RouteCatalog.Sample(template);

        using var response = await client.GetAsync(path);

        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        var location = response.Headers.Location!.ToString();
        Assert.Contains("/account/signin?returnUrl=", location, StringComparison.Ordinal);
        Assert.Contains(Uri.EscapeDataString(path), location, StringComparison.OrdinalIgnoreCase);
    }

    [Theory]
    [InlineData("/")]
    [InlineData("/sections")]
    [InlineData("/account/signin")]
    [InlineData("/account/denied")]
    public async Task Open_pages_answer_anonymous_users_with_the_caution_footer(string path)
    {
        using var client = _factory.CreateBrowser();

        using var response = await client.GetAsync(path);
        var html = await response.Content.ReadAsStringAsync();

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Contains(WebUtility.HtmlEncode(TrussWeb.Core.Caution.Text), html);
    }

    [Fact]
    public async Task Start_page_offers_anonymous_users_the_sign_in_link()
    {
        using var client = _factory.CreateBrowser();

        var html = await client.GetStringAsync("/");

        Assert.Contains("data-testid=\"home-signin\"", html);
        Assert.DoesNotContain("data-testid=\"signed-in-user\"", html);
    }
}
