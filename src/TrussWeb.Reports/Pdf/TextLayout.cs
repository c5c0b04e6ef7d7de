using PdfSharp.Drawing;

namespace TrussWeb.Reports.Pdf;

/// <summary>Measures, wraps and shrinks text so that nothing runs past its box (XGraphics.MeasureString).</summary>
internal static class TextLayout
{
    /// <summary>Line height of a font, pt.</summary>
    public static double LineHeight(XFont font) => font.Size * 1.22;

    /// <summary>Breaks <paramref name="text"/> into lines no wider than <paramref name="width"/>: at spaces, and inside a word only when the word alone is too wide.</summary>
    public static List<string> Wrap(XGraphics g, string text, XFont font, double width)
    {
        var lines = new List<string>();
        foreach (var paragraph in (text ?? "").Replace("\r", "", StringComparison.Ordinal).Split('\n'))
        {
            WrapParagraph(g, paragraph, font, width, lines);
        }

        return lines;
    }

    private static void WrapParagraph(XGraphics g, string paragraph, XFont font, double width, List<string> lines)
    {
        var words = paragraph.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        if (words.Length == 0)
        {
            lines.Add("");
            return;
        }

        // Widths add up word by word (PDFsharp applies no kerning), so each word is measured once.
        var space = Width(g, " ", font);
        var start = 0;
        var lineWidth = 0.0;
        for (var i = 0; i < words.Length; i++)
        {
            var w = Width(g, words[i], font);
            if (w > width)
            {
                if (i > start)
                {
                    lines.Add(string.Join(' ', words, start, i - start));
                }

                lineWidth = BreakWord(g, words[i], font, width, lines, out var rest);
                words[i] = rest;
                start = i;
                continue;
            }

            var candidate = i == start ? w : lineWidth + space + w;
            if (candidate <= width)
            {
                lineWidth = candidate;
                continue;
            }

            lines.Add(string.Join(' ', words, start, i - start));
            start = i;
            lineWidth = w;
        }

        if (start < words.Length)
        {
            lines.Add(string.Join(' ', words, start, words.Length - start));
        }
    }

    /// <summary>Breaks a word wider than the box between characters; the last piece is returned to continue the line.</summary>
    private static double BreakWord(XGraphics g, string word, XFont font, double width, List<string> lines, out string rest)
    {
        var piece = 0;
        var begin = 0;
        for (var k = 1; k <= word.Length; k++)
        {
            if (k - begin > 1 && Width(g, word[begin..k], font) > width)
            {
                lines.Add(word[begin..(k - 1)]);
                begin = k - 1;
            }

            piece = k;
        }

        rest = word[begin..piece];
        return Width(g, rest, font);
    }

    private const int WidthCacheLimit = 200_000;
    private static readonly System.Collections.Concurrent.ConcurrentDictionary<(XFont Font, string Text), double> Widths = new();

    /// <summary>
    /// Width of one line of text, pt (XGraphics.MeasureString; the result depends only on font and text, so
    /// it is cached: headers, footers and table words repeat on every page).
    /// </summary>
    public static double Width(XGraphics g, string text, XFont font)
    {
        if (text.Length == 0)
        {
            return 0;
        }

        if (Widths.TryGetValue((font, text), out var w))
        {
            return w;
        }

        if (Widths.Count > WidthCacheLimit)
        {
            Widths.Clear();
        }

        w = g.MeasureString(text, font).Width;
        Widths.TryAdd((font, text), w);
        return w;
    }

    /// <summary>Height the wrapped text takes, pt.</summary>
    public static double Measure(XGraphics g, string text, XFont font, double width) => Wrap(g, text, font, width).Count * LineHeight(font);

    /// <summary>Draws wrapped text with its top at <paramref name="y"/>; returns the height used.</summary>
    public static double Draw(XGraphics g, string text, XFont font, XBrush brush, double x, double y, double width, XStringAlignment align = XStringAlignment.Near)
    {
        var lh = LineHeight(font);
        var lines = Wrap(g, text, font, width);
        for (var i = 0; i < lines.Count; i++)
        {
            DrawLine(g, lines[i], font, brush, x, y + (i * lh), width, align);
        }

        return lines.Count * lh;
    }

    /// <summary>Draws one line in a box of <paramref name="width"/>, top at <paramref name="y"/>.</summary>
    public static void DrawLine(XGraphics g, string line, XFont font, XBrush brush, double x, double y, double width, XStringAlignment align = XStringAlignment.Near)
    {
        if (line.Length == 0)
        {
            return;
        }

        var left = align switch
        {
            XStringAlignment.Far => x + width - Width(g, line, font),
            XStringAlignment.Center => x + ((width - Width(g, line, font)) / 2),
            _ => x,
        };
        g.DrawString(line, font, brush, left, y, XStringFormats.TopLeft);
    }

    private static readonly System.Collections.Concurrent.ConcurrentDictionary<(string, double, XFontStyleEx), XFont> Fonts = new();

    /// <summary>A font from the shared cache (XFont objects are immutable).</summary>
    public static XFont Font(string family, double size, XFontStyleEx style = XFontStyleEx.Regular) =>
        Fonts.GetOrAdd((family, size, style), k => new XFont(k.Item1, k.Item2, k.Item3));

    /// <summary>The largest font of <paramref name="family"/> (at most <paramref name="size"/>, at least <paramref name="minSize"/>) in which the text fits in one line.</summary>
    public static XFont Fit(XGraphics g, string text, string family, double size, XFontStyleEx style, double width, double minSize)
    {
        var s = size;
        var font = Font(family, s, style);
        while (s > minSize && Width(g, text, font) > width)
        {
            s = Math.Max(minSize, s - 0.5);
            font = Font(family, s, style);
        }

        return font;
    }

    /// <summary>
    /// The largest font (down to <paramref name="minSize"/>) in which the text wraps into at most
    /// <paramref name="maxLines"/> lines, with those lines.
    /// </summary>
    public static (XFont Font, List<string> Lines) FitLines(XGraphics g, string text, string family, double size, XFontStyleEx style, double width, int maxLines, double minSize)
    {
        var s = size;
        while (true)
        {
            var font = Font(family, s, style);
            var lines = Wrap(g, text, font, width);
            if (lines.Count <= maxLines || s <= minSize)
            {
                return (font, lines);
            }

            s = Math.Max(minSize, s - 0.25);
        }
    }
}
