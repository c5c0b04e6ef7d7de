using PdfSharp.Drawing;

namespace TrussWeb.Reports.Pdf;

/// <summary>Fonts, colours and pens shared by the PDF documents (one place, so the documents look alike).</summary>
internal sealed class ReportStyle
{
    public ReportStyle()
    {
        ReportFonts.EnsureConfigured();
        Title = new XFont(DejaVuFontResolver.Sans, 16, XFontStyleEx.Bold);
        Heading = new XFont(DejaVuFontResolver.Sans, 11, XFontStyleEx.Bold);
        SubHeading = new XFont(DejaVuFontResolver.Sans, 9, XFontStyleEx.Bold);
        Body = new XFont(DejaVuFontResolver.Sans, 8);
        BodyBold = new XFont(DejaVuFontResolver.Sans, 8, XFontStyleEx.Bold);
        Table = new XFont(DejaVuFontResolver.Condensed, 7.5);
        TableBold = new XFont(DejaVuFontResolver.Condensed, 7.5, XFontStyleEx.Bold);
        Mono = new XFont(DejaVuFontResolver.Mono, 7);
        Small = new XFont(DejaVuFontResolver.Condensed, 6.5);
        Label = new XFont(DejaVuFontResolver.Condensed, 6);
        LabelBold = new XFont(DejaVuFontResolver.Condensed, 6, XFontStyleEx.Bold);
    }

    public XFont Title { get; }

    public XFont Heading { get; }

    public XFont SubHeading { get; }

    public XFont Body { get; }

    public XFont BodyBold { get; }

    public XFont Table { get; }

    public XFont TableBold { get; }

    public XFont Mono { get; }

    public XFont Small { get; }

    public XFont Label { get; }

    public XFont LabelBold { get; }

    public static XColor Ink { get; } = XColor.FromArgb(20, 20, 20);

    public static XColor Grey { get; } = XColor.FromArgb(110, 110, 110);

    public static XColor Rule { get; } = XColor.FromArgb(170, 170, 170);

    public static XColor Shade { get; } = XColor.FromArgb(232, 236, 240);

    public static XColor Banner { get; } = XColor.FromArgb(176, 28, 28);

    /// <summary>Tension in force diagrams (blue) and compression (orange-red), always with a T or C label too.</summary>
    public static XColor Tension { get; } = XColor.FromArgb(30, 90, 200);

    public static XColor Compression { get; } = XColor.FromArgb(205, 70, 20);

    public static XBrush InkBrush { get; } = new XSolidBrush(Ink);

    public static XBrush GreyBrush { get; } = new XSolidBrush(Grey);

    public static XBrush ShadeBrush { get; } = new XSolidBrush(Shade);

    public static XBrush White { get; } = XBrushes.White;

    /// <summary>Utilization bands of the utilization diagram: upper bound (inclusive) and colour.</summary>
    public static IReadOnlyList<(double Upper, XColor Colour, string Label)> UtilizationBands { get; } =
    [
        (0.5, XColor.FromArgb(60, 150, 75), "U ≤ 0.50"),
        (0.8, XColor.FromArgb(150, 170, 40), "0.50 < U ≤ 0.80"),
        (0.95, XColor.FromArgb(225, 150, 20), "0.80 < U ≤ 0.95"),
        (1.0, XColor.FromArgb(215, 90, 20), "0.95 < U ≤ 1.00"),
        (double.PositiveInfinity, XColor.FromArgb(190, 20, 20), "U > 1.00 (fails)"),
    ];

    /// <summary>Colour of a utilization.</summary>
    public static XColor UtilizationColour(double u)
    {
        foreach (var (upper, colour, _) in UtilizationBands)
        {
            if (u <= upper)
            {
                return colour;
            }
        }

        return UtilizationBands[^1].Colour;
    }
}
