using TrussWeb.Core.Sections;

namespace TrussWeb.Services.Contracts;

/// <summary>Sections, grades and design standards; imports and grade edits are for administrators.</summary>
public interface ICatalogueService
{
    Task<ServiceResult<IReadOnlyList<SectionListItem>>> ListSectionsAsync(SectionFilter filter, CancellationToken cancellationToken = default);

    /// <summary>One section with the properties Core computes from its dimensions.</summary>
    Task<ServiceResult<SectionDetail>> GetSectionAsync(string designation, CancellationToken cancellationToken = default);

    Task<ServiceResult<IReadOnlyList<GradeView>>> ListGradesAsync(CancellationToken cancellationToken = default);

    Task<ServiceResult<IReadOnlyList<StandardView>>> ListStandardsAsync(CancellationToken cancellationToken = default);

    /// <summary>Validates the whole CSV (errors by file/line/field) and imports it in one transaction, or nothing.</summary>
    Task<ServiceResult<CatalogueImportSummary>> ImportCatalogueAsync(string fileName, string csvText, CancellationToken cancellationToken = default);

    /// <summary>Adds (Id null) or edits a grade.</summary>
    Task<ServiceResult<GradeView>> SaveGradeAsync(GradeInput input, CancellationToken cancellationToken = default);
}

/// <summary>Filters; size is the largest outside dimension in mm; Search matches the designation.</summary>
public sealed record SectionFilter(SectionFamily? Family = null, string? Search = null, double? MinSizeMm = null, double? MaxSizeMm = null, bool IncludeInactive = false);

public sealed record SectionListItem(
    Guid Id,
    SectionFamily Family,
    string Designation,
    double? DepthMm,
    double? WidthMm,
    double? ThicknessMm,
    double? OutsideDiameterMm,
    double MassPerMetreKg,
    string Source,
    bool IsActive);

/// <summary>A computed property: symbol, words, value and unit (mm, mm², mm⁴, kg/m ...).</summary>
public sealed record PropertyView(string Symbol, string Description, double Value, string Unit);

public sealed record SectionDetail(SectionListItem Section, IReadOnlyDictionary<string, double> Dimensions, IReadOnlyList<PropertyView> Properties);

public sealed record ThicknessBandView(double MaxThicknessMm, double FyMPa);

public sealed record GradeView(Guid Id, long Version, string Name, string Standard, IReadOnlyList<ThicknessBandView> Bands, double FuMPa, double EMPa, double GMPa);

public sealed record GradeInput(Guid? Id, long Version, string Name, string Standard, IReadOnlyList<ThicknessBandView> Bands, double FuMPa, double EMPa, double GMPa);

public sealed record StandardView(string Code, string Version, string Title);

public sealed record CatalogueImportSummary(string FileName, int Added, int Updated, int Unchanged);
