using TrussWeb.Reports.Model;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Exports;

/// <summary>Turns the report model into the bytes of one file (the Reports builders; replaceable in tests).</summary>
public interface IExportRenderer
{
    /// <summary>Renders; <paramref name="progress"/> hears of each item laid out and may throw <see cref="OperationCanceledException"/> to stop.</summary>
    byte[] Render(ExportKind kind, ExportFormat format, ReportHeader header, IReadOnlyList<TrussReportData> trusses, IProgress<ReportProgress> progress);
}

/// <summary>The real renderers of <c>TrussWeb.Reports</c>.</summary>
public sealed class ReportRenderer : IExportRenderer
{
    public byte[] Render(ExportKind kind, ExportFormat format, ReportHeader header, IReadOnlyList<TrussReportData> trusses, IProgress<ReportProgress> progress)
    {
        ArgumentNullException.ThrowIfNull(progress);
        var total = trusses.Count + trusses.Sum(t => t.Design.Members.Count);
        byte[] bytes = (kind, format) switch
        {
            (ExportKind.CalculationBook, ExportFormat.Pdf) => Reports.Book.CalculationBook.Render(header, trusses, progress).Bytes,
            (ExportKind.MemberSummary, ExportFormat.Pdf) => Reports.Summary.MemberSummaryReport.Render(header, trusses).Bytes,
            (ExportKind.MemberSummary, ExportFormat.Csv) => Reports.Summary.MemberSummaryCsv.RenderBytes(header, trusses),
            (ExportKind.MemberSummary, ExportFormat.Xlsx) => Reports.Summary.MemberSummaryXlsx.Render(header, trusses),
            _ => throw new InvalidOperationException($"There is no {format} form of the {ExportNames.KindText(kind)}."),
        };
        if (kind != ExportKind.CalculationBook)
        {
            progress.Report(new ReportProgress(total, total, "Summary table"));
        }

        return bytes;
    }
}
