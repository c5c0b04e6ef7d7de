namespace TrussWeb.Core.Sections;

/// <summary>
/// One catalogue section: its designation, family and stored dimensions. The properties are computed
/// from the dimensions on first use (the dimensions have already passed validation when an entry exists).
/// </summary>
public sealed class SectionCatalogueEntry
{
    private readonly Lazy<SectionProperties> _properties;

    public SectionCatalogueEntry(string designation, ISectionDimensions dimensions, string file, int line)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(designation);
        ArgumentNullException.ThrowIfNull(dimensions);
        Designation = designation;
        Dimensions = dimensions;
        File = file;
        Line = line;
        _properties = new Lazy<SectionProperties>(() => dimensions.Compute(designation), LazyThreadSafetyMode.ExecutionAndPublication);
    }

    public string Designation { get; }

    public SectionFamily Family => Dimensions.Family;

    /// <summary><see cref="AngleDimensions"/>, <see cref="CircularHollowDimensions"/> or <see cref="RectangularHollowDimensions"/>.</summary>
    public ISectionDimensions Dimensions { get; }

    /// <summary>The file the entry came from.</summary>
    public string File { get; }

    /// <summary>Its line in that file.</summary>
    public int Line { get; }

    /// <summary>Computed properties (lazily, once).</summary>
    public SectionProperties Properties => _properties.Value;

    public override string ToString() => Designation;
}
