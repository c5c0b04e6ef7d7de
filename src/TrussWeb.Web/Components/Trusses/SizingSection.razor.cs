using Microsoft.AspNetCore.Components;
using MudBlazor;
using TrussWeb.Core.Loads;
using TrussWeb.Core.Model;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Components.Shared;

namespace TrussWeb.Web.Components.Trusses;

/// <summary>Automatic sizing: run with progress and cancel, then accept or discard the proposal. Nothing is saved until Accept.</summary>
public partial class SizingSection
{
    private CancellationTokenSource? _cts;
    private SizingProposal? _proposal;
    private string? _progress;
    private string? _message;
    private bool _running;
    private bool _busy;

    [Parameter, EditorRequired] public required Guid TrussId { get; set; }

    [Parameter] public bool CanEdit { get; set; }

    /// <summary>Raised after an accepted proposal was applied and the truss re-designed.</summary>
    [Parameter] public EventCallback<TrussDesignView> OnAccepted { get; set; }

    /// <summary>Raised when the accept lost a race (a group changed since the proposal).</summary>
    [Parameter] public EventCallback<IReadOnlyList<ConflictDetail>> OnConflict { get; set; }

    /// <summary>The shown proposal, if any (for tests and the page).</summary>
    public SizingProposal? Proposal => _proposal;

    private async Task RunAsync()
    {
        _cts?.Dispose();
        _cts = new CancellationTokenSource();
        _running = true;
        _message = null;
        _progress = null;
        // Progress arrives on a worker thread: marshal to the renderer.
        var progress = new Progress<SizingProgress>(p => _ = InvokeAsync(() =>
        {
            _progress = $"Round {p.Round}: {p.Message}";
            StateHasChanged();
        }));
        try
        {
            var result = await Design.ProposeSizingAsync(TrussId, progress, _cts.Token);
            if (result.IsOk)
            {
                _proposal = result.Value;
            }
            else
            {
                _message = result.Message ?? "Sizing could not run.";
            }
        }
        catch (OperationCanceledException)
        {
            _message = "Sizing stopped; nothing was changed.";
        }
        finally
        {
            _running = false;
        }
    }

    private void Cancel() => _cts?.Cancel();

    private async Task AcceptAsync()
    {
        if (_proposal is null)
        {
            return;
        }

        _busy = true;
        try
        {
            var result = await Design.AcceptSizingAsync(_proposal);
            if (result.IsOk)
            {
                _proposal = null;
                Snackbar.Add("Proposed sections applied and the truss re-designed.", Severity.Success);
                await OnAccepted.InvokeAsync(result.Value!);
            }
            else if (result.Kind == ResultKind.Conflict)
            {
                _message = "Not applied: a group changed since the proposal. Run the sizing again.";
                _proposal = null;
                await OnConflict.InvokeAsync(result.Conflicts);
            }
            else
            {
                _message = result.Message ?? "Not applied.";
            }
        }
        finally
        {
            _busy = false;
        }
    }

    private async Task DiscardAsync()
    {
        if (_proposal is null)
        {
            return;
        }

        var result = await Design.DiscardSizingAsync(_proposal);
        _proposal = null;
        Snackbar.Add(result.IsOk ? "Proposal discarded; nothing changed." : result.Message ?? "Discard failed.", result.IsOk ? Severity.Info : Severity.Warning);
    }

    public void Dispose()
    {
        _cts?.Cancel();
        _cts?.Dispose();
    }
}
