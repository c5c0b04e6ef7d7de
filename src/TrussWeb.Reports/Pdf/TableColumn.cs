using PdfSharp.Drawing;

namespace TrussWeb.Reports.Pdf;

/// <summary>A table column: heading, share of the table width (relative weight) and alignment.</summary>
internal sealed record TableColumn(string Heading, double Weight, XStringAlignment Align = XStringAlignment.Near);
