using Microsoft.Playwright;
using TrussWeb.E2E.Support;

namespace TrussWeb.E2E;

[Collection(E2ECollection.Name)]
public sealed class SignInJourneyTests(DemoApp app, BrowserSession browser)
{
    [Fact]
    public async Task A_designer_signs_in_and_sees_the_demo_project_and_the_caution()
    {
        var shots = new Screenshots("sign-in");
        await using var context = await browser.NewContextAsync();
        var page = await Pages.SignInAsync(context, app, app.Designer);
        await page.GotoAsync(app.Url("/projects"));
        await page.WaitForSelectorAsync("[data-testid=project-link]");
        await Pages.SettleAsync(page);
        await shots.TakeAsync(page, "projects");

        var body = await page.InnerTextAsync("body");
        Assert.Contains("competent engineer", body, StringComparison.OrdinalIgnoreCase);
        Assert.True(await page.Locator("[data-testid=project-link]").CountAsync() >= 1, "the demo project is listed");
    }

    [Fact]
    public async Task A_wrong_password_keeps_the_visitor_on_the_sign_in_page_with_a_message()
    {
        var shots = new Screenshots("sign-in-refused");
        await using var context = await browser.NewContextAsync();
        var page = await context.NewPageAsync();
        page.SetDefaultTimeout(Pages.Timeout);
        await page.GotoAsync(app.Url("/account/signin"));
        await page.FillAsync("#signin-email", app.Designer.Email);
        await page.FillAsync("#signin-password", app.Designer.Password + "-wrong");
        await page.ClickAsync("[data-testid=signin-submit]");
        await page.WaitForLoadStateAsync(LoadState.NetworkIdle);
        await shots.TakeAsync(page, "refused");

        Assert.StartsWith("/account/signin", new Uri(page.Url).AbsolutePath, StringComparison.Ordinal);
        Assert.Contains("password", await page.InnerTextAsync("body"), StringComparison.OrdinalIgnoreCase);
    }
}
