using Microsoft.EntityFrameworkCore;
using TrussWeb.Data;

namespace TrussWeb.Web.Hosting;

/// <summary>
/// <c>/health/live</c> (the process answers: always 200) and <c>/health/ready</c> (database reachable and
/// no pending migration: 200, else 503). Both answer JSON with <c>status</c>, <c>version</c> (the app's
/// informational version) and <c>schema</c> (the last applied migration id; on <c>live</c> the one last
/// seen, so a liveness probe never waits for the database).
/// </summary>
public static class HealthEndpoints
{
    private static string? lastSchema;

    /// <summary>The JSON body of both endpoints.</summary>
    public sealed record HealthReport(string Status, string Version, string? Schema, int? PendingMigrations = null);

    public static IEndpointRouteBuilder MapTrussWebHealth(this IEndpointRouteBuilder endpoints)
    {
        ArgumentNullException.ThrowIfNull(endpoints);
        endpoints.MapGet("/health/live", () => Results.Ok(new HealthReport("live", AppVersion.Informational, Volatile.Read(ref lastSchema))));
        endpoints.MapGet("/health/ready", ReadyAsync);
        return endpoints;
    }

    private static async Task<IResult> ReadyAsync(IDbContextFactory<TrussWebDbContext> factory, ILoggerFactory loggers, CancellationToken cancellationToken)
    {
        try
        {
            await using var db = await factory.CreateDbContextAsync(cancellationToken);
            if (!await db.Database.CanConnectAsync(cancellationToken))
            {
                return NotReady(null, null);
            }

            var applied = (await db.Database.GetAppliedMigrationsAsync(cancellationToken)).ToList();
            var pending = (await db.Database.GetPendingMigrationsAsync(cancellationToken)).Count();
            var schema = applied.Count > 0 ? applied[^1] : null;
            Volatile.Write(ref lastSchema, schema);
            return pending == 0
                ? Results.Ok(new HealthReport("ready", AppVersion.Informational, schema, 0))
                : NotReady(schema, pending);
        }
        catch (Exception ex) when (ex is not OperationCanceledException)
        {
            loggers.CreateLogger(typeof(HealthEndpoints)).LogWarning(ex, "Readiness check failed: the database is not reachable.");
            return NotReady(null, null);
        }
    }

    private static IResult NotReady(string? schema, int? pending) =>
        Results.Json(new HealthReport("not ready", AppVersion.Informational, schema, pending), statusCode: StatusCodes.Status503ServiceUnavailable);
}
