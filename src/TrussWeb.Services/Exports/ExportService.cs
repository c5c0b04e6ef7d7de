using Microsoft.EntityFrameworkCore;
using TrussWeb.Data;
using TrussWeb.Services.Authorization;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Review;

namespace TrussWeb.Services.Exports;

/// <summary>
/// Starts export jobs on <see cref="ExportJobRunner"/>, reports them and opens their files. Any project member
/// may export and download the project's files (read access); only the project lead issues the final set.
/// </summary>
internal sealed class ExportService(IDbContextFactory<TrussWebDbContext> factory, Authorizer authorizer, ExportJobRunner runner, IReviewService reviews)
    : IExportService
{
    private static string Op(string method) => PermissionTable.Key<IExportService>(method);

    public async Task<ServiceResult<ExportReadiness>> GetReadinessAsync(Guid projectId, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (refusal, role) = await authorizer.CheckProjectAsync<ExportReadiness>(db, projectId, Op(nameof(GetReadinessAsync)), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        var status = await ReviewService.IssueStatusAsync(db, projectId, cancellationToken).ConfigureAwait(false);
        var lead = role == Roles.ProjectLead || authorizer.IsAdministrator;
        var why = !lead ? "Only the project lead can issue the final set."
            : !status.CanIssueFinal ? $"The final set needs every member approved: {status.Summary}"
            : null;
        var marking = status.TotalMembers == 0 ? "The project has no members yet."
            : status.CanIssueFinal ? $"All {status.TotalMembers} members approved — files will be marked preliminary unless the project lead issues the final set"
            : $"{status.ApprovedMembers} of {status.TotalMembers} members approved — files will be marked preliminary ({status.TotalMembers - status.ApprovedMembers} not approved)";
        return ServiceResult<ExportReadiness>.Ok(new ExportReadiness(status, lead, why, marking));
    }

    public Task<ServiceResult<ExportJobView>> StartAsync(Guid projectId, ExportKind kind, ExportFormat format, CancellationToken cancellationToken = default) =>
        StartAsync(projectId, kind, format, final: false, Op(nameof(StartAsync)), cancellationToken);

    public Task<ServiceResult<ExportJobView>> StartFinalSetAsync(Guid projectId, ExportKind kind, ExportFormat format, CancellationToken cancellationToken = default) =>
        StartAsync(projectId, kind, format, final: true, Op(nameof(StartFinalSetAsync)), cancellationToken);

    public async Task<ServiceResult<ExportJobView>> GetJobAsync(Guid jobId, CancellationToken cancellationToken = default)
    {
        var (job, refusal, _) = await JobAsync<ExportJobView>(jobId, Op(nameof(GetJobAsync)), cancellationToken).ConfigureAwait(false);
        return refusal ?? ServiceResult<ExportJobView>.Ok(job!.View());
    }

    public async Task<ServiceResult<IReadOnlyList<ExportJobView>>> ListJobsAsync(Guid projectId, CancellationToken cancellationToken = default)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (refusal, _) = await authorizer.CheckProjectAsync<IReadOnlyList<ExportJobView>>(db, projectId, Op(nameof(ListJobsAsync)), cancellationToken).ConfigureAwait(false);
        return refusal ?? ServiceResult<IReadOnlyList<ExportJobView>>.Ok(runner.ForProject(projectId).Select(j => j.View()).ToList());
    }

    public async Task<ServiceResult<ExportFile>> OpenFileAsync(Guid jobId, CancellationToken cancellationToken = default)
    {
        var (job, refusal, _) = await JobAsync<ExportFile>(jobId, Op(nameof(OpenFileAsync)), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        var view = job!.View();
        if (!view.HasFile || job.FilePath is not { } path)
        {
            return ServiceResult<ExportFile>.NotFound(view.Status == ExportJobStatus.Failed || view.Status == ExportJobStatus.Cancelled
                ? $"The export has no file: {view.Error}"
                : "The export is not finished yet.");
        }

        try
        {
            var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 81920, FileOptions.Asynchronous | FileOptions.SequentialScan);
            return ServiceResult<ExportFile>.Ok(new ExportFile(stream, view.FileName!, view.ContentType!, stream.Length, view.Sha256!));
        }
        catch (FileNotFoundException)
        {
            return ServiceResult<ExportFile>.NotFound("The export file has expired; export again.");
        }
    }

    public async Task<ServiceResult<ExportJobView>> CancelAsync(Guid jobId, CancellationToken cancellationToken = default)
    {
        var (job, refusal, role) = await JobAsync<ExportJobView>(jobId, Op(nameof(CancelAsync)), cancellationToken).ConfigureAwait(false);
        if (refusal is not null)
        {
            return refusal;
        }

        if (!string.Equals(job!.RequestedById, authorizer.Caller.UserId, StringComparison.Ordinal) && role != Roles.ProjectLead && !authorizer.IsAdministrator)
        {
            return ServiceResult<ExportJobView>.Forbidden($"Only {job.RequestedBy}, who started this export, or the project lead can cancel it.");
        }

        runner.Cancel(job);
        return ServiceResult<ExportJobView>.Ok(job.View());
    }

    private async Task<ServiceResult<ExportJobView>> StartAsync(Guid projectId, ExportKind kind, ExportFormat format, bool final, string operation,
        CancellationToken cancellationToken)
    {
        string requestedBy;
        await using (var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false))
        {
            var (refusal, _) = await authorizer.CheckProjectAsync<ExportJobView>(db, projectId, operation, cancellationToken).ConfigureAwait(false);
            if (refusal is not null)
            {
                return refusal;
            }

            // The person's name as the documents print it (the sign-in name may be the e-mail address).
            var userId = authorizer.Caller.UserId;
            var stored = await db.Users.AsNoTracking().Where(u => u.Id == userId).Select(u => u.DisplayName).FirstOrDefaultAsync(cancellationToken).ConfigureAwait(false);
            requestedBy = string.IsNullOrWhiteSpace(stored) ? authorizer.Caller.DisplayName : stored;
        }

        if (!Enum.IsDefined(kind))
        {
            return ServiceResult<ExportJobView>.Invalid("Kind", "choose the calculation book or the member summary");
        }

        if (!Enum.IsDefined(format) || !ExportNames.Exists(kind, format))
        {
            return ServiceResult<ExportJobView>.Invalid("Format", kind == ExportKind.CalculationBook
                ? "the calculation book is made as PDF only"
                : "the member summary is made as PDF, CSV or XLSX");
        }

        if (final)
        {
            var issued = await reviews.IssueFinalSetAsync(projectId, cancellationToken).ConfigureAwait(false);
            if (!issued.IsOk)
            {
                return issued.As<ExportJobView>();
            }
        }

        return ServiceResult<ExportJobView>.Ok(runner.Enqueue(projectId, kind, format, final, authorizer.Caller.UserId ?? "", requestedBy).View());
    }

    private async Task<(ExportJob? Job, ServiceResult<T>? Refusal, string? Role)> JobAsync<T>(Guid jobId, string operation, CancellationToken cancellationToken)
    {
        if (!authorizer.Caller.IsAuthenticated)
        {
            return (null, ServiceResult<T>.Forbidden("Sign in first."), null);
        }

        var job = runner.Find(jobId);
        if (job is null)
        {
            return (null, ServiceResult<T>.NotFound("The export does not exist or has expired."), null);
        }

        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (refusal, role) = await authorizer.CheckProjectAsync<T>(db, job.ProjectId, operation, cancellationToken).ConfigureAwait(false);
        return refusal is not null ? (null, refusal, role) : (job, null, role);
    }
}
