using PdfSharp;
using PdfSharp.Drawing;
using PdfSharp.Pdf;

namespace TrussWeb.Reports.Pdf;

/// <summary>
/// A flowing page layout over a PDFsharp document: content goes down the page from <see cref="Top"/>
/// to <see cref="Bottom"/> (the frame bands are left free) and continues on a new page when a block
/// does not fit. Each page remembers its <see cref="PageContext"/> for the header drawn afterwards.
/// </summary>
internal sealed class PdfCanvas : IDisposable
{
    public const double Margin = 34;

    private readonly List<PageContext> _contexts = [];
    private XGraphics? _graphics;

    public PdfCanvas(PdfDocument document, bool landscape, double headerHeight, double footerHeight, ReportStyle style)
    {
        Document = document;
        Landscape = landscape;
        Style = style;
        var probe = new PdfPage { Size = PageSize.A4, Orientation = landscape ? PageOrientation.Landscape : PageOrientation.Portrait };
        PageWidth = probe.Width.Point;
        PageHeight = probe.Height.Point;
        Top = Margin + headerHeight;
        Bottom = PageHeight - Margin - footerHeight;
    }

    public PdfDocument Document { get; }

    public ReportStyle Style { get; }

    public bool Landscape { get; }

    public double PageWidth { get; }

    public double PageHeight { get; }

    public double Left => Margin;

    public double Right => PageWidth - Margin;

    public double Width => Right - Left;

    public double Top { get; }

    public double Bottom { get; }

    /// <summary>Current position down the page, pt.</summary>
    public double Y { get; set; }

    /// <summary>Context given to the pages started from now on.</summary>
    public PageContext Context { get; set; } = PageContext.None;

    public IReadOnlyList<PageContext> PageContexts => _contexts;

    /// <summary>1-based number of the current page (0 before the first).</summary>
    public int PageNumber => Document.PageCount;

    public XGraphics G => _graphics ?? throw new InvalidOperationException("no page started");

    public double Remaining => Bottom - Y;

    /// <summary>Starts a new page; content resumes at <see cref="Top"/>.</summary>
    public void NewPage()
    {
        _graphics?.Dispose();
        var page = Document.AddPage();
        page.Size = PageSize.A4;
        page.Orientation = Landscape ? PageOrientation.Landscape : PageOrientation.Portrait;
        _contexts.Add(Context);
        _graphics = XGraphics.FromPdfPage(page);
        Y = Top;
    }

    /// <summary>Starts a new page when fewer than <paramref name="height"/> points are left (and the page is not fresh).</summary>
    public void Ensure(double height)
    {
        if (_graphics is null || (Y + height > Bottom && Y > Top + 0.5))
        {
            NewPage();
        }
    }

    /// <summary>Re-labels the current page (e.g. a member sheet that starts on a fresh page).</summary>
    public void SetCurrentContext(PageContext context)
    {
        Context = context;
        if (_contexts.Count > 0)
        {
            _contexts[^1] = context;
        }
    }

    /// <summary>Wrapped paragraph across pages, line by line.</summary>
    public void Paragraph(string text, XFont font, XBrush? brush = null, double indent = 0, double spaceAfter = 3)
    {
        var lh = TextLayout.LineHeight(font);
        Ensure(lh);
        foreach (var line in TextLayout.Wrap(G, text, font, Width - indent))
        {
            Ensure(lh);
            TextLayout.DrawLine(G, line, font, brush ?? ReportStyle.InkBrush, Left + indent, Y, Width - indent);
            Y += lh;
        }

        Y += spaceAfter;
    }

    /// <summary>A heading kept together with at least <paramref name="keepWith"/> points of what follows.</summary>
    public void Heading(string text, XFont font, double keepWith = 40)
    {
        var h = TextLayout.Measure(G, text, font, Width);
        Ensure(h + keepWith);
        Y += TextLayout.Draw(G, text, font, ReportStyle.InkBrush, Left, Y, Width) + 3;
    }

    public void Space(double points) => Y = Math.Min(Y + points, Bottom);

    public void Dispose()
    {
        _graphics?.Dispose();
        _graphics = null;
    }
}
