using Microsoft.AspNetCore.Components;
using MudBlazor;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Components.Review;

/// <summary>
/// One member's review, live: it reloads when a review event for the member arrives (another user's step) and shows
/// only the actions the service offers the caller. The service decides; a refusal is shown and the typed text kept.
/// </summary>
public partial class MemberReviewPanel
{
    private const string TextField = "text";
    private const string CheckerField = "checker";

    private MemberReviewView? _view;
    private ChangesSinceApproval? _changes;
    private IReadOnlyList<AuditEntryView> _audit = [];
    private List<AuditEntryView> _thread = [];
    private IReadOnlyList<EligibleChecker> _checkers = [];
    private string? _checkerId;
    private string? _text;
    private string? _loadFailure;
    private string? _refusal;
    private readonly Dictionary<string, string> _errors = new(StringComparer.Ordinal);
    private bool _busy;
    private IDisposable? _subscription;
    private Guid _subscribedProject;

    [Parameter, EditorRequired] public required Guid MemberId { get; set; }

    /// <summary>When set, the actions are disabled and this sentence says why (e.g. unsaved design changes).</summary>
    [Parameter] public string? BlockedReason { get; set; }

    /// <summary>Raised after the review changed (the caller's step or another user's): the member's version has changed.</summary>
    [Parameter] public EventCallback<MemberReviewView> OnChanged { get; set; }

    [Inject] private IReviewService Review { get; set; } = default!;

    [Inject] private IReviewEvents Events { get; set; } = default!;

    [Inject] private ISnackbar Snackbar { get; set; } = default!;

    /// <summary>The review as the panel shows it (null until loaded).</summary>
    public MemberReviewView? View => _view;

    private bool Disabled => _busy || BlockedReason is not null;

    private bool Has(ReviewAction action) => _view?.AvailableActions.Contains(action) == true;

    private string TextLabel =>
        Has(ReviewAction.Resubmit) ? "Answer to the checker (required to resubmit)"
        : Has(ReviewAction.Return) || Has(ReviewAction.Approve) ? "Comment (required to return, optional to approve)"
        : "Note to the checker (optional)";

    private string? ErrorFor(string field) => _errors.TryGetValue(field, out var m) ? m : null;

    protected override async Task OnParametersSetAsync()
    {
        if (_view?.MemberId != MemberId)
        {
            await ReloadAsync();
        }
    }

    // Listening starts after a render in the browser (never in a prerender, which is gone before any event could reach it).
    protected override void OnAfterRender(bool firstRender)
    {
        if (_view is { } view)
        {
            Subscribe(view.ProjectId);
        }
    }

    /// <summary>Reads the review again (after a design save, or when an event arrives).</summary>
    public async Task ReloadAsync()
    {
        var result = await Review.GetMemberReviewAsync(MemberId);
        if (!result.IsOk)
        {
            _loadFailure = result.Message ?? "The review of this member could not be loaded.";
            _view = null;
            return;
        }

        _loadFailure = null;
        var view = result.Value!;
        _view = view;
        _changes = null;
        if (view.State == MemberReviewState.ApprovalStale)
        {
            var changes = await Review.GetChangesSinceApprovalAsync(MemberId);
            _changes = changes.IsOk ? changes.Value : null;
        }

        var audit = await Review.GetAuditAsync(view.ProjectId, MemberId);
        _audit = audit.Value ?? [];
        _thread = _audit.Where(a => a.Action.StartsWith("Review", StringComparison.Ordinal) && !string.IsNullOrWhiteSpace(a.Comment))
            .OrderBy(a => a.UtcTime).ThenBy(a => a.Id).TakeLast(4).ToList();

        _checkers = [];
        if (view.AvailableActions.Contains(ReviewAction.Submit) || view.AvailableActions.Contains(ReviewAction.ReassignChecker))
        {
            var reassign = !view.AvailableActions.Contains(ReviewAction.Submit);
            var checkers = await Review.ListEligibleCheckersAsync(view.ProjectId, reassign ? MemberId : null);
            _checkers = checkers.Value ?? [];
            if (_checkerId is null || _checkers.All(c => c.UserId != _checkerId))
            {
                _checkerId = (_checkers.FirstOrDefault(c => c.UserId == view.CheckerId && !reassign)
                              ?? _checkers.FirstOrDefault(c => c.ProjectRole == "Checker")
                              ?? _checkers.FirstOrDefault())?.UserId;
            }
        }
    }

    private void Subscribe(Guid projectId)
    {
        if (_subscription is not null && _subscribedProject == projectId)
        {
            return;
        }

        _subscription?.Dispose();
        _subscribedProject = projectId;
        _subscription = Events.Subscribe(projectId, OnReviewEvent);
    }

    private void OnReviewEvent(ReviewEvent e)
    {
        if (e.MemberId != MemberId)
        {
            return;
        }

        LiveRefresh.Dispatch(InvokeAsync, async () =>
        {
            await ReloadAsync();
            if (_view is not null)
            {
                await OnChanged.InvokeAsync(_view);
            }

            StateHasChanged();
        });
    }

    private Task SubmitAsync() => RunAsync("Submitted for checking.", () => Review.SubmitAsync(MemberId, _checkerId!, Trimmed()));

    private Task ResubmitAsync()
    {
        if (string.IsNullOrWhiteSpace(_text))
        {
            return Refuse(TextField, "Answer: write a reply to the checker's comment before resubmitting (required).");
        }

        return RunAsync("Answered and resubmitted.", () => Review.ResubmitAsync(MemberId, _text!.Trim()));
    }

    private Task ApproveAsync() => RunAsync("Approved.", () => Review.ApproveAsync(MemberId, Trimmed()));

    private Task ReturnAsync()
    {
        if (string.IsNullOrWhiteSpace(_text))
        {
            return Refuse(TextField, "Comment: say what the designer should change; a member is returned only with a comment (required).");
        }

        return RunAsync("Returned to the designer.", () => Review.ReturnAsync(MemberId, _text!.Trim()));
    }

    private Task WithdrawAsync() => RunAsync("Withdrawn from checking.", () => Review.WithdrawAsync(MemberId));

    private Task ReassignAsync() => RunAsync("Checker changed.", () => Review.ReassignCheckerAsync(MemberId, _checkerId!));

    private string? Trimmed() => string.IsNullOrWhiteSpace(_text) ? null : _text.Trim();

    private Task Refuse(string field, string message)
    {
        _refusal = null;
        _errors.Clear();
        _errors[field] = message;
        return Task.CompletedTask;
    }

    private async Task RunAsync(string done, Func<Task<ServiceResult<MemberReviewView>>> call)
    {
        if (_busy || BlockedReason is not null)
        {
            return;
        }

        _busy = true;
        _refusal = null;
        _errors.Clear();
        try
        {
            var result = await call();
            if (result.IsOk)
            {
                _text = null;
                Snackbar.Add($"{result.Value!.Mark}: {done}", Severity.Success);
                await ReloadAsync();
                await OnChanged.InvokeAsync(_view ?? result.Value);
                return;
            }

            foreach (var error in result.Errors)
            {
                var field = error.Field switch
                {
                    "comment" or "answer" or "note" => TextField,
                    "checkerUserId" => CheckerField,
                    _ => null,
                };
                if (field is not null)
                {
                    _errors[field] = error.Message;
                }
            }

            // Four eyes, a state that changed meanwhile, a conflict: the service's sentence, the typed text kept.
            _refusal = result.Kind switch
            {
                ResultKind.Invalid when _errors.Count == result.Errors.Count => null,
                ResultKind.Conflict => "Someone changed this member meanwhile: " + result.Message + " The review is shown as stored now; your text is kept.",
                ResultKind.Invalid when result.Errors.Count > 0 => string.Join(" ", result.Errors.Select(e => e.Message)),
                _ => result.Message ?? "The review step was refused.",
            };
            if (_refusal is not null)
            {
                await ReloadAsync();
            }
        }
        finally
        {
            _busy = false;
        }
    }

    public void Dispose()
    {
        _subscription?.Dispose();
        _subscription = null;
        GC.SuppressFinalize(this);
    }
}
