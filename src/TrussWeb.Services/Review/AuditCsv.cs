using System.Globalization;
using System.Text;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Review;

/// <summary>
/// The audit log as CSV (RFC 4180): a header row, one row per entry, CRLF line ends, fields quoted when they
/// hold a comma, quote, CR or LF (quotes doubled); times as ISO 8601 UTC; UTF-8 without a byte-order mark.
/// </summary>
internal static class AuditCsv
{
    private static readonly string[] Header =
        ["Id", "UtcTime", "UserId", "UserName", "EntityType", "EntityId", "Action", "Field", "OldValue", "NewValue", "Comment", "Fingerprint"];

    public static byte[] Write(IEnumerable<AuditEntryView> entries)
    {
        var text = new StringBuilder();
        Row(text, Header);
        foreach (var e in entries)
        {
            Row(text,
            [
                e.Id.ToString(CultureInfo.InvariantCulture), e.UtcTime.ToString("yyyy-MM-dd'T'HH:mm:ss.fff'Z'", CultureInfo.InvariantCulture),
                e.UserId, e.UserName, e.EntityType, e.EntityId, e.Action, e.Field, e.OldValue, e.NewValue, e.Comment, e.Fingerprint,
            ]);
        }

        return new UTF8Encoding(encoderShouldEmitUTF8Identifier: false).GetBytes(text.ToString());
    }

    /// <summary>One field as RFC 4180 wants it.</summary>
    public static string Field(string? value) =>
        value is null ? string.Empty
        : value.AsSpan().IndexOfAny(",\"\r\n") >= 0 ? "\"" + value.Replace("\"", "\"\"", StringComparison.Ordinal) + "\""
        : value;

    private static void Row(StringBuilder text, IReadOnlyList<string?> fields)
    {
        text.Append(string.Join(',', fields.Select(Field)));
        text.Append("\r\n");
    }
}
