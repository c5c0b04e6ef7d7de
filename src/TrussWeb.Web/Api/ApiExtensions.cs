using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using System.Threading.RateLimiting;
using Microsoft.AspNetCore.Authentication;
using Microsoft.AspNetCore.Diagnostics;
using Microsoft.AspNetCore.RateLimiting;
using Microsoft.Extensions.Options;
using TrussWeb.Core.Validation;
using TrussWeb.Services.Contracts;
using TrussWeb.Web.Api.OpenApi;

namespace TrussWeb.Web.Api;

/// <summary>
/// The HTTP API under <see cref="Prefix"/>: bearer tokens only (no cookie, so no CSRF surface), a
/// per-token rate limit, strict JSON, problem details for every failure, and the OpenAPI document at
/// <c>/openapi/v1.json</c>. Program.cs calls <see cref="AddTrussWebApi"/> and <see cref="MapTrussWebApi"/>.
/// </summary>
public static class ApiExtensions
{
    public const string Prefix = "/api/v1";

    /// <summary>Policy: any valid token.</summary>
    public const string ReadPolicy = "api-read";

    /// <summary>Policy: a valid read-write token.</summary>
    public const string WritePolicy = "api-write";

    public const string RateLimitPolicy = "api-per-token";

    public static WebApplicationBuilder AddTrussWebApi(this WebApplicationBuilder builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        var services = builder.Services;
        services.AddOptions<ApiOptions>().Bind(builder.Configuration.GetSection(ApiOptions.SectionName))
            .Validate(o => o.RequestsPerWindow >= 1 && o.WindowSeconds >= 1 && o.MaxBodyBytes >= 1024,
                $"{ApiOptions.SectionName}: RequestsPerWindow and WindowSeconds must be at least 1, MaxBodyBytes at least 1024.")
            .ValidateOnStart();
        services.ConfigureHttpJsonOptions(o => ApiJson.Configure(o.SerializerOptions));
        services.AddAuthentication()
            .AddScheme<AuthenticationSchemeOptions, ApiTokenAuthenticationHandler>(ApiTokenAuthenticationHandler.SchemeName, null);
        services.AddAuthorizationBuilder()
            .AddPolicy(ReadPolicy, p => p.AddAuthenticationSchemes(ApiTokenAuthenticationHandler.SchemeName).RequireAuthenticatedUser())
            .AddPolicy(WritePolicy, p => p.AddAuthenticationSchemes(ApiTokenAuthenticationHandler.SchemeName).RequireAuthenticatedUser()
                .RequireClaim(ApiTokenAuthenticationHandler.ScopeClaim, ApiTokenScopes.ReadWrite));
        services.AddRateLimiter(o =>
        {
            o.RejectionStatusCode = StatusCodes.Status429TooManyRequests;
            o.AddPolicy(RateLimitPolicy, context =>
            {
                var settings = context.RequestServices.GetRequiredService<IOptions<ApiOptions>>().Value;
                return RateLimitPartition.GetFixedWindowLimiter(PartitionKey(context), _ => new FixedWindowRateLimiterOptions
                {
                    PermitLimit = settings.RequestsPerWindow,
                    Window = TimeSpan.FromSeconds(settings.WindowSeconds),
                    QueueLimit = 0,
                    AutoReplenishment = true,
                });
            });
            o.OnRejected = async (context, cancellationToken) =>
            {
                var settings = context.HttpContext.RequestServices.GetRequiredService<IOptions<ApiOptions>>().Value;
                var retry = context.Lease.TryGetMetadata(MetadataName.RetryAfter, out var after) ? after : TimeSpan.FromSeconds(settings.WindowSeconds);
                var seconds = Math.Max(1, (int)Math.Ceiling(retry.TotalSeconds));
                context.HttpContext.Response.Headers.RetryAfter = seconds.ToString(CultureInfo.InvariantCulture);
                await ApiProblems.Problem(StatusCodes.Status429TooManyRequests, "Too many requests.",
                    string.Create(CultureInfo.InvariantCulture, $"This token may make {settings.RequestsPerWindow} requests per {settings.WindowSeconds} s; retry after {seconds} s."),
                    extra: new Dictionary<string, object?> { ["limit"] = settings.RequestsPerWindow, ["windowSeconds"] = settings.WindowSeconds, ["retryAfterSeconds"] = seconds })
                    .ExecuteAsync(context.HttpContext).ConfigureAwait(false);
            };
        });
        services.AddOpenApi("v1", ApiDocument.Configure);
        return builder;
    }

    /// <summary>Call after UseAuthorization: the API's guard and rate limiter, its endpoints and the OpenAPI document.</summary>
    public static WebApplication MapTrussWebApi(this WebApplication app)
    {
        ArgumentNullException.ThrowIfNull(app);
        app.UseWhen(c => c.Request.Path.StartsWithSegments(Prefix, StringComparison.OrdinalIgnoreCase), api => api.Use(GuardAsync));
        app.UseRateLimiter();
        app.MapOpenApi("/openapi/{documentName}.json").AllowAnonymous();

        var v1 = app.MapGroup(Prefix)
            .RequireAuthorization(ReadPolicy)
            .RequireRateLimiting(RateLimitPolicy)
            .ProducesProblem(StatusCodes.Status401Unauthorized)
            .ProducesProblem(StatusCodes.Status429TooManyRequests);
        SectionEndpoints.Map(v1);
        CalculationEndpoints.Map(v1);
        ProjectEndpoints.Map(v1);
        TrussEndpoints.Map(v1);
        ReviewEndpoints.Map(v1);
        ExportJobEndpoints.Map(v1);
        return app;
    }

    /// <summary>
    /// For /api paths: JSON problems instead of the app's HTML error and status pages, and never a stack
    /// trace. Empty error responses get a problem body.
    /// </summary>
    private static async Task GuardAsync(HttpContext context, RequestDelegate next)
    {
        if (context.Features.Get<IStatusCodePagesFeature>() is { } pages)
        {
            pages.Enabled = false;
        }

        try
        {
            await next(context).ConfigureAwait(false);
        }
        catch (InputValidationException ex) when (!context.Response.HasStarted)
        {
            context.Response.Clear();
            await ApiProblems.Invalid(ex.Issues).ExecuteAsync(context).ConfigureAwait(false);
            return;
        }
        catch (BadHttpRequestException ex) when (!context.Response.HasStarted)
        {
            context.Response.Clear();
            await ApiProblems.Problem(ex.StatusCode, "The request could not be read.", "The request could not be read (a route, query or header value has the wrong form).")
                .ExecuteAsync(context).ConfigureAwait(false);
            return;
        }
        catch (Exception ex) when (!context.Response.HasStarted && ex is not OperationCanceledException)
        {
            context.RequestServices.GetRequiredService<ILoggerFactory>().CreateLogger(typeof(ApiExtensions)).LogError(ex, "API request {Path} failed", context.Request.Path);
            context.Response.Clear();
            await ApiProblems.Problem(StatusCodes.Status500InternalServerError, "Internal error.",
                "The server could not complete the request; nothing was saved unless the response said so. The error is logged with trace id " + context.TraceIdentifier + ".")
                .ExecuteAsync(context).ConfigureAwait(false);
            return;
        }

        if (context.Response is { StatusCode: >= 400, HasStarted: false, ContentLength: null } && string.IsNullOrEmpty(context.Response.ContentType))
        {
            var status = context.Response.StatusCode;
            var detail = status switch
            {
                400 => "The request could not be read (a route, query or header value has the wrong form, e.g. a number that is not a number).",
                404 => "No API route matches this path; see /openapi/v1.json.",
                405 => "This method is not allowed on this path.",
                415 => "Send the body as application/json.",
                _ => "The request failed.",
            };
            await ApiProblems.Problem(status, "The request failed.", detail,
                status == StatusCodes.Status415UnsupportedMediaType ? [new ApiFieldError("Content-Type", "must be application/json", context.Request.ContentType, "application/json")] : null)
                .ExecuteAsync(context).ConfigureAwait(false);
        }
    }

    /// <summary>Rate-limit partition: a hash of the presented token, else the client address.</summary>
    private static string PartitionKey(HttpContext context)
    {
        string? header = context.Request.Headers.Authorization;
        if (!string.IsNullOrEmpty(header))
        {
            return "t:" + Convert.ToHexString(SHA256.HashData(Encoding.UTF8.GetBytes(header)), 0, 12);
        }

        return "a:" + (context.Connection.RemoteIpAddress?.ToString() ?? "unknown");
    }
}
