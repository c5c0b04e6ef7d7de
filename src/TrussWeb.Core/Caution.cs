namespace TrussWeb.Core;

/// <summary>The caution every page and every exported file carries, in one place so that none drifts.</summary>
public static class Caution
{
    /// <summary>Full caution text.</summary>
    public const string Text =
        "TrussWeb results assist a competent engineer; they do not replace one. Check every result against " +
        "the current edition of the design standard, local codes and licensed engineering practice before use.";
}
