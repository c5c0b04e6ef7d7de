using Microsoft.Playwright;

namespace TrussWeb.E2E.Support;

/// <summary>
/// Numbered screenshots of one journey, in <c>test-results/e2e/&lt;journey&gt;/</c> at the repository root
/// (or TRUSSWEB_E2E_SHOTS), so a failed run can be looked at step by step.
/// </summary>
public sealed class Screenshots(string journey)
{
    private int step;

    public string Folder { get; } = Path.Combine(
        Environment.GetEnvironmentVariable("TRUSSWEB_E2E_SHOTS") is { Length: > 0 } root ? root : Path.Combine(Repo.Root, "test-results", "e2e"),
        journey);

    public async Task<string> TakeAsync(IPage page, string name)
    {
        Directory.CreateDirectory(Folder);
        var file = Path.Combine(Folder, $"{++step:00}-{name}.png");
        await page.ScreenshotAsync(new PageScreenshotOptions { Path = file, FullPage = true });
        return file;
    }
}
