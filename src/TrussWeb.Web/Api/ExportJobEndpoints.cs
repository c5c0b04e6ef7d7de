using System.Globalization;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Api;

/// <summary>Which document to make and in which format (the calculation book is PDF only).</summary>
public sealed record ExportRequest(ExportKind Kind, ExportFormat Format);

/// <summary>
/// /api/v1 exports over <see cref="IExportService"/> (docs/dev/reports.md, "Exports"): start a preliminary export
/// or the final set (202 with the job and its Location), follow the job, list the project's jobs and download the
/// file of a finished job. The service decides who may do what; these endpoints only map its answers.
/// Starting needs a read-write token (a job writes an audit entry when it produces its file); reading the
/// status and downloading need only a read token.
/// </summary>
public static class ExportJobEndpoints
{
    /// <summary>Where a job's status is read.</summary>
    public static string JobPath(Guid jobId) => $"{ApiExtensions.Prefix}/exports/{jobId}";

    public static void Map(RouteGroupBuilder api)
    {
        ArgumentNullException.ThrowIfNull(api);
        var g = api.MapGroup("").WithTags("Exports");
        g.MapPost("/projects/{projectId:guid}/exports", (Guid projectId, HttpRequest request, IExportService exports, CancellationToken ct) =>
                request.WithBodyAsync<ExportRequest>(async body => Accepted(await exports.StartAsync(projectId, body.Kind, body.Format, ct))))
            .WithName("StartExport")
            .WithSummary("Queues a preliminary export (calculation book as PDF; member summary as PDF, CSV or XLSX); 202 with the job, Location is its status.")
            .Accepts<ExportRequest>("application/json").Produces<ExportJobView>(StatusCodes.Status202Accepted).RequiresWrite();
        g.MapPost("/projects/{projectId:guid}/exports/final-set", (Guid projectId, HttpRequest request, IExportService exports, CancellationToken ct) =>
                request.WithBodyAsync<ExportRequest>(async body =>
                {
                    // The readiness says whether the caller leads the project and why the final set cannot be issued
                    // now; a lead whose members are not all approved gets 409 with that reason, anyone else the
                    // service's own refusal (403).
                    var readiness = await exports.GetReadinessAsync(projectId, ct);
                    if (!readiness.IsOk)
                    {
                        return ApiProblems.From(readiness);
                    }

                    if (readiness.Value!.CallerIsLead && readiness.Value.FinalSetRefusal is { } refusal)
                    {
                        return ApiProblems.Problem(StatusCodes.Status409Conflict, "The final set cannot be issued yet.", refusal,
                            extra: new Dictionary<string, object?> { ["issueStatus"] = readiness.Value.Issue });
                    }

                    return Accepted(await exports.StartFinalSetAsync(projectId, body.Kind, body.Format, ct));
                }))
            .WithName("StartFinalSet")
            .WithSummary("Project lead: records the final issue and queues the export marked final; 403 for anyone else, 409 while any member is not approved.")
            .Accepts<ExportRequest>("application/json").Produces<ExportJobView>(StatusCodes.Status202Accepted)
            .ProducesProblem(StatusCodes.Status409Conflict).RequiresWrite();
        g.MapGet("/projects/{projectId:guid}/exports", async (Guid projectId, IExportService exports, CancellationToken ct) => ApiProblems.Ok(await exports.ListJobsAsync(projectId, ct)))
            .WithName("ListExports").WithSummary("The project's export jobs that have not expired, newest first.")
            .Produces<IReadOnlyList<ExportJobView>>().ProducesProblem(StatusCodes.Status404NotFound);
        g.MapGet("/exports/{jobId:guid}", async (Guid jobId, IExportService exports, CancellationToken ct) => ApiProblems.Ok(await exports.GetJobAsync(jobId, ct)))
            .WithName("GetExport").WithSummary("One export job: status, progress (done of total, stage), error, and for a finished job the file name, size and SHA-256.")
            .Produces<ExportJobView>().ProducesProblem(StatusCodes.Status404NotFound);
        g.MapGet("/exports/{jobId:guid}/file", async (Guid jobId, IExportService exports, HttpContext http, CancellationToken ct) =>
            {
                var job = await exports.GetJobAsync(jobId, ct);
                if (!job.IsOk)
                {
                    return ApiProblems.From(job);
                }

                if (!job.Value!.IsFinished)
                {
                    return ApiProblems.Problem(StatusCodes.Status409Conflict, "The export is not finished yet.",
                        string.Create(CultureInfo.InvariantCulture, $"The export is {job.Value.Status} ({job.Value.Done} of {job.Value.Total}, {job.Value.Stage}); poll {JobPath(jobId)} and download when it has succeeded."),
                        extra: new Dictionary<string, object?> { ["jobStatus"] = job.Value.Status.ToString() });
                }

                if (!job.Value.HasFile)
                {
                    // A failed or cancelled job never offers a file, whatever is left in the folder.
                    return ApiProblems.NotFound($"The export {job.Value.Status.ToString().ToLowerInvariant()} and has no file: {job.Value.Error ?? "export again"}.");
                }

                var file = await exports.OpenFileAsync(jobId, ct);
                if (!file.IsOk)
                {
                    return ApiProblems.From(file);
                }

                // RFC 9530: the SHA-256 of the file, as the job record and the audit log keep it.
                http.Response.Headers["Repr-Digest"] = "sha-256=:" + Convert.ToBase64String(Convert.FromHexString(file.Value!.Sha256)) + ":";
                return Results.File(file.Value.Content, file.Value.ContentType, file.Value.FileName);
            })
            .WithName("DownloadExport").WithSummary("The file of a succeeded export (PDF, CSV or XLSX, with its file name); 409 while it runs, 404 when unknown, expired, failed or cancelled.")
            .Produces(StatusCodes.Status200OK, (Type?)null, "application/pdf", "text/csv", "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet")
            .ProducesProblem(StatusCodes.Status404NotFound).ProducesProblem(StatusCodes.Status409Conflict);
    }

    private static IResult Accepted(ServiceResult<ExportJobView> result) =>
        result.IsOk ? Results.Accepted(JobPath(result.Value!.JobId), result.Value) : ApiProblems.From(result);
}
