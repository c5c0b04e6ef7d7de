using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Review;
using TrussWeb.Web.Tests.Fakes;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Review;

public class MemberReviewPanelTests : TrussWebTestContext
{
    private static readonly Guid Member = Guid.Parse("7a000000-0000-4000-8000-0000000000c1");

    private static readonly string[] AllButtons = ["review-submit", "review-resubmit", "review-approve", "review-return", "review-withdraw", "review-reassign"];

    public MemberReviewPanelTests()
    {
        Render<MudBlazor.MudPopoverProvider>();
    }

    private IRenderedComponent<MemberReviewPanel> RenderPanel(MemberReviewState state, params ReviewAction[] actions)
    {
        Reviews.Reviews[Member] = FakeReviewService.View(Member, "TC1", state, actions);
        var cut = Render<MemberReviewPanel>(p => p.Add(x => x.MemberId, Member));
        cut.WaitForAssertion(() => cut.Find("[data-testid=review-state]"));
        return cut;
    }

    private static AngleSharp.Dom.IElement Text(IRenderedComponent<MemberReviewPanel> cut)
    {
        var element = cut.Find("[data-testid=review-text]");
        return element.TagName == "TEXTAREA" ? element : element.QuerySelector("textarea")!;
    }

    private static List<string> Buttons(IRenderedComponent<MemberReviewPanel> cut) =>
        AllButtons.Where(id => cut.FindAll($"[data-testid={id}]").Count > 0).ToList();

    // State and role combinations with the actions the service's view offers in each (docs/dev/review.md, transition table
    // and the rules about people); the panel must show exactly those buttons.
    public static TheoryData<MemberReviewState, string, ReviewAction[], string[]> Combinations => new()
    {
        { MemberReviewState.NotSubmitted, "designer", [ReviewAction.Submit], ["review-submit"] },
        { MemberReviewState.NotSubmitted, "checker", [], [] },
        { MemberReviewState.AwaitingCheck, "designer", [ReviewAction.Withdraw], ["review-withdraw"] },
        { MemberReviewState.AwaitingCheck, "assigned checker", [ReviewAction.Approve, ReviewAction.Return], ["review-approve", "review-return"] },
        { MemberReviewState.AwaitingCheck, "lead, not the checker", [ReviewAction.Withdraw, ReviewAction.ReassignChecker], ["review-withdraw", "review-reassign"] },
        { MemberReviewState.Returned, "designer", [ReviewAction.Resubmit], ["review-resubmit"] },
        { MemberReviewState.Returned, "lead", [ReviewAction.Resubmit, ReviewAction.ReassignChecker], ["review-resubmit", "review-reassign"] },
        { MemberReviewState.Approved, "designer", [], [] },
        { MemberReviewState.Approved, "checker", [], [] },
        { MemberReviewState.ApprovalStale, "designer", [ReviewAction.Submit], ["review-submit"] },
    };

    [Theory]
    [MemberData(nameof(Combinations))]
    public void Shows_exactly_the_actions_the_view_allows(MemberReviewState state, string role, ReviewAction[] actions, string[] expected)
    {
        var cut = RenderPanel(state, actions);

        Assert.True(expected.SequenceEqual(Buttons(cut)), $"{state} as {role}: expected [{string.Join(", ", expected)}], shown [{string.Join(", ", Buttons(cut))}]");
        Assert.Equal(actions.Length > 0, cut.FindAll("[data-testid=review-actions]").Count == 1);
        Assert.Equal(state.ToString(), cut.Find("[data-testid=review-state]").GetAttribute("data-state"));
    }

    [Fact]
    public void Return_without_a_comment_names_the_field_and_calls_nothing()
    {
        var cut = RenderPanel(MemberReviewState.AwaitingCheck, ReviewAction.Approve, ReviewAction.Return);

        cut.Find("[data-testid=review-return]").Click();

        cut.WaitForAssertion(() => Assert.StartsWith("Comment:", cut.Find("[data-testid=review-text-error]").TextContent.Trim(), StringComparison.Ordinal));
        Assert.Contains("required", cut.Find("[data-testid=review-text-error]").TextContent, StringComparison.Ordinal);
        Assert.Empty(Reviews.Calls);
    }

    [Fact]
    public void Resubmit_without_an_answer_names_the_field_and_calls_nothing()
    {
        var cut = RenderPanel(MemberReviewState.Returned, ReviewAction.Resubmit);

        cut.Find("[data-testid=review-resubmit]").Click();

        cut.WaitForAssertion(() => Assert.StartsWith("Answer:", cut.Find("[data-testid=review-text-error]").TextContent.Trim(), StringComparison.Ordinal));
        Assert.Empty(Reviews.Calls);
    }

    [Fact]
    public void A_refusal_from_the_service_is_shown_and_the_typed_comment_is_kept()
    {
        const string refusal = "You are the designer of record of TC1; another checker must approve it.";
        Reviews.OnStep = (_, action, _) => action == ReviewAction.Approve ? ServiceResult<MemberReviewView>.Forbidden(refusal) : null;
        var cut = RenderPanel(MemberReviewState.AwaitingCheck, ReviewAction.Approve, ReviewAction.Return);

        Text(cut).Input("Looks right");
        cut.Find("[data-testid=review-approve]").Click();

        cut.WaitForAssertion(() => Assert.Equal(refusal, cut.Find("[data-testid=review-refusal]").TextContent.Trim()));
        Assert.Equal([("Approve", Member, (string?)"Looks right")], Reviews.Calls);
        Assert.Equal("Looks right", Text(cut).GetAttribute("value"));
        Assert.Equal(MemberReviewState.AwaitingCheck.ToString(), cut.Find("[data-testid=review-state]").GetAttribute("data-state"));
    }

    [Fact]
    public void Return_with_a_comment_calls_the_service_and_shows_the_new_state()
    {
        var cut = RenderPanel(MemberReviewState.AwaitingCheck, ReviewAction.Approve, ReviewAction.Return);

        Text(cut).Input("  Check the connector spacing  ");
        cut.Find("[data-testid=review-return]").Click();

        cut.WaitForAssertion(() => Assert.Equal("Returned", cut.Find("[data-testid=review-state]").GetAttribute("data-state")));
        Assert.Equal([("Return", Member, (string?)"Check the connector spacing")], Reviews.Calls);
        Assert.Empty(Buttons(cut));
    }

    [Fact]
    public void An_event_for_this_member_refreshes_the_panel_and_one_for_another_member_does_not()
    {
        var cut = RenderPanel(MemberReviewState.AwaitingCheck, ReviewAction.Withdraw);
        var reads = Reviews.ReviewReads;

        // Another member of the project changes: nothing to reload.
        ReviewHub.Publish(new ReviewEvent(FakeReviewService.ProjectId, FakeReviewService.TrussId, Guid.NewGuid(), "BC1",
            MemberReviewState.AwaitingCheck, MemberReviewState.Approved, "ReviewApprove", "u-checker", DateTime.UtcNow));
        Assert.Equal(reads, Reviews.ReviewReads);

        // The checker approves this member in their own circuit: the service commits, then publishes.
        Reviews.Reviews[Member] = FakeReviewService.View(Member, "TC1", MemberReviewState.Approved, []);
        ReviewHub.Publish(new ReviewEvent(FakeReviewService.ProjectId, FakeReviewService.TrussId, Member, "TC1",
            MemberReviewState.AwaitingCheck, MemberReviewState.Approved, "ReviewApprove", "u-checker", DateTime.UtcNow));

        cut.WaitForAssertion(() => Assert.Equal("Approved", cut.Find("[data-testid=review-state]").GetAttribute("data-state")));
        Assert.Empty(Buttons(cut));
    }

    [Fact]
    public async Task After_dispose_the_panel_no_longer_listens()
    {
        RenderPanel(MemberReviewState.AwaitingCheck, ReviewAction.Withdraw);
        await DisposeComponentsAsync();
        var reads = Reviews.ReviewReads;

        ReviewHub.Publish(new ReviewEvent(FakeReviewService.ProjectId, FakeReviewService.TrussId, Member, "TC1",
            MemberReviewState.AwaitingCheck, MemberReviewState.Approved, "ReviewApprove", "u-checker", DateTime.UtcNow));

        Assert.Equal(reads, Reviews.ReviewReads);
        Assert.Equal(0, ReviewHub.HandlerFailures);
    }

    [Fact]
    public void Comments_with_markup_are_shown_as_text()
    {
        Reviews.Audit.Add(new AuditEntryView(1, new DateTime(2026, 12, 1, 9, 0, 0, DateTimeKind.Utc), "u-checker", "<i>Chris</i>", "TrussMember", Member.ToString(),
            "ReviewReturn", "ReviewState", "AwaitingCheck", "Returned", "<script>alert(1)</script><b>thicker</b>", "fp"));
        var cut = RenderPanel(MemberReviewState.Returned, ReviewAction.Resubmit);

        var comment = cut.Find("[data-testid=thread-comment]");
        Assert.Equal("<script>alert(1)</script><b>thicker</b>", comment.TextContent.Trim());
        Assert.Empty(comment.QuerySelectorAll("script, b"));
        Assert.Contains("<i>Chris</i>", cut.Find("[data-testid=thread-entry]").TextContent, StringComparison.Ordinal);
    }

    [Fact]
    public void A_stale_approval_shows_what_changed()
    {
        Reviews.Changes = new ChangesSinceApproval(Member, "TC1", MemberReviewState.ApprovalStale, "a1b2c3d4e5f6a7b8", "0f9e8d7c6b5a", new DateTime(2026, 12, 1, 9, 0, 0, DateTimeKind.Utc), "Chris Checker",
            [new FieldChange("inputs.lengths.kx", "1", "0.9"), new FieldChange("results.utilization", "0.81", "0.77")]);

        var cut = RenderPanel(MemberReviewState.ApprovalStale, ReviewAction.Submit);

        var rows = cut.FindAll("[data-testid=changes-since-approval] [data-testid=change-row]").Select(r => r.TextContent).ToList();
        Assert.Equal(2, rows.Count);
        Assert.Contains("0.9", rows[0], StringComparison.Ordinal);
        Assert.Contains("0.77", rows[1], StringComparison.Ordinal);
        Assert.Contains("stale", cut.Find("[data-testid=review-state]").TextContent, StringComparison.Ordinal);
    }
}
