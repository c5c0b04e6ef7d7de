using System.Globalization;

namespace TrussWeb.Web.Api;

/// <summary>Small helpers shared by the endpoint files.</summary>
public static class ApiEndpointExtensions
{
    /// <summary>Needs a read-write token (a read token gets 403).</summary>
    public static RouteHandlerBuilder RequiresWrite(this RouteHandlerBuilder builder) =>
        builder.RequireAuthorization(ApiExtensions.WritePolicy)
            .ProducesProblem(StatusCodes.Status400BadRequest)
            .ProducesProblem(StatusCodes.Status403Forbidden)
            .ProducesProblem(StatusCodes.Status404NotFound);

    /// <summary>Reads the JSON body and runs <paramref name="then"/> with it, or returns the body's problem.</summary>
    public static async Task<IResult> WithBodyAsync<T>(this HttpRequest request, Func<T, Task<IResult>> then)
        where T : class
    {
        ArgumentNullException.ThrowIfNull(then);
        var (body, problem) = await ApiJson.ReadAsync<T>(request).ConfigureAwait(false);
        return problem ?? await then(body!).ConfigureAwait(false);
    }

    /// <summary>
    /// The version to save with: If-Match ("3" or W/"3") when present, else the body's. Null (and a
    /// problem) when If-Match is not a version or disagrees with a non-zero body version.
    /// </summary>
    public static (long Version, IResult? Problem) VersionFrom(this HttpRequest request, long bodyVersion)
    {
        ArgumentNullException.ThrowIfNull(request);
        string? header = request.Headers.IfMatch;
        if (string.IsNullOrWhiteSpace(header))
        {
            return (bodyVersion, null);
        }

        var text = header.Trim();
        if (text.StartsWith("W/", StringComparison.Ordinal))
        {
            text = text[2..];
        }

        if (!long.TryParse(text.Trim('"'), NumberStyles.None, CultureInfo.InvariantCulture, out var version))
        {
            return (0, ApiProblems.BadRequest("If-Match must be the ETag of the row you loaded, e.g. \"3\".", [new ApiFieldError("If-Match", "must be a version ETag such as \"3\"", header)]));
        }

        if (bodyVersion != 0 && bodyVersion != version)
        {
            return (0, ApiProblems.BadRequest("If-Match and the body's version disagree.",
                [new ApiFieldError("version", string.Create(CultureInfo.InvariantCulture, $"must equal If-Match {version} (got {bodyVersion})"), bodyVersion.ToString(CultureInfo.InvariantCulture))]));
        }

        return (version, null);
    }

    /// <summary>200 with an ETag of the row's version.</summary>
    public static IResult OkWithETag<T>(this HttpContext context, T value, long version)
    {
        ArgumentNullException.ThrowIfNull(context);
        context.Response.Headers.ETag = string.Create(CultureInfo.InvariantCulture, $"\"{version}\"");
        return Results.Ok(value);
    }
}
