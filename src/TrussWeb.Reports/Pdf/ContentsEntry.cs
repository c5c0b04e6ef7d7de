namespace TrussWeb.Reports.Pdf;

/// <summary>One line of a contents list: its title, the page it starts on (1-based), its truss and member mark ("" when none).</summary>
public sealed record ContentsEntry(string Title, int Page, string Truss = "", string Member = "");
