namespace TrussWeb.Core.Sections;

/// <summary>
/// One plate element of a section for classification: its kind, the width used in the width-to-
/// thickness ratio (as the standard defines it for that kind, see <see cref="ElementKind"/>), its
/// thickness, and how many identical elements the section has (2 legs of one angle are 2 elements;
/// an SHS has 4 walls: <c>Count = 2</c> for each of the two wall widths).
/// </summary>
/// <param name="Name">e.g. "long leg", "short leg", "wall h", "wall b".</param>
/// <param name="Kind">Element kind.</param>
/// <param name="Width">Width for the ratio, mm.</param>
/// <param name="Thickness">Thickness, mm.</param>
/// <param name="Count">How many identical elements the whole section holds.</param>
/// <param name="AreaWidth">Width that carries area for the class-4 effective area, mm (the straight
/// part that is cut back); for an angle leg the leg length less t, for an HSS wall the flat width.</param>
public sealed record PlateElement(string Name, ElementKind Kind, double Width, double Thickness, int Count, double AreaWidth)
{
    /// <summary>Width-to-thickness ratio as the standard defines it.</summary>
    public double Slenderness => Width / Thickness;
}
