using TrussWeb.Core.Sections;

namespace TrussWeb.Core.Sizing;

/// <summary>
/// Turns catalogue entries into sizing candidates. Double-angle candidates are built from the angle
/// rows with one gap and one back-to-back arrangement for the whole group, so that every member of a
/// group shares the gusset thickness (a fabrication rule).
/// </summary>
public static class CandidateBuilder
{
    /// <summary>Candidates of the requested families from <paramref name="catalogue"/>.</summary>
    /// <param name="catalogue">Loaded catalogue (rows with errors are already excluded).</param>
    /// <param name="families">Families wanted; DoubleAngle is built from the Angle rows.</param>
    /// <param name="doubleAngleGap">Gap between the backs (gusset thickness), mm, &gt; 0 when double angles are wanted.</param>
    /// <param name="orientation">Which legs are back to back for unequal angles.</param>
    public static IReadOnlyList<SizingCandidate> FromCatalogue(
        CatalogueLoadResult catalogue,
        IReadOnlySet<SectionFamily> families,
        double doubleAngleGap = 10,
        BackToBack orientation = BackToBack.LongLegsBackToBack)
    {
        ArgumentNullException.ThrowIfNull(catalogue);
        ArgumentNullException.ThrowIfNull(families);
        var list = new List<SizingCandidate>();
        foreach (var entry in catalogue.Entries)
        {
            switch (entry.Dimensions)
            {
                case AngleDimensions a:
                    if (families.Contains(SectionFamily.Angle))
                    {
                        list.Add(new SizingCandidate(entry.Properties, a.LongLeg, a.ShortLeg, a.Thickness));
                    }

                    if (families.Contains(SectionFamily.DoubleAngle))
                    {
                        var arrangement = a.LongLeg == a.ShortLeg ? BackToBack.EqualLegs : orientation;
                        if (DoubleAngle.TryCompute(a, doubleAngleGap, arrangement, out var pair, out _))
                        {
                            list.Add(new SizingCandidate(pair, a.LongLeg, a.ShortLeg, a.Thickness));
                        }
                    }

                    break;
                case CircularHollowDimensions c when families.Contains(SectionFamily.CircularHollow):
                    list.Add(new SizingCandidate(entry.Properties, c.Diameter, c.Diameter, c.Thickness));
                    break;
                case RectangularHollowDimensions r when families.Contains(SectionFamily.RectangularHollow):
                    list.Add(new SizingCandidate(entry.Properties, Math.Max(r.Depth, r.Width), Math.Min(r.Depth, r.Width), r.Thickness));
                    break;
            }
        }

        return list;
    }
}
