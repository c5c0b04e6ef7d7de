using TrussWeb.Core.Sections;
using TrussWeb.Core.Validation;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Api;

/// <summary>/api/v1/sections, grades and standards (read).</summary>
public static class SectionEndpoints
{
    public static void Map(RouteGroupBuilder api)
    {
        ArgumentNullException.ThrowIfNull(api);
        var g = api.MapGroup("").WithTags("Catalogue");
        g.MapGet("/sections", ListAsync)
            .WithName("ListSections")
            .WithSummary("Catalogue sections, filtered by kind (family), designation text and size range (largest outside dimension, mm).")
            .ProducesProblem(StatusCodes.Status400BadRequest);
        g.MapGet("/sections/{designation}", GetAsync)
            .WithName("GetSection")
            .WithSummary("One section with the properties computed from its dimensions.")
            .ProducesProblem(StatusCodes.Status404NotFound);
        g.MapGet("/grades", async (ICatalogueService catalogue, CancellationToken ct) => ApiProblems.Ok(await catalogue.ListGradesAsync(ct)))
            .WithName("ListGrades").WithSummary("Steel grades with fy by thickness band.")
            .Produces<IReadOnlyList<GradeView>>();
        g.MapGet("/standards", async (ICatalogueService catalogue, CancellationToken ct) => ApiProblems.Ok(await catalogue.ListStandardsAsync(ct)))
            .WithName("ListStandards").WithSummary("Design standards a project can use.")
            .Produces<IReadOnlyList<StandardView>>();
    }

    private static async Task<IResult> ListAsync(ICatalogueService catalogue, SectionFamily? kind, string? designation, double? minSizeMm, double? maxSizeMm, CancellationToken ct)
    {
        var issues = new List<ValidationIssue>();
        if (minSizeMm is { } min)
        {
            Guard.InRange(issues, "minSizeMm", min, 0, PlausibleRange.MaxDimensionMm, "mm");
        }

        if (maxSizeMm is { } max)
        {
            Guard.InRange(issues, "maxSizeMm", max, 0, PlausibleRange.MaxDimensionMm, "mm");
        }

        if (minSizeMm > maxSizeMm)
        {
            issues.Add(new ValidationIssue("minSizeMm", $"must not exceed maxSizeMm ({maxSizeMm} mm)"));
        }

        if (designation is { Length: > 100 })
        {
            issues.Add(new ValidationIssue("designation", "must be at most 100 characters"));
        }

        if (issues.Count > 0)
        {
            return ApiProblems.Invalid(issues);
        }

        return ApiProblems.Ok(await catalogue.ListSectionsAsync(new SectionFilter(kind, designation, minSizeMm, maxSizeMm), ct));
    }

    private static async Task<IResult> GetAsync(ICatalogueService catalogue, string designation, CancellationToken ct) =>
        ApiProblems.Ok(await catalogue.GetSectionAsync(designation, ct));
}
