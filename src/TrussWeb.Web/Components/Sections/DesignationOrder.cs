using System.Globalization;

namespace TrussWeb.Web.Components.Sections;

/// <summary>Orders designations as a reader expects: runs of digits by their value ("L40x40x4" before "L100x100x8").</summary>
public sealed class DesignationOrder : IComparer<string>
{
    public static readonly DesignationOrder Instance = new();

    public int Compare(string? x, string? y)
    {
        if (ReferenceEquals(x, y))
        {
            return 0;
        }

        if (x is null || y is null)
        {
            return x is null ? -1 : 1;
        }

        int i = 0, j = 0;
        while (i < x.Length && j < y.Length)
        {
            if (IsNumberStart(x, i) && IsNumberStart(y, j))
            {
                var a = ReadNumber(x, ref i);
                var b = ReadNumber(y, ref j);
                var c = a.CompareTo(b);
                if (c != 0)
                {
                    return c;
                }

                continue;
            }

            var d = char.ToUpperInvariant(x[i]).CompareTo(char.ToUpperInvariant(y[j]));
            if (d != 0)
            {
                return d;
            }

            i++;
            j++;
        }

        return (x.Length - i).CompareTo(y.Length - j);
    }

    private static bool IsNumberStart(string s, int i) => char.IsAsciiDigit(s[i]);

    private static double ReadNumber(string s, ref int i)
    {
        var start = i;
        while (i < s.Length && (char.IsAsciiDigit(s[i]) || (s[i] == '.' && i + 1 < s.Length && char.IsAsciiDigit(s[i + 1]))))
        {
            i++;
        }

        return double.Parse(s.AsSpan(start, i - start), CultureInfo.InvariantCulture);
    }
}
