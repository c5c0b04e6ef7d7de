using Microsoft.AspNetCore.Components;
using MudBlazor;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Components.Review;

/// <summary>
/// Review of a truss's members. "Submit all" calls <see cref="IReviewService.SubmitTrussAsync"/> and lists what was skipped
/// and why; batch approve / return calls the service per member and lists each member's outcome (some may be refused).
/// </summary>
public partial class TrussReviewSection
{
    private IReadOnlyList<MemberReviewView> _rows = [];
    private IReadOnlyList<EligibleChecker> _checkers = [];
    private readonly HashSet<Guid> _selected = [];
    private string? _checkerId;
    private string? _note;
    private string? _comment;
    private string? _commentError;
    private string? _loadFailure;
    private string? _outcome;
    private List<(string Mark, bool Ok, string Text)> _outcomeRows = [];
    private bool _busy;
    private IDisposable? _subscription;

    [Parameter, EditorRequired] public required Guid TrussId { get; set; }

    [Parameter, EditorRequired] public required Guid ProjectId { get; set; }

    /// <summary>Raised after review states changed (so the page can re-read rows that show them).</summary>
    [Parameter] public EventCallback OnChanged { get; set; }

    [Inject] private IReviewService Review { get; set; } = default!;

    [Inject] private IReviewEvents Events { get; set; } = default!;

    [Inject] private ISnackbar Snackbar { get; set; } = default!;

    private bool CanSubmitAny => _rows.Any(r => r.AvailableActions.Contains(ReviewAction.Submit));

    private List<MemberReviewView> Deciding => _rows.Where(r => r.AvailableActions.Contains(ReviewAction.Approve) || r.AvailableActions.Contains(ReviewAction.Return)).ToList();

    protected override async Task OnParametersSetAsync()
    {
        await ReloadAsync();
    }

    // Listening starts after a render in the browser (never in a prerender, which is gone before any event could reach it).
    protected override void OnAfterRender(bool firstRender) => _subscription ??= Events.Subscribe(ProjectId, OnReviewEvent);

    public async Task ReloadAsync()
    {
        var result = await Review.GetTrussReviewAsync(TrussId);
        if (!result.IsOk)
        {
            _loadFailure = result.Message ?? "The review of this truss could not be loaded.";
            _rows = [];
            return;
        }

        _loadFailure = null;
        _rows = result.Value!;
        var decidable = Deciding.Select(r => r.MemberId).ToHashSet();
        _selected.IntersectWith(decidable);
        if (CanSubmitAny && _checkers.Count == 0)
        {
            var checkers = await Review.ListEligibleCheckersAsync(ProjectId, null);
            _checkers = checkers.Value ?? [];
            _checkerId ??= (_checkers.FirstOrDefault(c => c.ProjectRole == "Checker") ?? _checkers.FirstOrDefault())?.UserId;
        }
    }

    private void OnReviewEvent(ReviewEvent e)
    {
        if (e.TrussId != TrussId)
        {
            return;
        }

        LiveRefresh.Dispatch(InvokeAsync, async () =>
        {
            await ReloadAsync();
            await OnChanged.InvokeAsync();
            StateHasChanged();
        });
    }

    private void Toggle(Guid memberId, bool on)
    {
        if (on)
        {
            _selected.Add(memberId);
        }
        else
        {
            _selected.Remove(memberId);
        }
    }

    private void SelectAllAwaiting()
    {
        foreach (var r in Deciding)
        {
            _selected.Add(r.MemberId);
        }
    }

    private async Task SubmitAllAsync()
    {
        if (_busy || _checkerId is null)
        {
            return;
        }

        _busy = true;
        try
        {
            var result = await Review.SubmitTrussAsync(TrussId, _checkerId, string.IsNullOrWhiteSpace(_note) ? null : _note.Trim());
            if (result.IsOk)
            {
                var s = result.Value!;
                _outcome = $"{s.Submitted.Count} submitted for checking; {s.Skipped.Count} left as they were.";
                _outcomeRows = s.Submitted.Select(m => (m.Mark, true, "submitted"))
                    .Concat(s.Skipped.Select(m => (m.Mark, false, $"skipped ({ReviewStateText.Words(m.State)}): {m.Reason}"))).ToList();
                _note = null;
                Snackbar.Add(_outcome, Severity.Success);
            }
            else
            {
                _outcome = result.Message ?? "Nothing was submitted.";
                _outcomeRows = result.Errors.Select(e => (e.Field, false, e.Message)).ToList();
            }

            await ReloadAsync();
            await OnChanged.InvokeAsync();
        }
        finally
        {
            _busy = false;
        }
    }

    private Task ApproveSelectedAsync() =>
        DecideSelectedAsync("approved", id => Review.ApproveAsync(id, string.IsNullOrWhiteSpace(_comment) ? null : _comment.Trim()));

    private Task ReturnSelectedAsync()
    {
        if (string.IsNullOrWhiteSpace(_comment))
        {
            _commentError = "Comment: say what the designers should change; members are returned only with a comment (required).";
            return Task.CompletedTask;
        }

        return DecideSelectedAsync("returned", id => Review.ReturnAsync(id, _comment!.Trim()));
    }

    private async Task DecideSelectedAsync(string verb, Func<Guid, Task<ServiceResult<MemberReviewView>>> call)
    {
        if (_busy || _selected.Count == 0)
        {
            return;
        }

        _busy = true;
        _commentError = null;
        try
        {
            var rows = new List<(string Mark, bool Ok, string Text)>();
            foreach (var r in _rows.Where(r => _selected.Contains(r.MemberId)).OrderBy(r => r.Mark, StringComparer.Ordinal).ToList())
            {
                var result = await call(r.MemberId);
                rows.Add((r.Mark, result.IsOk, result.IsOk ? verb : "refused: " + Reason(result)));
            }

            var ok = rows.Count(r => r.Ok);
            _outcome = $"{ok} of {rows.Count} {verb}" + (ok < rows.Count ? $"; {rows.Count - ok} refused (see below)." : ".");
            _outcomeRows = rows;
            if (ok == rows.Count)
            {
                _comment = null;
            }

            _selected.Clear();
            await ReloadAsync();
            await OnChanged.InvokeAsync();
        }
        finally
        {
            _busy = false;
        }
    }

    private static string Reason<T>(ServiceResult<T> result) =>
        result.Errors.Count > 0 ? string.Join(" ", result.Errors.Select(e => e.Message)) : result.Message ?? result.Kind.ToString();

    public void Dispose()
    {
        _subscription?.Dispose();
        _subscription = null;
        GC.SuppressFinalize(this);
    }
}
