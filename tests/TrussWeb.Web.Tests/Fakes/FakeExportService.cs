using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Tests.Fakes;

/// <summary>Export service and job events in one: the test pushes job views as a runner would.</summary>
public sealed class FakeExportService : IExportService, IExportEvents
{
    private readonly List<(Guid ProjectId, Action<ExportJobView> Handler)> _handlers = [];

    public ExportReadiness Readiness { get; set; } = new(new IssueStatus(Guid.Empty, 40, 12, 0, false, "12 of 40 members are approved; 28 are not."), false,
        "Only the project lead can issue the final set.", "12 of 40 members approved — files will be marked preliminary (28 not approved)");

    /// <summary>When set, what GetReadinessAsync answers instead of Ok(Readiness).</summary>
    public ServiceResult<ExportReadiness>? ReadinessRefusal { get; set; }

    public List<ExportJobView> Jobs { get; } = [];

    public List<(ExportKind Kind, ExportFormat Format, bool Final)> Started { get; } = [];

    public int Subscribers { get { lock (_handlers) { return _handlers.Count; } } }

    public static ExportJobView Job(Guid projectId, ExportJobStatus status, int done = 0, int total = 10, string? error = null, string stage = "Rendered RT1 TC1") => new(
        Guid.Parse("0e7e0000-0000-4000-8000-000000000001"), projectId, ExportKind.CalculationBook, ExportFormat.Pdf, false, "u1", "Dineo Designer",
        new DateTime(2026, 12, 2, 9, 0, 0, DateTimeKind.Utc), status, done, total, stage, error,
        status == ExportJobStatus.Succeeded ? "T-118_A_calculation-book_20261202T090000Z.pdf" : null,
        status == ExportJobStatus.Succeeded ? "application/pdf" : null, status == ExportJobStatus.Succeeded ? 123_456 : null,
        status == ExportJobStatus.Succeeded ? new string('a', 64) : null, null, new DateTime(2026, 12, 3, 9, 0, 0, DateTimeKind.Utc));

    /// <summary>Delivers a job change to the subscribers, from another thread as the runner does.</summary>
    public Task PushAsync(ExportJobView view)
    {
        List<Action<ExportJobView>> targets;
        lock (_handlers)
        {
            targets = _handlers.Where(h => h.ProjectId == view.ProjectId).Select(h => h.Handler).ToList();
        }

        return Task.Run(() => targets.ForEach(h => h(view)));
    }

    public IDisposable Subscribe(Guid projectId, Action<ExportJobView> handler)
    {
        var entry = (projectId, handler);
        lock (_handlers)
        {
            _handlers.Add(entry);
        }

        return new Remover(() => { lock (_handlers) { _handlers.Remove(entry); } });
    }

    /// <summary>How many times the approval state has been read.</summary>
    public int ReadinessReads => Volatile.Read(ref _readinessReads);

    private int _readinessReads;

    public Task<ServiceResult<ExportReadiness>> GetReadinessAsync(Guid projectId, CancellationToken cancellationToken = default)
    {
        Interlocked.Increment(ref _readinessReads);
        return Task.FromResult(ReadinessRefusal ?? ServiceResult<ExportReadiness>.Ok(Readiness));
    }

    public Task<ServiceResult<ExportJobView>> StartAsync(Guid projectId, ExportKind kind, ExportFormat format, CancellationToken cancellationToken = default)
    {
        Started.Add((kind, format, false));
        return Task.FromResult(ServiceResult<ExportJobView>.Ok(Job(projectId, ExportJobStatus.Queued) with { Kind = kind, Format = format, Stage = "Waiting for a free renderer" }));
    }

    public Task<ServiceResult<ExportJobView>> StartFinalSetAsync(Guid projectId, ExportKind kind, ExportFormat format, CancellationToken cancellationToken = default)
    {
        Started.Add((kind, format, true));
        return Task.FromResult(ServiceResult<ExportJobView>.Forbidden("The final set cannot be issued: not approved."));
    }

    public Task<ServiceResult<ExportJobView>> GetJobAsync(Guid jobId, CancellationToken cancellationToken = default) => throw new NotSupportedException();

    public Task<ServiceResult<IReadOnlyList<ExportJobView>>> ListJobsAsync(Guid projectId, CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<IReadOnlyList<ExportJobView>>.Ok(Jobs.ToList()));

    public Task<ServiceResult<ExportFile>> OpenFileAsync(Guid jobId, CancellationToken cancellationToken = default) => throw new NotSupportedException();

    public Task<ServiceResult<ExportJobView>> CancelAsync(Guid jobId, CancellationToken cancellationToken = default) => throw new NotSupportedException();

    private sealed class Remover(Action remove) : IDisposable
    {
        public void Dispose() => remove();
    }
}
