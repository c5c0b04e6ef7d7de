using AngleSharp.Dom;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Pages.Members;
using TrussWeb.Web.Tests.Support;

using TrussWeb.Web.Tests.Support.MemberPageFakes;

namespace TrussWeb.Web.Tests.Members;

public class MemberPageTests : TrussWebTestContext
{
    private readonly FakeDesignService _design = new();
    private readonly FakeTrussService _trusses = new();
    private readonly FakeCatalogueService _catalogue = new();
    private readonly Core.TrussDesign.MemberOutcome _member = ServiceViews.Diagonal;

    public MemberPageTests()
    {
        _design.Stored = ServiceViews.Detail(_member);
        _trusses.Detail = ServiceViews.Truss(_member);
        Reviews.Reviews[ServiceViews.IdOf(_member)] = Fakes.FakeReviewService.View(ServiceViews.IdOf(_member), _member.Mark, MemberReviewState.NotSubmitted, [ReviewAction.Submit]);
        Services.AddSingleton<IDesignService>(_design);
        Services.AddSingleton<ITrussService>(_trusses);
        Services.AddSingleton<ICatalogueService>(_catalogue);
        Services.AddSingleton(UnusedService.Create<IProjectService>());
        Render<MudBlazor.MudPopoverProvider>();
    }

    private IRenderedComponent<MemberPage> RenderPage()
    {
        var cut = RenderAt(ServiceViews.IdOf(_member));
        cut.WaitForAssertion(() => cut.Find("[data-testid=member-title]"));
        return cut;
    }

    private IRenderedComponent<MemberPage> RenderAt(Guid memberId)
    {
        Services.GetRequiredService<Microsoft.AspNetCore.Components.NavigationManager>().NavigateTo($"/members/{memberId}?truss={ServiceViews.TrussId}");
        return Render<MemberPage>(p => p.Add(x => x.Id, memberId));
    }

    private static IElement Input(IRenderedComponent<MemberPage> cut, string testId)
    {
        var element = cut.Find($"[data-testid={testId}]");
        return element.TagName == "INPUT" ? element : element.QuerySelector("input")!;
    }

    [Fact]
    public void Shows_every_step_of_the_stored_record_in_order()
    {
        var cut = RenderPage();

        var expected = _member.Design.Record!.Steps.Select(s => s.Symbol).ToList();
        Assert.True(expected.Count > 10);
        cut.WaitForAssertion(() => Assert.Equal(expected, Texts(cut, "[data-testid=member-record] [data-testid=step-symbol]")));
        Assert.Contains(_member.Mark, cut.Find("[data-testid=member-title]").TextContent, StringComparison.Ordinal);
        Assert.Equal(Core.Records.Display.Sig(_member.Design.Utilization), cut.Find("[data-testid=member-utilization]").TextContent.Trim());
        Assert.Equal(_member.Lengths.LxSource, cut.Find("[data-testid=source-x]").TextContent.Trim());
    }

    [Fact]
    public void An_invalid_save_puts_the_message_next_to_its_field_and_keeps_the_value()
    {
        _design.OnUpdate = _ => ServiceResult<MemberDesignDetail>.Invalid("Kx", "must be greater than 0 (got 0)");
        var cut = RenderPage();

        Input(cut, "input-Kx").Change("0");
        cut.Find("[data-testid=member-save]").Click();

        cut.WaitForAssertion(() => Assert.Contains("must be greater than 0 (got 0)", cut.Find("[data-testid=axis-x]").TextContent, StringComparison.Ordinal));
        Assert.DoesNotContain("must be greater than 0", cut.Find("[data-testid=axis-y]").TextContent, StringComparison.Ordinal);
        Assert.Equal(0, _design.Updates.Single().Overrides.Kx);
        Assert.Equal("0", Input(cut, "input-Kx").GetAttribute("value"));
    }

    [Fact]
    public void A_conflict_names_the_other_user_and_keeps_the_typed_values()
    {
        _design.OnUpdate = input => ServiceResult<MemberDesignDetail>.Conflict([new ConflictDetail("Member", ServiceViews.IdOf(_member).ToString(), _member.Mark, "u2", "Pieter Checker",
            new DateTime(2026, 12, 1, 9, 30, 0, DateTimeKind.Utc), false, ["LengthXMm"], new Dictionary<string, string?> { ["LengthXMm"] = "2500" }, null, "Pieter Checker saved this member first.")]);
        var cut = RenderPage();

        Input(cut, "input-LengthXMm").Change("2500");
        cut.Find("[data-testid=member-save]").Click();

        cut.WaitForAssertion(() => Assert.Contains("Pieter Checker", cut.Find("[data-testid=member-conflict]").TextContent, StringComparison.Ordinal));
        Assert.Equal("2500", Input(cut, "input-LengthXMm").GetAttribute("value"));
        Assert.Equal(2500, _design.Updates.Single().Overrides.LengthXMm);
        Assert.NotNull(cut.Find("[data-testid=member-dirty]"));
    }

    [Fact]
    public void A_successful_save_shows_the_new_utilization_without_reloading()
    {
        var heavier = TestData.SizedTruss.Design.Members.First(m => m.Group == "Diagonals" && m.Design.Utilization != _member.Design.Utilization);
        _design.OnUpdate = input => ServiceResult<MemberDesignDetail>.Ok(ServiceViews.Detail(heavier, 4, input.Overrides) with { Row = ServiceViews.Detail(heavier).Row with { MemberId = ServiceViews.IdOf(_member) } });
        var cut = RenderPage();

        Input(cut, "input-Ky").Change("0.9");
        cut.Find("[data-testid=member-save]").Click();

        cut.WaitForAssertion(() => Assert.Equal(Core.Records.Display.Sig(heavier.Design.Utilization), cut.Find("[data-testid=member-utilization]").TextContent.Trim()));
        Assert.Equal(3, _design.Updates.Single().Version);
        Assert.Empty(cut.FindAll("[data-testid=member-dirty]"));
    }

    [Fact]
    public void A_design_save_reloads_the_review_so_a_lapsed_approval_shows_at_once()
    {
        var id = ServiceViews.IdOf(_member);
        Reviews.Reviews[id] = Fakes.FakeReviewService.View(id, _member.Mark, MemberReviewState.Approved, []);
        var cut = RenderPage();
        cut.WaitForAssertion(() => Assert.Equal("Approved", cut.Find("[data-testid=review-state]").GetAttribute("data-state")));

        // The service's design run makes the approval stale in the same unit of work as the save.
        _design.OnUpdate = input =>
        {
            Reviews.Reviews[id] = Fakes.FakeReviewService.View(id, _member.Mark, MemberReviewState.ApprovalStale, [ReviewAction.Submit]);
            return ServiceResult<MemberDesignDetail>.Ok(_design.Stored! with { Overrides = input.Overrides, MemberVersion = input.Version + 1 });
        };
        Input(cut, "input-Ky").Change("0.9");
        cut.Find("[data-testid=member-save]").Click();

        cut.WaitForAssertion(() => Assert.Equal("ApprovalStale", cut.Find("[data-testid=review-state]").GetAttribute("data-state")));
        Assert.NotNull(cut.Find("[data-testid=review-submit]"));
    }

    [Fact]
    public void Review_steps_wait_while_the_design_has_unsaved_changes()
    {
        var cut = RenderPage();
        cut.WaitForAssertion(() => cut.Find("[data-testid=review-submit]"));

        Input(cut, "input-Ky").Change("0.9");

        cut.WaitForAssertion(() => Assert.NotNull(cut.Find("[data-testid=review-blocked]")));
        Assert.True(cut.Find("[data-testid=review-submit]").HasAttribute("disabled"));
        Assert.Empty(Reviews.Calls);
    }

    [Fact]
    public void The_section_picker_filters_by_designation_and_size()
    {
        var cut = RenderPage();
        cut.WaitForAssertion(() => Assert.NotEmpty(cut.FindAll("[data-testid=picker-row]")));

        Input(cut, "picker-search").Input("L100");
        cut.WaitForAssertion(() =>
        {
            var shown = cut.FindAll("[data-testid=picker-designation]").Select(e => e.TextContent).ToList();
            Assert.NotEmpty(shown);
            Assert.All(shown, d => Assert.Contains("L100", d, StringComparison.OrdinalIgnoreCase));
        });

        Input(cut, "picker-min").Change("200");
        Input(cut, "picker-max").Change("100");
        cut.WaitForAssertion(() => Assert.Contains("must not exceed", cut.Find("[data-testid=picker-message]").TextContent, StringComparison.Ordinal));
        Assert.Empty(cut.FindAll("[data-testid=picker-row]"));
    }

    [Fact]
    public void Choosing_a_section_marks_the_form_unsaved_and_sends_the_designation()
    {
        var cut = RenderPage();
        Input(cut, "picker-search").Input("L100x100x10");
        cut.WaitForAssertion(() => Assert.Contains("L100x100x10", Texts(cut, "[data-testid=picker-designation]")));

        cut.Find("[data-designation=L100x100x10] [data-testid=picker-choose]").Click();
        cut.WaitForAssertion(() => Assert.NotNull(cut.Find("[data-testid=member-dirty]")));
        cut.Find("[data-testid=member-save]").Click();

        cut.WaitForAssertion(() => Assert.Equal("L100x100x10", _design.Updates.Single().Overrides.SectionOverride));
    }

    [Fact]
    public void An_unknown_member_shows_a_clear_message()
    {
        var cut = RenderAt(Guid.NewGuid());

        cut.WaitForAssertion(() => Assert.Contains("could not be found", cut.Find("[data-testid=member-failure]").TextContent, StringComparison.Ordinal));
    }
}
