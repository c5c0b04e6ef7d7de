using TrussWeb.Core.Sections;

namespace TrussWeb.Core.Sizing;

/// <summary>
/// One section the sizer may choose, with the dimensions its constraints look at (mm): the largest
/// and smallest outer dimension (legs of an angle, h and b of an RHS, D of a CHS) and the thickness.
/// </summary>
public sealed record SizingCandidate(SectionProperties Section, double LargestDimension, double SmallestDimension, double Thickness)
{
    public SectionFamily Family => Section.Family;

    public double MassPerMetre => Section.MassPerMetre;
}
