using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Pages.Checking;
using TrussWeb.Web.Components.Review;
using TrussWeb.Web.Tests.Fakes;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Review;

public class QueueAndRollUpTests : TrussWebTestContext
{
    private readonly FakeProjectService _projects = new();

    public QueueAndRollUpTests()
    {
        _projects.Summaries.Add(new ProjectSummary(FakeReviewService.ProjectId, "Tamboti Storage Hall", null, null, null, "A", "SANS 10162-1", "Checker", DateTime.UtcNow, []));
        Services.AddSingleton<IProjectService>(_projects);
    }

    private static CheckQueueItem Item(string mark, double? utilization) => new(FakeReviewService.ProjectId, "Tamboti Storage Hall", FakeReviewService.TrussId, "RT1",
        Guid.NewGuid(), mark, "Dineo Designer", new DateTime(2026, 12, 1, 8, 30, 0, DateTimeKind.Utc), utilization, "Pass");

    [Fact]
    public void The_queue_lists_each_member_with_project_truss_designer_submission_and_a_link()
    {
        Reviews.Queue.Add(Item("TC1", 0.81));
        Reviews.Queue.Add(Item("BC2", null));

        var cut = Render<CheckQueuePage>();

        cut.WaitForAssertion(() => Assert.Equal(2, cut.FindAll("[data-testid=queue-row]").Count));
        var first = cut.FindAll("[data-testid=queue-row]")[0];
        Assert.Equal("TC1", first.QuerySelector("[data-testid=queue-mark]")!.TextContent);
        Assert.Contains("Tamboti Storage Hall", first.TextContent, StringComparison.Ordinal);
        Assert.Contains("Dineo Designer", first.TextContent, StringComparison.Ordinal);
        Assert.Contains("2026-12-01 08:30 UTC", first.TextContent, StringComparison.Ordinal);
        Assert.Contains("0.81", first.TextContent, StringComparison.Ordinal);
        Assert.Equal($"/members/{Reviews.Queue[0].MemberId}?truss={FakeReviewService.TrussId}", first.QuerySelector("[data-testid=queue-open]")!.GetAttribute("href"));
        Assert.Contains("not designed", cut.FindAll("[data-testid=queue-row]")[1].TextContent, StringComparison.Ordinal);
    }

    [Fact]
    public void A_new_submission_appears_in_the_open_queue_without_a_reload()
    {
        var cut = Render<CheckQueuePage>();
        cut.WaitForAssertion(() => cut.Find("[data-testid=queue-empty]"));

        Reviews.Queue.Add(Item("W3", 0.5));
        ReviewHub.Publish(new ReviewEvent(FakeReviewService.ProjectId, FakeReviewService.TrussId, Reviews.Queue[0].MemberId, "W3",
            MemberReviewState.NotSubmitted, MemberReviewState.AwaitingCheck, "ReviewSubmit", "u-designer", DateTime.UtcNow));

        cut.WaitForAssertion(() => Assert.Equal(["W3"], Texts(cut, "[data-testid=queue-mark]")));
    }

    private static Dictionary<MemberReviewState, int> Counts(int notSubmitted, int awaiting, int approved, int returned, int stale) => new()
    {
        [MemberReviewState.NotSubmitted] = notSubmitted,
        [MemberReviewState.AwaitingCheck] = awaiting,
        [MemberReviewState.Approved] = approved,
        [MemberReviewState.Returned] = returned,
        [MemberReviewState.ApprovalStale] = stale,
    };

    [Fact]
    public void The_roll_up_shows_counts_per_state_for_the_project_and_each_truss_and_follows_events()
    {
        var rt1 = Guid.NewGuid();
        var rt2 = Guid.NewGuid();
        Reviews.RollUp = new ReviewRollUp(FakeReviewService.ProjectId, Counts(3, 4, 5, 1, 2),
            [new TrussReviewCounts(rt1, "RT1", Counts(3, 0, 5, 1, 0)), new TrussReviewCounts(rt2, "RT2", Counts(0, 4, 0, 0, 2))]);

        var cut = Render<ReviewRollUpPanel>(p => p.Add(x => x.ProjectId, FakeReviewService.ProjectId));

        // Columns in the order ReviewStateText.Order: not submitted, awaiting, returned, approved, stale.
        cut.WaitForAssertion(() => Assert.Equal(["3", "4", "1", "5", "2"], Texts(cut, "[data-testid=rollup-total] td.tw-num")));
        var trusses = cut.FindAll("[data-testid=rollup-truss]");
        Assert.Equal(["RT1", "RT2"], trusses.Select(t => t.GetAttribute("data-truss")));
        Assert.Equal(["0", "4", "0", "0", "2"], trusses[1].QuerySelectorAll("td.tw-num").Select(td => td.TextContent.Trim()));
        Assert.Equal($"/projects/{FakeReviewService.ProjectId}/audit.csv", cut.Find("[data-testid=audit-csv-link]").GetAttribute("href"));

        Reviews.RollUp = Reviews.RollUp with { Totals = Counts(2, 5, 5, 1, 2) };
        ReviewHub.Publish(new ReviewEvent(FakeReviewService.ProjectId, rt1, Guid.NewGuid(), "TC1", MemberReviewState.NotSubmitted, MemberReviewState.AwaitingCheck, "ReviewSubmit", "u", DateTime.UtcNow));

        cut.WaitForAssertion(() => Assert.Equal(["2", "5", "1", "5", "2"], Texts(cut, "[data-testid=rollup-total] td.tw-num")));
    }
}
