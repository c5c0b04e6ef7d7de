using Microsoft.EntityFrameworkCore;
using TrussWeb.Core.Materials;
using TrussWeb.Core.Sections;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Authorization;
using TrussWeb.Services.Common;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Design;

namespace TrussWeb.Services.Catalogue;

/// <summary>Sections (dimensions stored; properties computed by Core), grades and standards.</summary>
internal sealed class CatalogueService(IDbContextFactory<TrussWebDbContext> factory, Authorizer authorizer, TimeProvider clock) : ICatalogueService
{
    private static string Op(string method) => PermissionTable.Key<ICatalogueService>(method);

    public async Task<ServiceResult<IReadOnlyList<SectionListItem>>> ListSectionsAsync(SectionFilter filter, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(filter);
        if (authorizer.Check<IReadOnlyList<SectionListItem>>(Op(nameof(ListSectionsAsync))) is { } refusal)
        {
            return refusal;
        }

        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var query = db.SectionCatalogue.AsNoTracking();
        if (!filter.IncludeInactive)
        {
            query = query.Where(r => r.IsActive);
        }

        if (filter.Family is { } family)
        {
            // Double angles are built from the angle rows (2026-12-02: without this the hollow rows were
            // cast to angle dimensions and the member page of every double-angle member failed).
            var name = (family == SectionFamily.DoubleAngle ? SectionFamily.Angle : family).ToString();
            query = query.Where(r => r.Family == name);
        }

        var rows = await query.OrderBy(r => r.Family).ThenBy(r => r.Designation).ToListAsync(cancellationToken).ConfigureAwait(false);
        var items = new List<SectionListItem>();
        foreach (var row in rows)
        {
            var item = ToItem(row);
            if (item is null)
            {
                continue;
            }

            var size = new[] { row.DepthMm, row.WidthMm, row.OutsideDiameterMm, row.HeightMm }.Max() ?? 0;
            if ((filter.MinSizeMm is { } min && size < min) || (filter.MaxSizeMm is { } max && size > max))
            {
                continue;
            }

            if (filter.Family == SectionFamily.DoubleAngle)
            {
                var dims = (AngleDimensions)CatalogueMapper.DimensionsOf(row)!;
                var arrangement = dims.IsEqualLeg ? BackToBack.EqualLegs : BackToBack.LongLegsBackToBack;
                var designation = DoubleAngle.DefaultDesignation(dims, SectionResolver.DefaultGapMm, arrangement);
                if (!DoubleAngle.TryCompute(dims, SectionResolver.DefaultGapMm, arrangement, out var pair, out _, designation))
                {
                    continue;
                }

                item = item with { Family = SectionFamily.DoubleAngle, Designation = designation, MassPerMetreKg = pair.MassPerMetre };
            }

            if (!string.IsNullOrWhiteSpace(filter.Search) && !item.Designation.Contains(filter.Search.Trim(), StringComparison.OrdinalIgnoreCase))
            {
                continue;
            }

            items.Add(item);
        }

        return ServiceResult<IReadOnlyList<SectionListItem>>.Ok(items);
    }

    public async Task<ServiceResult<SectionDetail>> GetSectionAsync(string designation, CancellationToken cancellationToken = default)
    {
        if (authorizer.Check<SectionDetail>(Op(nameof(GetSectionAsync))) is { } refusal)
        {
            return refusal;
        }

        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var resolver = new SectionResolver(await CatalogueMapper.LoadCatalogueAsync(db, cancellationToken).ConfigureAwait(false));
        if (!resolver.TryResolve(designation ?? string.Empty, null, null, out var section, out var error))
        {
            return ServiceResult<SectionDetail>.NotFound(error ?? $"no section '{designation}'");
        }

        var doc = section!.ToDoc();
        var p = section.Properties;
        var componentName = p.Family == SectionFamily.DoubleAngle ? designation!.Trim()[1..].Split(' ')[0] : p.Designation;
        var row = await db.SectionCatalogue.AsNoTracking().FirstAsync(r => r.Designation == componentName, cancellationToken).ConfigureAwait(false);
        var item = ToItem(row)! with { Family = p.Family, Designation = p.Designation, MassPerMetreKg = p.MassPerMetre };
        var properties = new List<PropertyView>
        {
            new("A", "Gross area", p.Area, "mm²"),
            new("m", "Mass per metre", p.MassPerMetre, "kg/m"),
            new("Ix", "Second moment of area about x-x", p.Ix, "mm⁴"),
            new("Iy", "Second moment of area about y-y", p.Iy, "mm⁴"),
            new("rx", "Radius of gyration about x-x", p.Rx, "mm"),
            new("ry", "Radius of gyration about y-y", p.Ry, "mm"),
            new("Iu", "Second moment of area about u-u", p.Iu, "mm⁴"),
            new("Iv", "Second moment of area about v-v", p.Iv, "mm⁴"),
            new("rv", "Radius of gyration about v-v", p.Rv, "mm"),
            new("J", "St Venant torsion constant", p.J, "mm⁴"),
            new("Cw", "Warping constant", p.Cw, "mm⁶"),
            new("x0", "Shear centre offset x", p.X0, "mm"),
            new("y0", "Shear centre offset y", p.Y0, "mm"),
            new("r0", "Polar radius of gyration about the shear centre", p.R0, "mm"),
            new("t", "Governing thickness", p.GoverningThickness, "mm"),
        };
        return ServiceResult<SectionDetail>.Ok(new SectionDetail(item, doc.Dimensions, properties));
    }

    public async Task<ServiceResult<IReadOnlyList<GradeView>>> ListGradesAsync(CancellationToken cancellationToken = default)
    {
        if (authorizer.Check<IReadOnlyList<GradeView>>(Op(nameof(ListGradesAsync))) is { } refusal)
        {
            return refusal;
        }

        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var rows = await db.SteelGrades.AsNoTracking().OrderBy(g => g.Name).ToListAsync(cancellationToken).ConfigureAwait(false);
        return ServiceResult<IReadOnlyList<GradeView>>.Ok(rows.Select(ToView).ToList());
    }

    public Task<ServiceResult<IReadOnlyList<StandardView>>> ListStandardsAsync(CancellationToken cancellationToken = default)
    {
        if (authorizer.Check<IReadOnlyList<StandardView>>(Op(nameof(ListStandardsAsync))) is { } refusal)
        {
            return Task.FromResult(refusal);
        }

        return Task.FromResult(ServiceResult<IReadOnlyList<StandardView>>.Ok(Standards.All.Select(s => new StandardView(s.Code, s.Version, s.Edition)).ToList()));
    }

    public async Task<ServiceResult<CatalogueImportSummary>> ImportCatalogueAsync(string fileName, string csvText, CancellationToken cancellationToken = default)
    {
        if (authorizer.Check<CatalogueImportSummary>(Op(nameof(ImportCatalogueAsync))) is { } refusal)
        {
            return refusal;
        }

        if (string.IsNullOrWhiteSpace(fileName))
        {
            return ServiceResult<CatalogueImportSummary>.Invalid(nameof(fileName), "give the file name");
        }

        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var (summary, errors) = await ImportAsync(db, fileName, csvText ?? string.Empty, cancellationToken).ConfigureAwait(false);
        if (errors.Count > 0)
        {
            return ServiceResult<CatalogueImportSummary>.Invalid(errors);
        }

        AuditWriter.AddChanges(db, authorizer.Caller, clock, null);
        AuditWriter.AddAction(db, authorizer.Caller, clock, null, nameof(TrussWeb.Data.Entities.SectionCatalogueEntry), fileName, "Imported", null, null, $"{summary.Added} added, {summary.Updated} updated");
        await db.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        return ServiceResult<CatalogueImportSummary>.Ok(summary);
    }

    /// <summary>Validates the whole file with Core and stages the rows (not saved). Any error: nothing staged.</summary>
    internal static async Task<(CatalogueImportSummary Summary, IReadOnlyList<FieldError> Errors)> ImportAsync(
        TrussWebDbContext db, string fileName, string csvText, CancellationToken cancellationToken)
    {
        var loaded = SectionCatalogue.LoadFromText(fileName, csvText);
        if (loaded.Errors.Count > 0 || loaded.Entries.Count == 0)
        {
            var errors = loaded.Errors.Select(e => new FieldError(e.Field, e.Message, e.File, e.Line)).ToList();
            if (errors.Count == 0)
            {
                errors.Add(new FieldError("file", "the file has no sections", fileName, 0));
            }

            return (new CatalogueImportSummary(fileName, 0, 0, 0), errors);
        }

        var existing = await db.SectionCatalogue.ToListAsync(cancellationToken).ConfigureAwait(false);
        int added = 0, updated = 0, unchanged = 0;
        foreach (var entry in loaded.Entries)
        {
            var row = CatalogueMapper.ToRow(entry, fileName);
            var current = existing.FirstOrDefault(r => string.Equals(r.Designation, entry.Designation, StringComparison.OrdinalIgnoreCase) && r.Family == row.Family);
            if (current is null)
            {
                db.SectionCatalogue.Add(row);
                added++;
            }
            else if (CatalogueMapper.CopyDimensions(row, current))
            {
                updated++;
            }
            else
            {
                unchanged++;
            }
        }

        return (new CatalogueImportSummary(fileName, added, updated, unchanged), []);
    }

    public async Task<ServiceResult<GradeView>> SaveGradeAsync(GradeInput input, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(input);
        if (authorizer.Check<GradeView>(Op(nameof(SaveGradeAsync))) is { } refusal)
        {
            return refusal;
        }

        var grade = new SteelGrade(input.Name?.Trim() ?? string.Empty, input.Standard?.Trim() ?? string.Empty,
            input.Bands.Select(b => new ThicknessBand(b.MaxThicknessMm, b.FyMPa)).ToList(), input.FuMPa, input.EMPa, input.GMPa);
        var errors = grade.Validate().Select(i => new FieldError(GradeField(i.Field), i.Message)).ToList();
        if (grade.Name.Length == 0)
        {
            errors.Add(new FieldError(nameof(input.Name), "give the grade a name"));
        }

        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        if (await db.SteelGrades.AnyAsync(g => g.Name == grade.Name && g.Id != (input.Id ?? Guid.Empty), cancellationToken).ConfigureAwait(false))
        {
            errors.Add(new FieldError(nameof(input.Name), $"a grade named '{grade.Name}' exists already"));
        }

        if (errors.Count > 0)
        {
            return ServiceResult<GradeView>.Invalid(errors);
        }

        SteelGradeEntry row;
        if (input.Id is { } id)
        {
            var found = await db.SteelGrades.FirstOrDefaultAsync(g => g.Id == id, cancellationToken).ConfigureAwait(false);
            if (found is null)
            {
                return ServiceResult<GradeView>.Conflict([Conflicts.Deleted(nameof(SteelGradeEntry), id, input.Name)]);
            }

            row = found;
            db.Entry(row).Property(g => g.Version).OriginalValue = input.Version;
            var fresh = CatalogueMapper.ToRow(grade);
            row.Name = fresh.Name;
            row.Standard = fresh.Standard;
            row.BandsJson = fresh.BandsJson;
            row.FuMPa = fresh.FuMPa;
            row.EMPa = fresh.EMPa;
            row.GMPa = fresh.GMPa;
        }
        else
        {
            row = CatalogueMapper.ToRow(grade);
            db.SteelGrades.Add(row);
        }

        AuditWriter.AddChanges(db, authorizer.Caller, clock, null);
        try
        {
            await db.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
        }
        catch (DbUpdateConcurrencyException ex)
        {
            return ServiceResult<GradeView>.Conflict(await Conflicts.DescribeAsync(db, ex, cancellationToken).ConfigureAwait(false));
        }

        return ServiceResult<GradeView>.Ok(ToView(row));
    }

    private static GradeView ToView(SteelGradeEntry row)
    {
        var g = CatalogueMapper.ToCore(row);
        return new GradeView(row.Id, row.Version, row.Name, row.Standard, g.Bands.Select(b => new ThicknessBandView(b.MaxThickness, b.Fy)).ToList(), row.FuMPa, row.EMPa, row.GMPa);
    }

    private static SectionListItem? ToItem(TrussWeb.Data.Entities.SectionCatalogueEntry row)
    {
        var dims = CatalogueMapper.DimensionsOf(row);
        if (dims is null || dims.Validate().Count > 0)
        {
            return null;
        }

        var properties = dims.Compute(row.Designation);
        return new SectionListItem(row.Id, dims.Family, row.Designation, row.DepthMm ?? row.HeightMm, row.WidthMm, row.ThicknessMm, row.OutsideDiameterMm,
            properties.MassPerMetre, row.Source, row.IsActive);
    }

    private static string GradeField(string coreField) => coreField switch
    {
        nameof(SteelGrade.Fu) => nameof(GradeInput.FuMPa),
        nameof(SteelGrade.E) => nameof(GradeInput.EMPa),
        nameof(SteelGrade.G) => nameof(GradeInput.GMPa),
        _ => coreField,
    };
}
