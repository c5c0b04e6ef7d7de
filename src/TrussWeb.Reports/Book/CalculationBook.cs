using PdfSharp.Pdf;
using TrussWeb.Core.Records;
using TrussWeb.Reports.Model;
using TrussWeb.Reports.Pdf;

namespace TrussWeb.Reports.Book;

/// <summary>
/// The calculation book (A4 portrait PDF): cover, contents with page numbers, then per truss its
/// overview pages (elevation, summary, groups, actions, load cases, combinations, force and
/// utilization diagrams) and one calculation sheet per member. Every page carries the frame:
/// project, truss, member, revision, review state, page x of y, produced-at time, the caution text
/// and, unless the issue is for construction, the banner.
/// </summary>
public static class CalculationBook
{
    public const string Title = "Calculation book";

    /// <summary>Renders the book; <paramref name="progress"/> (called on the rendering thread) hears of every truss overview and member sheet laid out.</summary>
    public static RenderedPdf Render(ReportHeader header, IReadOnlyList<TrussReportData> trusses, IProgress<ReportProgress>? progress = null)
    {
        ArgumentNullException.ThrowIfNull(header);
        ArgumentNullException.ThrowIfNull(trusses);
        var style = new ReportStyle();
        using var document = new PdfDocument();
        document.Info.Title = $"{header.ProjectName}: {Title}";
        document.Info.Creator = $"TrussWeb {header.AppVersion}";
        using var canvas = new PdfCanvas(document, landscape: false, PageFrame.TopBand(header), PageFrame.FooterHeight, style);

        CoverSection.Write(canvas, header, trusses);
        var entryCount = trusses.Count + trusses.Sum(t => t.Design.Members.Count);
        var contentsFirst = ContentsSection.Reserve(canvas, ContentsSection.PagesFor(canvas, entryCount));
        var entries = new List<ContentsEntry>(entryCount);
        var done = 0;
        foreach (var truss in trusses)
        {
            TrussSection.Write(canvas, truss);
            progress?.Report(new ReportProgress(++done, entryCount, $"Truss {truss.Name}"));
            entries.Add(new ContentsEntry($"Truss {truss.Name}: elevation, actions, combinations, force and utilization diagrams", FirstPageOf(canvas, truss.Name, ""), truss.Name));
            foreach (var m in truss.Design.Members)
            {
                MemberSheet.Write(canvas, truss, m);
                var start = FirstPageOf(canvas, truss.Name, m.Mark);
                entries.Add(new ContentsEntry($"{m.Mark} · {m.Design.Designation} · U = {Display.Sig(m.Design.Utilization)} · {truss.ReviewOf(m.Mark).State}", start, truss.Name, m.Mark));
                progress?.Report(new ReportProgress(++done, entryCount, $"{truss.Name} {m.Mark}"));
            }
        }

        canvas.Dispose();
        ContentsSection.Fill(canvas, contentsFirst, entries);
        PageFrame.DrawAll(canvas, header, Title);
        var pageCount = document.PageCount;
        using var stream = new MemoryStream();
        document.Save(stream, false);
        return new RenderedPdf(stream.ToArray(), pageCount, entries);
    }

    /// <summary>The first page (1-based) whose context is this truss and member.</summary>
    private static int FirstPageOf(PdfCanvas canvas, string truss, string member)
    {
        var contexts = canvas.PageContexts;
        for (var i = contexts.Count - 1; i >= 0; i--)
        {
            var isIt = contexts[i].Truss == truss && contexts[i].Member == member;
            var previousIsIt = i > 0 && contexts[i - 1].Truss == truss && contexts[i - 1].Member == member;
            if (isIt && !previousIsIt)
            {
                return i + 1;
            }
        }

        return canvas.PageNumber;
    }
}
