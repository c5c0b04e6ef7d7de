using TrussWeb.Core.Loads;
using TrussWeb.Core.Model;
using TrussWeb.Core.Sections;
using TrussWeb.Core.TrussDesign;

namespace TrussWeb.Reports.Model;

/// <summary>
/// One designed truss as the documents print it: the model, the design result, the load cases and
/// combinations with every factor, the area actions, the section of every member, the dimensions the
/// section drawings need and the reviews. Nothing here is recomputed by a report.
/// </summary>
public sealed record TrussReportData
{
    public required string Name { get; init; }

    public required TrussModel Model { get; init; }

    public required TrussDesignResult Design { get; init; }

    public required AreaActions Actions { get; init; }

    /// <summary>The load cases the design used (self-weight included), in order.</summary>
    public required IReadOnlyList<LoadCase> LoadCases { get; init; }

    public required IReadOnlyList<LoadCombination> Combinations { get; init; }

    /// <summary>Group settings (section, gap, arrangement, connectors) by group name.</summary>
    public required IReadOnlyDictionary<string, GroupDesignSettings> Groups { get; init; }

    /// <summary>Section of every member, by mark.</summary>
    public required IReadOnlyDictionary<string, SectionProperties> MemberSections { get; init; }

    /// <summary>Dimensions of the sections in use by designation (for a double angle: its component's), for the drawings; a missing entry prints "outline not available".</summary>
    public IReadOnlyDictionary<string, ISectionDimensions> SectionDimensions { get; init; } = new Dictionary<string, ISectionDimensions>();

    /// <summary>Review of each member by mark; a missing mark prints as not reviewed.</summary>
    public IReadOnlyDictionary<string, MemberReviewInfo> Reviews { get; init; } = new Dictionary<string, MemberReviewInfo>();

    /// <summary>The review of <paramref name="mark"/>, or "not reviewed".</summary>
    public MemberReviewInfo ReviewOf(string mark) => Reviews.TryGetValue(mark, out var r) ? r : MemberReviewInfo.NotReviewed(mark);

    /// <summary>Dimensions for drawing <paramref name="section"/>, or null.</summary>
    public ISectionDimensions? DimensionsOf(SectionProperties section)
    {
        ArgumentNullException.ThrowIfNull(section);
        var key = section.Family == SectionFamily.DoubleAngle && section.Component is not null ? section.Component.Designation : section.Designation;
        return SectionDimensions.TryGetValue(key, out var d) ? d
            : SectionDimensions.TryGetValue(section.Designation, out var own) ? own : null;
    }

    /// <summary>
    /// Report data from the input a design ran with (e.g. <c>TrussSizingResult.FinalInput</c>) and its result.
    /// </summary>
    /// <param name="name">Truss name as printed.</param>
    /// <param name="input">The design input (final sections).</param>
    /// <param name="design">The design result of that input.</param>
    /// <param name="loadCases">The load cases the design used.</param>
    /// <param name="catalogue">Catalogue to take drawing dimensions from (by designation); null: none.</param>
    /// <param name="reviews">Reviews by mark; null: none.</param>
    public static TrussReportData From(string name, TrussDesignInput input, TrussDesignResult design, IReadOnlyList<LoadCase> loadCases,
        CatalogueLoadResult? catalogue = null, IReadOnlyDictionary<string, MemberReviewInfo>? reviews = null)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(name);
        ArgumentNullException.ThrowIfNull(input);
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(loadCases);
        var sections = input.Model.Members.ToDictionary(m => m.Id, m => TrussDesigner.SectionOf(input, m), StringComparer.Ordinal);
        var dims = new Dictionary<string, ISectionDimensions>(StringComparer.Ordinal);
        if (catalogue is not null)
        {
            foreach (var s in sections.Values)
            {
                var key = s.Family == SectionFamily.DoubleAngle && s.Component is not null ? s.Component.Designation : s.Designation;
                if (!dims.ContainsKey(key) && catalogue.Entries.FirstOrDefault(e => string.Equals(e.Designation, key, StringComparison.OrdinalIgnoreCase)) is { } entry)
                {
                    dims[key] = entry.Dimensions;
                }
            }
        }

        return new TrussReportData
        {
            Name = name,
            Model = input.Model,
            Design = design,
            Actions = input.Actions,
            LoadCases = loadCases,
            Combinations = input.Combinations,
            Groups = input.Groups,
            MemberSections = sections,
            SectionDimensions = dims,
            Reviews = reviews ?? new Dictionary<string, MemberReviewInfo>(),
        };
    }
}
