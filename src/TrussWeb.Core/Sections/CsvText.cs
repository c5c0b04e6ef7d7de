using System.Globalization;

namespace TrussWeb.Core.Sections;

/// <summary>
/// The small CSV dialect of the seed-data files: comma-separated, no quoting, values trimmed, blank
/// lines and lines starting with '#' skipped, the first remaining line is the header. Numbers are read
/// with the invariant culture ("12.5"; "12,5" is not a number).
/// </summary>
internal static class CsvText
{
    /// <summary>A data line: its 1-based physical line number and its trimmed values.</summary>
    internal readonly record struct Row(int Line, string[] Values);

    /// <summary>Splits the text into the header row and the data rows.</summary>
    public static (Row? Header, List<Row> Rows) Read(string text)
    {
        Row? header = null;
        var rows = new List<Row>();
        var lines = text.ReplaceLineEndings("\n").Split('\n');
        for (var i = 0; i < lines.Length; i++)
        {
            var line = lines[i].Trim();
            if (line.Length == 0 || line.StartsWith('#'))
            {
                continue;
            }

            var row = new Row(i + 1, line.Split(',').Select(v => v.Trim()).ToArray());
            if (header is null)
            {
                header = row;
            }
            else
            {
                rows.Add(row);
            }
        }

        return (header, rows);
    }

    /// <summary>Parses an invariant-culture number; false for anything else (including "12,5" and "").</summary>
    public static bool TryNumber(string text, out double value) =>
        double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out value);
}
