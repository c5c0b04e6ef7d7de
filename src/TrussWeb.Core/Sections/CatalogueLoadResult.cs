using System.Diagnostics.CodeAnalysis;

namespace TrussWeb.Core.Sections;

/// <summary>
/// What a catalogue load produced: the sections that loaded and an error for every row that did not.
/// Good rows load even when others fail. Lookups by designation ignore case and surrounding spaces.
/// </summary>
public sealed class CatalogueLoadResult
{
    private readonly Dictionary<string, SectionCatalogueEntry> _byDesignation;

    public CatalogueLoadResult(IReadOnlyList<SectionCatalogueEntry> entries, IReadOnlyList<CatalogueError> errors)
    {
        ArgumentNullException.ThrowIfNull(entries);
        ArgumentNullException.ThrowIfNull(errors);
        Entries = entries;
        Errors = errors;
        _byDesignation = new Dictionary<string, SectionCatalogueEntry>(StringComparer.OrdinalIgnoreCase);
        foreach (var entry in entries)
        {
            _byDesignation.TryAdd(entry.Designation.Trim(), entry);
        }
    }

    /// <summary>Loaded sections in file and line order.</summary>
    public IReadOnlyList<SectionCatalogueEntry> Entries { get; }

    /// <summary>Rows (or files) that could not be loaded.</summary>
    public IReadOnlyList<CatalogueError> Errors { get; }

    /// <summary>Entries of one family.</summary>
    public IEnumerable<SectionCatalogueEntry> OfFamily(SectionFamily family) => Entries.Where(e => e.Family == family);

    /// <summary>Looks a section up by designation (case-insensitive).</summary>
    /// <param name="designation">e.g. "L100x100x10".</param>
    /// <param name="entry">The entry, when found.</param>
    /// <param name="error">Why it was not found, for the user; null when found.</param>
    public bool TryFind(string designation, [NotNullWhen(true)] out SectionCatalogueEntry? entry, [NotNullWhen(false)] out string? error)
    {
        if (string.IsNullOrWhiteSpace(designation))
        {
            entry = null;
            error = "no designation given";
            return false;
        }

        if (_byDesignation.TryGetValue(designation.Trim(), out entry))
        {
            error = null;
            return true;
        }

        error = $"section '{designation.Trim()}' is not in the catalogue ({Entries.Count} sections loaded); enter it by its dimensions instead";
        return false;
    }

    /// <summary>Looks a section up by designation (case-insensitive).</summary>
    /// <exception cref="KeyNotFoundException">Not in the catalogue; the message says so.</exception>
    public SectionCatalogueEntry Find(string designation) =>
        TryFind(designation, out var entry, out var error) ? entry : throw new KeyNotFoundException(error);
}
