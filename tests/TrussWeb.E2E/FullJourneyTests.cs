using System.Text.RegularExpressions;
using Microsoft.Playwright;
using TrussWeb.Core;
using TrussWeb.Core.Records;
using TrussWeb.E2E.Support;

namespace TrussWeb.E2E;

/// <summary>
/// The office's whole journey in a real browser, step by step with a screenshot each. First half (here): the
/// project lead creates a project (invented names) and adds the demo designer; the designer generates a truss,
/// sizes it, opens a member's calculation and sees its record (clause, utilization) and the caution.
/// Second half (<see cref="ReviewAndExportAsync"/>): submit, check, return and approve, fix and resubmit, export and
/// download; every file is opened and compared with the pages.
/// </summary>
[Collection(E2ECollection.Name)]
public sealed partial class FullJourneyTests(DemoApp app, BrowserSession browser)
{
    /// <summary>An invented project: no real client, place or company.</summary>
    private const string ProjectName = "Umdoni Citrus Packhouse (invented)";

    private const string TrussName = "Packhouse truss PT1";

    [Fact]
    public async Task A_designer_takes_a_new_project_from_generated_truss_to_a_member_calculation()
    {
        var shots = new Screenshots("full-journey");
        var journey = await DesignAsync(shots);
        await ReviewAndExportAsync(journey, shots);
    }

    /// <summary>What the first half leaves for the second: the project, truss and member, and the designer's signed-in context.</summary>
    public sealed record JourneyState(string ProjectUrl, string TrussUrl, string MemberUrl, string MemberMark, IBrowserContext DesignerContext);

    private async Task<JourneyState> DesignAsync(Screenshots shots)
    {
        // The project lead creates the project (designers may not) and adds the designer to it.
        await using var leadContext = await browser.NewContextAsync();
        var leadProblems = await BrowserProblems.WatchAsync(leadContext);
        var lead = await Pages.SignInAsync(leadContext, app, app.Lead);
        await lead.GotoAsync(app.Url("/projects"));
        await Pages.SettleAsync(lead);
        await lead.ClickAsync("[data-testid=new-project]");
        await Inputs.FillAsync(lead, "project-name", ProjectName);
        await Inputs.FillAsync(lead, "project-client", "Nkwazi Fruit Growers (invented)");
        await Inputs.FillAsync(lead, "project-reference", "INV-2611");
        await Inputs.FillAsync(lead, "project-location", "Emthini (an invented town)");
        await shots.TakeAsync(lead, "lead-new-project");
        await lead.ClickAsync("[data-testid=create-project]");
        await lead.WaitForURLAsync(ProjectUrl());
        await lead.WaitForSelectorAsync("[data-testid=project-title]");
        Assert.Equal(ProjectName, (await lead.InnerTextAsync("[data-testid=project-title]")).Trim());
        var projectUrl = lead.Url;

        await Inputs.PickAsync(lead, "add-member-user", app.Designer.Email);
        await lead.ClickAsync("[data-testid=add-member-submit]");
        await lead.Locator("[data-testid=members-table]", new PageLocatorOptions { HasText = app.Designer.Email }).WaitForAsync();
        await shots.TakeAsync(lead, "lead-added-designer");
        leadProblems.AssertNone("lead's pages");

        // The designer generates a truss in the new project.
        var designerContext = await browser.NewContextAsync();
        var problems = await BrowserProblems.WatchAsync(designerContext);
        var page = await Pages.SignInAsync(designerContext, app, app.Designer);
        await page.GotoAsync(projectUrl);
        await Pages.SettleAsync(page);
        await shots.TakeAsync(page, "designer-project");
        await page.ClickAsync("[data-testid=new-truss]");
        await Inputs.FillAsync(page, "truss-name", TrussName);
        await shots.TakeAsync(page, "designer-new-truss");
        await page.ClickAsync("[data-testid=create-truss]");
        await page.WaitForURLAsync(TrussUrl());
        await page.WaitForSelectorAsync("[data-testid=truss-title]");
        await page.WaitForFunctionAsync("() => document.querySelectorAll('[data-testid=truss-elevation] .main-svg .scatterlayer path').length > 0");
        await Pages.SettleAsync(page);
        var trussUrl = page.Url;
        await shots.TakeAsync(page, "designer-truss-generated");

        // Sizing: run, see the proposal, accept it.
        await page.ClickAsync("[data-testid=sizing-run]");
        await page.WaitForSelectorAsync("[data-testid=sizing-accept]", new PageWaitForSelectorOptions { Timeout = 120_000 });
        await shots.TakeAsync(page, "designer-sizing-proposal");
        await page.ClickAsync("[data-testid=sizing-accept]");
        await page.WaitForSelectorAsync("[data-testid=sizing-accept]", new PageWaitForSelectorOptions { State = WaitForSelectorState.Detached, Timeout = 60_000 });
        await Pages.SettleAsync(page);
        await page.WaitForSelectorAsync("[data-testid=member-link]");
        await shots.TakeAsync(page, "designer-sized");

        // One member's calculation: its record with clause references, its utilization and the caution.
        var link = page.Locator("[data-testid=member-link]").First;
        var mark = (await link.InnerTextAsync()).Trim();
        await link.ClickAsync();
        await page.WaitForURLAsync(new Regex("/members/[0-9a-f-]{36}"));
        await page.WaitForSelectorAsync("[data-testid=member-utilization]", new PageWaitForSelectorOptions { Timeout = 60_000 });
        await page.WaitForSelectorAsync("[data-testid=member-record] [data-testid=record-step]");
        await Pages.SettleAsync(page);
        await shots.TakeAsync(page, "designer-member-calculation");

        Assert.Contains(mark, await page.InnerTextAsync("[data-testid=member-title]"));
        var utilization = await page.InnerTextAsync("[data-testid=member-utilization]");
        Assert.Matches(Number(), utilization);
        var references = await page.Locator("[data-testid=check-row] .tw-ref").AllInnerTextsAsync();
        Assert.NotEmpty(references);
        // Source: SANS 10162-1 numbers its clauses as digits separated by dots (e.g. 13.3.1): common practice
        Assert.Contains(references, r => Clause().IsMatch(r));
        Assert.True(await page.Locator("[data-testid=member-record] [data-testid=record-step]").CountAsync() > 3, "the record lists its steps");
        Assert.Contains("competent engineer", await page.InnerTextAsync("[data-testid=caution]"), StringComparison.OrdinalIgnoreCase);
        problems.AssertNone("designer's pages");
        return new JourneyState(projectUrl, trussUrl, page.Url, mark, designerContext);
    }

    /// <summary>
    /// Second half: the lead adds the demo checker; the designer submits the whole truss to the checker; the checker (own
    /// browser) returns one member with a comment and approves the rest in a batch; the designer sees the return on the open
    /// member page, changes its out-of-plane K factor, saves and resubmits with an answer; the checker approves it; the lead
    /// sees every member approved, exports the calculation book and the member summary (PDF, CSV, XLSX), issues the final set,
    /// and every download is opened and compared with the pages.
    /// </summary>
    private async Task ReviewAndExportAsync(JourneyState journey, Screenshots shots)
    {
        await using var designerContext = journey.DesignerContext;
        var mark = journey.MemberMark;

        // The project lead adds the demo checker to the project (a checker must be a project member to be chosen).
        await using var leadContext = await browser.NewContextAsync();
        var leadProblems = await BrowserProblems.WatchAsync(leadContext);
        var lead = await Pages.SignInAsync(leadContext, app, app.Lead);
        await lead.GotoAsync(journey.ProjectUrl);
        await Pages.SettleAsync(lead);
        await Inputs.PickAsync(lead, "add-member-user", app.Checker.Email);
        await Inputs.PickAsync(lead, "add-member-role", "Checker");
        await lead.ClickAsync("[data-testid=add-member-submit]");
        await lead.Locator("[data-testid=members-table]", new PageLocatorOptions { HasText = app.Checker.Email }).WaitForAsync();
        await shots.TakeAsync(lead, "lead-added-checker");

        // The designer submits every member of the truss to the checker.
        var designer = designerContext.Pages.Single();
        var designerProblems = await BrowserProblems.WatchAsync(designerContext);
        await designer.GotoAsync(journey.TrussUrl);
        await designer.WaitForSelectorAsync("[data-testid=truss-review-table] [data-testid=truss-review-row]");
        await Pages.SettleAsync(designer);
        var total = await designer.Locator("[data-testid=truss-review-row]").CountAsync();
        Assert.True(total > 3, "the generated truss has its members in the review table");
        Assert.Equal($"{total} not submitted", (await designer.InnerTextAsync("[data-testid=truss-review-count-NotSubmitted]")).Trim());
        await Inputs.PickAsync(designer, "submit-all-checker", "(Checker)");
        await Inputs.FillAsync(designer, "submit-all-note", "PT1 sized and ready for checking.");
        await designer.Locator("[data-testid=truss-review]").ScrollIntoViewIfNeededAsync();
        await shots.TakeAsync(designer, "designer-submit-all");
        await designer.ClickAsync("[data-testid=submit-all]");
        await designer.WaitForSelectorAsync("[data-testid=batch-outcome]");
        Assert.Contains($"{total} submitted for checking; 0 left as they were.", await designer.InnerTextAsync("[data-testid=batch-outcome]"), StringComparison.Ordinal);
        await designer.WaitForSelectorAsync("[data-testid=truss-review-count-AwaitingCheck]");
        Assert.Equal($"{total} awaiting check", (await designer.InnerTextAsync("[data-testid=truss-review-count-AwaitingCheck]")).Trim());
        await shots.TakeAsync(designer, "designer-submitted-all");

        // The designer keeps the member open; it will follow the checker's decision without a reload.
        await designer.GotoAsync(journey.MemberUrl);
        await designer.WaitForSelectorAsync(State("AwaitingCheck"));
        await Pages.SettleAsync(designer);

        // The checker finds the truss in the queue and opens it.
        await using var checkerContext = await browser.NewContextAsync();
        var checkerProblems = await BrowserProblems.WatchAsync(checkerContext);
        var checker = await Pages.SignInAsync(checkerContext, app, app.Checker);
        await checker.GotoAsync(app.Url("/checking"));
        var queueRows = checker.Locator($"[data-testid=queue-row][data-truss='{TrussName}']");
        await queueRows.First.WaitForAsync();
        await Pages.SettleAsync(checker);
        Assert.Equal(total, await queueRows.CountAsync());
        await shots.TakeAsync(checker, "checker-queue");
        await queueRows.First.Locator("a[href^='/trusses/']").ClickAsync();
        await checker.WaitForURLAsync(TrussUrl());
        await checker.WaitForSelectorAsync("[data-testid=batch-form]");
        await Pages.SettleAsync(checker);

        // One member returned with a comment...
        const string comment = "Out-of-plane K of 1.0 is not what the purlin cleats give; take the restraint into account.";
        await checker.Locator(Row(mark)).Locator("[data-testid=batch-select]").CheckAsync();
        await Inputs.FillAsync(checker, "batch-comment", comment);
        await checker.Locator("[data-testid=truss-review]").ScrollIntoViewIfNeededAsync();
        await shots.TakeAsync(checker, "checker-return-one");
        await checker.ClickAsync("[data-testid=batch-return]");
        await checker.Locator("[data-testid=batch-outcome]", new PageLocatorOptions { HasText = "1 of 1 returned." }).WaitForAsync();
        await checker.Locator($"{Row(mark)} [data-testid=review-state][data-state=Returned]").WaitForAsync();

        // ...and the rest approved in one batch.
        await checker.ClickAsync("[data-testid=batch-select-all]");
        await checker.Locator("[data-testid=batch-approve]", new PageLocatorOptions { HasText = $"({total - 1})" }).WaitForAsync();
        await checker.ClickAsync("[data-testid=batch-approve]");
        await checker.Locator("[data-testid=batch-outcome]", new PageLocatorOptions { HasText = $"{total - 1} of {total - 1} approved." }).WaitForAsync();
        await checker.WaitForSelectorAsync("[data-testid=truss-review-count-Approved]");
        Assert.Equal($"{total - 1} approved", (await checker.InnerTextAsync("[data-testid=truss-review-count-Approved]")).Trim());
        Assert.Equal("1 returned", (await checker.InnerTextAsync("[data-testid=truss-review-count-Returned]")).Trim());
        Assert.Equal(0, await checker.Locator("[data-testid=batch-outcome-row][data-ok=false]").CountAsync());
        await shots.TakeAsync(checker, "checker-batch-approved");

        // The designer's open member page shows the return and the comment.
        await designer.WaitForSelectorAsync(State("Returned"));
        Assert.Contains(comment, await designer.InnerTextAsync("[data-testid=review-thread]"), StringComparison.Ordinal);
        await shots.TakeAsync(designer, "designer-sees-return");

        // The fix: a K factor override on the out-of-plane axis, saved (the member is re-designed).
        var axisBefore = await designer.InnerTextAsync("[data-testid=axis-y]");
        var newK = axisBefore.Contains($"K {Display.Sig(0.9)}", StringComparison.Ordinal) ? 0.85 : 0.9;
        await Inputs.FillAsync(designer, "input-Ky", newK.ToString(System.Globalization.CultureInfo.InvariantCulture));
        await designer.WaitForSelectorAsync("[data-testid=member-dirty]");
        await shots.TakeAsync(designer, "designer-fix-k");
        await designer.ClickAsync("[data-testid=member-save]");
        await designer.WaitForSelectorAsync("[data-testid=member-dirty]", new PageWaitForSelectorOptions { State = WaitForSelectorState.Detached, Timeout = 60_000 });
        await designer.Locator("[data-testid=axis-y]", new PageLocatorOptions { HasText = $"K {Display.Sig(newK)}" }).WaitForAsync(new LocatorWaitForOptions { Timeout = 60_000 });
        await Pages.SettleAsync(designer);
        Assert.Equal(0, await designer.Locator("[data-testid=member-form-message], [data-testid=member-conflict]").CountAsync());
        await designer.WaitForSelectorAsync(State("Returned"));

        // The answer and the resubmission.
        await designer.FillAsync(ReviewText, $"Ky set to {Display.Sig(newK)} for the cleat restraint; re-designed.");
        await designer.ClickAsync("[data-testid=review-resubmit]");
        await designer.WaitForSelectorAsync(State("AwaitingCheck"));
        await shots.TakeAsync(designer, "designer-resubmitted");

        // The project lead has the project open: the export area's approval line counts one member still to approve.
        await lead.GotoAsync(journey.ProjectUrl);
        await lead.WaitForSelectorAsync("[data-testid=export-approval]");
        await Pages.SettleAsync(lead);
        Assert.StartsWith($"{total - 1} of {total} members approved", (await lead.InnerTextAsync("[data-testid=export-approval]")).Trim(), StringComparison.Ordinal);
        Assert.True(await lead.Locator("[data-testid=export-final]").IsDisabledAsync(), "no final set while a member is not approved");

        // The checker approves the resubmitted member from the queue.
        await checker.GotoAsync(app.Url("/checking"));
        var resubmitted = checker.Locator($"[data-testid=queue-row][data-truss='{TrussName}'][data-mark='{mark}']");
        await resubmitted.WaitForAsync();
        await Pages.SettleAsync(checker);
        Assert.Equal(1, await queueRows.CountAsync());
        await resubmitted.Locator("[data-testid=queue-open]").ClickAsync();
        await checker.WaitForSelectorAsync("[data-testid=review-approve]");
        await Pages.SettleAsync(checker);
        Assert.Contains($"Ky set to {Display.Sig(newK)}", await checker.InnerTextAsync("[data-testid=review-thread]"), StringComparison.Ordinal);
        await checker.ClickAsync("[data-testid=review-approve]");
        await checker.WaitForSelectorAsync(State("Approved"));
        await shots.TakeAsync(checker, "checker-approved-fix");
        checkerProblems.AssertNone("checker's pages");

        await designer.WaitForSelectorAsync(State("Approved"));
        var pageUtilization = (await designer.InnerTextAsync("[data-testid=member-utilization]")).Trim();
        var pageSection = (await designer.InnerTextAsync("[data-testid=member-section]")).Trim();
        await shots.TakeAsync(designer, "designer-sees-approved");
        designerProblems.AssertNone("designer's pages (second half)");

        // The project lead's open page follows without a reload: every member approved in the roll-up and the export area.
        await lead.Locator("[data-testid=export-approval]", new PageLocatorOptions { HasText = $"All {total} members approved" }).WaitForAsync();
        await lead.Locator("[data-testid=rollup-total] [data-testid=count-Approved]", new PageLocatorOptions { HasText = total.ToString(System.Globalization.CultureInfo.InvariantCulture) }).WaitForAsync();
        await Pages.SettleAsync(lead);
        Assert.Equal(total.ToString(System.Globalization.CultureInfo.InvariantCulture), (await lead.InnerTextAsync("[data-testid=rollup-total] [data-testid=count-Approved]")).Trim());
        foreach (var other in new[] { "NotSubmitted", "AwaitingCheck", "Returned", "ApprovalStale" })
        {
            Assert.Equal("0", (await lead.InnerTextAsync($"[data-testid=rollup-total] [data-testid=count-{other}]")).Trim());
        }

        Assert.StartsWith($"All {total} members approved", (await lead.InnerTextAsync("[data-testid=export-approval]")).Trim(), StringComparison.Ordinal);
        await lead.Locator("[data-testid=export-panel]").ScrollIntoViewIfNeededAsync();
        await shots.TakeAsync(lead, "lead-all-approved");

        // The exports, each downloaded and opened.
        var book = await ExportAsync(lead, shots, "export-book-pdf", "_calculation-book_", ".pdf", 1);
        var summaryPdf = await ExportAsync(lead, shots, "export-summary-pdf", "_member-summary_", ".pdf", 2);
        var summaryCsv = await ExportAsync(lead, shots, "export-summary-csv", "_member-summary_", ".csv", 3);
        var summaryXlsx = await ExportAsync(lead, shots, "export-summary-xlsx", "_member-summary_", ".xlsx", 4);
        Assert.False(await lead.Locator("[data-testid=export-final]").IsDisabledAsync(), "the lead may issue the final set once every member is approved");
        var finalSet = await ExportAsync(lead, shots, "export-final", "_calculation-book_final_", ".pdf", 5);
        leadProblems.AssertNone("lead's pages (second half)");

        var caution = Downloads.Normalise(Caution.Text);

        // Calculation book (preliminary): project, the member's mark, the caution on every page, marked preliminary.
        var bookPages = Downloads.PdfPages(book);
        Assert.Contains(ProjectName, bookPages[0], StringComparison.Ordinal);
        Assert.Contains(mark, Downloads.PdfWords(book));
        Assert.All(bookPages, p => Assert.Contains(caution, p, StringComparison.Ordinal));
        Assert.Contains($"All {total} members approved; preliminary", bookPages[0], StringComparison.Ordinal);
        Assert.Contains("NOT FOR CONSTRUCTION: preliminary issue", bookPages[0], StringComparison.Ordinal);

        // The final set: the same book, marked final and without the not-for-construction banner.
        var finalPages = Downloads.PdfPages(finalSet);
        Assert.Contains(ProjectName, finalPages[0], StringComparison.Ordinal);
        Assert.Contains(mark, Downloads.PdfWords(finalSet));
        Assert.All(finalPages, p => Assert.Contains(caution, p, StringComparison.Ordinal));
        Assert.Contains($"All {total} members approved; final issue", finalPages[0], StringComparison.Ordinal);
        Assert.All(finalPages, p => Assert.DoesNotContain("NOT FOR CONSTRUCTION", p, StringComparison.Ordinal));

        // Member summary PDF.
        var summaryPages = Downloads.PdfPages(summaryPdf);
        Assert.Contains(ProjectName, summaryPages[0], StringComparison.Ordinal);
        Assert.Contains(mark, Downloads.PdfWords(summaryPdf));
        Assert.All(summaryPages, p => Assert.Contains(caution, p, StringComparison.Ordinal));

        // Member summary CSV: header block, one row per member, the fixed member as its page shows it.
        var csv = Downloads.CsvRecords(await File.ReadAllTextAsync(summaryCsv));
        Assert.Equal(ProjectName, Downloads.HeaderValue(csv, "Project"));
        Assert.Equal(Caution.Text, Downloads.HeaderValue(csv, "Caution"));
        var csvRows = Downloads.Table(csv, "Truss", "Mark");
        Assert.Equal(total, csvRows.Count);
        Assert.All(csvRows, r => Assert.Equal(TrussName, r["Truss"]));
        Assert.All(csvRows, r => Assert.Equal("Approved", r["Review state"]));
        var fixedRow = Assert.Single(csvRows, r => r["Mark"] == mark);
        Assert.Equal(pageSection, fixedRow["Section"]);
        // The page shows results to 3 significant figures (Display.Sig); the file keeps them unrounded.
        Assert.Equal(pageUtilization, Display.Sig(Number(fixedRow["Utilization (-)"])));
        var trussTotal = Assert.Single(Downloads.Table(csv, "Truss", "Members (-)"));
        Assert.Equal(total.ToString(System.Globalization.CultureInfo.InvariantCulture), trussTotal["Members (-)"]);
        // Source: a truss's mass is the sum of its members' masses: common practice
        Assert.Equal(csvRows.Sum(r => Number(r["Mass (kg)"])), Number(trussTotal["Mass (kg)"]), 6);

        // Member summary XLSX: the same header and the same rows as the CSV.
        var xlsx = Downloads.XlsxRows(summaryXlsx);
        Assert.Equal(ProjectName, Downloads.HeaderValue(xlsx, "Project"));
        Assert.Equal(Caution.Text, Downloads.HeaderValue(xlsx, "Caution"));
        var xlsxRows = Downloads.Table(xlsx, "Truss", "Mark");
        Assert.Equal(csvRows.Select(r => r["Mark"]), xlsxRows.Select(r => r["Mark"]));
        Assert.Equal(csvRows.Select(r => r["Section"]), xlsxRows.Select(r => r["Section"]));
        var xlsxFixed = Assert.Single(xlsxRows, r => r["Mark"] == mark);
        Assert.Equal(Number(fixedRow["Utilization (-)"]), Number(xlsxFixed["Utilization (-)"]), 9);
    }

    /// <summary>Clicks an export button, waits for job number <paramref name="count"/> to offer its file, downloads it and checks its name.</summary>
    private static async Task<string> ExportAsync(IPage page, Screenshots shots, string button, string namePart, string extension, int count)
    {
        await page.ClickAsync($"[data-testid={button}]");
        var links = page.Locator("[data-testid=export-download]");
        await page.WaitForFunctionAsync($"() => document.querySelectorAll('[data-testid=export-download]').length >= {count}", null,
            new PageWaitForFunctionOptions { Timeout = 120_000, PollingInterval = 250 });
        Assert.Equal(0, await page.Locator("[data-testid=export-error], [data-testid=export-start-error]").CountAsync());
        await shots.TakeAsync(page, "lead-" + button);
        // The newest job is listed first.
        var (path, name) = await Downloads.SaveAsync(page, links.First, shots);
        Assert.Contains(namePart, name, StringComparison.Ordinal);
        Assert.EndsWith(extension, name, StringComparison.Ordinal);
        Assert.True(new FileInfo(path).Length > 0, $"{name} is not empty");
        return path;
    }

    private const string ReviewText = "textarea[data-testid=review-text], [data-testid=review-text] textarea";

    private static string State(string state) => $"[data-testid=review-panel] [data-testid=review-state][data-state={state}]";

    private static string Row(string mark) => $"[data-testid=truss-review-row][data-mark='{mark}']";

    private static double Number(string text) => double.Parse(text, System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture);

    private static Regex ProjectUrl() => new("/projects/[0-9a-f-]{36}");

    private static Regex TrussUrl() => new("/trusses/[0-9a-f-]{36}");

    [GeneratedRegex(@"\d+(\.\d+)+")]
    private static partial Regex Clause();

    [GeneratedRegex(@"\d+(\.\d+)?")]
    private static partial Regex Number();
}
