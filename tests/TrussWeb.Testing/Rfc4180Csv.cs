using System.Text;
using Xunit;

namespace TrussWeb.Testing;

/// <summary>A small CSV reader for reading exports back in tests (one reader for every suite).</summary>
public static class Rfc4180Csv
{
    /// <summary>RFC 4180 records: comma separated, quoted fields may hold commas, quotes (doubled) and line breaks; a byte order mark is skipped.</summary>
    public static IReadOnlyList<IReadOnlyList<string>> Read(string text)
    {
        var records = new List<IReadOnlyList<string>>();
        var fields = new List<string>();
        var field = new StringBuilder();
        var quoted = false;
        var i = text.Length > 0 && text[0] == '\uFEFF' ? 1 : 0;
        for (; i < text.Length; i++)
        {
            var ch = text[i];
            if (quoted)
            {
                if (ch == '"' && i + 1 < text.Length && text[i + 1] == '"')
                {
                    field.Append('"');
                    i++;
                }
                else if (ch == '"')
                {
                    quoted = false;
                }
                else
                {
                    field.Append(ch);
                }
            }
            else if (ch == '"')
            {
                quoted = true;
            }
            else if (ch == ',')
            {
                fields.Add(field.ToString());
                field.Clear();
            }
            else if (ch == '\r' && i + 1 < text.Length && text[i + 1] == '\n')
            {
                // the CRLF pair ends the record at the '\n'
            }
            else if (ch == '\n')
            {
                fields.Add(field.ToString());
                field.Clear();
                records.Add(fields);
                fields = [];
            }
            else
            {
                field.Append(ch);
            }
        }

        Assert.False(quoted, "the CSV ends inside a quoted field");
        if (field.Length > 0 || fields.Count > 0)
        {
            fields.Add(field.ToString());
            records.Add(fields);
        }

        return records;
    }
}
