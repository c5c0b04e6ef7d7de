using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Trusses;
using TrussWeb.Web.Tests.Fakes;
using TrussWeb.Web.Tests.Support;

namespace TrussWeb.Web.Tests.Trusses;

public class TableEditorTests : TrussWebTestContext
{
    private readonly FakeTrussService _trusses = new();

    public TableEditorTests() => Services.AddSingleton<ITrussService>(_trusses);

    [Fact]
    public async Task Node_message_lands_on_the_edited_row_and_only_changed_rows_are_sent_with_their_versions()
    {
        var truss = TrussDetails.Small();
        _trusses.OnSaveNodes = _ => ServiceResult<TrussDetail>.Invalid("Rows[0].YMm", "must be at most 20000 mm (got 99999 mm)");
        var cut = Render<NodesEditor>(p => p.Add(x => x.Truss, truss).Add(x => x.CanEdit, true));
        var rows = cut.FindAll("[data-testid=nodes-table] tbody tr");
        rows[1].QuerySelectorAll("input")[2].Change("99999");

        await cut.Find("[data-testid=save-nodes]").ClickAsync(new());

        var sent = Assert.Single(_trusses.NodeSaves);
        var row = Assert.Single(sent.Rows);
        Assert.Equal(truss.Nodes[1].Id, row.Id);
        Assert.Equal(5, row.Version);
        Assert.Equal(99999, row.YMm);
        cut.WaitForAssertion(() =>
        {
            var shown = cut.FindAll("[data-testid=nodes-table] tbody tr");
            Assert.Contains("must be at most 20000 mm (got 99999 mm)", shown[1].TextContent);
            Assert.DoesNotContain("must be at most", shown[0].TextContent);
            Assert.Equal("99999", shown[1].QuerySelectorAll("input")[2].GetAttribute("value"));
        });
    }

    [Fact]
    public async Task Actions_conflict_names_the_other_user_and_keeps_the_typed_value()
    {
        var truss = TrussDetails.Small();
        _trusses.OnSaveActions = _ => ServiceResult<TrussDetail>.Conflict([
            new ConflictDetail("Actions", truss.Actions.Id.ToString()!, "Actions", "u9", "Other Engineer", null, false, ["ImposedKPa"],
                new Dictionary<string, string?>(), new Dictionary<string, string?> { ["ImposedKPa"] = "0.25" }, "Changed.")]);
        var cut = Render<ActionsEditor>(p => p.Add(x => x.Truss, truss).Add(x => x.CanEdit, true));
        cut.Find("input[data-testid=covering]").Change("0.3");

        await cut.Find("[data-testid=save-actions]").ClickAsync(new());

        Assert.Equal(6, Assert.Single(_trusses.ActionSaves).Version);
        cut.WaitForAssertion(() =>
        {
            Assert.Equal("Other Engineer", cut.Find("[data-testid=conflict-user]").TextContent.Trim());
            Assert.Equal("0.3", cut.Find("input[data-testid=covering]").GetAttribute("value"));
        });
    }

    [Fact]
    public void Editing_a_cell_reports_unsaved_edits_and_undo_reports_them_gone()
    {
        var reports = new List<bool>();
        var cut = Render<NodesEditor>(p => p.Add(x => x.Truss, TrussDetails.Small()).Add(x => x.CanEdit, true).Add(x => x.OnDirtyChanged, d => reports.Add(d)));

        cut.FindAll("[data-testid=nodes-table] tbody tr")[0].QuerySelectorAll("input")[1].Change("10");
        cut.WaitForAssertion(() => Assert.Equal([true], reports));
        Assert.True(cut.Instance.IsDirty);

        cut.FindAll("button").Single(b => b.TextContent.Contains("Undo edits", StringComparison.Ordinal)).Click();

        cut.WaitForAssertion(() => Assert.Equal([true, false], reports));
        Assert.False(cut.Instance.IsDirty);
    }

    [Fact]
    public void Read_only_truss_has_disabled_inputs_and_no_save_button()
    {
        var cut = Render<NodesEditor>(p => p.Add(x => x.Truss, TrussDetails.Small(canEdit: false)).Add(x => x.CanEdit, false));

        Assert.Empty(cut.FindAll("[data-testid=save-nodes]"));
        Assert.All(cut.FindAll("[data-testid=nodes-table] input"), i => Assert.True(i.HasAttribute("disabled")));
    }
}
