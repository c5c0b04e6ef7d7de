namespace TrussWeb.Core.Sections;

/// <summary>
/// One problem found while loading a catalogue (sections or grades): where it is and what is wrong,
/// e.g. "angles-en10056.csv line 17, field t: thickness t = 0 mm must be greater than 0 mm".
/// </summary>
/// <param name="File">File name as given to the loader (no folder).</param>
/// <param name="Line">1-based physical line in the file (comment lines count); 0 for the file as a whole.</param>
/// <param name="Field">CSV column name, or "header", "row", "file".</param>
/// <param name="Message">What is wrong and the limit, in words a user understands.</param>
public sealed record CatalogueError(string File, int Line, string Field, string Message)
{
    public override string ToString() => Line > 0
        ? $"{File} line {Line}, field {Field}: {Message}"
        : $"{File}, {Field}: {Message}";
}
