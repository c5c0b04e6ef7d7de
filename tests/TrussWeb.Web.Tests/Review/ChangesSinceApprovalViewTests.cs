using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Review;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Review;

public class ChangesSinceApprovalViewTests : TrussWebTestContext
{
    private static ChangesSinceApproval With(params FieldChange[] changes) => new(Guid.NewGuid(), "TC1", MemberReviewState.ApprovalStale,
        "a1b2c3d4e5f6a7b8c9d0", "0f9e8d7c6b5a49382716", new DateTime(2026, 12, 1, 9, 0, 0, DateTimeKind.Utc), "Chris Checker", changes);

    [Fact]
    public void Each_change_shows_the_field_the_value_at_approval_and_the_value_now_inputs_before_results()
    {
        var cut = Render<ChangesSinceApprovalView>(p => p.Add(x => x.Changes, With(
            new FieldChange("results.utilization", "0.812", "0.934"),
            new FieldChange("inputs.section.designation", "L70x70x6", "L65x65x6"),
            new FieldChange("inputs.lengths.kx", "1", null))));

        var inputs = cut.FindAll("[data-testid=changes-inputs] [data-testid=change-row]")
            .Select(r => (r.QuerySelector("[data-testid=change-field]")!.TextContent, r.QuerySelector("[data-testid=change-old]")!.TextContent, r.QuerySelector("[data-testid=change-new]")!.TextContent))
            .ToList();
        Assert.Equal([("inputs.section.designation", "L70x70x6", "L65x65x6"), ("inputs.lengths.kx", "1", "(none)")], inputs);
        var results = cut.FindAll("[data-testid=changes-results] [data-testid=change-row]");
        Assert.Equal(["results.utilization", "0.812", "0.934"], results.Single().QuerySelectorAll("td").Select(td => td.TextContent).ToArray());
        Assert.Contains("by Chris Checker", cut.Markup, StringComparison.Ordinal);
        Assert.Contains("a1b2c3d4e5f6", cut.Markup, StringComparison.Ordinal);
        Assert.DoesNotContain("a1b2c3d4e5f6a", cut.Markup, StringComparison.Ordinal);
    }

    [Fact]
    public void No_differing_field_says_so()
    {
        var cut = Render<ChangesSinceApprovalView>(p => p.Add(x => x.Changes, With()));

        Assert.Empty(cut.FindAll("[data-testid=change-row]"));
        Assert.NotNull(cut.Find("[data-testid=no-changes]"));
    }
}
