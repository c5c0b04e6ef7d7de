using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Api;

/// <summary>Hand a member (or a truss) to a checker.</summary>
public sealed record SubmitRequest(string CheckerUserId, string? Note = null);

/// <summary>A checker's decision comment (required to return).</summary>
public sealed record CommentRequest(string? Comment = null);

/// <summary>The designer's answer to a returned member.</summary>
public sealed record AnswerRequest(string Answer);

/// <summary>Give a member to another checker.</summary>
public sealed record ReassignRequest(string CheckerUserId);

/// <summary>
/// /api/v1 review actions under the same rules as the pages: the review service enforces roles, the
/// state machine and four eyes (the designer of record never approves or returns their own member: 403).
/// The audit log is read only: there is no route that changes or removes an entry.
/// </summary>
public static class ReviewEndpoints
{
    public static void Map(RouteGroupBuilder api)
    {
        ArgumentNullException.ThrowIfNull(api);
        var g = api.MapGroup("").WithTags("Review");
        g.MapGet("/review/queue", async (IReviewService review, CancellationToken ct) => ApiProblems.Ok(await review.ListMyQueueAsync(ct)))
            .WithName("ListMyCheckQueue").WithSummary("Members awaiting your check.").Produces<IReadOnlyList<CheckQueueItem>>();
        g.MapGet("/members/{memberId:guid}/review", async (Guid memberId, IReviewService review, CancellationToken ct) => ApiProblems.Ok(await review.GetMemberReviewAsync(memberId, ct)))
            .WithName("GetMemberReview").WithSummary("A member's review state and the actions you may take.").Produces<MemberReviewView>().ProducesProblem(StatusCodes.Status404NotFound);
        g.MapGet("/members/{memberId:guid}/review/changes", async (Guid memberId, IReviewService review, CancellationToken ct) => ApiProblems.Ok(await review.GetChangesSinceApprovalAsync(memberId, ct)))
            .WithName("GetChangesSinceApproval").WithSummary("Inputs and results at approval against the current stored design.").Produces<ChangesSinceApproval>().ProducesProblem(StatusCodes.Status404NotFound);

        Action<SubmitRequest>(g, "submit", "SubmitMember", "Hands the member to a checker; you become its designer of record.",
            (r, id, b, ct) => r.SubmitAsync(id, b.CheckerUserId, b.Note, ct));
        Action<AnswerRequest>(g, "resubmit", "ResubmitMember", "Hands a returned member back to its checker with your answer.",
            (r, id, b, ct) => r.ResubmitAsync(id, b.Answer, ct));
        Action<CommentRequest>(g, "withdraw", "WithdrawMember", "Takes a submitted member back before the checker decides.",
            (r, id, _, ct) => r.WithdrawAsync(id, ct));
        Action<CommentRequest>(g, "approve", "ApproveMember", "Approves the member's current stored design (assigned checker, never the designer of record).",
            (r, id, b, ct) => r.ApproveAsync(id, b.Comment, ct));
        Action<CommentRequest>(g, "return", "ReturnMember", "Returns the member to its designer; comment required.",
            (r, id, b, ct) => r.ReturnAsync(id, b.Comment ?? string.Empty, ct));
        Action<ReassignRequest>(g, "reassign", "ReassignChecker", "Project lead: gives the member to another checker.",
            (r, id, b, ct) => r.ReassignCheckerAsync(id, b.CheckerUserId, ct));

        g.MapGet("/trusses/{trussId:guid}/review", async (Guid trussId, IReviewService review, CancellationToken ct) => ApiProblems.Ok(await review.GetTrussReviewAsync(trussId, ct)))
            .WithName("GetTrussReview").WithSummary("Every member of the truss with its review.").Produces<IReadOnlyList<MemberReviewView>>().ProducesProblem(StatusCodes.Status404NotFound);
        g.MapPost("/trusses/{trussId:guid}/review/submit", (Guid trussId, HttpRequest request, IReviewService review, CancellationToken ct) =>
                request.WithBodyAsync<SubmitRequest>(async b => ApiProblems.Ok(await review.SubmitTrussAsync(trussId, b.CheckerUserId, b.Note, ct))))
            .WithName("SubmitTruss").WithSummary("Submits every member that is not submitted or whose approval is stale.")
            .Accepts<SubmitRequest>("application/json").Produces<TrussSubmission>().RequiresWrite();
        g.MapGet("/projects/{projectId:guid}/review/roll-up", async (Guid projectId, IReviewService review, CancellationToken ct) => ApiProblems.Ok(await review.GetRollUpAsync(projectId, ct)))
            .WithName("GetReviewRollUp").WithSummary("Members per review state for the project and each truss.").Produces<ReviewRollUp>().ProducesProblem(StatusCodes.Status404NotFound);
        g.MapGet("/projects/{projectId:guid}/issue-status", async (Guid projectId, IReviewService review, CancellationToken ct) => ApiProblems.Ok(await review.GetIssueStatusAsync(projectId, ct)))
            .WithName("GetIssueStatus").WithSummary("Whether the final set may be issued (every member approved).").Produces<IssueStatus>().ProducesProblem(StatusCodes.Status404NotFound);
        g.MapGet("/projects/{projectId:guid}/audit", async (Guid projectId, Guid? memberId, IReviewService review, CancellationToken ct) => ApiProblems.Ok(await review.GetAuditAsync(projectId, memberId, ct)))
            .WithName("GetAuditLog").WithSummary("The project's audit log (oldest first), or one member's. Read only.").Produces<IReadOnlyList<AuditEntryView>>().ProducesProblem(StatusCodes.Status404NotFound);
        g.MapGet("/projects/{projectId:guid}/audit.csv", async (Guid projectId, IReviewService review, CancellationToken ct) =>
            {
                var result = await review.ExportAuditCsvAsync(projectId, ct);
                return result.IsOk ? Results.File(result.Value!, "text/csv; charset=utf-8", $"audit-{projectId:N}.csv") : ApiProblems.From(result);
            })
            .WithName("GetAuditLogCsv").WithSummary("The project's audit log as CSV (RFC 4180, UTF-8).").Produces(StatusCodes.Status200OK, contentType: "text/csv").ProducesProblem(StatusCodes.Status404NotFound);
    }

    private static void Action<T>(RouteGroupBuilder g, string action, string name, string summary,
        Func<IReviewService, Guid, T, CancellationToken, Task<ServiceResult<MemberReviewView>>> run)
        where T : class
    {
        g.MapPost($"/members/{{memberId:guid}}/review/{action}", (Guid memberId, HttpRequest request, IReviewService review, CancellationToken ct) =>
                request.WithBodyAsync<T>(async body => ApiProblems.Ok(await run(review, memberId, body, ct))))
            .WithName(name).WithSummary(summary + " 403 when your role or the four-eyes rule does not allow it; 409 when the state does not.")
            .Accepts<T>("application/json").Produces<MemberReviewView>().RequiresWrite();
    }
}
