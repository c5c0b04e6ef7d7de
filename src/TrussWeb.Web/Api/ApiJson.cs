using System.Globalization;
using System.Text.Json;
using System.Text.Json.Serialization;
using System.Text.RegularExpressions;
using Microsoft.Extensions.Options;

namespace TrussWeb.Web.Api;

/// <summary>
/// Reads a JSON request body strictly: at most <see cref="ApiOptions.MaxBodyBytes"/>, numbers only as
/// JSON numbers (no "NaN", "Infinity" or numbers in strings), required properties present, no nulls for
/// non-nullable properties. Every failure is a 400 problem naming the field (JSON path) and what was wrong.
/// </summary>
public static partial class ApiJson
{
    private static JsonSerializerOptions? _reading;

    /// <summary>
    /// The API's serializer settings (responses and the OpenAPI schemas). Request bodies are read with a
    /// copy that also refuses null for non-nullable properties (<see cref="ReadingOptions"/>); responses
    /// do not use that check, so a service value can never turn a good answer into a serializer error.
    /// </summary>
    public static void Configure(JsonSerializerOptions options)
    {
        ArgumentNullException.ThrowIfNull(options);
        options.NumberHandling = JsonNumberHandling.Strict;
        options.RespectRequiredConstructorParameters = true;
        options.UnmappedMemberHandling = JsonUnmappedMemberHandling.Disallow;
        options.MaxDepth = 32;
        options.Converters.Add(new JsonStringEnumConverter(allowIntegerValues: false));
        // A nullable constructor parameter (string? Client) may be left out; a non-nullable one is required.
        options.TypeInfoResolver = new System.Text.Json.Serialization.Metadata.DefaultJsonTypeInfoResolver
        {
            Modifiers =
            {
                info =>
                {
                    foreach (var property in info.Properties)
                    {
                        if (property.IsRequired && property.AssociatedParameter is { IsNullable: true })
                        {
                            property.IsRequired = false;
                        }
                    }
                },
            },
        };
    }

    /// <summary>The body as <typeparamref name="T"/>, or the 400/413/415 problem to return.</summary>
    public static async Task<(T? Value, IResult? Problem)> ReadAsync<T>(HttpRequest request)
        where T : class
    {
        ArgumentNullException.ThrowIfNull(request);
        var limit = request.HttpContext.RequestServices.GetRequiredService<IOptions<ApiOptions>>().Value.MaxBodyBytes;
        var json = ReadingOptions(request.HttpContext.RequestServices.GetRequiredService<IOptions<Microsoft.AspNetCore.Http.Json.JsonOptions>>().Value.SerializerOptions);
        if (request.ContentType is not { } type || !type.StartsWith("application/json", StringComparison.OrdinalIgnoreCase))
        {
            return (null, ApiProblems.Problem(StatusCodes.Status415UnsupportedMediaType, "The body must be JSON.",
                $"Send the body as application/json (got {(request.ContentType is null ? "no Content-Type" : request.ContentType)}).",
                [new ApiFieldError("Content-Type", "must be application/json", request.ContentType, "application/json")]));
        }

        if (request.ContentLength > limit)
        {
            return (null, TooLarge(limit, request.ContentLength.Value));
        }

        var buffer = new MemoryStream();
        var chunk = new byte[16 * 1024];
        int read;
        while ((read = await request.Body.ReadAsync(chunk, request.HttpContext.RequestAborted).ConfigureAwait(false)) > 0)
        {
            if (buffer.Length + read > limit)
            {
                return (null, TooLarge(limit, null));
            }

            buffer.Write(chunk, 0, read);
        }

        if (buffer.Length == 0)
        {
            return (null, ApiProblems.BadRequest("The request body is empty; send a JSON object.", [new ApiFieldError("$", "a JSON object is required")]));
        }

        if (LargestNumber(buffer.GetBuffer().AsSpan(0, (int)buffer.Length)) is { } huge)
        {
            var limitText = MaxMagnitude.ToString("0e0", CultureInfo.InvariantCulture);
            return (null, ApiProblems.BadRequest($"{huge.Path} is {huge.Text}, beyond the largest magnitude any input may have ({limitText}).",
                [new ApiFieldError(huge.Path, $"must be at most {limitText} in magnitude", huge.Text, limitText)]));
        }

        if (NullInList(buffer.GetBuffer().AsSpan(0, (int)buffer.Length)) is { } nullPath)
        {
            return (null, ApiProblems.BadRequest($"{nullPath} is null; a list holds no null entries (leave the entry out instead).",
                [new ApiFieldError(nullPath, "must not be null (a list holds no null entries)", "null")]));
        }

        try
        {
            var value = JsonSerializer.Deserialize<T>(buffer.GetBuffer().AsSpan(0, (int)buffer.Length), json);
            return value is null
                ? (null, ApiProblems.BadRequest("The request body is null; send a JSON object.", [new ApiFieldError("$", "a JSON object is required")]))
                : (value, null);
        }
        catch (JsonException ex)
        {
            return (null, FromJsonException<T>(ex));
        }
    }

    /// <summary>
    /// Largest magnitude of any number in a request: Core's largest outer limit (forces, 1e10 N). Each
    /// field's own limit is checked later; this stops 1e308 and beyond before any arithmetic.
    /// </summary>
    public const double MaxMagnitude = TrussWeb.Core.Validation.PlausibleRange.MaxForceN;

    /// <summary>The first number (with its JSON path) beyond <see cref="MaxMagnitude"/> or beyond the double range; null when none. Invalid JSON is left to the serializer.</summary>
    public static (string Path, string Text)? LargestNumber(ReadOnlySpan<byte> json) => FirstOffending(json, nullEntries: false);

    /// <summary>
    /// The JSON path of the first <c>null</c> that is an element of an array (no API list holds null entries; the
    /// serializer would pass them on to the services); null when none. Invalid JSON is left to the serializer.
    /// </summary>
    public static string? NullInList(ReadOnlySpan<byte> json) => FirstOffending(json, nullEntries: true)?.Path;

    /// <summary>
    /// One walk over the body keeping the JSON path (<c>$.members[2].kx</c>): the first number out of range, or
    /// (<paramref name="nullEntries"/>) the first null array element, with its path and text.
    /// </summary>
    private static (string Path, string Text)? FirstOffending(ReadOnlySpan<byte> json, bool nullEntries)
    {
        var reader = new Utf8JsonReader(json, new JsonReaderOptions { MaxDepth = 64 });
        var path = new List<string>();
        var indexes = new List<int>();
        string? property = null;
        try
        {
            while (reader.Read())
            {
                switch (reader.TokenType)
                {
                    case JsonTokenType.PropertyName:
                        property = reader.GetString();
                        break;
                    case JsonTokenType.StartObject or JsonTokenType.StartArray:
                        path.Add(Segment(path.Count == 0 ? null : property, indexes));
                        indexes.Add(reader.TokenType == JsonTokenType.StartArray ? 0 : -1);
                        property = null;
                        break;
                    case JsonTokenType.EndObject or JsonTokenType.EndArray:
                        path.RemoveAt(path.Count - 1);
                        indexes.RemoveAt(indexes.Count - 1);
                        Advance(indexes);
                        break;
                    case JsonTokenType.Number when !nullEntries:
                        if (!reader.TryGetDouble(out var v) || !double.IsFinite(v) || Math.Abs(v) > MaxMagnitude)
                        {
                            return (string.Concat(path) + Segment(property, indexes), System.Text.Encoding.UTF8.GetString(reader.ValueSpan));
                        }

                        Advance(indexes);
                        break;
                    case JsonTokenType.Null when nullEntries && indexes.Count > 0 && indexes[^1] >= 0:
                        return (string.Concat(path) + Segment(property, indexes), "null");
                    default:
                        Advance(indexes);
                        break;
                }
            }
        }
        catch (JsonException)
        {
            return null;
        }

        return null;

        static string Segment(string? name, List<int> indexes) =>
            indexes.Count == 0 ? "$" : indexes[^1] >= 0 ? string.Create(CultureInfo.InvariantCulture, $"[{indexes[^1]}]") : name is null ? string.Empty : "." + name;

        static void Advance(List<int> indexes)
        {
            if (indexes.Count > 0 && indexes[^1] >= 0)
            {
                indexes[^1]++;
            }
        }
    }

    /// <summary>The response settings plus <c>RespectNullableAnnotations</c> (null refused for non-nullable properties), made once.</summary>
    public static JsonSerializerOptions ReadingOptions(JsonSerializerOptions http)
    {
        ArgumentNullException.ThrowIfNull(http);
        return _reading ??= new JsonSerializerOptions(http) { RespectNullableAnnotations = true };
    }

    private static IResult TooLarge(int limit, long? length)
    {
        var limitText = string.Create(CultureInfo.InvariantCulture, $"{limit} bytes ({limit / 1024} KB)");
        return ApiProblems.BadRequest(
            $"The request body is larger than the limit of {limitText}" + (length is null ? "." : string.Create(CultureInfo.InvariantCulture, $" (Content-Length {length})."))
            + " Split the work into smaller requests.",
            [new ApiFieldError("body", $"must be at most {limitText}", length?.ToString(CultureInfo.InvariantCulture), limitText)]);
    }

    /// <summary>A 400 problem from a serializer failure: the JSON path as the field and a plain reason.</summary>
    public static IResult FromJsonException<T>(JsonException ex)
    {
        ArgumentNullException.ThrowIfNull(ex);
        var path = string.IsNullOrEmpty(ex.Path) ? "$" : ex.Path;
        var raw = ex.Message;
        var cut = raw.IndexOf(" Path:", StringComparison.Ordinal);
        var reason = cut > 0 ? raw[..cut] : raw;
        var missing = MissingProperties().Match(raw);
        if (missing.Success)
        {
            var names = missing.Groups[1].Value.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries).Select(n => n.Trim('\'')).ToList();
            return ApiProblems.BadRequest($"Required propert{(names.Count == 1 ? "y" : "ies")} missing at {path}: {string.Join(", ", names)}.",
                names.Select(n => new ApiFieldError(path == "$" ? "$." + n : $"{path}.{n}", "is required")).ToList());
        }

        string message;
        if (ex.InnerException is FormatException or OverflowException || reason.Contains("could not be converted", StringComparison.Ordinal))
        {
            var expected = TypeAt(typeof(T), path);
            message = expected switch
            {
                null => "has the wrong type or an unknown value",
                _ when expected == typeof(double) || expected == typeof(float) =>
                    "must be a finite JSON number (numbers in quotes, NaN and Infinity are refused)",
                _ when expected == typeof(int) || expected == typeof(long) => "must be a whole JSON number",
                _ when expected == typeof(bool) => "must be true or false",
                _ when expected == typeof(string) => "must be a JSON string",
                _ when expected == typeof(Guid) => "must be a GUID in quotes",
                _ when expected == typeof(DateTime) => "must be an ISO 8601 date-time in quotes",
                _ when expected.IsEnum => $"must be one of {string.Join(", ", Enum.GetNames(expected))}",
                _ when typeof(System.Collections.IEnumerable).IsAssignableFrom(expected) => "must be a JSON array",
                _ => "must be a JSON object",
            };
        }
        else if (reason.Contains("could not be mapped", StringComparison.Ordinal))
        {
            message = "is not a known property";
        }
        else if (reason.Contains("null", StringComparison.OrdinalIgnoreCase) && reason.Contains("allow", StringComparison.Ordinal))
        {
            message = "must not be null";
        }
        else
        {
            message = "is not valid JSON here: " + Clean(reason);
        }

        return ApiProblems.BadRequest($"{path} {message}.", [new ApiFieldError(path, message)]);
    }

    /// <summary>The CLR type a JSON path ("$.lengths.lxMm", "$.rows[2].xMm") points at in <paramref name="root"/>; null when unknown.</summary>
    public static Type? TypeAt(Type root, string path)
    {
        ArgumentNullException.ThrowIfNull(root);
        ArgumentNullException.ThrowIfNull(path);
        var type = root;
        foreach (var raw in path.TrimStart('$').Split('.', StringSplitOptions.RemoveEmptyEntries))
        {
            var name = raw;
            var bracket = raw.IndexOf('[', StringComparison.Ordinal);
            if (bracket >= 0)
            {
                name = raw[..bracket];
            }

            if (name.Length > 0)
            {
                var property = type.GetProperties().FirstOrDefault(p => string.Equals(p.Name, name, StringComparison.OrdinalIgnoreCase));
                if (property is null)
                {
                    return null;
                }

                type = Nullable.GetUnderlyingType(property.PropertyType) ?? property.PropertyType;
            }

            for (var i = bracket; i >= 0 && i < raw.Length; i = raw.IndexOf('[', i + 1))
            {
                var element = type.IsArray ? type.GetElementType() : type.GetGenericArguments().FirstOrDefault();
                if (element is null)
                {
                    return null;
                }

                type = Nullable.GetUnderlyingType(element) ?? element;
            }
        }

        return type;
    }

    private static string Clean(string reason) =>
        reason.Length > 200 ? reason[..200] : reason;

    [GeneratedRegex(@"missing required properties including: (.+?)\.?\s*(Path:|$)")]
    private static partial Regex MissingProperties();
}
