using PdfSharp.Drawing;

namespace TrussWeb.Reports.Pdf;

/// <summary>One table cell: parts stacked top to bottom, each in its own font (e.g. description, then expression in mono).</summary>
internal sealed record TableCell(IReadOnlyList<(string Text, XFont? Font, XBrush? Brush)> Parts)
{
    public static implicit operator TableCell(string text) => new([(text, null, null)]);

    public static TableCell Of(params (string Text, XFont? Font, XBrush? Brush)[] parts) => new(parts.Where(p => p.Text.Length > 0).ToArray());
}
