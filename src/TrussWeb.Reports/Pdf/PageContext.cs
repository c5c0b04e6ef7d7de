namespace TrussWeb.Reports.Pdf;

/// <summary>What a page is about, for its header: the truss, the member and the member's review state ("" when the page is not about one).</summary>
internal sealed record PageContext(string Truss = "", string Member = "", string Review = "")
{
    public static PageContext None { get; } = new();
}
