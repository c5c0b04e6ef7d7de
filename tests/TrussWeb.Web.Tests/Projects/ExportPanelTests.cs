using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Core;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Projects;
using TrussWeb.Web.Tests.Fakes;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Projects;

public class ExportPanelTests : TrussWebTestContext
{
    private static readonly Guid Project = Guid.NewGuid();
    private readonly FakeExportService _exports = new();

    public ExportPanelTests()
    {
        Services.AddSingleton<IExportService>(_exports);
        Services.AddSingleton<IExportEvents>(_exports);
        _reviewEvents = new CountingReviewEvents(ReviewHub);
        Services.AddSingleton<IReviewEvents>(_reviewEvents);
    }

    private readonly CountingReviewEvents _reviewEvents;

    private IRenderedComponent<ExportPanel> RenderPanel() => Render<ExportPanel>(p => p.Add(x => x.ProjectId, Project));

    [Fact]
    public void Shows_the_approval_state_the_caution_and_the_final_button_disabled_with_its_reason()
    {
        var cut = RenderPanel();

        Assert.Equal("12 of 40 members approved — files will be marked preliminary (28 not approved)", cut.Find("[data-testid=export-approval]").TextContent.Trim());
        Assert.Equal(Caution.Text, cut.Find("[data-testid=export-caution]").TextContent.Trim());
        Assert.True(cut.Find("[data-testid=export-final]").HasAttribute("disabled"));
        Assert.Equal("Only the project lead can issue the final set.", cut.Find("[data-testid=export-final-reason]").TextContent.Trim());
        Assert.False(cut.Find("[data-testid=export-book-pdf]").HasAttribute("disabled"));
    }

    [Fact]
    public void The_final_button_is_enabled_for_the_lead_when_every_member_is_approved()
    {
        _exports.Readiness = new ExportReadiness(new IssueStatus(Project, 40, 40, 0, true, "all 40 members are approved."), true, null, "All 40 members approved");
        var cut = RenderPanel();

        Assert.False(cut.Find("[data-testid=export-final]").HasAttribute("disabled"));
        Assert.Empty(cut.FindAll("[data-testid=export-final-reason]"));
    }

    [Fact]
    public async Task Progress_is_shown_while_running_and_the_download_link_appears_only_when_done()
    {
        var cut = RenderPanel();
        await cut.Find("[data-testid=export-summary-xlsx]").ClickAsync(new());

        Assert.Equal((ExportKind.MemberSummary, ExportFormat.Xlsx, false), Assert.Single(_exports.Started));
        cut.WaitForAssertion(() => Assert.Single(cut.FindAll("[data-testid=export-job]")));
        Assert.Empty(cut.FindAll("[data-testid=export-download]"));

        await _exports.PushAsync(FakeExportService.Job(Project, ExportJobStatus.Running, done: 4, total: 10));
        cut.WaitForAssertion(() =>
        {
            Assert.Contains("Rendered RT1 TC1 (4 of 10)", cut.Find("[data-testid=export-stage]").TextContent);
            var bar = cut.Find("[data-testid=export-progress]");
            var valued = bar.HasAttribute("aria-valuenow") ? bar : bar.QuerySelector("[aria-valuenow]");
            Assert.Equal("40", valued?.GetAttribute("aria-valuenow"));
        });
        Assert.Empty(cut.FindAll("[data-testid=export-download]"));

        await _exports.PushAsync(FakeExportService.Job(Project, ExportJobStatus.Succeeded, done: 10, total: 10));
        cut.WaitForAssertion(() =>
        {
            var link = cut.Find("[data-testid=export-download]");
            Assert.Equal("/exports/0e7e0000-0000-4000-8000-000000000001/file", link.GetAttribute("href"));
            Assert.Contains("T-118_A_calculation-book_20261202T090000Z.pdf", link.TextContent);
        });
        Assert.Empty(cut.FindAll("[data-testid=export-progress]"));
    }

    [Fact]
    public async Task A_failed_job_shows_its_message_and_no_download()
    {
        var cut = RenderPanel();

        await _exports.PushAsync(FakeExportService.Job(Project, ExportJobStatus.Failed, error: "The export failed: the project was deleted."));

        cut.WaitForAssertion(() => Assert.Equal("The export failed: the project was deleted. No file was produced.", cut.Find("[data-testid=export-error]").TextContent.Trim()));
        Assert.Empty(cut.FindAll("[data-testid=export-download]"));
        Assert.Empty(cut.FindAll("[data-testid=export-progress]"));
    }

    [Fact]
    public async Task A_refused_final_set_says_why_and_the_subscription_ends_with_the_panel()
    {
        _exports.Readiness = new ExportReadiness(new IssueStatus(Project, 40, 40, 0, true, "all 40 members are approved."), true, null, "All 40 members approved");
        var cut = RenderPanel();
        Assert.Equal(1, _exports.Subscribers);

        await cut.Find("[data-testid=export-final]").ClickAsync(new());

        cut.WaitForAssertion(() => Assert.Equal("The final set cannot be issued: not approved.", cut.Find("[data-testid=export-start-error]").TextContent.Trim()));
        Assert.Equal((ExportKind.CalculationBook, ExportFormat.Pdf, true), Assert.Single(_exports.Started));
        await DisposeComponentsAsync();
        Assert.Equal(0, _exports.Subscribers);
    }

    [Fact]
    public void A_caller_the_service_refuses_sees_the_message_and_hears_no_job_changes()
    {
        _exports.ReadinessRefusal = ServiceResult<ExportReadiness>.NotFound("The project does not exist or you are not a member of it.");
        var cut = RenderPanel();

        Assert.Equal("The project does not exist or you are not a member of it.", cut.Find("[data-testid=export-load-error]").TextContent.Trim());
        Assert.Empty(cut.FindAll("[data-testid=export-book-pdf]"));
        Assert.Equal(0, _exports.Subscribers);
    }

    [Fact]
    public async Task The_approval_line_follows_review_changes_of_its_project_until_the_panel_is_gone()
    {
        var cut = RenderPanel();
        Assert.Contains("12 of 40", cut.Find("[data-testid=export-approval]").TextContent, StringComparison.Ordinal);
        var reads = _exports.ReadinessReads;

        // A change in another project is not this panel's business.
        ReviewHub.Publish(Event(Guid.NewGuid()));
        _exports.Readiness = new ExportReadiness(new IssueStatus(Project, 40, 13, 0, false, "13 of 40 members are approved; 27 are not."), false,
            "Only the project lead can issue the final set.", "13 of 40 members approved — files will be marked preliminary (27 not approved)");
        ReviewHub.Publish(Event(Project));

        cut.WaitForAssertion(() => Assert.Equal("13 of 40 members approved — files will be marked preliminary (27 not approved)",
            cut.Find("[data-testid=export-approval]").TextContent.Trim()));
        Assert.Equal(reads + 1, _exports.ReadinessReads);

        Assert.Equal(1, _reviewEvents.Subscribers);
        await DisposeComponentsAsync();
        Assert.Equal(0, _reviewEvents.Subscribers);
    }

    [Fact]
    public void A_refused_caller_does_not_re_read_on_review_changes()
    {
        _exports.ReadinessRefusal = ServiceResult<ExportReadiness>.NotFound("The project does not exist or you are not a member of it.");
        var cut = RenderPanel();
        var reads = _exports.ReadinessReads;

        ReviewHub.Publish(Event(Project));

        Assert.Equal(0, _reviewEvents.Subscribers);
        Assert.Equal(reads, _exports.ReadinessReads);
        Assert.Single(cut.FindAll("[data-testid=export-load-error]"));
    }

    private static ReviewEvent Event(Guid project) =>
        new(project, Guid.NewGuid(), Guid.NewGuid(), "W3", MemberReviewState.AwaitingCheck, MemberReviewState.Approved, "ReviewApprove", "u-checker", DateTime.UtcNow);

    /// <summary>The real hub, counting live subscriptions (so a test can see one end with the panel).</summary>
    private sealed class CountingReviewEvents(IReviewEvents inner) : IReviewEvents
    {
        private int _subscribers;

        public int Subscribers => Volatile.Read(ref _subscribers);

        public IDisposable Subscribe(Guid projectId, Action<ReviewEvent> handler)
        {
            var inner1 = inner.Subscribe(projectId, handler);
            Interlocked.Increment(ref _subscribers);
            return new Handle(() =>
            {
                inner1.Dispose();
                Interlocked.Decrement(ref _subscribers);
            });
        }

        public void Publish(ReviewEvent reviewEvent) => inner.Publish(reviewEvent);

        private sealed class Handle(Action dispose) : IDisposable
        {
            private Action? _dispose = dispose;

            public void Dispose() => Interlocked.Exchange(ref _dispose, null)?.Invoke();
        }
    }
}
