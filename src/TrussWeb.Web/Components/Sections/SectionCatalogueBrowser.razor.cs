using Microsoft.AspNetCore.Components;
using Microsoft.AspNetCore.Components.Web;
using TrussWeb.Core.Sections;

namespace TrussWeb.Web.Components.Sections;

/// <summary>Search, filter and sort of catalogue sections; raises <see cref="OnSelected"/> on a row click.</summary>
public partial class SectionCatalogueBrowser
{
    /// <summary>The loaded catalogue (sections and load errors).</summary>
    [Parameter, EditorRequired] public required CatalogueLoadResult Catalogue { get; set; }

    /// <summary>Family shown first.</summary>
    [Parameter] public SectionFamily InitialFamily { get; set; } = SectionFamily.Angle;

    /// <summary>Designation to select on first render (e.g. from a link); ignored when not in the catalogue.</summary>
    [Parameter] public string? InitialDesignation { get; set; }

    /// <summary>Raised when the user selects a section.</summary>
    [Parameter] public EventCallback<SectionCatalogueEntry> OnSelected { get; set; }

    /// <summary>Families the catalogue browser offers (those a catalogue file can hold).</summary>
    public static readonly IReadOnlyList<SectionFamily> Families =
        [SectionFamily.Angle, SectionFamily.CircularHollow, SectionFamily.RectangularHollow];

    private sealed record Column(string Key, string Header, bool Numeric);

    private SectionFamily Family { get; set; }

    private string Search { get; set; } = "";

    private string? SortKey { get; set; }

    private bool Descending { get; set; }

    private SectionCatalogueEntry? Selected { get; set; }

    private bool _initialised;

    private IReadOnlyList<Column> Columns =>
    [
        new("designation", "Designation", false),
        new("mass", "Mass kg/m", true),
        new("area", "A mm²", true),
        new("r1", Family == SectionFamily.Angle ? "ru mm" : "rx mm", true),
        new("r2", Family == SectionFamily.Angle ? "rv mm" : "ry mm", true),
    ];

    /// <summary>The rows shown: the family, filtered by the search text (case-insensitive, spaces ignored), sorted.</summary>
    private List<SectionCatalogueEntry> Rows
    {
        get
        {
            var needle = Normalise(Search);
            var rows = Catalogue.OfFamily(Family).Where(e => needle.Length == 0 || Normalise(e.Designation).Contains(needle, StringComparison.Ordinal));
            rows = SortKey switch
            {
                "designation" => Descending
                    ? rows.OrderByDescending(e => e.Designation, DesignationOrder.Instance)
                    : rows.OrderBy(e => e.Designation, DesignationOrder.Instance),
                "mass" => Order(rows, e => e.Properties.MassPerMetre),
                "area" => Order(rows, e => e.Properties.Area),
                "r1" => Order(rows, e => Radius1(e.Properties)),
                "r2" => Order(rows, e => Radius2(e.Properties)),
                _ => rows,
            };
            return rows.ToList();
        }
    }

    protected override void OnParametersSet()
    {
        if (!_initialised)
        {
            Family = InitialFamily;
            _initialised = true;
            if (!string.IsNullOrWhiteSpace(InitialDesignation) && Catalogue.TryFind(InitialDesignation, out var entry, out _)
                && Families.Contains(entry.Family))
            {
                Family = entry.Family;
                Selected = entry;
            }
        }
    }

    private IEnumerable<SectionCatalogueEntry> Order<TKey>(IEnumerable<SectionCatalogueEntry> rows, Func<SectionCatalogueEntry, TKey> key) =>
        Descending ? rows.OrderByDescending(key) : rows.OrderBy(key);

    private static string Normalise(string? text) => (text ?? "").Replace(" ", "", StringComparison.Ordinal).ToUpperInvariant();

    /// <summary>ru for single angles, else rx.</summary>
    private double Radius1(SectionProperties p) => Family == SectionFamily.Angle ? p.Ru : p.Rx;

    /// <summary>rv for single angles, else ry.</summary>
    private double Radius2(SectionProperties p) => Family == SectionFamily.Angle ? p.Rv : p.Ry;

    private static string FamilyLabel(SectionFamily family) => family switch
    {
        SectionFamily.Angle => "Angles",
        SectionFamily.CircularHollow => "CHS",
        SectionFamily.RectangularHollow => "RHS / SHS",
        _ => family.ToString(),
    };

    private void SetFamily(SectionFamily family)
    {
        Family = family;
        SortKey = null;
        Selected = null;
    }

    private void SetSearch(string? text) => Search = text ?? "";

    private void SortBy(string key)
    {
        Descending = SortKey == key && !Descending;
        SortKey = key;
    }

    private string SortMark(string key) => SortKey != key ? "" : Descending ? "▼" : "▲";

    private string AriaSort(string key) => SortKey != key ? "none" : Descending ? "descending" : "ascending";

    private async Task OnRowKey(KeyboardEventArgs e, SectionCatalogueEntry entry)
    {
        if (e.Key is "Enter" or " ")
        {
            await Select(entry);
        }
    }

    private async Task Select(SectionCatalogueEntry entry)
    {
        Selected = entry;
        await OnSelected.InvokeAsync(entry);
    }
}
