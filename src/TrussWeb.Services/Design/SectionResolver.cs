using TrussWeb.Core.Sections;
using TrussWeb.Core.Validation;

namespace TrussWeb.Services.Design;

/// <summary>A section found for a designation, with the dimensions it was computed from.</summary>
internal sealed record ResolvedSection(SectionProperties Properties, ISectionDimensions Dimensions, double? Gap, BackToBack? Orientation)
{
    public SectionDoc ToDoc()
    {
        var dims = new SortedDictionary<string, double>(StringComparer.Ordinal);
        switch (Dimensions)
        {
            case AngleDimensions a:
                dims["d"] = a.LongLeg; dims["b"] = a.ShortLeg; dims["t"] = a.Thickness; dims["r1"] = a.RootRadius; dims["r2"] = a.ToeRadius;
                break;
            case CircularHollowDimensions c:
                dims["D"] = c.Diameter; dims["t"] = c.Thickness;
                break;
            case RectangularHollowDimensions r:
                dims["h"] = r.Depth; dims["b"] = r.Width; dims["t"] = r.Thickness; dims["ro"] = r.EffectiveOuterRadius;
                break;
        }

        return new SectionDoc(Properties.Designation, Properties.Family, dims, Gap, Orientation, Properties.Area, Properties.MassPerMetre);
    }
}

/// <summary>
/// Finds sections by designation in the catalogue. A double angle is named
/// "2&lt;angle designation&gt;[ LLBB| SLBB] s=&lt;gap&gt;" (Core's default designation); it is built by Core's
/// <see cref="DoubleAngle"/> from the angle row with the group's gap and arrangement.
/// </summary>
internal sealed class SectionResolver(CatalogueLoadResult catalogue)
{
    public const double DefaultGapMm = 10;

    public CatalogueLoadResult Catalogue { get; } = catalogue;

    public bool TryResolve(string designation, double? gap, BackToBack? orientation, out ResolvedSection? section, out string? error)
    {
        section = null;
        if (Catalogue.TryFind(designation, out var entry, out error))
        {
            section = new ResolvedSection(entry.Properties, entry.Dimensions, null, null);
            return true;
        }

        var trimmed = designation.Trim();
        if (trimmed.StartsWith('2'))
        {
            var componentName = trimmed[1..].Split(' ', StringSplitOptions.RemoveEmptyEntries).FirstOrDefault() ?? string.Empty;
            if (Catalogue.TryFind(componentName, out var component, out _) && component.Dimensions is AngleDimensions a)
            {
                var g = gap ?? DefaultGapMm;
                var arrangement = a.LongLeg == a.ShortLeg ? BackToBack.EqualLegs : orientation is null or BackToBack.EqualLegs ? BackToBack.LongLegsBackToBack : orientation.Value;
                if (DoubleAngle.TryCompute(a, g, arrangement, out var pair, out var issues, DoubleAngle.DefaultDesignation(a, g, arrangement)))
                {
                    section = new ResolvedSection(pair, a, g, arrangement);
                    error = null;
                    return true;
                }

                error = string.Join("; ", issues.Select(i => i.ToString()));
                return false;
            }
        }

        error ??= $"no section '{designation}' in the catalogue";
        return false;
    }

    /// <summary>Resolves a section Core chose (sizing), by its designation, with the group's gap and arrangement.</summary>
    public ResolvedSection ResolveChosen(SectionProperties chosen, double? gap, BackToBack? orientation) =>
        TryResolve(chosen.Designation, chosen.Family == SectionFamily.DoubleAngle ? chosen.Gap : gap, orientation, out var s, out var error)
            ? s! with { Properties = chosen }
            : throw new InputValidationException("Section", error ?? chosen.Designation);
}
