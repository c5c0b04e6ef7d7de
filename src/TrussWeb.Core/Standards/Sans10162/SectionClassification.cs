namespace TrussWeb.Core.Standards.Sans10162;

/// <summary>
/// Class of a section in axial compression: the worst class of its elements (3 = "class 1 to 3",
/// 4 = slender), and the effective area used in the compressive resistance (mm²; = gross area unless
/// class 4). <see cref="EffectiveAreaInScope"/> is false when a class 4 element has no effective-width
/// rule here (circular hollow sections): then no resistance may be given.
/// </summary>
public sealed record SectionClassification(
    IReadOnlyList<ElementClassification> Elements,
    int Class,
    double GrossArea,
    double EffectiveArea,
    bool EffectiveAreaInScope);
