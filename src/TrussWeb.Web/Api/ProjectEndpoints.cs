using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Api;

/// <summary>Project settings to save, with the Version the caller loaded (or If-Match).</summary>
public sealed record ProjectUpdateRequest(ProjectInput Settings, long Version);

/// <summary>/api/v1/projects: list, read, create, update settings; people of a project.</summary>
public static class ProjectEndpoints
{
    public static void Map(RouteGroupBuilder api)
    {
        ArgumentNullException.ThrowIfNull(api);
        var g = api.MapGroup("/projects").WithTags("Projects");
        g.MapGet("", async (IProjectService projects, CancellationToken ct) => ApiProblems.Ok(await projects.ListMyProjectsAsync(ct)))
            .WithName("ListProjects").WithSummary("Projects you belong to, each truss with its status roll-up.")
            .Produces<IReadOnlyList<ProjectSummary>>();
        g.MapGet("/{projectId:guid}", async (Guid projectId, IProjectService projects, HttpContext http, CancellationToken ct) =>
            {
                var result = await projects.GetAsync(projectId, ct);
                return result.IsOk ? http.OkWithETag(result.Value, result.Value!.Version) : ApiProblems.From(result);
            })
            .WithName("GetProject").WithSummary("One project with its trusses; ETag is its Version.")
            .Produces<ProjectDetail>().ProducesProblem(StatusCodes.Status404NotFound);
        g.MapPost("", (HttpRequest request, IProjectService projects, CancellationToken ct) => request.WithBodyAsync<ProjectInput>(async input =>
            {
                var result = await projects.CreateAsync(input, ct);
                return result.IsOk ? Results.Created($"{ApiExtensions.Prefix}/projects/{result.Value!.Id}", result.Value) : ApiProblems.From(result);
            }))
            .WithName("CreateProject").WithSummary("Creates a project (global project leads and administrators); you become its lead.")
            .Accepts<ProjectInput>("application/json").Produces<ProjectDetail>(StatusCodes.Status201Created).RequiresWrite();
        g.MapPut("/{projectId:guid}", (Guid projectId, HttpRequest request, IProjectService projects, CancellationToken ct) => request.WithBodyAsync<ProjectUpdateRequest>(async input =>
            {
                var (version, problem) = request.VersionFrom(input.Version);
                if (problem is not null)
                {
                    return problem;
                }

                var result = await projects.UpdateSettingsAsync(projectId, input.Settings, version, ct);
                return result.IsOk ? request.HttpContext.OkWithETag(result.Value, result.Value!.Version) : ApiProblems.From(result);
            }))
            .WithName("UpdateProject").WithSummary("Saves the project settings; 409 when someone saved since your Version.")
            .Accepts<ProjectUpdateRequest>("application/json").Produces<ProjectDetail>().ProducesProblem(StatusCodes.Status409Conflict).RequiresWrite();
        g.MapGet("/{projectId:guid}/people", async (Guid projectId, IProjectService projects, CancellationToken ct) => ApiProblems.Ok(await projects.GetMembersAsync(projectId, ct)))
            .WithName("ListProjectPeople").WithSummary("The project's members and their project roles (user ids for submitting to a checker).")
            .Produces<IReadOnlyList<ProjectMemberView>>().ProducesProblem(StatusCodes.Status404NotFound);
    }
}
