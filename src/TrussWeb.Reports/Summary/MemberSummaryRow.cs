using TrussWeb.Core.Records;

namespace TrussWeb.Reports.Summary;

/// <summary>
/// One member of the summary as all three exports print it. Values are unrounded, in the display
/// units named in each property (kN, m, kg); the PDF formats them with <see cref="Display"/>.
/// </summary>
public sealed record MemberSummaryRow(
    string Truss,
    string Mark,
    string Group,
    string Section,
    double LengthM,
    double MaxTensionKN,
    string TensionCombination,
    double MaxCompressionKN,
    string CompressionCombination,
    double Utilization,
    string GoverningCheck,
    CheckStatus Status,
    int? ConnectorCount,
    double? ConnectorSpacingMm,
    string ReviewState,
    double MassKg)
{
    /// <summary>Connectors as printed: "3 @ 1350 mm", "@ 1350 mm" or "" for members without.</summary>
    public string ConnectorText => ConnectorSpacingMm is { } a
        ? (ConnectorCount is { } n ? $"{n} @ {Display.Sig(a)} mm" : $"@ {Display.Sig(a)} mm")
        : "";
}
