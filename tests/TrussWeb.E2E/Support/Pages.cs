using Microsoft.Playwright;

namespace TrussWeb.E2E.Support;

/// <summary>Steps every journey uses: sign in, wait for an interactive page to settle.</summary>
public static class Pages
{
    public const float Timeout = 30_000;

    /// <summary>Signs in through the sign-in form in a new page of <paramref name="context"/>.</summary>
    public static async Task<IPage> SignInAsync(IBrowserContext context, DemoApp app, DemoUser user)
    {
        var page = await context.NewPageAsync();
        page.SetDefaultTimeout(Timeout);
        await page.GotoAsync(app.Url("/account/signin"));
        await page.FillAsync("#signin-email", user.Email);
        await page.FillAsync("#signin-password", user.Password);
        await page.ClickAsync("[data-testid=signin-submit]");
        await page.WaitForURLAsync(url => !new Uri(url).AbsolutePath.StartsWith("/account/signin", StringComparison.Ordinal));
        await SettleAsync(page);
        return page;
    }

    /// <summary>Network quiet (circuit up, first render done) and no progress bar or loading marker left.</summary>
    public static async Task SettleAsync(IPage page)
    {
        await page.WaitForLoadStateAsync(LoadState.NetworkIdle);
        await page.WaitForFunctionAsync("() => !document.querySelector('.mud-progress-linear-indeterminate, [data-testid$=\"-loading\"]')");
    }
}
