using System.Globalization;
using System.Text;
using TrussWeb.Reports.Model;

namespace TrussWeb.Reports.Summary;

/// <summary>
/// The member summary as CSV (RFC 4180: comma separated, CRLF line ends, fields with a comma, quote or
/// line break quoted, quotes doubled), invariant culture, numbers unrounded. A header block of
/// label,value lines (with the caution text) comes first, then the member table, the section totals
/// and the truss totals, each after a blank line and its own column line.
/// </summary>
public static class MemberSummaryCsv
{
    public const string Title = "TrussWeb member summary";

    /// <summary>Writes the CSV text.</summary>
    public static string Render(ReportHeader header, IReadOnlyList<TrussReportData> trusses)
    {
        ArgumentNullException.ThrowIfNull(header);
        var table = MemberSummaryTable.From(trusses);
        var sb = new StringBuilder();
        foreach (var (label, value) in ExportHeaderBlock.Lines(header, Title))
        {
            Line(sb, label, value);
        }

        sb.Append("\r\n");
        Line(sb, ExportHeaderBlock.MemberColumns);
        foreach (var r in table.Rows)
        {
            Line(sb, r.Truss, r.Mark, r.Group, r.Section, N(r.LengthM), N(r.MaxTensionKN), r.TensionCombination, N(r.MaxCompressionKN),
                r.CompressionCombination, N(r.Utilization), r.GoverningCheck, r.Status.ToString(),
                r.ConnectorCount?.ToString(CultureInfo.InvariantCulture) ?? "", r.ConnectorSpacingMm is { } a ? N(a) : "", r.ReviewState, N(r.MassKg));
        }

        sb.Append("\r\n");
        Line(sb, ExportHeaderBlock.SectionColumns);
        foreach (var s in table.SectionTotals)
        {
            Line(sb, s.Truss, s.Section, s.Count.ToString(CultureInfo.InvariantCulture), N(s.LengthM), N(s.MassKg));
        }

        sb.Append("\r\n");
        Line(sb, ExportHeaderBlock.TrussColumns);
        foreach (var t in table.TrussTotals)
        {
            Line(sb, t.Truss, t.Count.ToString(CultureInfo.InvariantCulture), N(t.MassKg), N(t.MassWithAllowanceKg), N(t.MaxUtilization));
        }

        return sb.ToString();
    }

    /// <summary>The CSV as UTF-8 bytes (with a byte order mark so that spreadsheet programs read the symbols).</summary>
    public static byte[] RenderBytes(ReportHeader header, IReadOnlyList<TrussReportData> trusses) =>
        [.. Encoding.UTF8.GetPreamble(), .. Encoding.UTF8.GetBytes(Render(header, trusses))];

    /// <summary>One field quoted per RFC 4180 when it must be.</summary>
    public static string Quote(string field)
    {
        ArgumentNullException.ThrowIfNull(field);
        return field.IndexOfAny([',', '"', '\r', '\n']) >= 0 ? "\"" + field.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"" : field;
    }

    private static void Line(StringBuilder sb, params string[] fields)
    {
        sb.AppendJoin(',', fields.Select(Quote));
        sb.Append("\r\n");
    }

    private static string N(double v) => double.IsFinite(v) ? v.ToString("R", CultureInfo.InvariantCulture) : "";
}
