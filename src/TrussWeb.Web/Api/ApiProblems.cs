using System.Globalization;
using TrussWeb.Core.Validation;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Api;

/// <summary>
/// RFC 9457 problem details (application/problem+json) for every API failure. Validation problems carry
/// <c>errors</c>: each with the field, the message (which states the limit), and the value and limit when known.
/// </summary>
public static partial class ApiProblems
{
    public const string ContentType = "application/problem+json";

    private const string TypeBase = "https://trussweb.invalid/problems/";

    public static IResult Problem(int status, string title, string detail, IReadOnlyList<ApiFieldError>? errors = null, IDictionary<string, object?>? extra = null)
    {
        var extensions = new Dictionary<string, object?>(StringComparer.Ordinal);
        if (errors is { Count: > 0 })
        {
            extensions["errors"] = errors;
        }

        if (extra is not null)
        {
            foreach (var (k, v) in extra)
            {
                extensions[k] = v;
            }
        }

        return Results.Problem(detail: detail, statusCode: status, title: title, type: TypeBase + Slug(status), extensions: extensions);
    }

    public static IResult BadRequest(string detail, IReadOnlyList<ApiFieldError> errors) =>
        Problem(StatusCodes.Status400BadRequest, "The request was not valid.", detail, errors);

    public static IResult Invalid(IReadOnlyList<ValidationIssue> issues, string? prefix = null) =>
        BadRequest(Summary(issues.Select(i => $"{Field(prefix, i.Field)}: {i.Message}").ToList()),
            issues.Select(i => WithValueAndLimit(Field(prefix, i.Field), i.Message)).ToList());

    public static IResult Invalid(IReadOnlyList<ApiFieldError> errors) =>
        BadRequest(Summary(errors.Select(e => $"{e.Field}: {e.Message}").ToList()), errors);

    public static IResult NotFound(string detail) => Problem(StatusCodes.Status404NotFound, "Not found.", detail);

    public static IResult Forbidden(string detail) => Problem(StatusCodes.Status403Forbidden, "Not allowed.", detail);

    /// <summary>Maps a failed service result: Invalid 400, Conflict 409, Forbidden 403, NotFound 404.</summary>
    public static IResult From<T>(ServiceResult<T> result)
    {
        ArgumentNullException.ThrowIfNull(result);
        return result.Kind switch
        {
            ResultKind.Invalid => Invalid(result.Errors.Select(e => WithValueAndLimit(e.Field, e.Message)).ToList()),
            ResultKind.Conflict => Problem(StatusCodes.Status409Conflict, "Someone else saved first.", result.Message ?? "The row changed since you loaded it; nothing was saved.",
                extra: new Dictionary<string, object?> { ["conflicts"] = result.Conflicts }),
            ResultKind.Forbidden => Forbidden(result.Message ?? "Your role does not allow this."),
            ResultKind.NotFound => NotFound(result.Message ?? "Not found."),
            _ => throw new InvalidOperationException("An Ok result is not a problem."),
        };
    }

    /// <summary>200 with the value, or the problem.</summary>
    public static IResult Ok<T>(ServiceResult<T> result) => result.IsOk ? Results.Ok(result.Value) : From(result);

    /// <summary>The error with the value ("(got …)") and limit ("at most 500000 mm") read from Core's message when it states them.</summary>
    public static ApiFieldError WithValueAndLimit(string field, string message)
    {
        ArgumentNullException.ThrowIfNull(message);
        var got = Got().Match(message);
        var limit = Limit().Match(message);
        return new ApiFieldError(field, message, got.Success ? got.Groups[1].Value.Trim() : null, limit.Success ? limit.Value.Trim() : null);
    }

    [System.Text.RegularExpressions.GeneratedRegex(@"\(got ([^)]*)\)")]
    private static partial System.Text.RegularExpressions.Regex Got();

    [System.Text.RegularExpressions.GeneratedRegex(@"(at most|at least|greater than|less than|not exceed|from) -?[0-9][0-9.,E+\-]*( to -?[0-9][0-9.,E+\-]*)?( ?(mm²|mm|MPa|kPa|N|kN|days|characters|rows))?")]
    private static partial System.Text.RegularExpressions.Regex Limit();

    private static string Field(string? prefix, string field) => prefix is null ? field : $"{prefix}.{field}";

    private static string Summary(IReadOnlyList<string> lines) =>
        lines.Count == 1 ? lines[0] : string.Create(CultureInfo.InvariantCulture, $"{lines.Count} inputs need attention: {string.Join("; ", lines)}");

    private static string Slug(int status) => status switch
    {
        400 => "bad-request",
        401 => "unauthorized",
        403 => "forbidden",
        404 => "not-found",
        409 => "conflict",
        413 => "body-too-large",
        415 => "unsupported-media-type",
        429 => "too-many-requests",
        _ => status.ToString(CultureInfo.InvariantCulture),
    };
}
