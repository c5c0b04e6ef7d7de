using System.Globalization;
using FsCheck;
using FsCheck.Fluent;

namespace TrussWeb.Reliability.Tests.BadInput;

/// <summary>Generators of hostile text and numbers for the import and table properties.</summary>
public static class Hostile
{
    private static readonly double[] SpecialNumbers =
    [
        double.NaN, double.PositiveInfinity, double.NegativeInfinity, 0.0, -0.0, -1.0, -250.0, 1e-300, double.Epsilon, 1e300, 1e308, -1e308,
        double.MaxValue, double.MinValue, 1e12, 2e6,
    ];

    /// <summary>Cells a spreadsheet or a person might leave in a CSV: special numbers as text, empty, quotes, control characters, huge text, markup.</summary>
    public static Gen<string> Cell() => Gen.OneOf(
        Gen.Elements("", " ", "NaN", "nan", "Infinity", "-Infinity", "∞", "1e308", "1e309", "-1e308", "-5", "0", "-0", "1,5", "\"12\"", "\"unterminated",
            "\"a\"\"b\"", "12abc", "0x1F", "\u0000", "\u0001\u001f", "\t7", "7\r", new string('9', 400), new string('x', 20_000), "<img src=x onerror=alert(1)>",
            "L100x100x10", "100", "8", "12", "6.5", "3", "200", "10"),
        Gen.Choose(-1000, 60_000).Select(i => (i / 10.0).ToString(CultureInfo.InvariantCulture)));

    public static Gen<string> Header() => Gen.Elements(
        "designation,d,b,t,r1,r2", "designation,D,t", "designation,h,b,t,ro", "designation,h,b,t", "Designation , D , T", "d,b,t", "", "designation", "a,b,c",
        "\"designation\",\"d\",\"b\",\"t\",\"r1\",\"r2\"", "designation,d,b,t,r1,r2,extra", "designation,d,d,b,t,r1,r2", "# only a comment");

    /// <summary>A whole CSV text: a header, then 0 to 6 rows of 0 to 8 hostile cells (wrong column counts included), with \n or \r\n.</summary>
    public static Gen<string> CsvText() =>
        from header in Header()
        from n in Gen.Choose(0, 6)
        from rows in Gen.ListOf(from k in Gen.Choose(0, 8) from cells in Gen.ListOf(Cell(), k) select string.Join(",", cells), n)
        from newline in Gen.Elements("\n", "\r\n")
        select header + newline + string.Join(newline, rows);

    /// <summary>A number that is hostile about half the time and an ordinary coordinate or length (mm) otherwise.</summary>
    public static Gen<double> Number() => Gen.OneOf(
        Gen.Elements(SpecialNumbers),
        Gen.Choose(-20_000, 20_000).Select(i => i * 1.0));

    /// <summary>A K factor or length that is hostile about half the time, else null or ordinary.</summary>
    public static Gen<double?> Override() => Gen.OneOf(
        Gen.Elements(SpecialNumbers).Select(v => (double?)v),
        Gen.Constant<double?>(null),
        Gen.Choose(5, 30).Select(i => (double?)(i / 10.0)));

    public static Gen<string> Text() => Gen.OneOf(
        Gen.Elements("", " ", "\u0000", "\u0007bell", "tab\there", "new\nline", "\"quoted\"", "<b>bold</b>", "<img src=x onerror=alert(1)>", new string('N', 20_000), "Ω-1", "N1", "T1"),
        Gen.Choose(1, 40).Select(i => "N" + i.ToString(CultureInfo.InvariantCulture)));

    public static bool Finite(double? value) => value is null || double.IsFinite(value.Value);
}
