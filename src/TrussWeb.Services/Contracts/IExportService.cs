namespace TrussWeb.Services.Contracts;

/// <summary>Which document an export produces.</summary>
public enum ExportKind
{
    /// <summary>The calculation book (PDF only).</summary>
    CalculationBook,

    /// <summary>The member summary (PDF, CSV or XLSX).</summary>
    MemberSummary,
}

public enum ExportFormat
{
    Pdf,
    Csv,
    Xlsx,
}

public enum ExportJobStatus
{
    Queued,
    Running,
    Succeeded,
    Failed,
    Cancelled,
}

/// <summary>
/// One export job as its record keeps it: what, who, when, how far, and for a finished job the file's size and
/// SHA-256 (lower-case hex). <see cref="Error"/> is a message for people (never a stack trace).
/// </summary>
public sealed record ExportJobView(
    Guid JobId,
    Guid ProjectId,
    ExportKind Kind,
    ExportFormat Format,
    bool FinalSet,
    string RequestedById,
    string RequestedBy,
    DateTime RequestedUtc,
    ExportJobStatus Status,
    int Done,
    int Total,
    string Stage,
    string? Error,
    string? FileName,
    string? ContentType,
    long? SizeBytes,
    string? Sha256,
    DateTime? FinishedUtc,
    DateTime ExpiresUtc)
{
    /// <summary>0 to 1.</summary>
    public double Fraction => Total <= 0 ? 0 : Math.Clamp((double)Done / Total, 0, 1);

    /// <summary>True once the job has ended (whatever the outcome).</summary>
    public bool IsFinished => Status is ExportJobStatus.Succeeded or ExportJobStatus.Failed or ExportJobStatus.Cancelled;

    /// <summary>True only when a complete file can be downloaded.</summary>
    public bool HasFile => Status == ExportJobStatus.Succeeded && FileName is not null;
}

/// <summary>What the export area shows before anything is started.</summary>
/// <param name="Issue">Approval count (stale approvals do not count).</param>
/// <param name="CallerIsLead">Whether the caller may issue the final set (project lead or administrator).</param>
/// <param name="FinalSetRefusal">Why the final set cannot be issued now (null when it can).</param>
/// <param name="MarkingText">How files made now will be marked, e.g. "12 of 40 members approved — files will be marked preliminary".</param>
public sealed record ExportReadiness(IssueStatus Issue, bool CallerIsLead, string? FinalSetRefusal, string MarkingText);

/// <summary>A finished export's file, opened for reading (the caller disposes the stream).</summary>
public sealed record ExportFile(Stream Content, string FileName, string ContentType, long Length, string Sha256);

/// <summary>
/// Exports of a project's stored designs, run in the background (docs/dev/reports.md). Callable without
/// Blazor: start a job, poll or subscribe (<see cref="IExportEvents"/>) for its status, open its file.
/// </summary>
public interface IExportService
{
    /// <summary>Approval state and how files produced now will be marked.</summary>
    Task<ServiceResult<ExportReadiness>> GetReadinessAsync(Guid projectId, CancellationToken cancellationToken = default);

    /// <summary>Queues a preliminary export (any project member). Invalid for a kind/format pair that does not exist (the book is PDF only).</summary>
    Task<ServiceResult<ExportJobView>> StartAsync(Guid projectId, ExportKind kind, ExportFormat format, CancellationToken cancellationToken = default);

    /// <summary>Project lead: records the final issue (<see cref="IReviewService.IssueFinalSetAsync"/>, refused unless every member is approved) and queues the export marked final.</summary>
    Task<ServiceResult<ExportJobView>> StartFinalSetAsync(Guid projectId, ExportKind kind, ExportFormat format, CancellationToken cancellationToken = default);

    /// <summary>One job (members of its project only).</summary>
    Task<ServiceResult<ExportJobView>> GetJobAsync(Guid jobId, CancellationToken cancellationToken = default);

    /// <summary>The project's jobs that have not expired, newest first.</summary>
    Task<ServiceResult<IReadOnlyList<ExportJobView>>> ListJobsAsync(Guid projectId, CancellationToken cancellationToken = default);

    /// <summary>Opens the file of a succeeded job; NotFound for a job still running, failed, cancelled or expired.</summary>
    Task<ServiceResult<ExportFile>> OpenFileAsync(Guid jobId, CancellationToken cancellationToken = default);

    /// <summary>Cancels a queued or running job (the member who started it, or the project lead).</summary>
    Task<ServiceResult<ExportJobView>> CancelAsync(Guid jobId, CancellationToken cancellationToken = default);
}

/// <summary>
/// In-process notifications of export job changes (queued, progress, finished), per project. Handlers run on
/// the job's thread: a page marshals with <c>InvokeAsync</c> and disposes the handle.
/// </summary>
public interface IExportEvents
{
    IDisposable Subscribe(Guid projectId, Action<ExportJobView> handler);
}
