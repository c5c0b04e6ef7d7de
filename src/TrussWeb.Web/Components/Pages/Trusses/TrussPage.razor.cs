using Microsoft.AspNetCore.Components;
using Microsoft.AspNetCore.Components.Routing;
using MudBlazor;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Truss;
using TrussWeb.Web.Components.Trusses;

namespace TrussWeb.Web.Components.Pages.Trusses;

/// <summary>
/// One truss: status, elevation, member results, sizing and the editable tables. Each table saves
/// with its own button; the service re-designs on every save and the page shows the fresh result.
/// </summary>
public partial class TrussPage
{
    private const string EnvelopeKey = "envelope";

    private ResultKind? _loadKind;
    private string? _loadMessage;
    private TrussDetail? _truss;
    private TrussDesignView? _design;
    private ElevationInput? _elevation;
    private ElevationMode _mode = ElevationMode.Geometry;
    private bool _working;
    private NodesEditor? _nodes;
    private MembersEditor? _members;
    private GroupsEditor? _groups;
    private ActionsEditor? _actions;
    private CombinationsEditor? _combinations;
    private Review.TrussReviewSection? _review;

    [Parameter, EditorRequired] public required Guid TrussId { get; set; }

    [Inject] private ITrussService Trusses { get; set; } = default!;

    [Inject] private IDesignService Design { get; set; } = default!;

    [Inject] private NavigationManager Navigation { get; set; } = default!;

    [Inject] private IDialogService Dialogs { get; set; } = default!;

    private string? Status => _design?.Status ?? _truss?.Design.Status;

    private bool HasUnsavedEdits =>
        new TableEditorBase?[] { _nodes, _members, _groups, _actions, _combinations }.Any(e => e?.IsDirty == true);

    private List<BreadcrumbItem> Crumbs =>
        [new("Projects", "/projects"), new("Project", $"/projects/{_truss?.ProjectId}"), new(_truss?.Name ?? "Truss", null, disabled: true)];

    protected override async Task OnParametersSetAsync()
    {
        var result = await Trusses.GetAsync(TrussId);
        _loadKind = result.Kind;
        _loadMessage = result.Message;
        _truss = result.Value;
        if (_truss is not null)
        {
            await LoadDesignAsync();
        }
    }

    private async Task LoadDesignAsync()
    {
        _working = true;
        try
        {
            var design = await Design.GetTrussDesignAsync(TrussId);
            _design = design.IsOk ? design.Value : null;
            _elevation = ElevationInput.From(_truss!, _design);
            if ((_mode == ElevationMode.AxialForce && _elevation.Analysis is null) || (_mode == ElevationMode.Utilization && _elevation.Outcomes is null))
            {
                _mode = ElevationMode.Geometry;
            }
        }
        finally
        {
            _working = false;
        }
    }

    private async Task SavedAsync(TrussDetail fresh)
    {
        _truss = fresh;
        await LoadDesignAsync();
        await ReloadReviewAsync();
    }

    /// <summary>A save re-designs the truss: approvals may have lapsed and designers of record changed.</summary>
    private Task ReloadReviewAsync() => _review?.ReloadAsync() ?? Task.CompletedTask;

    private async Task SizingAcceptedAsync(TrussDesignView design)
    {
        var fresh = await Trusses.GetAsync(TrussId);
        if (fresh.IsOk)
        {
            _truss = fresh.Value;
        }

        _design = design;
        _elevation = ElevationInput.From(_truss!, _design);
        await ReloadReviewAsync();
    }

    // Re-render so NavigationLock's browser prompt follows the editors' state.
    private void DirtyChanged(bool dirty) => StateHasChanged();

    private void OpenMember(string mark)
    {
        var member = _truss?.Members.FirstOrDefault(m => m.Mark == mark);
        if (member is not null)
        {
            Navigation.NavigateTo($"/members/{member.Id}?truss={_truss!.Id}");
        }
    }

    private async Task ConfirmLeaveAsync(LocationChangingContext context)
    {
        if (!HasUnsavedEdits)
        {
            return;
        }

        var leave = await Dialogs.ShowMessageBoxAsync("Unsaved edits",
            "Some tables on this page have edits that are not saved. Leave and drop them?", yesText: "Leave", cancelText: "Stay");
        if (leave != true)
        {
            context.PreventNavigation();
        }
    }
}
