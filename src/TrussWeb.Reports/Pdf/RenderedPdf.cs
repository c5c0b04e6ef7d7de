namespace TrussWeb.Reports.Pdf;

/// <summary>A rendered PDF with what its layout knows: page count and where each contents entry starts (1-based pages).</summary>
public sealed record RenderedPdf(byte[] Bytes, int PageCount, IReadOnlyList<ContentsEntry> Contents);
