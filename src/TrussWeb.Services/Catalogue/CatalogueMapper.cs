using Microsoft.EntityFrameworkCore;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Sections;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Common;
using CoreEntry = TrussWeb.Core.Sections.SectionCatalogueEntry;
using DataEntry = TrussWeb.Data.Entities.SectionCatalogueEntry;

namespace TrussWeb.Services.Catalogue;

/// <summary>Catalogue rows and grade rows ⇄ Core's catalogue entries and grades (dimensions only; Core computes the properties).</summary>
internal static class CatalogueMapper
{
    public static async Task<CatalogueLoadResult> LoadCatalogueAsync(TrussWebDbContext db, CancellationToken cancellationToken)
    {
        var rows = await db.SectionCatalogue.AsNoTracking().Where(r => r.IsActive).OrderBy(r => r.Designation).ToListAsync(cancellationToken).ConfigureAwait(false);
        return ToCore(rows);
    }

    public static CatalogueLoadResult ToCore(IEnumerable<DataEntry> rows)
    {
        var entries = new List<CoreEntry>();
        var errors = new List<CatalogueError>();
        var line = 0;
        foreach (var row in rows)
        {
            line++;
            var dims = DimensionsOf(row);
            if (dims is null)
            {
                errors.Add(new CatalogueError(row.Source, line, row.Family, $"unknown family '{row.Family}' of {row.Designation}"));
                continue;
            }

            var issues = dims.Validate();
            if (issues.Count > 0)
            {
                errors.AddRange(issues.Select(i => new CatalogueError(row.Source, line, i.Field, $"{row.Designation}: {i.Message}")));
                continue;
            }

            entries.Add(new CoreEntry(row.Designation, dims, row.Source, line));
        }

        return new CatalogueLoadResult(entries, errors);
    }

    public static ISectionDimensions? DimensionsOf(DataEntry row) => row.Family switch
    {
        nameof(SectionFamily.Angle) => new AngleDimensions(row.DepthMm ?? 0, row.WidthMm ?? 0, row.ThicknessMm ?? 0, row.RootRadiusMm ?? 0, row.ToeRadiusMm ?? 0),
        nameof(SectionFamily.CircularHollow) => new CircularHollowDimensions(row.OutsideDiameterMm ?? 0, row.ThicknessMm ?? 0),
        nameof(SectionFamily.RectangularHollow) => new RectangularHollowDimensions(row.HeightMm ?? 0, row.WidthMm ?? 0, row.ThicknessMm ?? 0,
            Json.Read<Dictionary<string, double>>(row.DimensionsJson) is { } extra && extra.TryGetValue("ro", out var ro) ? ro : null),
        _ => null,
    };

    /// <summary>A new row (or the values to copy onto an existing one) for a Core entry.</summary>
    public static DataEntry ToRow(CoreEntry entry, string source)
    {
        var row = new DataEntry { Family = entry.Family.ToString(), Designation = entry.Designation, Source = source, IsActive = true };
        switch (entry.Dimensions)
        {
            case AngleDimensions a:
                row.DepthMm = a.LongLeg; row.WidthMm = a.ShortLeg; row.ThicknessMm = a.Thickness; row.RootRadiusMm = a.RootRadius; row.ToeRadiusMm = a.ToeRadius;
                break;
            case CircularHollowDimensions c:
                row.OutsideDiameterMm = c.Diameter; row.ThicknessMm = c.Thickness;
                break;
            case RectangularHollowDimensions r:
                row.HeightMm = r.Depth; row.WidthMm = r.Width; row.ThicknessMm = r.Thickness;
                row.DimensionsJson = r.OuterRadius is { } ro ? Json.Write(new Dictionary<string, double> { ["ro"] = ro }) : null;
                break;
        }

        return row;
    }

    public static bool CopyDimensions(DataEntry from, DataEntry to)
    {
        var changed = to.DepthMm != from.DepthMm || to.WidthMm != from.WidthMm || to.ThicknessMm != from.ThicknessMm || to.RootRadiusMm != from.RootRadiusMm
            || to.ToeRadiusMm != from.ToeRadiusMm || to.OutsideDiameterMm != from.OutsideDiameterMm || to.HeightMm != from.HeightMm
            || to.DimensionsJson != from.DimensionsJson || to.Family != from.Family || !to.IsActive;
        if (changed)
        {
            to.Family = from.Family; to.DepthMm = from.DepthMm; to.WidthMm = from.WidthMm; to.ThicknessMm = from.ThicknessMm; to.RootRadiusMm = from.RootRadiusMm;
            to.ToeRadiusMm = from.ToeRadiusMm; to.OutsideDiameterMm = from.OutsideDiameterMm; to.HeightMm = from.HeightMm; to.DimensionsJson = from.DimensionsJson;
            to.IsActive = true; to.Source = from.Source;
        }

        return changed;
    }

    public static SteelGrade ToCore(SteelGradeEntry row) =>
        new(row.Name, row.Standard, (Json.Read<List<BandDocRow>>(row.BandsJson) ?? []).Select(b => new ThicknessBand(b.MaxThicknessMm, b.FyMPa)).ToList(),
            row.FuMPa, row.EMPa, row.GMPa);

    public static SteelGradeEntry ToRow(SteelGrade grade) => new()
    {
        Name = grade.Name,
        Standard = grade.Standard,
        BandsJson = BandsJson(grade.Bands),
        FuMPa = grade.Fu,
        EMPa = grade.E,
        GMPa = grade.G,
    };

    public static string BandsJson(IEnumerable<ThicknessBand> bands) => Json.Write(bands.Select(b => new BandDocRow(b.MaxThickness, b.Fy)).ToList());

    /// <summary>Stored band layout: <c>{"maxThicknessMm": n, "fyMPa": n}</c>.</summary>
    internal sealed record BandDocRow(double MaxThicknessMm, double FyMPa);
}
