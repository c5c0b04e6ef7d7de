using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Pages.Trusses;
using TrussWeb.Web.Tests.Fakes;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Trusses;

public class TrussPageTests : TrussWebTestContext
{
    private readonly FakeTrussService _trusses = new();
    private readonly FakeDesignService _design = new();

    public TrussPageTests()
    {
        Services.AddSingleton<ITrussService>(_trusses);
        Services.AddSingleton<IDesignService>(_design);
        Services.AddSingleton<ICatalogueService, FakeCatalogueService>();
    }

    private static TrussDesignView DesignOf(TrussDetail t) => new(t.Id, "Fail", 1.12, 41.3, 45.4, [],
        t.Members.Select((m, i) => new MemberDesignRow(m.Id, m.Mark, m.Group, "L50x50x5", "S355JR", m.LengthMm,
            new ForcesView(0, null, 20000 + i, "ULS 1"), new LengthsView(m.LengthMm, m.LengthMm, m.LengthMm, 1, 1, 1, null, null, "a", "b", "c"),
            i == 0 ? 1.12 : 0.7, "Compression", "ULS 1", i == 0 ? "Fail" : "Pass", "Draft", "fp")).ToList(),
        [], "fp", "SANS 10162-1", "2011", "1.0", DateTime.UtcNow);

    [Fact]
    public void Header_elevation_and_results_come_from_the_stored_design()
    {
        var truss = TrussDetails.Small();
        _trusses.Truss = truss;
        _design.StoredDesign = DesignOf(truss);

        var cut = Render<TrussPage>(p => p.Add(x => x.TrussId, truss.Id));

        cut.WaitForAssertion(() => Assert.Equal("Test truss", cut.Find("[data-testid=truss-title]").TextContent.Trim()));
        Assert.Contains("1.12", cut.Find("[data-testid=truss-max-u]").TextContent);
        Assert.Contains("41.3 kg", cut.Find("[data-testid=truss-mass]").TextContent);
        Assert.Equal(2, cut.FindAll("[data-testid=member-link]").Count);
        Assert.NotNull(cut.Find("[data-testid=truss-elevation]"));
        Assert.NotNull(cut.Find("[data-testid=sizing-run]"));
    }

    [Fact]
    public void Unknown_truss_shows_the_not_found_panel()
    {
        var cut = Render<TrussPage>(p => p.Add(x => x.TrussId, Guid.NewGuid()));

        cut.WaitForAssertion(() => Assert.NotNull(cut.Find("[data-testid=notfound-panel]")));
        Assert.Empty(cut.FindAll("[data-testid=truss-elevation]"));
    }
}
