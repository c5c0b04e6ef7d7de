using Microsoft.AspNetCore.Components;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Exports;
using TrussWeb.Web.Components.Review;

namespace TrussWeb.Web.Components.Projects;

/// <summary>
/// Starts exports and follows them: job changes arrive from <see cref="IExportEvents"/> on the job's thread and are
/// marshalled with <c>InvokeAsync</c>. The approval line also follows the project's review changes
/// (<see cref="IReviewEvents"/>, through <see cref="LiveRefresh.Dispatch"/> so the re-read runs as this page's user).
/// Both subscriptions are disposed with the component.
/// </summary>
public partial class ExportPanel
{
    private ExportReadiness? _readiness;
    private List<ExportJobView> _jobs = [];
    private string? _loadMessage;
    private string? _startMessage;
    private bool _starting;
    private IDisposable? _subscription;
    private IDisposable? _reviewSubscription;
    private Guid _reviewProjectId;

    [Parameter, EditorRequired] public required Guid ProjectId { get; set; }

    [Inject] private IExportService Exports { get; set; } = default!;

    [Inject] private IExportEvents Events { get; set; } = default!;

    [Inject] private IReviewEvents ReviewEvents { get; set; } = default!;

    protected override async Task OnParametersSetAsync()
    {
        _subscription?.Dispose();
        _subscription = null;
        if (_reviewProjectId != ProjectId)
        {
            _reviewSubscription?.Dispose();
            _reviewSubscription = null;
        }

        await LoadAsync();
    }

    // Review changes are heard only after a render in the browser (never in a prerender) and only by a caller the service let in.
    protected override void OnAfterRender(bool firstRender)
    {
        if (_reviewSubscription is null && _readiness is not null && _loadMessage is null)
        {
            _reviewProjectId = ProjectId;
            _reviewSubscription = ReviewEvents.Subscribe(ProjectId, _ => LiveRefresh.Dispatch(InvokeAsync, async () =>
            {
                await LoadReadinessAsync();
                StateHasChanged();
            }));
        }
    }

    /// <summary>Re-reads only the approval state after a review change (the job list follows its own events).</summary>
    private async Task LoadReadinessAsync()
    {
        var readiness = await Exports.GetReadinessAsync(ProjectId);
        if (readiness.IsOk)
        {
            _readiness = readiness.Value;
            _loadMessage = null;
        }
        else
        {
            _loadMessage = readiness.Message ?? "The export area could not be loaded.";
        }
    }

    /// <summary>Reads the approval state; only a caller the service lets in is subscribed to the project's jobs (then the list is read, so no change is missed).</summary>
    private async Task LoadAsync()
    {
        var readiness = await Exports.GetReadinessAsync(ProjectId);
        _loadMessage = readiness.IsOk ? null : readiness.Message ?? "The export area could not be loaded.";
        _readiness = readiness.Value;
        if (!readiness.IsOk)
        {
            return;
        }

        _subscription ??= Events.Subscribe(ProjectId, OnJobChanged);
        var jobs = await Exports.ListJobsAsync(ProjectId);
        if (jobs.Value is { } list)
        {
            var known = _jobs.ToDictionary(j => j.JobId);
            _jobs = list.Select(j => known.TryGetValue(j.JobId, out var k) && k.IsFinished ? k : j).ToList();
        }
    }

    private void OnJobChanged(ExportJobView view) => _ = InvokeAsync(async () =>
    {
        Upsert(view);
        if (view.IsFinished && view.FinalSet)
        {
            await LoadAsync();
        }

        StateHasChanged();
    });

    /// <summary>Runs on the renderer's context only (after InvokeAsync).</summary>
    private void Upsert(ExportJobView view)
    {
        var i = _jobs.FindIndex(j => j.JobId == view.JobId);
        if (i < 0)
        {
            _jobs.Insert(0, view);
        }
        else if (!_jobs[i].IsFinished && (view.IsFinished || view.Done >= _jobs[i].Done))
        {
            // Events from the job's thread can overtake each other: never step back.
            _jobs[i] = view;
        }
    }

    private Task StartAsync(ExportKind kind, ExportFormat format) => RunStartAsync(() => Exports.StartAsync(ProjectId, kind, format));

    private Task IssueFinalAsync() => RunStartAsync(() => Exports.StartFinalSetAsync(ProjectId, ExportKind.CalculationBook, ExportFormat.Pdf));

    private async Task RunStartAsync(Func<Task<ServiceResult<ExportJobView>>> start)
    {
        _starting = true;
        try
        {
            var result = await start();
            if (result.IsOk)
            {
                _startMessage = null;
                Upsert(result.Value!);
            }
            else
            {
                _startMessage = result.Errors.Count > 0 ? string.Join("; ", result.Errors.Select(e => $"{e.Field}: {e.Message}")) : result.Message ?? "The export was not started.";
            }
        }
        finally
        {
            _starting = false;
        }
    }

    private async Task CancelAsync(ExportJobView job)
    {
        var result = await Exports.CancelAsync(job.JobId);
        if (!result.IsOk)
        {
            _startMessage = result.Message;
        }
    }

    private static string Title(ExportJobView job) =>
        $"{(job.Kind == ExportKind.CalculationBook ? "Calculation book" : "Member summary")} ({ExportNames.Extension(job.Format).ToUpperInvariant()}){(job.FinalSet ? ", final set" : "")}";

    private static string SizeText(long? bytes) => bytes is not { } b ? "" : b >= 1 << 20
        ? $"{(b / 1048576.0).ToString("0.0", System.Globalization.CultureInfo.InvariantCulture)} MB"
        : $"{(b / 1024.0).ToString("0", System.Globalization.CultureInfo.InvariantCulture)} kB";

    public void Dispose()
    {
        _subscription?.Dispose();
        _subscription = null;
        _reviewSubscription?.Dispose();
        _reviewSubscription = null;
        GC.SuppressFinalize(this);
    }
}
