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

/// <summary>Form helpers for MudBlazor inputs (the data-testid lands on the input or on its wrapper).</summary>
public static class Inputs
{
    public static ILocator Field(IPage page, string testId) =>
        page.Locator($"input[data-testid={testId}], [data-testid={testId}] input, textarea[data-testid={testId}]").First;

    public static async Task FillAsync(IPage page, string testId, string value)
    {
        var field = Field(page, testId);
        await field.FillAsync(value);
        await field.BlurAsync();
    }

    /// <summary>Opens a MudSelect by its data-testid and picks the item whose text contains <paramref name="text"/>.</summary>
    public static async Task PickAsync(IPage page, string testId, string text)
    {
        await page.Locator($"[data-testid={testId}]").First.ClickAsync();
        var item = page.Locator(".mud-popover-open .mud-list-item", new PageLocatorOptions { HasText = text }).First;
        await item.ClickAsync();
        await page.WaitForFunctionAsync("() => !document.querySelector('.mud-popover-open .mud-list-item')");
    }
}
