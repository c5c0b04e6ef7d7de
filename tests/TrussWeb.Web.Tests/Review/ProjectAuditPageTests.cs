using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Data;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Pages.Projects;
using TrussWeb.Web.Tests.Fakes;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Review;

public class ProjectAuditPageTests : TrussWebTestContext
{
    private readonly FakeProjectService _projects = new();

    public ProjectAuditPageTests()
    {
        _projects.Project = new ProjectDetail(FakeReviewService.ProjectId, 1, "Tamboti Storage Hall", null, null, null, "A", "SANS 10162-1", "S355JR",
            Roles.Checker, DateTime.UtcNow, DateTime.UtcNow, []);
        Services.AddSingleton<IProjectService>(_projects);
        Services.AddSingleton<ITrussService>(new FakeTrussService());
    }

    [Fact]
    public void The_project_log_lists_entries_oldest_first_read_only_with_short_fingerprints()
    {
        var member = Guid.NewGuid().ToString();
        Reviews.Audit.Add(new AuditEntryView(7, new DateTime(2026, 12, 1, 10, 0, 0, DateTimeKind.Utc), "u-checker", "Chris Checker", "TrussMember", member,
            "ReviewReturn", "ReviewState", "AwaitingCheck", "Returned", "Check Ly", "0123456789abcdef0123"));
        Reviews.Audit.Add(new AuditEntryView(3, new DateTime(2026, 12, 1, 9, 0, 0, DateTimeKind.Utc), "u-designer", "Dineo Designer", "TrussMember", member,
            "ReviewSubmit", "ReviewState", "NotSubmitted", "AwaitingCheck", null, "0123456789abcdef0123"));

        var cut = Render<ProjectAuditPage>(p => p.Add(x => x.ProjectId, FakeReviewService.ProjectId));

        cut.WaitForAssertion(() => Assert.Equal(2, cut.FindAll("[data-testid=audit-row]").Count));
        Assert.Equal(["Submitted", "Returned"], Texts(cut, "[data-testid=audit-action]"));
        Assert.Contains("AwaitingCheck → Returned", cut.FindAll("[data-testid=audit-row]")[1].TextContent, StringComparison.Ordinal);
        Assert.Contains("0123456789ab", cut.Markup, StringComparison.Ordinal);
        Assert.DoesNotContain(">0123456789abcdef0123<", cut.Markup, StringComparison.Ordinal);
        Assert.Empty(cut.FindAll("[data-testid=audit-table] button, [data-testid=audit-table] input"));
        Assert.Equal($"/projects/{FakeReviewService.ProjectId}/audit.csv", cut.Find("[data-testid=audit-csv-link]").GetAttribute("href"));
    }
}
