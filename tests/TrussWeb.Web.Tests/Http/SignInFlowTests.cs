using System.Net;
using System.Text.RegularExpressions;
using TrussWeb.Data;
using TrussWeb.Services.Hosting;

namespace TrussWeb.Web.Tests.Http;

public partial class SignInFlowTests : IClassFixture<DemoAppFactory>
{
    private readonly DemoAppFactory _factory;

    public SignInFlowTests(DemoAppFactory factory) => _factory = factory;

    public static TheoryData<string> DemoEmails()
    {
        var data = new TheoryData<string>();
        foreach (var u in DemoSeeder.Users)
        {
            data.Add(u.Email);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(DemoEmails))]
    public async Task Each_demo_role_signs_in_through_the_form_and_sees_name_and_role(string email)
    {
        var demo = DemoSeeder.Users.Single(u => u.Email == email);
        using var client = _factory.CreateBrowser();

        using var response = await SignInForm.PostAsync(client, demo.Email, demo.Password, "/projects");
        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        Assert.Equal(new Uri(client.BaseAddress!, "/projects"), new Uri(client.BaseAddress!, response.Headers.Location!));

        var projects = await client.GetAsync("/projects");
        var html = await projects.Content.ReadAsStringAsync();
        Assert.Equal(HttpStatusCode.OK, projects.StatusCode);
        Assert.Contains(demo.DisplayName, html);
        Assert.Contains(demo.Role, html);
        Assert.Contains("data-testid=\"signout\"", html);
    }

    [Theory]
    [InlineData("https://elsewhere.example/steal")]
    [InlineData("//elsewhere.example/steal")]
    [InlineData("/\\elsewhere.example")]
    public async Task A_return_url_outside_the_site_is_not_followed(string returnUrl)
    {
        var demo = DemoSeeder.Users[0];
        using var client = _factory.CreateBrowser();

        using var response = await SignInForm.PostAsync(client, demo.Email, demo.Password, returnUrl);

        Assert.Equal(HttpStatusCode.Redirect, response.StatusCode);
        Assert.Equal(new Uri(client.BaseAddress!, "/"), new Uri(client.BaseAddress!, response.Headers.Location!));
    }

    [Fact]
    public async Task Wrong_password_says_so_and_stays_signed_out()
    {
        var demo = DemoSeeder.Users.Single(u => u.Role == Roles.Checker);
        using var client = _factory.CreateBrowser();

        using var response = await SignInForm.PostAsync(client, demo.Email, demo.Password + "-wrong");
        var html = await response.Content.ReadAsStringAsync();

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Contains("The e-mail or the password is wrong.", html);
        var projects = await client.GetAsync("/projects");
        Assert.Equal(HttpStatusCode.Redirect, projects.StatusCode);
    }

    [Fact]
    public async Task Sign_out_form_ends_the_session()
    {
        var demo = DemoSeeder.Users.Single(u => u.Role == Roles.ProjectLead);
        using var client = _factory.CreateBrowser();
        await SignInForm.PostAsync(client, demo.Email, demo.Password);
        var home = await client.GetStringAsync("/");

        using var signOut = await client.PostAsync("/account/signout",
            new FormUrlEncodedContent(new Dictionary<string, string> { ["__RequestVerificationToken"] = SignInForm.TokenOf(home) }));

        Assert.Equal(HttpStatusCode.Redirect, signOut.StatusCode);
        using var after = await client.GetAsync("/projects");
        Assert.Equal(HttpStatusCode.Redirect, after.StatusCode);
    }

    [Fact]
    public async Task Sign_out_without_the_antiforgery_token_is_refused()
    {
        var demo = DemoSeeder.Users.Single(u => u.Role == Roles.ProjectLead);
        using var client = _factory.CreateBrowser();
        await SignInForm.PostAsync(client, demo.Email, demo.Password);

        using var signOut = await client.PostAsync("/account/signout", new FormUrlEncodedContent(new Dictionary<string, string>()));

        Assert.Equal(HttpStatusCode.BadRequest, signOut.StatusCode);
        using var still = await client.GetAsync("/projects");
        Assert.Equal(HttpStatusCode.OK, still.StatusCode);
    }

    [Fact]
    public async Task Sixth_attempt_with_the_right_password_is_refused_after_five_failures()
    {
        const string email = "lockout-test@example.test";
        const string password = "lockout-test-2026";
        await _factory.CreateUserAsync(email, password, Roles.Designer);
        using var client = _factory.CreateBrowser();

        for (var attempt = 1; attempt <= ServiceCollectionExtensions.MaxFailedAccessAttempts; attempt++)
        {
            using var failed = await SignInForm.PostAsync(client, email, "not-the-password-1");
            Assert.Equal(HttpStatusCode.OK, failed.StatusCode);
        }

        using var sixth = await SignInForm.PostAsync(client, email, password);
        var html = await sixth.Content.ReadAsStringAsync();

        Assert.Equal(HttpStatusCode.OK, sixth.StatusCode);
        Assert.Matches(LockedUntil(), html);
        using var projects = await client.GetAsync("/projects");
        Assert.Equal(HttpStatusCode.Redirect, projects.StatusCode);
    }

    [GeneratedRegex(@"locked after too many wrong passwords, until \d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC")]
    private static partial Regex LockedUntil();
}
