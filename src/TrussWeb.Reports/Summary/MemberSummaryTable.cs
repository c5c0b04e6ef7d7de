using System.Globalization;
using TrussWeb.Core.Records;
using TrussWeb.Core.Sections;
using TrussWeb.Reports.Model;

namespace TrussWeb.Reports.Summary;

/// <summary>
/// The rows and totals of the member summary, read from the design results (never recomputed), so
/// that the PDF, the CSV and the XLSX print the same numbers.
/// </summary>
public sealed class MemberSummaryTable
{
    private MemberSummaryTable(IReadOnlyList<MemberSummaryRow> rows, IReadOnlyList<SectionTotalRow> sections, IReadOnlyList<TrussTotalRow> trusses)
    {
        Rows = rows;
        SectionTotals = sections;
        TrussTotals = trusses;
    }

    public IReadOnlyList<MemberSummaryRow> Rows { get; }

    public IReadOnlyList<SectionTotalRow> SectionTotals { get; }

    public IReadOnlyList<TrussTotalRow> TrussTotals { get; }

    /// <summary>Reads the table from the trusses, in truss and member order.</summary>
    public static MemberSummaryTable From(IReadOnlyList<TrussReportData> trusses)
    {
        ArgumentNullException.ThrowIfNull(trusses);
        var rows = new List<MemberSummaryRow>();
        var sections = new List<SectionTotalRow>();
        var totals = new List<TrussTotalRow>();
        foreach (var t in trusses)
        {
            foreach (var m in t.Design.Members)
            {
                var section = t.MemberSections.TryGetValue(m.Mark, out var s) ? s : null;
                var (count, spacing) = Connectors(m.Design.Record, section, t.Groups.TryGetValue(m.Group, out var g) ? g.Connectors?.IntermediateCount : null);
                rows.Add(new MemberSummaryRow(
                    t.Name, m.Mark, m.Group, m.Design.Designation, m.Length / 1000,
                    m.Envelope.MaxTension / 1000, m.Envelope.TensionCombination ?? "",
                    m.Envelope.MaxCompression / 1000, m.Envelope.CompressionCombination ?? "",
                    m.Design.Utilization, m.Design.GoverningCheck, m.Design.Status, count, spacing,
                    t.ReviewOf(m.Mark).State, m.Mass));
            }

            sections.AddRange(t.Design.Totals.Select(x => new SectionTotalRow(t.Name, x.Designation, x.Count, x.Length / 1000, x.Mass)));
            totals.Add(new TrussTotalRow(t.Name, t.Design.Members.Count, t.Design.Mass, t.Design.MassWithAllowance, t.Design.MaxUtilization));
        }

        return new MemberSummaryTable(rows, sections, totals);
    }

    /// <summary>
    /// Connector spacing (step "a" of the built-up check) and the number of intermediate connectors
    /// as the record states it (step "n"), else as the group gives it. Null for
    /// members that are not built up or whose record has no connector step (never in compression).
    /// </summary>
    internal static (int? Count, double? Spacing) Connectors(CalcRecord? record, SectionProperties? section, int? givenCount)
    {
        if (record is null || section?.Family != SectionFamily.DoubleAngle)
        {
            return (null, null);
        }

        var step = record.Steps.LastOrDefault(s => s.Symbol == "a" && s.Unit == "mm");
        if (step is null)
        {
            return (null, null);
        }

        var n = record.Steps.LastOrDefault(s => s.Symbol == "n");
        int? count = n is not null ? (int)Math.Round(n.Value) : givenCount;
        return (count, step.Value);
    }

}
