using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Hosting;

/// <summary>
/// The download of a finished export: <c>GET /exports/{jobId}/file</c>, signed-in users only (others are sent to
/// sign in). The export service decides: any member of the job's project gets the file; anyone else gets 404, as
/// for a project they cannot see; a job that is not finished, failed or expired is 404 too.
/// </summary>
public static class ExportEndpoints
{
    public static string FilePath(Guid jobId) => $"/exports/{jobId}/file";

    public static IEndpointRouteBuilder MapExportDownloads(this IEndpointRouteBuilder endpoints)
    {
        ArgumentNullException.ThrowIfNull(endpoints);
        endpoints.MapGet("/exports/{jobId:guid}/file", async (Guid jobId, IExportService exports, CancellationToken cancellationToken) =>
        {
            var result = await exports.OpenFileAsync(jobId, cancellationToken).ConfigureAwait(false);
            return result.Kind switch
            {
                ResultKind.Ok => Results.File(result.Value!.Content, result.Value.ContentType, result.Value.FileName),
                ResultKind.Forbidden => Results.StatusCode(StatusCodes.Status403Forbidden),
                _ => Results.NotFound(),
            };
        }).RequireAuthorization();
        return endpoints;
    }
}
