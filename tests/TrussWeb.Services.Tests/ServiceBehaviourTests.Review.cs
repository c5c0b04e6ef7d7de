using System.Text;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Common;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Design;
using TrussWeb.Services.Review;

namespace TrussWeb.Services.Tests;

public abstract partial class ServiceBehaviourTests
{
    private async Task<(ProjectDetail Project, TrussDetail Truss, MemberView Tc1)> SubmittedTc1Async()
    {
        var (project, truss) = await ProjectWithTrussAsync();
        var tc1 = truss.Members.First(m => m.Mark == "TC1");
        var submitted = Ok(await As(Designer).Review.SubmitAsync(tc1.Id, Checker.UserId!, "TC1 ready"));
        Assert.Equal(MemberReviewState.AwaitingCheck, submitted.State);
        return (project, truss, tc1);
    }

    private async Task<(ProjectDetail Project, TrussDetail Truss, Guid Tc1)> ApprovedTc1Async()
    {
        var (project, truss, tc1) = await SubmittedTc1Async();
        var approved = Ok(await As(Checker).Review.ApproveAsync(tc1.Id, "Agreed"));
        Assert.Equal(MemberReviewState.Approved, approved.State);
        return (project, Ok(await As(Designer).Trusses.GetAsync(truss.Id)), tc1.Id);
    }

    private async Task<MemberReviewState> StateAsync(Guid memberId) => Ok(await As(Lead).Review.GetMemberReviewAsync(memberId)).State;

    [Fact]
    public async Task Submit_and_approve_record_the_designer_the_checker_and_the_approved_fingerprint_and_audit_each_step()
    {
        var (project, truss, tc1) = await SubmittedTc1Async();
        Clock.Advance(TimeSpan.FromMinutes(5));

        var approved = Ok(await As(Checker).Review.ApproveAsync(tc1.Id, "Agreed"));

        var design = Ok(await As(Checker).Design.GetMemberDesignAsync(truss.Id, tc1.Id));
        Assert.Equal(design.Row.Fingerprint, approved.ApprovedFingerprint);
        Assert.Equal(design.Row.Fingerprint, approved.CurrentFingerprint);
        Assert.Equal(Designer.UserId, approved.DesignerOfRecordId);
        Assert.Equal("Chris Checker", approved.CheckerName);
        Assert.Equal("Approved", design.Row.ReviewState);
        var log = Ok(await As(Checker).Review.GetAuditAsync(project.Id, tc1.Id)).Where(a => a.Action.StartsWith("Review", StringComparison.Ordinal)).ToList();
        Assert.Collection(log,
            s =>
            {
                Assert.Equal(("ReviewSubmit", "NotSubmitted", "AwaitingCheck", "TC1 ready"), (s.Action, s.OldValue, s.NewValue, s.Comment));
                Assert.Equal(("Dineo Designer", Start.UtcDateTime), (s.UserName, s.UtcTime));
                Assert.Equal(design.Row.Fingerprint, s.Fingerprint);
            },
            a =>
            {
                Assert.Equal(("ReviewApprove", "AwaitingCheck", "Approved", "Agreed"), (a.Action, a.OldValue, a.NewValue, a.Comment));
                Assert.Equal(("Chris Checker", Start.UtcDateTime.AddMinutes(5)), (a.UserName, a.UtcTime));
                Assert.Equal(design.Row.Fingerprint, a.Fingerprint);
                Assert.Equal(tc1.Id.ToString(), a.EntityId);
            });
    }

    [Fact]
    public async Task The_designer_of_record_cannot_approve_or_return_their_own_member()
    {
        var (_, truss) = await ProjectWithTrussAsync();
        var tc1 = truss.Members.First(m => m.Mark == "TC1");
        Ok(await As(Lead).Review.SubmitAsync(tc1.Id, Checker.UserId!, null));
        Ok(await As(Lead).Review.ReassignCheckerAsync(tc1.Id, Checker.UserId!));

        var approve = await As(Lead).Review.ApproveAsync(tc1.Id, null);
        var @return = await As(Lead).Review.ReturnAsync(tc1.Id, "Looks wrong");
        var byDesigner = await As(Designer).Review.ApproveAsync(tc1.Id, null);

        Assert.Equal(ResultKind.Forbidden, approve.Kind);
        Assert.Contains("designer of record of TC1", approve.Message, StringComparison.Ordinal);
        Assert.Equal(ResultKind.Forbidden, @return.Kind);
        Assert.Contains("designer of record", @return.Message, StringComparison.Ordinal);
        Assert.Equal(ResultKind.Forbidden, byDesigner.Kind);
        Assert.Equal(MemberReviewState.AwaitingCheck, await StateAsync(tc1.Id));
        var reassignToSelf = await As(Lead).Review.ReassignCheckerAsync(tc1.Id, Lead.UserId!);
        Assert.Equal(ResultKind.Invalid, reassignToSelf.Kind);
        Assert.Contains("cannot be its checker", reassignToSelf.Message, StringComparison.Ordinal);
        var view = Ok(await As(Lead).Review.GetMemberReviewAsync(tc1.Id));
        Assert.DoesNotContain(ReviewAction.Approve, view.AvailableActions);
    }

    [Fact]
    public async Task A_checker_who_edits_a_member_becomes_its_designer_of_record_and_can_no_longer_approve_it()
    {
        var (_, truss) = await ProjectWithTrussAsync();
        var tc1 = truss.Members.First(m => m.Mark == "TC1");
        Ok(await As(Designer).Review.SubmitAsync(tc1.Id, Lead.UserId!, null));
        Assert.Equal(ResultKind.Forbidden, (await As(Checker).Design.UpdateMemberDesignAsync(truss.Id, tc1.Id,
            new MemberDesignInput(tc1.Overrides with { Kx = 0.9 }, Ok(await As(Checker).Trusses.GetAsync(truss.Id)).Members.First(m => m.Mark == "TC1").Version))).Kind);

        var fresh = Ok(await As(Lead).Trusses.GetAsync(truss.Id)).Members.First(m => m.Mark == "TC1");
        Ok(await As(Lead).Design.UpdateMemberDesignAsync(truss.Id, tc1.Id, new MemberDesignInput(fresh.Overrides with { Kx = 0.9 }, fresh.Version)));
        var afterEdit = Ok(await As(Lead).Review.GetMemberReviewAsync(tc1.Id));
        var approve = await As(Lead).Review.ApproveAsync(tc1.Id, null);

        Assert.Equal(Lead.UserId, afterEdit.DesignerOfRecordId);
        Assert.Equal(ResultKind.Forbidden, approve.Kind);
        Assert.Contains("designer of record", approve.Message, StringComparison.Ordinal);
        Ok(await As(Lead).Review.ReassignCheckerAsync(tc1.Id, Checker.UserId!));
        Assert.Equal(MemberReviewState.Approved, Ok(await As(Checker).Review.ApproveAsync(tc1.Id, null)).State);
    }

    [Fact]
    public async Task Only_the_assigned_checker_decides_and_the_checker_must_be_a_checking_member()
    {
        var (project, truss, tc1) = await SubmittedTc1Async();
        var bc1 = truss.Members.First(m => m.Mark == "BC1");

        var byLead = await As(Lead).Review.ApproveAsync(tc1.Id, null);
        var toDesigner = await As(Lead).Review.SubmitAsync(bc1.Id, Designer.UserId!, null);
        var toOutsider = await As(Designer).Review.SubmitAsync(bc1.Id, Outsider.UserId!, null);
        var byChecker = await As(Checker).Review.SubmitAsync(bc1.Id, Lead.UserId!, null);
        var outsider = await As(Outsider).Review.GetMemberReviewAsync(tc1.Id);

        Assert.Equal(ResultKind.Forbidden, byLead.Kind);
        Assert.Contains("awaits Chris Checker", byLead.Message, StringComparison.Ordinal);
        Assert.Equal(ResultKind.Invalid, toDesigner.Kind);
        Assert.Contains("Checker or ProjectLead", toDesigner.Message, StringComparison.Ordinal);
        Assert.Equal(ResultKind.Invalid, toOutsider.Kind);
        Assert.Contains("member of the project", toOutsider.Message, StringComparison.Ordinal);
        Assert.Equal(ResultKind.Forbidden, byChecker.Kind);
        Assert.Equal(ResultKind.NotFound, outsider.Kind);
        Assert.Equal(ResultKind.NotFound, (await As(Outsider).Review.GetAuditAsync(project.Id, null)).Kind);
        Assert.Equal(MemberReviewState.NotSubmitted, await StateAsync(bc1.Id));
    }

    [Fact]
    public async Task Return_needs_a_comment_resubmit_needs_an_answer_and_withdraw_takes_a_submission_back()
    {
        var (project, truss, tc1) = await SubmittedTc1Async();

        Assert.Equal(ResultKind.Invalid, (await As(Checker).Review.ReturnAsync(tc1.Id, " ")).Kind);
        var returned = Ok(await As(Checker).Review.ReturnAsync(tc1.Id, "Ky at the apex?"));
        Assert.Equal((MemberReviewState.Returned, "Ky at the apex?"), (returned.State, returned.Comment));
        Assert.Equal(ResultKind.Invalid, (await As(Designer).Review.SubmitAsync(tc1.Id, Checker.UserId!, null)).Kind);
        Assert.Equal(ResultKind.Invalid, (await As(Designer).Review.ResubmitAsync(tc1.Id, "")).Kind);
        var resubmitted = Ok(await As(Designer).Review.ResubmitAsync(tc1.Id, "Restrained by the purlin"));
        Assert.Equal((MemberReviewState.AwaitingCheck, Checker.UserId), (resubmitted.State, resubmitted.CheckerId));
        var withdrawn = Ok(await As(Designer).Review.WithdrawAsync(tc1.Id));
        Assert.Equal((MemberReviewState.NotSubmitted, (string?)null), (withdrawn.State, withdrawn.CheckerId));
        Assert.Equal(ResultKind.Invalid, (await As(Checker).Review.ApproveAsync(tc1.Id, null)).Kind);

        var steps = Ok(await As(Lead).Review.GetAuditAsync(project.Id, tc1.Id)).Where(a => a.Action.StartsWith("Review", StringComparison.Ordinal))
            .Select(a => (a.Action, a.OldValue, a.NewValue, a.Comment)).ToList();
        Assert.Equal(
        [
            ("ReviewSubmit", "NotSubmitted", "AwaitingCheck", "TC1 ready"),
            ("ReviewReturn", "AwaitingCheck", "Returned", "Ky at the apex?"),
            ("ReviewResubmit", "Returned", "AwaitingCheck", "Restrained by the purlin"),
            ("ReviewWithdraw", "AwaitingCheck", "NotSubmitted", null),
        ], steps);
        Assert.Equal(truss.Id, returned.TrussId);
    }

    [Theory]
    [InlineData("section")]
    [InlineData("lengths")]
    [InlineData("K")]
    [InlineData("loads")]
    [InlineData("combinations")]
    [InlineData("geometry")]
    [InlineData("material")]
    [InlineData("connectors")]
    public async Task Each_kind_of_input_change_makes_the_approval_stale(string kind)
    {
        var (project, truss, tc1) = await ApprovedTc1Async();
        var before = Ok(await As(Designer).Design.GetTrussDesignAsync(truss.Id));
        Assert.Equal(1, Ok(await As(Lead).Review.GetIssueStatusAsync(project.Id)).ApprovedMembers);

        await ChangeInputAsync(kind, Ok(await As(Lead).Projects.GetAsync(project.Id)), truss, before);

        var review = Ok(await As(Lead).Review.GetMemberReviewAsync(tc1));
        Assert.Equal(MemberReviewState.ApprovalStale, review.State);
        Assert.NotEqual(review.ApprovedFingerprint, review.CurrentFingerprint);
        var stale = Assert.Single(Ok(await As(Lead).Review.GetAuditAsync(project.Id, tc1)), a => a.Action == "ReviewApprovalStale");
        Assert.Equal(("Approved", "ApprovalStale", review.CurrentFingerprint), (stale.OldValue, stale.NewValue, stale.Fingerprint));
        var status = Ok(await As(Lead).Review.GetIssueStatusAsync(project.Id));
        Assert.Equal((0, 1), (status.ApprovedMembers, status.StaleMembers));
    }

    [Fact]
    public async Task A_new_standard_module_version_makes_the_approval_stale_in_the_design_run_hook()
    {
        var (project, truss, tc1) = await ApprovedTc1Async();
        await using var db = await ContextAsync();
        var snapshot = await db.DesignSnapshots.AsNoTracking().SingleAsync(s => s.MemberId == tc1);
        var inputs = Json.Read<MemberInputsDoc>(snapshot.InputsJson)!;
        var results = Json.Read<MemberResultDoc>(snapshot.ResultJson)!;
        Assert.Equal(snapshot.Fingerprint, DesignFingerprint.Compute(inputs, results));
        var nextVersion = DesignFingerprint.Compute(inputs with { StandardVersion = inputs.StandardVersion + "+next" }, results);
        var tracked = await DesignInputBuilder.LoadTrussAsync(db, truss.Id, CancellationToken.None);

        var events = ReviewStaleness.Apply(db, tracked!, new Dictionary<Guid, string> { [tc1] = snapshot.Fingerprint },
            new Dictionary<Guid, string> { [tc1] = nextVersion }, Lead, Clock);
        await db.SaveChangesAsync();

        Assert.NotEqual(snapshot.Fingerprint, nextVersion);
        Assert.Equal(MemberReviewState.ApprovalStale, Assert.Single(events).To);
        Assert.Equal(MemberReviewState.ApprovalStale, await StateAsync(tc1));
        Assert.Contains(Ok(await As(Lead).Review.GetAuditAsync(project.Id, tc1)), a => a.Action == "ReviewApprovalStale" && a.Fingerprint == nextVersion);
    }

    [Fact]
    public async Task Saving_an_unchanged_member_or_redesigning_keeps_the_approval()
    {
        var (project, truss, tc1) = await ApprovedTc1Async();
        var member = truss.Members.Single(m => m.Id == tc1);
        var a = truss.Actions;

        Ok(await As(Designer).Design.UpdateMemberDesignAsync(truss.Id, tc1, new MemberDesignInput(member.Overrides, member.Version)));
        Ok(await As(Designer).Trusses.SaveActionsAsync(truss.Id, new ActionsInput(a.CoveringKPa, a.PurlinsAndServicesKPa, a.ImposedKPa, a.WindCases, a.Version)));
        Ok(await As(Designer).Design.DesignTrussAsync(truss.Id));

        var review = Ok(await As(Lead).Review.GetMemberReviewAsync(tc1));
        Assert.Equal(MemberReviewState.Approved, review.State);
        Assert.Equal(review.ApprovedFingerprint, review.CurrentFingerprint);
        Assert.DoesNotContain(Ok(await As(Lead).Review.GetAuditAsync(project.Id, null)), e => e.Action == "ReviewApprovalStale");
    }

    [Fact]
    public async Task Changes_since_approval_list_each_changed_field_with_both_values()
    {
        var (_, truss, tc1) = await ApprovedTc1Async();
        var member = truss.Members.Single(m => m.Id == tc1);
        var approvedDesign = Ok(await As(Designer).Design.GetMemberDesignAsync(truss.Id, tc1));

        Ok(await As(Designer).Design.UpdateMemberDesignAsync(truss.Id, tc1, new MemberDesignInput(member.Overrides with { Kx = 0.9 }, member.Version)));
        var changes = Ok(await As(Checker).Review.GetChangesSinceApprovalAsync(tc1));

        var kx = Assert.Single(changes.Changes, c => c.Field == "inputs.lengths.kx");
        Assert.Equal(("1", "0.9"), (kx.AtApproval, kx.Now));
        Assert.Equal(approvedDesign.Row.Fingerprint, changes.ApprovedFingerprint);
        Assert.NotEqual(changes.ApprovedFingerprint, changes.CurrentFingerprint);
        Assert.Equal("Chris Checker", changes.ApprovedByName);
        Assert.DoesNotContain(changes.Changes, c => c.Field.StartsWith("inputs.section", StringComparison.Ordinal) || c.Field.StartsWith("results.steps", StringComparison.Ordinal));
        Assert.All(changes.Changes, c => Assert.NotEqual(c.AtApproval, c.Now));
        var bc1 = truss.Members.First(m => m.Mark == "BC1").Id;
        Assert.Equal(ResultKind.Invalid, (await As(Checker).Review.GetChangesSinceApprovalAsync(bc1)).Kind);
    }

    [Fact]
    public async Task The_checker_queue_and_the_roll_up_count_members_per_state_and_truss()
    {
        var (project, truss) = await ProjectWithTrussAsync();
        var submission = Ok(await As(Designer).Review.SubmitTrussAsync(truss.Id, Checker.UserId!, "All members"));
        Assert.Equal(truss.Members.Count, submission.Submitted.Count);
        Assert.Empty(submission.Skipped);
        var queue = Ok(await As(Checker).Review.ListMyQueueAsync());
        Assert.Equal(truss.Members.Count, queue.Count);
        Assert.All(queue, q => Assert.Equal(("Tamboti Storage Hall", "RT1", "Dineo Designer"), (q.ProjectName, q.TrussName, q.DesignerOfRecordName)));
        Assert.Empty(Ok(await As(Designer).Review.ListMyQueueAsync()));

        var marks = truss.Members.OrderBy(m => m.Mark, StringComparer.Ordinal).ToList();
        Ok(await As(Checker).Review.ApproveAsync(marks[0].Id, null));
        Ok(await As(Checker).Review.ApproveAsync(marks[1].Id, null));
        Ok(await As(Checker).Review.ReturnAsync(marks[2].Id, "Check the connector spacing"));
        Ok(await As(Designer).Review.WithdrawAsync(marks[3].Id));
        var again = Ok(await As(Designer).Review.SubmitTrussAsync(truss.Id, Checker.UserId!, null));

        Assert.Equal([marks[3].Id], again.Submitted.Select(s => s.MemberId));
        Assert.Equal(truss.Members.Count - 1, again.Skipped.Count);
        Assert.Equal(truss.Members.Count - 3, Ok(await As(Checker).Review.ListMyQueueAsync()).Count);
        var rollUp = Ok(await As(Designer).Review.GetRollUpAsync(project.Id));
        var expected = new Dictionary<MemberReviewState, int>
        {
            [MemberReviewState.NotSubmitted] = 0,
            [MemberReviewState.AwaitingCheck] = truss.Members.Count - 3,
            [MemberReviewState.Approved] = 2,
            [MemberReviewState.Returned] = 1,
            [MemberReviewState.ApprovalStale] = 0,
        };
        Assert.Equal(expected, rollUp.Totals);
        Assert.Equal(expected, Assert.Single(rollUp.Trusses).Counts);
        var projects = Ok(await As(Lead).Projects.ListMyProjectsAsync());
        Assert.Equal(2, Assert.Single(Assert.Single(projects).Trusses).ReviewStates["Approved"]);
        var reviews = Ok(await As(Checker).Review.GetTrussReviewAsync(truss.Id));
        Assert.Equal(truss.Members.Count, reviews.Count);
        Assert.Equal(expected[MemberReviewState.AwaitingCheck], reviews.Count(r => r.State == MemberReviewState.AwaitingCheck));
        Assert.All(reviews.Where(r => r.State == MemberReviewState.AwaitingCheck), r => Assert.Contains(ReviewAction.Approve, r.AvailableActions));
        var returned = reviews.Single(r => r.MemberId == marks[2].Id);
        Assert.Equal((MemberReviewState.Returned, "Chris Checker", "Dineo Designer", "Check the connector spacing"),
            (returned.State, returned.CheckerName, returned.DesignerOfRecordName, returned.Comment));
        Assert.DoesNotContain(ReviewAction.Approve, Ok(await As(Designer).Review.GetTrussReviewAsync(truss.Id)).Single(r => r.MemberId == marks[4].Id).AvailableActions);
    }

    [Fact]
    public async Task The_checker_queue_spans_the_projects_the_checker_belongs_to_and_leaves_a_project_when_they_leave_it()
    {
        var (first, truss, tc1) = await SubmittedTc1Async();
        var lead = As(Lead);
        var second = Ok(await lead.Projects.CreateAsync(new ProjectInput("Marula Workshop", "Invented client", "T-120", "Nowhere (invented)", "A", "SANS 10162-1", "S355JR")));
        Ok(await lead.Projects.AddMemberAsync(second.Id, new AddProjectMemberInput(Designer.UserId!, TrussWeb.Data.Roles.Designer)));
        var membership = Ok(await lead.Projects.AddMemberAsync(second.Id, new AddProjectMemberInput(Checker.UserId!, TrussWeb.Data.Roles.Checker)));
        var other = Ok(await As(Designer).Trusses.CreateFromGeneratorAsync(second.Id,
            new TrussGeneratorInput("WT1", TrussWeb.Core.Model.TrussType.PitchedHowe, 9000, 15, null, 0, 6, 4500, 2)));
        Ok(await As(Designer).Review.SubmitAsync(other.Members.First().Id, Checker.UserId!, null));

        var queue = Ok(await As(Checker).Review.ListMyQueueAsync());

        Assert.Equal([(first.Id, tc1.Id), (second.Id, other.Members.First().Id)], queue.Select(q => (q.ProjectId, q.MemberId)).OrderBy(x => x.Item1 == second.Id));
        Assert.Equal(["RT1", "WT1"], queue.Select(q => q.TrussName).Order(StringComparer.Ordinal));
        Ok(await lead.Projects.RemoveMemberAsync(second.Id, new RowRef(membership.MembershipId, membership.Version)));
        Assert.Equal([tc1.Id], Ok(await As(Checker).Review.ListMyQueueAsync()).Select(q => q.MemberId));
        Assert.Equal(truss.Id, queue.Single(q => q.ProjectId == first.Id).TrussId);
    }

    [Fact]
    public async Task The_final_set_is_refused_with_the_count_until_every_member_is_approved_and_then_recorded()
    {
        var (project, truss) = await ProjectWithTrussAsync();
        Ok(await As(Designer).Review.SubmitTrussAsync(truss.Id, Checker.UserId!, null));
        var members = truss.Members.OrderBy(m => m.Mark, StringComparer.Ordinal).ToList();
        foreach (var m in members.Skip(1))
        {
            Ok(await As(Checker).Review.ApproveAsync(m.Id, null));
        }

        var status = Ok(await As(Designer).Review.GetIssueStatusAsync(project.Id));
        var refused = await As(Lead).Review.IssueFinalSetAsync(project.Id);
        Assert.Equal((members.Count, members.Count - 1, false), (status.TotalMembers, status.ApprovedMembers, status.CanIssueFinal));
        Assert.Equal(ResultKind.Forbidden, refused.Kind);
        Assert.Contains($"{members.Count - 1} of {members.Count} members are approved; 1 are not", refused.Message, StringComparison.Ordinal);

        Ok(await As(Checker).Review.ApproveAsync(members[0].Id, null));
        Assert.True(Ok(await As(Designer).Review.GetIssueStatusAsync(project.Id)).CanIssueFinal);
        Assert.Equal(ResultKind.Forbidden, (await As(Designer).Review.IssueFinalSetAsync(project.Id)).Kind);
        Assert.Equal(ResultKind.Forbidden, (await As(Checker).Review.IssueFinalSetAsync(project.Id)).Kind);
        var issued = Ok(await As(Lead).Review.IssueFinalSetAsync(project.Id));

        Assert.Equal((members.Count, "A"), (issued.MemberCount, issued.Revision));
        var entry = Assert.Single(Ok(await As(Lead).Review.GetAuditAsync(project.Id, null)), a => a.Action == "ReviewFinalSetIssued");
        Assert.Equal(("Lerato Lead", issued.ApprovalSetFingerprint), (entry.UserName, entry.Fingerprint));
    }

    [Fact]
    public async Task Review_events_reach_subscribers_of_the_project_only_after_the_change_is_stored()
    {
        var (project, truss) = await ProjectWithTrussAsync();
        var other = Ok(await As(Lead).Projects.CreateAsync(new ProjectInput("Other hall", "Invented client", "T-119", "Nowhere (invented)", "A", "SANS 10162-1", "S355JR")));
        var hub = Services.GetRequiredService<IReviewEvents>();
        var mine = new List<(ReviewEvent Event, string StoredState)>();
        var others = new List<ReviewEvent>();
        var tc1 = truss.Members.First(m => m.Mark == "TC1");
        using var a = hub.Subscribe(project.Id, e =>
        {
            using var db = ContextAsync().GetAwaiter().GetResult();
            mine.Add((e, db.TrussMembers.AsNoTracking().Single(m => m.Id == e.MemberId).ReviewState));
        });
        using var b = hub.Subscribe(other.Id, others.Add);

        Ok(await As(Designer).Review.SubmitAsync(tc1.Id, Checker.UserId!, null));
        Ok(await As(Checker).Review.ApproveAsync(tc1.Id, null));
        var fresh = Ok(await As(Designer).Trusses.GetAsync(truss.Id)).Members.First(m => m.Mark == "TC1");
        Ok(await As(Designer).Design.UpdateMemberDesignAsync(truss.Id, tc1.Id, new MemberDesignInput(fresh.Overrides with { Kx = 0.85 }, fresh.Version)));

        Assert.Equal(
            [("ReviewSubmit", MemberReviewState.AwaitingCheck, "AwaitingCheck"), ("ReviewApprove", MemberReviewState.Approved, "Approved"),
             ("ReviewApprovalStale", MemberReviewState.ApprovalStale, "ApprovalStale")],
            mine.Select(x => (x.Event.Action, x.Event.To, x.StoredState)));
        Assert.Empty(others);
    }

    [Fact]
    public async Task Every_service_call_leaves_earlier_audit_entries_as_they_were_and_the_context_and_database_refuse_edits()
    {
        var (project, truss, tc1) = await SubmittedTc1Async();
        var before = Ok(await As(Lead).Review.GetAuditAsync(project.Id, null));

        Ok(await As(Checker).Review.ReturnAsync(tc1.Id, "Why K = 1?"));
        Ok(await As(Designer).Review.ResubmitAsync(tc1.Id, "Pinned ends"));
        Ok(await As(Checker).Review.ApproveAsync(tc1.Id, null));
        Ok(await As(Designer).Design.DesignTrussAsync(truss.Id));
        Ok(await As(Lead).Review.ExportAuditCsvAsync(project.Id));
        var a = Ok(await As(Designer).Trusses.GetAsync(truss.Id)).Actions;
        Ok(await As(Designer).Trusses.SaveActionsAsync(truss.Id, new ActionsInput(a.CoveringKPa, a.PurlinsAndServicesKPa, a.ImposedKPa + 0.2, a.WindCases, a.Version)));
        var after = Ok(await As(Lead).Review.GetAuditAsync(project.Id, null));

        Assert.Equal(before, after.Take(before.Count));
        Assert.True(after.Count > before.Count + 4);

        await using var db = await ContextAsync();
        var row = await db.AuditEntries.FirstAsync(e => e.ProjectId == project.Id && e.Action == "ReviewSubmit");
        row.Comment = "rewritten";
        await Assert.ThrowsAsync<InvalidOperationException>(() => db.SaveChangesAsync());
        db.ChangeTracker.Clear();
        await Assert.ThrowsAnyAsync<Exception>(() => db.AuditEntries.Where(e => e.Id == row.Id).ExecuteUpdateAsync(s => s.SetProperty(e => e.Comment, "rewritten")));
        await Assert.ThrowsAnyAsync<Exception>(() => db.AuditEntries.Where(e => e.Id == row.Id).ExecuteDeleteAsync());
        await using var check = await ContextAsync();
        Assert.Equal("TC1 ready", (await check.AuditEntries.SingleAsync(e => e.Id == row.Id)).Comment);
    }

    [Fact]
    public async Task The_audit_csv_has_a_header_and_one_record_per_entry()
    {
        var (project, _, tc1) = await SubmittedTc1Async();
        Ok(await As(Checker).Review.ReturnAsync(tc1.Id, "Two lines,\nwith \"quotes\""));

        var csv = Encoding.UTF8.GetString(Ok(await As(Designer).Review.ExportAuditCsvAsync(project.Id)));
        var entries = Ok(await As(Designer).Review.GetAuditAsync(project.Id, null));

        Assert.StartsWith("Id,UtcTime,UserId,UserName,EntityType,EntityId,Action,Field,OldValue,NewValue,Comment,Fingerprint\r\n", csv, StringComparison.Ordinal);
        Assert.Equal(entries.Count + 1, csv.Split("\r\n", StringSplitOptions.RemoveEmptyEntries).Length);
        Assert.Contains(",ReviewReturn,ReviewState,AwaitingCheck,Returned,\"Two lines,\nwith \"\"quotes\"\"\",", csv, StringComparison.Ordinal);
    }
}

public abstract partial class ServiceBehaviourTests
{
    [Fact]
    public async Task Eligible_checkers_are_checkers_and_leads_of_the_project_never_the_designer_of_record()
    {
        var (project, _, tc1) = await SubmittedTc1Async();

        // A submission by the designer: the checker and the lead, never the designer themself.
        var forDesigner = Ok(await As(Designer).Review.ListEligibleCheckersAsync(project.Id, null));
        Assert.Equal(["Chris Checker", "Lerato Lead"], forDesigner.Select(c => c.DisplayName));
        Assert.Equal([Roles.Checker, Roles.ProjectLead], forDesigner.Select(c => c.ProjectRole));

        // A submission by the lead leaves the lead out (they would be the designer of record).
        Assert.Equal(["Chris Checker"], Ok(await As(Lead).Review.ListEligibleCheckersAsync(project.Id, null)).Select(c => c.DisplayName));

        // Reassigning TC1 (designed by the designer): the lead may name themself.
        Assert.Equal(["Chris Checker", "Lerato Lead"], Ok(await As(Lead).Review.ListEligibleCheckersAsync(project.Id, tc1.Id)).Select(c => c.DisplayName));

        Assert.Equal(ResultKind.NotFound, (await As(Outsider).Review.ListEligibleCheckersAsync(project.Id, null)).Kind);
        Assert.Equal(ResultKind.NotFound, (await As(Lead).Review.ListEligibleCheckersAsync(project.Id, Guid.NewGuid())).Kind);
    }
}
