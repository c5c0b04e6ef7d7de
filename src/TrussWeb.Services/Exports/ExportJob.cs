using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Exports;

/// <summary>The runner's mutable record of one job; read it only through <see cref="View"/> (taken under the lock).</summary>
internal sealed class ExportJob
{
    private readonly Lock gate = new();

    public required Guid Id { get; init; }

    public required Guid ProjectId { get; init; }

    public required ExportKind Kind { get; init; }

    public required ExportFormat Format { get; init; }

    public required bool FinalSet { get; init; }

    public required string RequestedById { get; init; }

    public required string RequestedBy { get; init; }

    public required DateTime RequestedUtc { get; init; }

    public required DateTime ExpiresUtc { get; set; }

    public ExportJobStatus Status { get; private set; } = ExportJobStatus.Queued;

    public int Done { get; private set; }

    public int Total { get; private set; } = 1;

    public string Stage { get; private set; } = "Waiting for a free renderer";

    public string? Error { get; private set; }

    public string? FileName { get; private set; }

    public string? FilePath { get; private set; }

    public long? SizeBytes { get; private set; }

    public string? Sha256 { get; private set; }

    public DateTime? FinishedUtc { get; private set; }

    public CancellationTokenSource Cancellation { get; } = new();

    public TaskCompletionSource Finished { get; } = new(TaskCreationOptions.RunContinuationsAsynchronously);

    public ExportJobView View()
    {
        lock (gate)
        {
            return new ExportJobView(Id, ProjectId, Kind, Format, FinalSet, RequestedById, RequestedBy, RequestedUtc, Status, Done, Total, Stage, Error,
                Status == ExportJobStatus.Succeeded ? FileName : null, Status == ExportJobStatus.Succeeded ? ExportNames.ContentType(Format) : null,
                SizeBytes, Sha256, FinishedUtc, ExpiresUtc);
        }
    }

    public void Start(int total, string stage) => Set(() => { Status = ExportJobStatus.Running; Total = Math.Max(1, total); Stage = stage; });

    public void Step(string stage, int by = 1) => Set(() => { Done = Math.Min(Total, Done + by); Stage = stage; });

    public void Succeed(string fileName, string path, long size, string sha256, DateTime now) => Set(() =>
    {
        Status = ExportJobStatus.Succeeded;
        Done = Total;
        Stage = "Done";
        FileName = fileName;
        FilePath = path;
        SizeBytes = size;
        Sha256 = sha256;
        FinishedUtc = now;
    });

    public void End(ExportJobStatus status, string error, DateTime now) => Set(() =>
    {
        Status = status;
        Stage = status == ExportJobStatus.Cancelled ? "Cancelled" : "Failed";
        Error = error;
        FinishedUtc = now;
    });

    private void Set(Action change)
    {
        lock (gate)
        {
            change();
        }
    }
}
