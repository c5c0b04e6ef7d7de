using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Data;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Pages.Projects;
using TrussWeb.Web.Tests.Fakes;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Projects;

public class ProjectsPageTests : TrussWebTestContext
{
    private readonly FakeProjectService _projects = new();

    public ProjectsPageTests()
    {
        var trussId = Guid.NewGuid();
        _projects.Summaries.Add(new ProjectSummary(Guid.NewGuid(), "Cold store", "Client", "J-7", "Town", "B", "SANS 10162-1", Roles.Designer, DateTime.UtcNow,
            [new TrussStatusRollup(trussId, "RT1", 29, 25, 3, 1, 0, new Dictionary<string, int> { ["Draft"] = 26, ["Approved"] = 2, ["NotSubmitted"] = 1 })]));
        Services.AddSingleton<IProjectService>(_projects);
        Services.AddSingleton<ICatalogueService, FakeCatalogueService>();
    }

    [Fact]
    public void Each_truss_shows_its_passing_failing_and_not_designed_counts_and_review_states()
    {
        Services.AddSingleton<ICallerContext>(new FakeCaller("u1", "D", Roles.Designer));

        var cut = Render<ProjectsPage>();

        var rollup = cut.WaitForElement("[data-testid=truss-rollup]").TextContent;
        Assert.Contains("25 pass", rollup);
        Assert.Contains("3 fail", rollup);
        Assert.Contains("1 not designed", rollup);
        Assert.Contains("of 29 members", rollup);
        // Stored names in words, in workflow order; "Draft" and "NotSubmitted" are the same state (ReviewStateMachine.Parse).
        Assert.Equal("27 not submitted, 2 approved", cut.Find("[data-testid=truss-review-counts]").TextContent.Trim());
        Assert.DoesNotContain("Draft", cut.Find("[data-testid=projects-table]").TextContent, StringComparison.Ordinal);
        Assert.Equal($"/projects/{_projects.Summaries[0].Id}", cut.Find("[data-testid=project-link]").GetAttribute("href"));
    }

    [Theory]
    [InlineData(Roles.Designer, false)]
    [InlineData(Roles.Checker, false)]
    [InlineData(Roles.ProjectLead, true)]
    [InlineData(Roles.Administrator, true)]
    public void New_project_is_offered_to_project_leads_and_administrators_only(string role, bool offered)
    {
        Services.AddSingleton<ICallerContext>(new FakeCaller("u1", "Someone", role));

        var cut = Render<ProjectsPage>();

        cut.WaitForElement("[data-testid=projects-table]");
        Assert.Equal(offered, cut.FindAll("[data-testid=new-project]").Count == 1);
    }
}
