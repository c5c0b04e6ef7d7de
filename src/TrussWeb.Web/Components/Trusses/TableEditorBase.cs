using System.Text.RegularExpressions;
using Microsoft.AspNetCore.Components;
using MudBlazor;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Shared;

namespace TrussWeb.Web.Components.Trusses;

/// <summary>
/// Common part of the truss table editors: a working copy of one table, explicit save, field messages
/// per row, conflicts with the typed values kept. The copy is refreshed from a new <see cref="Truss"/>
/// only while it has no unsaved edits.
/// </summary>
public abstract partial class TableEditorBase : ComponentBase
{
    private TrussDetail? _loaded;
    private bool _reportedDirty;

    [Parameter, EditorRequired] public required TrussDetail Truss { get; set; }

    [Parameter] public bool CanEdit { get; set; }

    /// <summary>Raised with the fresh detail after a successful save (the service has re-designed the truss).</summary>
    [Parameter] public EventCallback<TrussDetail> OnSaved { get; set; }

    /// <summary>Raised when the working copy becomes dirty or clean (the page's navigation lock follows it).</summary>
    [Parameter] public EventCallback<bool> OnDirtyChanged { get; set; }

    [Inject] protected ITrussService Trusses { get; set; } = default!;

    [Inject] protected ISnackbar Snackbar { get; set; } = default!;

    protected FieldErrorMap Errors { get; } = new();

    protected IReadOnlyList<ConflictDetail> Conflicts { get; private set; } = [];

    protected bool Busy { get; set; }

    /// <summary>True while the working copy differs from what was loaded.</summary>
    public abstract bool IsDirty { get; }

    /// <summary>Copies the table from <paramref name="truss"/> into the working copy.</summary>
    protected abstract void Load(TrussDetail truss);

    protected override void OnParametersSet()
    {
        if (_loaded is null || (!ReferenceEquals(_loaded, Truss) && !IsDirty))
        {
            _loaded = Truss;
            Load(Truss);
        }
    }

    protected override async Task OnAfterRenderAsync(bool firstRender)
    {
        // Inputs re-render this editor on every change; tell the page when the dirty state flips.
        var dirty = IsDirty;
        if (dirty != _reportedDirty)
        {
            _reportedDirty = dirty;
            await OnDirtyChanged.InvokeAsync(dirty);
        }
    }

    /// <summary>
    /// Takes a detail saved part-way through a multi-step save as the loaded state (fresh versions) and
    /// tells the page, without replacing the working copy.
    /// </summary>
    protected async Task AcceptPartAsync(TrussDetail saved)
    {
        _loaded = saved;
        await OnSaved.InvokeAsync(saved);
    }

    /// <summary>Drops the edits and takes the stored table.</summary>
    protected void Revert()
    {
        _loaded = Truss;
        Errors.Clear();
        Conflicts = [];
        Load(Truss);
    }

    /// <summary>
    /// Handles a save result. <paramref name="sentToShown"/> maps the index of each row sent to its index
    /// on screen, so "Rows[k].Field" messages land on the right row. True when saved.
    /// </summary>
    protected async Task<bool> HandleAsync(ServiceResult<TrussDetail> result, IReadOnlyList<int>? sentToShown = null, string what = "Table")
    {
        ArgumentNullException.ThrowIfNull(result);
        switch (result.Kind)
        {
            case ResultKind.Ok:
                Errors.Clear();
                Conflicts = [];
                _loaded = result.Value!;
                Load(result.Value!);
                Snackbar.Add($"{what} saved; the truss was re-designed.", Severity.Success);
                await OnSaved.InvokeAsync(result.Value!);
                return true;
            case ResultKind.Invalid:
                Errors.Set(sentToShown is null ? result.Errors : result.Errors.Select(e => e with { Field = Remap(e.Field, sentToShown) }));
                Conflicts = [];
                Snackbar.Add($"{what} not saved: check the marked fields.", Severity.Warning);
                return false;
            case ResultKind.Conflict:
                Conflicts = result.Conflicts;
                Snackbar.Add($"{what} not saved: changed by someone else meanwhile.", Severity.Warning);
                return false;
            default:
                Snackbar.Add(result.Message ?? $"{what} not saved.", Severity.Error);
                return false;
        }
    }

    /// <summary>"Rows[k]..." → "Rows[shown index]...".</summary>
    public static string Remap(string field, IReadOnlyList<int> sentToShown)
    {
        ArgumentNullException.ThrowIfNull(field);
        ArgumentNullException.ThrowIfNull(sentToShown);
        var m = RowIndex().Match(field);
        if (m.Success && int.TryParse(m.Groups[2].Value, System.Globalization.CultureInfo.InvariantCulture, out var k) && k >= 0 && k < sentToShown.Count)
        {
            return $"{m.Groups[1].Value}[{sentToShown[k]}]{field[m.Length..]}";
        }

        return field;
    }

    [GeneratedRegex(@"^(Rows|WindCases)\[(\d+)\]")]
    private static partial Regex RowIndex();
}
