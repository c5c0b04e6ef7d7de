using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Review;
using TrussWeb.Web.Tests.Fakes;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Review;

public class TrussReviewSectionTests : TrussWebTestContext
{
    private readonly Guid _a = Guid.NewGuid();
    private readonly Guid _b = Guid.NewGuid();
    private readonly Guid _c = Guid.NewGuid();

    public TrussReviewSectionTests()
    {
        Render<MudBlazor.MudPopoverProvider>();
    }

    private IRenderedComponent<TrussReviewSection> RenderSection() =>
        Render<TrussReviewSection>(p => p.Add(x => x.TrussId, FakeReviewService.TrussId).Add(x => x.ProjectId, FakeReviewService.ProjectId));

    [Fact]
    public void A_batch_approval_lists_each_member_and_the_refused_ones_with_the_reason()
    {
        Reviews.Reviews[_a] = FakeReviewService.View(_a, "BC1", MemberReviewState.AwaitingCheck, [ReviewAction.Approve, ReviewAction.Return]);
        Reviews.Reviews[_b] = FakeReviewService.View(_b, "BC2", MemberReviewState.AwaitingCheck, [ReviewAction.Approve, ReviewAction.Return]);
        Reviews.Reviews[_c] = FakeReviewService.View(_c, "TC1", MemberReviewState.NotSubmitted, []);
        Reviews.OnStep = (id, _, _) => id == _b ? ServiceResult<MemberReviewView>.Invalid("State", "BC2: Only a member awaiting check can be approved; this one is returned.") : null;
        var cut = RenderSection();
        cut.WaitForAssertion(() => Assert.Equal(2, cut.FindAll("[data-testid=batch-select]").Count));

        cut.Find("[data-testid=batch-select-all]").Click();
        cut.Find("[data-testid=batch-approve]").Click();

        cut.WaitForAssertion(() => Assert.Equal(2, cut.FindAll("[data-testid=batch-outcome-row]").Count));
        var rows = cut.FindAll("[data-testid=batch-outcome-row]");
        Assert.Equal(["true", "false"], rows.Select(r => r.GetAttribute("data-ok")));
        Assert.Contains("BC2: refused: BC2: Only a member awaiting check can be approved", rows[1].TextContent, StringComparison.Ordinal);
        Assert.Contains("1 of 2 approved", cut.Find("[data-testid=batch-outcome]").TextContent, StringComparison.Ordinal);
        Assert.Equal(["Approve", "Approve"], Reviews.Calls.Select(c => c.Call));
    }

    [Fact]
    public void A_batch_return_without_a_comment_names_the_field_and_calls_nothing()
    {
        Reviews.Reviews[_a] = FakeReviewService.View(_a, "BC1", MemberReviewState.AwaitingCheck, [ReviewAction.Approve, ReviewAction.Return]);
        var cut = RenderSection();
        cut.WaitForAssertion(() => cut.Find("[data-testid=batch-select]"));

        cut.Find("[data-testid=batch-select]").Change(true);
        cut.Find("[data-testid=batch-return]").Click();

        cut.WaitForAssertion(() => Assert.StartsWith("Comment:", cut.Find("[data-testid=batch-comment-error]").TextContent.Trim(), StringComparison.Ordinal));
        Assert.Empty(Reviews.Calls);
    }

    [Fact]
    public void Submit_all_shows_what_was_submitted_and_what_was_skipped_and_why()
    {
        Reviews.Reviews[_a] = FakeReviewService.View(_a, "BC1", MemberReviewState.NotSubmitted, [ReviewAction.Submit]);
        Reviews.Reviews[_b] = FakeReviewService.View(_b, "BC2", MemberReviewState.Approved, []);
        Reviews.Submission = new TrussSubmission([FakeReviewService.View(_a, "BC1", MemberReviewState.AwaitingCheck, [])],
            [new SkippedMember(_b, "BC2", MemberReviewState.Approved, "The member is approved and unchanged since; there is nothing to submit.")]);
        var cut = RenderSection();
        cut.WaitForAssertion(() => cut.Find("[data-testid=submit-all]"));

        cut.Find("[data-testid=submit-all]").Click();

        cut.WaitForAssertion(() => Assert.Equal(2, cut.FindAll("[data-testid=batch-outcome-row]").Count));
        Assert.Equal(("SubmitTruss", FakeReviewService.TrussId, (string?)"u-checker"), Reviews.Calls.Single());
        var skipped = cut.FindAll("[data-testid=batch-outcome-row]")[1].TextContent;
        Assert.Contains("BC2", skipped, StringComparison.Ordinal);
        Assert.Contains("nothing to submit", skipped, StringComparison.Ordinal);
    }
}
