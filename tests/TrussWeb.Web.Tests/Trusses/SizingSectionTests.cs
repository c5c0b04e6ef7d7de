using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Trusses;
using TrussWeb.Web.Tests.Fakes;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Trusses;

public class SizingSectionTests : TrussWebTestContext
{
    private static readonly Guid TrussId = Guid.NewGuid();
    private readonly FakeDesignService _design = new();

    public SizingSectionTests()
    {
        _design.Proposal = new SizingProposal(Guid.NewGuid(), TrussId,
        [
            new GroupProposal(Guid.NewGuid(), 3, "TopChord", "2L 65x65x6", "2L 75x75x6", 0.93, null),
            new GroupProposal(Guid.NewGuid(), 4, "Diagonals", "L50x50x5", null, null, "no section within 40-60 mm passes"),
        ], 812.4, 845.25, [new SizingRoundView(1, new Dictionary<string, string>(), 845.25)], true, "Fail");
        _design.ProgressToReport = [new SizingProgress(1, "checking TopChord")];
        Services.AddSingleton<IDesignService>(_design);
    }

    private IRenderedComponent<SizingSection> RenderSizing(Action<TrussDesignView>? accepted = null) =>
        Render<SizingSection>(p => p
            .Add(x => x.TrussId, TrussId)
            .Add(x => x.CanEdit, true)
            .Add(x => x.OnAccepted, v => accepted?.Invoke(v)));

    [Fact]
    public async Task Proposal_lists_every_group_with_current_and_proposed_section_and_the_unsized_reason()
    {
        var cut = RenderSizing();

        await cut.Find("[data-testid=sizing-run]").ClickAsync(new());

        cut.WaitForAssertion(() => Assert.Equal(2, cut.FindAll("[data-testid=sizing-group]").Count));
        var rows = cut.FindAll("[data-testid=sizing-group]").Select(r => r.TextContent).ToList();
        Assert.Contains("TopChord", rows[0]);
        Assert.Contains("2L 65x65x6", rows[0]);
        Assert.Contains("2L 75x75x6", rows[0]);
        Assert.Contains("none passes", rows[1]);
        Assert.Contains("no section within 40-60 mm passes", cut.Find("[data-testid=sizing-unsized]").TextContent);
        Assert.Contains("812 kg now, 845 kg proposed", cut.Find("[data-testid=sizing-mass]").TextContent);
        Assert.Empty(_design.Accepted);
        Assert.Empty(_design.Discarded);
    }

    [Fact]
    public async Task Accept_sends_the_shown_proposal_and_reports_the_new_design()
    {
        var design = new TrussDesignView(TrussId, "Pass", 0.93, 845.25, 900, [], [], [], "fp", "SANS 10162-1", "2011", "1.0", DateTime.UtcNow);
        _design.DesignAfterAccept = design;
        TrussDesignView? reported = null;
        var cut = RenderSizing(v => reported = v);
        await cut.Find("[data-testid=sizing-run]").ClickAsync(new());

        await cut.WaitForElement("[data-testid=sizing-accept]").ClickAsync(new());

        Assert.Same(_design.Proposal, Assert.Single(_design.Accepted));
        Assert.Empty(_design.Discarded);
        Assert.Same(design, reported);
        cut.WaitForAssertion(() => Assert.Empty(cut.FindAll("[data-testid=sizing-proposal]")));
    }

    [Fact]
    public async Task Discard_sends_the_proposal_to_discard_and_changes_nothing()
    {
        var reported = false;
        var cut = RenderSizing(_ => reported = true);
        await cut.Find("[data-testid=sizing-run]").ClickAsync(new());

        await cut.WaitForElement("[data-testid=sizing-discard]").ClickAsync(new());

        Assert.Same(_design.Proposal, Assert.Single(_design.Discarded));
        Assert.Empty(_design.Accepted);
        Assert.False(reported);
        cut.WaitForAssertion(() => Assert.Empty(cut.FindAll("[data-testid=sizing-proposal]")));
    }

    [Fact]
    public void Without_edit_rights_there_is_no_size_button()
    {
        var cut = Render<SizingSection>(p => p.Add(x => x.TrussId, TrussId).Add(x => x.CanEdit, false));

        Assert.Empty(cut.FindAll("[data-testid=sizing-run]"));
    }
}
