using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Api;

/// <summary>
/// /api/v1/trusses: create from the generator, read the whole input, save each table (patches carrying
/// each row's Version; 409 on a lost race), run and read the design, and one member's design with its record.
/// </summary>
public static class TrussEndpoints
{
    public static void Map(RouteGroupBuilder api)
    {
        ArgumentNullException.ThrowIfNull(api);
        var g = api.MapGroup("").WithTags("Trusses");
        g.MapPost("/projects/{projectId:guid}/trusses", (Guid projectId, HttpRequest request, ITrussService trusses, CancellationToken ct) =>
                request.WithBodyAsync<TrussGeneratorInput>(async input =>
                {
                    var result = await trusses.CreateFromGeneratorAsync(projectId, input, ct);
                    return result.IsOk ? Results.Created($"{ApiExtensions.Prefix}/trusses/{result.Value!.Id}", result.Value) : ApiProblems.From(result);
                }))
            .WithName("CreateTruss").WithSummary("Creates a truss from the generator (type, span, pitch or apex height, heel depth, panels, spacing), designed at once.")
            .Accepts<TrussGeneratorInput>("application/json").Produces<TrussDetail>(StatusCodes.Status201Created).RequiresWrite();
        g.MapGet("/trusses/{trussId:guid}", async (Guid trussId, ITrussService trusses, HttpContext http, CancellationToken ct) =>
            {
                var result = await trusses.GetAsync(trussId, ct);
                return result.IsOk ? http.OkWithETag(result.Value, result.Value!.Version) : ApiProblems.From(result);
            })
            .WithName("GetTruss").WithSummary("The whole input of a truss (nodes, members, groups, actions, combinations) and its stored design status; ETag is the truss Version.")
            .Produces<TrussDetail>().ProducesProblem(StatusCodes.Status404NotFound);

        Save<TrussSettingsInput>(g, "settings", "SaveTrussSettings", "Saves name, spacing, purlin spacing, deflection limit, connection allowance and notes.",
            (t, id, input, ct) => t.SaveSettingsAsync(id, input, ct));
        Save<NodeTableInput>(g, "nodes", "SaveTrussNodes", "Adds (id null), updates and deletes nodes; each row carries its Version.",
            (t, id, input, ct) => t.SaveNodesAsync(id, input, ct));
        Save<MemberTableInput>(g, "members", "SaveTrussMembers", "Adds, updates and deletes members (nodes by label, group by name).",
            (t, id, input, ct) => t.SaveMembersAsync(id, input, ct));
        Save<List<SupportRow>>(g, "supports", "SaveTrussSupports", "Sets the support at each listed node (kind null removes it).",
            (t, id, input, ct) => t.SaveSupportsAsync(id, input, ct));
        Save<GroupTableInput>(g, "groups", "SaveTrussGroups", "Adds, updates and deletes member groups (section, grade, sizing limits, double-angle gap).",
            (t, id, input, ct) => t.SaveGroupsAsync(id, input, ct));
        Save<ActionsInput>(g, "actions", "SaveTrussActions", "Saves the area actions (kPa) and wind cases.",
            (t, id, input, ct) => t.SaveActionsAsync(id, input, ct));
        Save<CombinationTableInput>(g, "combinations", "SaveTrussCombinations", "Adds, updates and deletes load combinations.",
            (t, id, input, ct) => t.SaveCombinationsAsync(id, input, ct));

        g.MapGet("/trusses/{trussId:guid}/design", async (Guid trussId, IDesignService design, CancellationToken ct) => ApiProblems.Ok(await design.GetTrussDesignAsync(trussId, ct)))
            .WithName("GetTrussDesign").WithSummary("The stored design of every member (never recomputed).")
            .Produces<TrussDesignView>().ProducesProblem(StatusCodes.Status404NotFound);
        g.MapPost("/trusses/{trussId:guid}/design", async (Guid trussId, IDesignService design, CancellationToken ct) => ApiProblems.Ok(await design.DesignTrussAsync(trussId, ct)))
            .WithName("DesignTruss").WithSummary("Analyses and designs the truss with its current inputs and stores the results.")
            .Produces<TrussDesignView>().RequiresWrite();
        g.MapGet("/trusses/{trussId:guid}/members/{memberId:guid}", async (Guid trussId, Guid memberId, IDesignService design, HttpContext http, CancellationToken ct) =>
            {
                var result = await design.GetMemberDesignAsync(trussId, memberId, ct);
                return result.IsOk ? http.OkWithETag(result.Value, result.Value!.MemberVersion) : ApiProblems.From(result);
            })
            .WithName("GetMemberDesign").WithSummary("One member's stored design with its full calculation record; ETag is the member Version.")
            .Produces<MemberDesignDetail>().ProducesProblem(StatusCodes.Status404NotFound);
        g.MapPut("/trusses/{trussId:guid}/members/{memberId:guid}", (Guid trussId, Guid memberId, HttpRequest request, IDesignService design, CancellationToken ct) =>
                request.WithBodyAsync<MemberDesignInput>(async input =>
                {
                    var (version, problem) = request.VersionFrom(input.Version);
                    if (problem is not null)
                    {
                        return problem;
                    }

                    var result = await design.UpdateMemberDesignAsync(trussId, memberId, input with { Version = version }, ct);
                    return result.IsOk ? request.HttpContext.OkWithETag(result.Value, result.Value!.MemberVersion) : ApiProblems.From(result);
                }))
            .WithName("UpdateMemberDesign").WithSummary("Saves one member's section, K, length and connector overrides; re-designs and returns its new design. 409 on a stale Version.")
            .Accepts<MemberDesignInput>("application/json").Produces<MemberDesignDetail>().ProducesProblem(StatusCodes.Status409Conflict).RequiresWrite();
    }

    private static void Save<T>(RouteGroupBuilder g, string table, string name, string summary, Func<ITrussService, Guid, T, CancellationToken, Task<ServiceResult<TrussDetail>>> save)
        where T : class
    {
        g.MapPut($"/trusses/{{trussId:guid}}/{table}", (Guid trussId, HttpRequest request, ITrussService trusses, CancellationToken ct) =>
                request.WithBodyAsync<T>(async input =>
                {
                    var result = await save(trusses, trussId, input, ct);
                    return result.IsOk ? request.HttpContext.OkWithETag(result.Value, result.Value!.Version) : ApiProblems.From(result);
                }))
            .WithName(name).WithSummary(summary + " Re-designs the truss; 409 when a row changed since its Version.")
            .Accepts<T>("application/json").Produces<TrussDetail>().ProducesProblem(StatusCodes.Status409Conflict).RequiresWrite();
    }
}
