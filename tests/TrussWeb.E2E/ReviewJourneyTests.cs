using Microsoft.Playwright;
using TrussWeb.E2E.Support;

namespace TrussWeb.E2E;

/// <summary>
/// Two signed-in users on the same demo app: the designer submits a member, the checker sees it arrive in the open queue,
/// returns it with a comment, the designer answers and resubmits, the checker approves; each open page follows without a
/// reload. The journey owns the demo member <see cref="Mark"/> (no other journey touches it).
/// </summary>
[Collection(E2ECollection.Name)]
public sealed class ReviewJourneyTests(DemoApp app, BrowserSession browser)
{
    /// <summary>A vertical of the demo truss (DemoSeeder: generated pitched Pratt, verticals V1…V7).</summary>
    private const string Mark = "V6";

    private const string ReviewText = "textarea[data-testid=review-text], [data-testid=review-text] textarea";

    private static string State(string state) => $"[data-testid=review-panel] [data-testid=review-state][data-state={state}]";

    [Fact]
    public async Task Designer_and_checker_take_a_member_through_return_resubmit_and_approve_with_live_pages()
    {
        var shots = new Screenshots("review-journey");
        await using var designerContext = await browser.NewContextAsync();
        await using var checkerContext = await browser.NewContextAsync();
        var designer = await Pages.SignInAsync(designerContext, app, app.Designer);
        var checker = await Pages.SignInAsync(checkerContext, app, app.Checker);

        // The checker's queue is open before anything is submitted.
        await checker.GotoAsync(app.Url("/checking"));
        await Pages.SettleAsync(checker);
        Assert.Equal(0, await checker.Locator($"[data-testid=queue-row][data-mark={Mark}]").CountAsync());
        await shots.TakeAsync(checker, "checker-queue-before");

        // The designer opens the member from the project and the truss.
        await OpenMemberAsync(designer);
        await designer.WaitForSelectorAsync(State("NotSubmitted"));
        await shots.TakeAsync(designer, "designer-member-not-submitted");
        await designer.FillAsync(ReviewText, "V6 ready for checking");
        await designer.ClickAsync("[data-testid=review-submit]");
        await designer.WaitForSelectorAsync(State("AwaitingCheck"));
        Assert.Contains("Pieter Demo-Checker", await designer.InnerTextAsync("[data-testid=review-checker-name]"), StringComparison.Ordinal);
        await shots.TakeAsync(designer, "designer-submitted");

        // The checker's open queue shows it without a reload.
        await checker.WaitForSelectorAsync($"[data-testid=queue-row][data-mark={Mark}]");
        Assert.Contains("Thandi Demo-Designer", await checker.InnerTextAsync($"[data-testid=queue-row][data-mark={Mark}]"), StringComparison.Ordinal);
        await shots.TakeAsync(checker, "checker-queue-live");

        // The checker returns it with a comment; the designer's open page shows the comment.
        await checker.ClickAsync($"[data-testid=queue-row][data-mark={Mark}] [data-testid=queue-open]");
        await checker.WaitForSelectorAsync("[data-testid=review-return]");
        await Pages.SettleAsync(checker);
        await checker.ClickAsync("[data-testid=review-return]");
        await checker.WaitForSelectorAsync("[data-testid=review-text-error]");
        await shots.TakeAsync(checker, "checker-return-needs-comment");
        const string comment = "Please confirm the out-of-plane length of V6 <against the bracing plan>.";
        await checker.FillAsync(ReviewText, comment);
        await checker.ClickAsync("[data-testid=review-return]");
        await checker.WaitForSelectorAsync(State("Returned"));
        await shots.TakeAsync(checker, "checker-returned");

        await designer.WaitForSelectorAsync(State("Returned"));
        Assert.Contains(comment, await designer.InnerTextAsync("[data-testid=review-thread]"), StringComparison.Ordinal);
        await shots.TakeAsync(designer, "designer-sees-comment-live");

        // The designer answers and resubmits; the checker's open member page offers the decision again.
        await designer.FillAsync(ReviewText, "Confirmed: Ly is the full length between the bracing points.");
        await designer.ClickAsync("[data-testid=review-resubmit]");
        await designer.WaitForSelectorAsync(State("AwaitingCheck"));
        await shots.TakeAsync(designer, "designer-resubmitted");

        await checker.WaitForSelectorAsync(State("AwaitingCheck"));
        await checker.WaitForSelectorAsync("[data-testid=review-approve]");
        Assert.Contains("Confirmed: Ly", await checker.InnerTextAsync("[data-testid=review-thread]"), StringComparison.Ordinal);
        await shots.TakeAsync(checker, "checker-sees-answer-live");
        await checker.ClickAsync("[data-testid=review-approve]");
        await checker.WaitForSelectorAsync(State("Approved"));
        await shots.TakeAsync(checker, "checker-approved");

        // The designer's page, still open, shows the approval without a reload.
        await designer.WaitForSelectorAsync(State("Approved"));
        Assert.Equal(0, await designer.Locator("[data-testid=review-resubmit], [data-testid=review-submit], [data-testid=review-approve]").CountAsync());
        await shots.TakeAsync(designer, "designer-sees-approved-live");

        // The checker's queue no longer lists it.
        await checker.GotoAsync(app.Url("/checking"));
        await Pages.SettleAsync(checker);
        Assert.Equal(0, await checker.Locator($"[data-testid=queue-row][data-mark={Mark}]").CountAsync());
    }

    [Fact]
    public async Task A_double_angle_member_page_shows_its_section_picker()
    {
        var shots = new Screenshots("double-angle-member");
        await using var context = await browser.NewContextAsync();
        var page = await Pages.SignInAsync(context, app, app.Designer);

        await OpenMemberAsync(page, "BC1");

        Assert.StartsWith("2L", await page.InnerTextAsync("[data-testid=member-section]"), StringComparison.Ordinal);
        Assert.Equal(0, await page.Locator("[data-testid=member-error]").CountAsync());
        Assert.True(await page.Locator("[data-testid=connectors-form]").CountAsync() == 1, "the connectors form of a double angle is shown");
        await page.WaitForSelectorAsync("[data-testid=section-picker] [data-testid=picker-row]");
        Assert.Equal(0, await page.Locator("[data-testid=picker-message]").CountAsync());
        var designations = await page.Locator("[data-testid=picker-designation]").AllInnerTextsAsync();
        Assert.All(designations, d => Assert.StartsWith("2L", d, StringComparison.Ordinal));
        await shots.TakeAsync(page, "bc1");
    }

    [Fact]
    public async Task The_project_shows_review_counts_the_audit_log_and_its_csv_download()
    {
        var shots = new Screenshots("review-project");
        await using var context = await browser.NewContextAsync();
        var page = await Pages.SignInAsync(context, app, app.Checker);

        await page.GotoAsync(app.Url("/projects"));
        await page.ClickAsync("[data-testid=project-link]");
        await page.WaitForSelectorAsync("[data-testid=rollup-table]");
        await Pages.SettleAsync(page);
        await shots.TakeAsync(page, "project-rollup");
        // Every demo member is counted once in the project row (DemoSeeder: 8 + 8 chords, 6 diagonals, 7 verticals).
        var totals = await page.Locator("[data-testid=rollup-total] td.tw-num").AllInnerTextsAsync();
        Assert.Equal(29, totals.Sum(int.Parse));

        await page.ClickAsync("[data-testid=audit-link]");
        await page.WaitForSelectorAsync("[data-testid=audit-table] [data-testid=audit-row]");
        await Pages.SettleAsync(page);
        await shots.TakeAsync(page, "project-audit");
        Assert.Equal(0, await page.Locator("[data-testid=audit-table] button, [data-testid=audit-table] input").CountAsync());

        var download = await page.RunAndWaitForDownloadAsync(() => page.ClickAsync("[data-testid=audit-csv-link]"));
        var file = await download.PathAsync();
        var csv = await File.ReadAllTextAsync(file!);
        Assert.StartsWith("Id,UtcTime,UserId,UserName,EntityType,EntityId,Action,Field,OldValue,NewValue,Comment,Fingerprint", csv, StringComparison.Ordinal);
        Assert.EndsWith(".csv", download.SuggestedFilename, StringComparison.Ordinal);

        // The truss page lists every member with its review state.
        await page.GotoAsync(app.Url("/projects"));
        await page.ClickAsync("[data-testid=project-link]");
        await page.ClickAsync("a[href^='/trusses/']");
        await page.WaitForSelectorAsync("[data-testid=truss-review-table] [data-testid=truss-review-row]");
        await Pages.SettleAsync(page);
        Assert.Equal(29, await page.Locator("[data-testid=truss-review-row]").CountAsync());
        await page.Locator("[data-testid=truss-review]").ScrollIntoViewIfNeededAsync();
        await shots.TakeAsync(page, "truss-review");
    }

    private async Task OpenMemberAsync(IPage page, string mark = Mark)
    {
        await page.GotoAsync(app.Url("/projects"));
        await page.ClickAsync("[data-testid=project-link]");
        await page.WaitForSelectorAsync("a[href^='/trusses/']");
        await page.ClickAsync("a[href^='/trusses/']");
        await page.WaitForSelectorAsync("[data-testid=member-link]");
        await page.Locator("[data-testid=member-link]", new PageLocatorOptions { HasTextRegex = new System.Text.RegularExpressions.Regex($"^{mark}$") }).First.ClickAsync();
        await page.WaitForSelectorAsync("[data-testid=member-title]");
        await page.WaitForSelectorAsync("[data-testid=review-panel] [data-testid=review-state]");
        await Pages.SettleAsync(page);
    }
}
