using System.Text.RegularExpressions;
using Microsoft.Playwright;
using TrussWeb.E2E.Support;

namespace TrussWeb.E2E;

/// <summary>
/// The office's whole journey in a real browser, step by step with a screenshot each. First half (here): the
/// project lead creates a project (invented names) and adds the demo designer; the designer generates a truss,
/// sizes it, opens a member's calculation and sees its record (clause, utilization) and the caution.
/// The second half (submit, check, return and approve, resubmit, export and download) is appended at
/// <see cref="ReviewAndExportAsync"/> when the review and export pages exist.
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
    /// Second half of the journey, to be written when the review and export pages land: the designer submits;
    /// the checker returns one member and approves the rest; the designer fixes and resubmits; the project lead
    /// exports the calculation book and summary and the downloads open. Until then it only closes the designer's browser.
    /// </summary>
    private static async Task ReviewAndExportAsync(JourneyState journey, Screenshots shots)
    {
        _ = shots;
        await journey.DesignerContext.CloseAsync();
    }

    private static Regex ProjectUrl() => new("/projects/[0-9a-f-]{36}");

    private static Regex TrussUrl() => new("/trusses/[0-9a-f-]{36}");

    [GeneratedRegex(@"\d+(\.\d+)+")]
    private static partial Regex Clause();

    [GeneratedRegex(@"\d+(\.\d+)?")]
    private static partial Regex Number();
}
