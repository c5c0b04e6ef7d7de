using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Components.Review;

/// <summary>
/// GET /projects/{id}/audit.csv: the project's audit log as a CSV download (<see cref="IReviewService.ExportAuditCsvAsync"/>).
/// Signed-in users only (an anonymous request is sent to the sign-in page by the cookie); a project the caller is not a
/// member of answers 404, as the pages do; read only.
/// </summary>
public static class AuditCsvEndpoint
{
    public const string Pattern = "/projects/{projectId:guid}/audit.csv";

    public static IEndpointRouteBuilder MapAuditCsv(this IEndpointRouteBuilder endpoints)
    {
        ArgumentNullException.ThrowIfNull(endpoints);
        endpoints.MapGet(Pattern, async (Guid projectId, IReviewService review, CancellationToken cancellationToken) =>
        {
            var result = await review.ExportAuditCsvAsync(projectId, cancellationToken);
            return result.Kind switch
            {
                ResultKind.Ok => Results.File(result.Value!, "text/csv; charset=utf-8", $"audit-{projectId:N}.csv"),
                ResultKind.Forbidden => Results.Problem(result.Message, statusCode: StatusCodes.Status403Forbidden),
                _ => Results.NotFound(result.Message),
            };
        }).RequireAuthorization();
        return endpoints;
    }
}
