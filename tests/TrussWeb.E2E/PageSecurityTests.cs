using System.Text.RegularExpressions;
using Microsoft.Playwright;
using TrussWeb.E2E.Support;

namespace TrussWeb.E2E;

/// <summary>
/// The pages work under the app's content security policy: every main page visited in the real browser, with
/// the interactive circuit up and the Plotly elevation drawn, and not one CSP violation, console error, page
/// error or dialog. HTML typed into a project name shows as text.
/// </summary>
[Collection(E2ECollection.Name)]
public sealed class PageSecurityTests(DemoApp app, BrowserSession browser)
{
    [Fact]
    public async Task Every_main_page_works_under_the_content_security_policy()
    {
        var shots = new Screenshots("csp-pages");
        await using var context = await browser.NewContextAsync();
        var problems = await BrowserProblems.WatchAsync(context);
        var page = await context.NewPageAsync();
        page.SetDefaultTimeout(Pages.Timeout);

        var home = await page.GotoAsync(app.Url("/"));
        Assert.NotNull(home);
        var csp = await home.HeaderValueAsync("content-security-policy");
        Assert.False(string.IsNullOrEmpty(csp), "the home page has a content security policy");
        Assert.Contains("frame-ancestors 'none'", csp);
        await Pages.SettleAsync(page);
        await shots.TakeAsync(page, "home");

        page = await Pages.SignInAsync(context, app, app.Designer);
        await page.GotoAsync(app.Url("/projects"));
        await page.WaitForSelectorAsync("[data-testid=project-link]");
        await Pages.SettleAsync(page);
        await shots.TakeAsync(page, "projects");

        await page.ClickAsync("[data-testid=project-link]");
        await page.WaitForURLAsync(new Regex("/projects/[0-9a-f-]{36}"));
        await page.WaitForSelectorAsync("[data-testid=project-title]");
        await Pages.SettleAsync(page);
        await shots.TakeAsync(page, "project");

        await page.ClickAsync("[data-testid=truss-open]");
        await page.WaitForURLAsync(new Regex("/trusses/[0-9a-f-]{36}"));
        await page.WaitForFunctionAsync("() => document.querySelectorAll('[data-testid=truss-elevation] .main-svg .scatterlayer path').length > 0");
        await Pages.SettleAsync(page);
        await shots.TakeAsync(page, "truss");

        await page.Locator("[data-testid=member-link]").First.ClickAsync();
        await page.WaitForURLAsync(new Regex("/members/[0-9a-f-]{36}"));
        await page.WaitForSelectorAsync("[data-testid=member-utilization]", new PageWaitForSelectorOptions { Timeout = 60_000 });
        await Pages.SettleAsync(page);
        await shots.TakeAsync(page, "member");

        await page.GotoAsync(app.Url("/sections"));
        await page.WaitForSelectorAsync("table tbody tr");
        await Pages.SettleAsync(page);
        await shots.TakeAsync(page, "sections");
        problems.AssertNone("designer's pages");

        await using var adminContext = await browser.NewContextAsync();
        var adminProblems = await BrowserProblems.WatchAsync(adminContext);
        var admin = await Pages.SignInAsync(adminContext, app, app.Users["Administrator"]);
        await admin.GotoAsync(app.Url("/admin"));
        await admin.WaitForSelectorAsync("[data-testid=admin-tabs] table tbody tr");
        await Pages.SettleAsync(admin);
        await shots.TakeAsync(admin, "admin");
        adminProblems.AssertNone("admin page");
    }

    [Fact]
    public async Task A_project_named_with_markup_shows_the_markup_as_text()
    {
        const string name = "<img src=x onerror=alert(1)> Ridge <b>shed</b>";
        var shots = new Screenshots("markup-as-text");
        await using var context = await browser.NewContextAsync();
        var problems = await BrowserProblems.WatchAsync(context);
        var page = await Pages.SignInAsync(context, app, app.Lead);
        await page.GotoAsync(app.Url("/projects"));
        await Pages.SettleAsync(page);
        await page.ClickAsync("[data-testid=new-project]");
        await Inputs.FillAsync(page, "project-name", name);
        await page.ClickAsync("[data-testid=create-project]");
        await page.WaitForURLAsync(new Regex("/projects/[0-9a-f-]{36}"));
        await page.WaitForSelectorAsync("[data-testid=project-title]");
        await Pages.SettleAsync(page);
        await shots.TakeAsync(page, "project");

        Assert.Equal(name, (await page.InnerTextAsync("[data-testid=project-title]")).Trim());
        Assert.Equal(0, await page.Locator("[data-testid=project-title] img, [data-testid=project-title] b, img[src=x]").CountAsync());

        await page.GotoAsync(app.Url("/projects"));
        await page.Locator("[data-testid=project-link]", new PageLocatorOptions { HasText = "Ridge" }).WaitForAsync();
        await Pages.SettleAsync(page);
        await shots.TakeAsync(page, "projects");
        Assert.Contains(name, await page.InnerTextAsync("[data-testid=projects-table]"));
        Assert.Equal(0, await page.Locator("img[src=x], [data-testid=projects-table] b").CountAsync());
        problems.AssertNone("pages showing the markup name");
    }
}
