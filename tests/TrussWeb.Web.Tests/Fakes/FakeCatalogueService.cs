using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Tests.Fakes;

/// <summary>ICatalogueService with one grade and one standard.</summary>
public sealed class FakeCatalogueService : ICatalogueService
{
    public Task<ServiceResult<IReadOnlyList<SectionListItem>>> ListSectionsAsync(SectionFilter filter, CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<IReadOnlyList<SectionListItem>>.Ok([]));

    public Task<ServiceResult<SectionDetail>> GetSectionAsync(string designation, CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<SectionDetail>.NotFound("none"));

    public Task<ServiceResult<IReadOnlyList<GradeView>>> ListGradesAsync(CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<IReadOnlyList<GradeView>>.Ok([new GradeView(Guid.NewGuid(), 1, "S355JR", "SANS 50025", [new ThicknessBandView(16, 355)], 470, 200000, 77000)]));

    public Task<ServiceResult<IReadOnlyList<StandardView>>> ListStandardsAsync(CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<IReadOnlyList<StandardView>>.Ok([new StandardView("SANS 10162-1", "2011", "Steel structures")]));

    public Task<ServiceResult<CatalogueImportSummary>> ImportCatalogueAsync(string fileName, string csvText, CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<CatalogueImportSummary>.Forbidden("no"));

    public Task<ServiceResult<GradeView>> SaveGradeAsync(GradeInput input, CancellationToken cancellationToken = default) =>
        Task.FromResult(ServiceResult<GradeView>.Forbidden("no"));
}
