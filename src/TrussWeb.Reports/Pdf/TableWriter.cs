using PdfSharp.Drawing;

namespace TrussWeb.Reports.Pdf;

/// <summary>
/// Draws a table on a <see cref="PdfCanvas"/>: every cell wraps inside its column, a row that does not
/// fit moves to the next page, and the column headings repeat at the top of each page.
/// </summary>
internal sealed class TableWriter
{
    private const double Pad = 2;
    private readonly PdfCanvas _canvas;
    private readonly IReadOnlyList<TableColumn> _columns;
    private readonly double[] _x;
    private readonly double[] _w;
    private readonly XFont _font;
    private readonly XFont _headFont;
    private bool _headerOnPage;
    private int _headerPage = -1;
    private int _row;

    public TableWriter(PdfCanvas canvas, IReadOnlyList<TableColumn> columns, XFont? font = null, XFont? headFont = null, double? width = null, double? left = null)
    {
        _canvas = canvas;
        _columns = columns;
        _font = font ?? canvas.Style.Table;
        _headFont = headFont ?? canvas.Style.TableBold;
        var total = width ?? canvas.Width;
        var sum = columns.Sum(c => c.Weight);
        _x = new double[columns.Count];
        _w = new double[columns.Count];
        var x = left ?? canvas.Left;
        for (var i = 0; i < columns.Count; i++)
        {
            _x[i] = x;
            _w[i] = total * columns[i].Weight / sum;
            x += _w[i];
        }

        Left = left ?? canvas.Left;
        Width = total;
    }

    public double Left { get; }

    public double Width { get; }

    /// <summary>Inner width of column <paramref name="i"/>, pt.</summary>
    public double ColumnWidth(int i) => _w[i] - (2 * Pad);

    /// <summary>Writes the headings (also called automatically at the top of each new page).</summary>
    public void Header()
    {
        if (_columns.All(c => c.Heading.Length == 0))
        {
            // A label/value table without headings.
            _canvas.Ensure(14);
            _headerOnPage = true;
            _headerPage = _canvas.PageNumber;
            return;
        }

        var g = _canvas.G;
        var h = HeaderHeight(g);
        _canvas.Ensure(h + 14);
        g = _canvas.G;
        g.DrawRectangle(ReportStyle.ShadeBrush, Left, _canvas.Y, Width, h);
        for (var i = 0; i < _columns.Count; i++)
        {
            TextLayout.Draw(g, _columns[i].Heading, _headFont, ReportStyle.InkBrush, _x[i] + Pad, _canvas.Y + Pad, ColumnWidth(i), _columns[i].Align);
        }

        _canvas.Y += h;
        _headerOnPage = true;
        _headerPage = _canvas.PageNumber;
    }

    private double HeaderHeight(XGraphics g) =>
        _columns.Select((c, i) => TextLayout.Measure(g, c.Heading, _headFont, ColumnWidth(i))).Max() + (2 * Pad);

    /// <summary>Writes one row; <paramref name="bold"/> for totals, <paramref name="fill"/> for a shaded row.</summary>
    public void Row(IReadOnlyList<TableCell> cells, bool bold = false, XBrush? fill = null)
    {
        var g = _canvas.G;
        var font = bold ? _headFont : _font;
        var laid = new List<List<(string Line, XFont Font, XBrush Brush)>>(cells.Count);
        var height = 0.0;
        for (var i = 0; i < _columns.Count; i++)
        {
            var lines = new List<(string, XFont, XBrush)>();
            var cell = i < cells.Count ? cells[i] : "";
            foreach (var (text, f, b) in cell.Parts)
            {
                var pf = f ?? font;
                foreach (var line in TextLayout.Wrap(g, text, pf, ColumnWidth(i)))
                {
                    lines.Add((line, pf, b ?? ReportStyle.InkBrush));
                }
            }

            laid.Add(lines);
            height = Math.Max(height, lines.Sum(l => TextLayout.LineHeight(l.Item2)));
        }

        height += 2 * Pad;
        var fitsOnAFreshPage = height <= _canvas.Bottom - _canvas.Top - HeaderHeight(g);
        if ((_canvas.Y + height > _canvas.Bottom && fitsOnAFreshPage) || !_headerOnPage || _headerPage != _canvas.PageNumber)
        {
            if (_canvas.Y + height > _canvas.Bottom && fitsOnAFreshPage)
            {
                _canvas.NewPage();
            }

            Header();
        }

        // A row taller than what is left of a fresh page is split: each part carries as many lines of
        // every cell as fit, and the rest continues under the repeated headings on the next page.
        var next = new int[laid.Count];
        while (true)
        {
            var available = _canvas.Bottom - _canvas.Y - (2 * Pad);
            var take = new int[laid.Count];
            var partHeight = 0.0;
            var more = false;
            for (var i = 0; i < laid.Count; i++)
            {
                var h = 0.0;
                var k = next[i];
                while (k < laid[i].Count && h + TextLayout.LineHeight(laid[i][k].Font) <= available)
                {
                    h += TextLayout.LineHeight(laid[i][k].Font);
                    k++;
                }

                take[i] = k;
                more |= k < laid[i].Count;
                partHeight = Math.Max(partHeight, h);
            }

            if (more && take.SequenceEqual(next))
            {
                // Not even one line fits (cannot happen on a fresh A4 page; guards the loop).
                for (var i = 0; i < laid.Count; i++)
                {
                    if (take[i] < laid[i].Count)
                    {
                        partHeight = Math.Max(partHeight, TextLayout.LineHeight(laid[i][take[i]].Font));
                        take[i]++;
                    }
                }

                more = take.Select((k, i) => k < laid[i].Count).Any(x => x);
            }

            DrawPart(laid, next, take, partHeight + (2 * Pad), fill);
            if (!more)
            {
                break;
            }

            next = take;
            _canvas.NewPage();
            Header();
        }

        _row++;
    }

    private void DrawPart(List<List<(string Line, XFont Font, XBrush Brush)>> laid, int[] from, int[] to, double height, XBrush? fill)
    {
        var g = _canvas.G;
        var y = _canvas.Y;
        if (fill is not null)
        {
            g.DrawRectangle(fill, Left, y, Width, height);
        }
        else if (_row % 2 == 1)
        {
            g.DrawRectangle(AlternateRow, Left, y, Width, height);
        }

        for (var i = 0; i < laid.Count; i++)
        {
            var ly = y + Pad;
            for (var k = from[i]; k < to[i]; k++)
            {
                var (line, f, b) = laid[i][k];
                TextLayout.DrawLine(g, line, f, b, _x[i] + Pad, ly, ColumnWidth(i), _columns[i].Align);
                ly += TextLayout.LineHeight(f);
            }
        }

        g.DrawLine(RowRule, Left, y + height, Left + Width, y + height);
        _canvas.Y += height;
    }

    private static readonly XBrush AlternateRow = new XSolidBrush(XColor.FromArgb(246, 247, 249));
    private static readonly XPen RowRule = new(ReportStyle.Rule, 0.3);

    /// <summary>Ends the table with a little space.</summary>
    public void End(double space = 6) => _canvas.Space(space);
}
