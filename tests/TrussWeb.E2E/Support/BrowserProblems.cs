using Microsoft.Playwright;

namespace TrussWeb.E2E.Support;

/// <summary>
/// Collects what would break a page for a person: console errors, uncaught page errors, content security policy
/// violations (the securitypolicyviolation event, recorded by an init script in every document) and dialogs
/// (an alert() run by injected markup).
/// </summary>
public sealed class BrowserProblems
{
    private const string RecordViolations =
        "document.addEventListener('securitypolicyviolation', e => console.error('CSP violation: ' + e.violatedDirective + ' blocked ' + (e.blockedURI || 'inline') + ' at ' + e.sourceFile + ':' + e.lineNumber));";

    private readonly List<string> problems = [];

    public IReadOnlyList<string> All
    {
        get
        {
            lock (problems)
            {
                return problems.ToList();
            }
        }
    }

    public static async Task<BrowserProblems> WatchAsync(IBrowserContext context)
    {
        var watch = new BrowserProblems();
        await context.AddInitScriptAsync(RecordViolations);
        context.Page += (_, page) => watch.Attach(page);
        foreach (var page in context.Pages)
        {
            watch.Attach(page);
        }

        return watch;
    }

    public void Attach(IPage page)
    {
        page.Console += (_, message) =>
        {
            if (message.Type == "error")
            {
                Add($"console error on {page.Url}: {message.Text}");
            }
        };
        page.PageError += (_, error) => Add($"page error on {page.Url}: {error}");
        page.Dialog += async (_, dialog) =>
        {
            Add($"dialog on {page.Url}: {dialog.Type} '{dialog.Message}'");
            await dialog.DismissAsync();
        };
    }

    public void AssertNone(string where) => Assert.True(All.Count == 0, $"{where}:\n" + string.Join("\n", All));

    private void Add(string problem)
    {
        lock (problems)
        {
            problems.Add(problem);
        }
    }
}
