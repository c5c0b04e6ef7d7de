using System.Collections.Concurrent;
using System.Collections.Immutable;
using System.Security.Cryptography;
using System.Threading.Channels;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Hosting;
using Microsoft.Extensions.Logging;
using TrussWeb.Data;
using TrussWeb.Reports.Model;
using TrussWeb.Services.Common;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Hosting;

namespace TrussWeb.Services.Exports;

/// <summary>
/// The singleton that renders exports in the background: a channel of queued jobs read by
/// <see cref="ExportOptions.Concurrency"/> workers. Each job loads the stored results, renders, writes
/// <c>&lt;job&gt;.tmp</c> in the export folder and renames it to <c>&lt;job&gt;.&lt;ext&gt;</c> only when
/// complete; a failed or cancelled job leaves no file. Jobs and files expire after
/// <see cref="ExportOptions.Retention"/>; records live in memory (a restart forgets them and removes their files).
/// </summary>
public sealed class ExportJobRunner : BackgroundService, IExportEvents
{
    private readonly Channel<ExportJob> queue = Channel.CreateUnbounded<ExportJob>(new UnboundedChannelOptions { SingleReader = false });
    private readonly ConcurrentDictionary<Guid, ExportJob> jobs = new();
    private readonly ConcurrentDictionary<Guid, ImmutableList<Action<ExportJobView>>> handlers = new();
    private readonly IServiceScopeFactory scopes;
    private readonly IExportRenderer renderer;
    private readonly TimeProvider clock;
    private readonly ILogger<ExportJobRunner> logger;

    public ExportJobRunner(IServiceScopeFactory scopes, IExportRenderer renderer, ExportOptions options, TimeProvider clock, ILogger<ExportJobRunner> logger)
    {
        ArgumentNullException.ThrowIfNull(options);
        this.scopes = scopes;
        this.renderer = renderer;
        this.clock = clock;
        this.logger = logger;
        Options = options;
    }

    public ExportOptions Options { get; }

    internal ExportJob? Find(Guid jobId) => jobs.TryGetValue(jobId, out var job) && job.ExpiresUtc > Now ? job : null;

    internal IReadOnlyList<ExportJob> ForProject(Guid projectId) =>
        jobs.Values.Where(j => j.ProjectId == projectId && j.ExpiresUtc > Now).OrderByDescending(j => j.RequestedUtc).ToList();

    internal ExportJob Enqueue(Guid projectId, ExportKind kind, ExportFormat format, bool final, string userId, string userName)
    {
        var now = Now;
        var job = new ExportJob
        {
            Id = Guid.NewGuid(),
            ProjectId = projectId,
            Kind = kind,
            Format = format,
            FinalSet = final,
            RequestedById = userId,
            RequestedBy = userName,
            RequestedUtc = now,
            ExpiresUtc = now + Options.Retention,
        };
        jobs[job.Id] = job;
        if (!queue.Writer.TryWrite(job))
        {
            job.End(ExportJobStatus.Failed, "The export queue is closed (the app is stopping).", now);
            job.Finished.TrySetResult();
        }

        Publish(job);
        return job;
    }

    internal void Cancel(ExportJob job)
    {
        if (!job.View().IsFinished)
        {
            job.Cancellation.Cancel();
        }
    }

    /// <summary>Waits until the job has ended (tests, tools).</summary>
    public Task WaitAsync(Guid jobId, CancellationToken cancellationToken = default) =>
        jobs.TryGetValue(jobId, out var job) ? job.Finished.Task.WaitAsync(cancellationToken) : Task.CompletedTask;

    public IDisposable Subscribe(Guid projectId, Action<ExportJobView> handler)
    {
        ArgumentNullException.ThrowIfNull(handler);
        handlers.AddOrUpdate(projectId, _ => [handler], (_, list) => list.Add(handler));
        return new Subscription(() => handlers.AddOrUpdate(projectId, _ => [], (_, list) => list.Remove(handler)));
    }

    /// <summary>
    /// Forgets expired jobs and deletes their files, and deletes every other file in the export folder that no
    /// live job owns (temporary files of jobs that are not running, files left by an earlier run of the app).
    /// </summary>
    public void CleanUp()
    {
        var now = Now;
        foreach (var job in jobs.Values.Where(j => j.ExpiresUtc <= now && j.View().IsFinished).ToList())
        {
            jobs.TryRemove(job.Id, out _);
        }

        if (!Directory.Exists(Options.Folder))
        {
            return;
        }

        foreach (var path in Directory.EnumerateFiles(Options.Folder))
        {
            var name = Path.GetFileNameWithoutExtension(path);
            var owned = Guid.TryParseExact(name, "N", out var id) && jobs.TryGetValue(id, out var job)
                && (Path.GetExtension(path) == ".tmp" ? job.View().Status == ExportJobStatus.Running : job.View().Status == ExportJobStatus.Succeeded);
            if (!owned)
            {
                TryDelete(path);
            }
        }
    }

    protected override async Task ExecuteAsync(CancellationToken stoppingToken)
    {
        CleanUp();
        var workers = Enumerable.Range(0, Math.Clamp(Options.Concurrency, 1, 2)).Select(_ => WorkAsync(stoppingToken)).ToList();
        workers.Add(SweepAsync(stoppingToken));
        try
        {
            await Task.WhenAll(workers).ConfigureAwait(false);
        }
        catch (OperationCanceledException) when (stoppingToken.IsCancellationRequested)
        {
            // stopping
        }
    }

    private async Task SweepAsync(CancellationToken stoppingToken)
    {
        using var timer = new PeriodicTimer(Options.CleanupInterval, clock);
        while (await timer.WaitForNextTickAsync(stoppingToken).ConfigureAwait(false))
        {
            CleanUp();
        }
    }

    private async Task WorkAsync(CancellationToken stoppingToken)
    {
        await foreach (var job in queue.Reader.ReadAllAsync(stoppingToken).ConfigureAwait(false))
        {
            await RunAsync(job, stoppingToken).ConfigureAwait(false);
        }
    }

    private async Task RunAsync(ExportJob job, CancellationToken stoppingToken)
    {
        using var linked = CancellationTokenSource.CreateLinkedTokenSource(stoppingToken, job.Cancellation.Token);
        var ct = linked.Token;
        var temp = Path.Combine(Options.Folder, $"{job.Id:N}.tmp");
        var final = Path.Combine(Options.Folder, $"{job.Id:N}.{ExportNames.Extension(job.Format)}");
        var succeeded = false;
        try
        {
            ct.ThrowIfCancellationRequested();
            await using var scope = scopes.CreateAsyncScope();
            var factory = scope.ServiceProvider.GetRequiredService<IDbContextFactory<TrussWebDbContext>>();
            await using var db = await factory.CreateDbContextAsync(ct).ConfigureAwait(false);
            var (trussCount, memberCount) = await ReportModelBuilder.CountAsync(db, job.ProjectId, ct).ConfigureAwait(false);
            var renderUnits = job.Kind == ExportKind.CalculationBook ? trussCount + memberCount : 1;
            job.Start(1 + trussCount + renderUnits + 1, "Reading stored results");
            Publish(job);
            var producedAt = clock.GetUtcNow();
            var model = await ReportModelBuilder.BuildAsync(db, job.ProjectId, job.RequestedBy, job.FinalSet, producedAt, truss =>
            {
                job.Step($"Read truss {truss}");
                Publish(job);
            }, ct).ConfigureAwait(false);
            job.Step("Rendering");
            Publish(job);

            var progress = new RelayProgress(p =>
            {
                ct.ThrowIfCancellationRequested();
                job.Step($"Rendered {p.Item}");
                Publish(job);
            });
            var bytes = await Task.Run(() => renderer.Render(job.Kind, job.Format, model.Header, model.Trusses, progress), ct).ConfigureAwait(false);
            ct.ThrowIfCancellationRequested();
            job.Step("Writing the file", 0);
            Publish(job);
            Directory.CreateDirectory(Options.Folder);
            await using (var stream = new FileStream(temp, FileMode.CreateNew, FileAccess.Write, FileShare.None, 81920, FileOptions.Asynchronous))
            {
                await stream.WriteAsync(bytes, ct).ConfigureAwait(false);
                await stream.FlushAsync(ct).ConfigureAwait(false);
                stream.Flush(flushToDisk: true);
            }

            var sha = Convert.ToHexStringLower(SHA256.HashData(bytes));
            var name = ExportNames.FileName(model.ProjectCode, model.Revision, job.Kind, job.Format, job.FinalSet, producedAt);

            // The audit keeps what was produced, by whom, with the file's hash, after the job record has expired.
            AuditWriter.AddAction(db, new FixedCaller(job.RequestedById, job.RequestedBy), clock, job.ProjectId, "Project", job.ProjectId.ToString(), "ExportProduced",
                "File", null, name, sha, $"{ExportNames.KindText(job.Kind)} {ExportNames.Extension(job.Format).ToUpperInvariant()}{(job.FinalSet ? " (final set)" : "")}, " +
                $"{bytes.LongLength} bytes; {model.Header.ApprovalStatusText}");
            await db.SaveChangesAsync(CancellationToken.None).ConfigureAwait(false);
            File.Move(temp, final, overwrite: false);
            job.Succeed(name, final, bytes.LongLength, sha, Now);
            succeeded = true;
            logger.LogInformation("Export {JobId} ({Kind} {Format}) of project {ProjectId} done: {Size} bytes, SHA-256 {Sha}", job.Id, job.Kind, job.Format, job.ProjectId,
                bytes.LongLength, sha);
        }
        catch (OperationCanceledException) when (ct.IsCancellationRequested)
        {
            job.End(ExportJobStatus.Cancelled, stoppingToken.IsCancellationRequested ? "The app stopped before the export finished." : "The export was cancelled.", Now);
        }
#pragma warning disable CA1031 // A failed job records its message; the worker goes on with the next job.
        catch (Exception ex)
#pragma warning restore CA1031
        {
            logger.LogError(ex, "Export {JobId} of project {ProjectId} failed", job.Id, job.ProjectId);
            job.End(ExportJobStatus.Failed, $"The export failed: {ex.Message}", Now);
        }
        finally
        {
            TryDelete(temp);
            if (!succeeded)
            {
                TryDelete(final);
            }

            job.Finished.TrySetResult();
            Publish(job);
        }
    }

    private DateTime Now => clock.GetUtcNow().UtcDateTime;

    private void Publish(ExportJob job)
    {
        if (!handlers.TryGetValue(job.ProjectId, out var list))
        {
            return;
        }

        var view = job.View();
        foreach (var handler in list)
        {
            try
            {
                handler(view);
            }
#pragma warning disable CA1031 // A subscriber's failure (e.g. a closed circuit) must not stop the job.
            catch (Exception ex)
#pragma warning restore CA1031
            {
                logger.LogDebug(ex, "An export subscriber failed");
            }
        }
    }

    private void TryDelete(string path)
    {
        try
        {
            if (File.Exists(path))
            {
                File.Delete(path);
            }
        }
        catch (IOException ex)
        {
            logger.LogWarning(ex, "Could not delete export file {Path}", path);
        }
        catch (UnauthorizedAccessException ex)
        {
            logger.LogWarning(ex, "Could not delete export file {Path}", path);
        }
    }

    private sealed class RelayProgress(Action<ReportProgress> report) : IProgress<ReportProgress>
    {
        public void Report(ReportProgress value) => report(value);
    }

    private sealed class Subscription(Action remove) : IDisposable
    {
        private Action? remove = remove;

        public void Dispose() => Interlocked.Exchange(ref remove, null)?.Invoke();
    }
}
