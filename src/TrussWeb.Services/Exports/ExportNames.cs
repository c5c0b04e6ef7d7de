using System.Globalization;
using System.Text;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Exports;

/// <summary>File names, content types and the texts of kinds and formats.</summary>
public static class ExportNames
{
    public static bool Exists(ExportKind kind, ExportFormat format) =>
        kind == ExportKind.MemberSummary || format == ExportFormat.Pdf;

    public static string KindText(ExportKind kind) => kind switch
    {
        ExportKind.CalculationBook => "calculation book",
        _ => "member summary",
    };

    public static string Extension(ExportFormat format) => format switch
    {
        ExportFormat.Csv => "csv",
        ExportFormat.Xlsx => "xlsx",
        _ => "pdf",
    };

    public static string ContentType(ExportFormat format) => format switch
    {
        ExportFormat.Csv => "text/csv",
        ExportFormat.Xlsx => "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
        _ => "application/pdf",
    };

    /// <summary>Download name: project code, revision, kind, UTC time, e.g. <c>T-118_A_calculation-book_20260504T071500Z.pdf</c> (final sets add <c>_final</c>).</summary>
    public static string FileName(string projectCode, string revision, ExportKind kind, ExportFormat format, bool final, DateTimeOffset producedUtc)
    {
        var kindPart = kind == ExportKind.CalculationBook ? "calculation-book" : "member-summary";
        var time = producedUtc.UtcDateTime.ToString("yyyyMMdd'T'HHmmss'Z'", CultureInfo.InvariantCulture);
        return $"{Safe(projectCode, "project")}_{Safe(revision, "rev")}_{kindPart}{(final ? "_final" : "")}_{time}.{Extension(format)}";
    }

    private static string Safe(string text, string fallback)
    {
        var sb = new StringBuilder();
        foreach (var ch in text.Trim())
        {
            sb.Append(char.IsAsciiLetterOrDigit(ch) || ch is '-' or '.' ? ch : '-');
        }

        var s = sb.ToString().Trim('-', '.');
        return s.Length == 0 ? fallback : s.Length > 40 ? s[..40] : s;
    }
}
