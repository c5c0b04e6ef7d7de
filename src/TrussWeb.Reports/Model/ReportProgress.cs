namespace TrussWeb.Reports.Model;

/// <summary>How far a renderer is: <paramref name="Done"/> of <paramref name="Total"/> items (truss overviews and member sheets) laid out; the last one named.</summary>
public sealed record ReportProgress(int Done, int Total, string Item);
