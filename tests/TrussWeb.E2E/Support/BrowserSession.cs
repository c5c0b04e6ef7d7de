using Microsoft.Playwright;

namespace TrussWeb.E2E.Support;

/// <summary>
/// One headless Chromium for the whole test collection: the system browser (<c>/usr/bin/chromium</c>, or the
/// path in TRUSSWEB_CHROMIUM), so Playwright downloads nothing.
/// </summary>
public sealed class BrowserSession : IAsyncLifetime
{
    private IPlaywright? playwright;

    public IBrowser Browser { get; private set; } = null!;

    public static string ChromiumPath =>
        Environment.GetEnvironmentVariable("TRUSSWEB_CHROMIUM") is { Length: > 0 } path ? path : "/usr/bin/chromium";

    public async Task InitializeAsync()
    {
        if (!File.Exists(ChromiumPath))
        {
            throw new InvalidOperationException($"Chromium not found at {ChromiumPath}: install the Debian package 'chromium' (scripts/test.sh does) or set TRUSSWEB_CHROMIUM");
        }

        playwright = await Playwright.CreateAsync();
        Browser = await playwright.Chromium.LaunchAsync(new BrowserTypeLaunchOptions
        {
            ExecutablePath = ChromiumPath,
            Headless = true,
            Args = ["--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
        });
    }

    public async Task DisposeAsync()
    {
        if (Browser is not null)
        {
            await Browser.CloseAsync();
        }

        playwright?.Dispose();
    }

    /// <summary>A fresh context (own cookies) with a desktop viewport; downloads accepted.</summary>
    public Task<IBrowserContext> NewContextAsync() => Browser.NewContextAsync(new BrowserNewContextOptions
    {
        ViewportSize = new ViewportSize { Width = 1400, Height = 900 },
        AcceptDownloads = true,
    });
}
