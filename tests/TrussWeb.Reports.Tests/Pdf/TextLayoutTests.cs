using PdfSharp.Drawing;
using TrussWeb.Reports.Pdf;

namespace TrussWeb.Reports.Tests.Pdf;

public class TextLayoutTests
{
    private static XGraphics Measure()
    {
        ReportFonts.EnsureConfigured();
        return XGraphics.CreateMeasureContext(new XSize(600, 800), XGraphicsUnit.Point, XPageDirection.Downwards);
    }

    [Theory]
    [InlineData("Compression: member buckling about the axis of symmetry", 40)]
    [InlineData("2L200x200x24 LLBB s=10", 30)]
    [InlineData("SANS10162-1cl.13.3.1(axialcompressiveresistance)withoutanyspaces", 50)]
    [InlineData("a", 5)]
    public void Wrapped_lines_fit_the_width_and_keep_every_character(string text, double width)
    {
        using var g = Measure();
        var font = new XFont(DejaVuFontResolver.Condensed, 7.5);
        var lines = TextLayout.Wrap(g, text, font, width);
        Assert.All(lines.Where(l => l.Length > 1), l => Assert.True(g.MeasureString(l, font).Width <= width + 0.01, $"'{l}' is wider than {width}"));
        Assert.Equal(text.Replace(" ", "", StringComparison.Ordinal), string.Concat(lines).Replace(" ", "", StringComparison.Ordinal));
    }

    [Fact]
    public void Words_that_fit_are_not_broken()
    {
        using var g = Measure();
        var font = new XFont(DejaVuFontResolver.Condensed, 7.5);
        var lines = TextLayout.Wrap(g, "Largest tension Tf over the ultimate combinations", font, 60);
        Assert.True(lines.Count > 1);
        Assert.All(lines, l => Assert.DoesNotContain(l.Split(' '), w => !"Largest tension Tf over the ultimate combinations".Split(' ').Contains(w)));
    }

    [Fact]
    public void Fit_shrinks_a_line_until_it_fits()
    {
        using var g = Measure();
        const string text = "Warehouse roof, bay 3 (P-2026-017) · A client with a very long registered company name (Pty) Ltd";
        var font = TextLayout.Fit(g, text, DejaVuFontResolver.Sans, 9, XFontStyleEx.Bold, 250, 4);
        Assert.True(font.Size < 9);
        Assert.True(g.MeasureString(text, font).Width <= 250 || font.Size == 4);
    }
}
