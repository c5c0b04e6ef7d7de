using System.Reflection;
using TrussWeb.Data;
using TrussWeb.Services.Authorization;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Tests;

/// <summary>
/// The permission table covers every method of every service interface, and grants exactly the rights
/// of docs/dev/authorization.md. A new interface method without an entry fails here.
/// </summary>
public sealed class AuthorizationTableTests
{
    private const string Admin = Roles.Administrator;
    private const string Lead = "lead of the project";
    private const string Designer = "designer in the project";
    private const string Checker = "checker in the project";
    private const string Outsider = "not a member";

    /// <summary>Who may call each method (Admin = global administrator; the others by project role, with global ProjectLead for creating).</summary>
    private static readonly Dictionary<string, string[]> Expected = new(StringComparer.Ordinal)
    {
        ["IProjectService.ListMyProjectsAsync"] = [Admin, Lead, Designer, Checker, Outsider],
        ["IProjectService.GetAsync"] = [Admin, Lead, Designer, Checker],
        ["IProjectService.CreateAsync"] = [Admin, Lead],
        ["IProjectService.UpdateSettingsAsync"] = [Admin, Lead],
        ["IProjectService.GetMembersAsync"] = [Admin, Lead, Designer, Checker],
        ["IProjectService.ListCandidateMembersAsync"] = [Admin, Lead],
        ["IProjectService.AddMemberAsync"] = [Admin, Lead],
        ["IProjectService.RemoveMemberAsync"] = [Admin, Lead],
        ["ITrussService.CreateFromGeneratorAsync"] = [Admin, Lead, Designer],
        ["ITrussService.GetAsync"] = [Admin, Lead, Designer, Checker],
        ["ITrussService.SaveSettingsAsync"] = [Admin, Lead, Designer],
        ["ITrussService.SaveNodesAsync"] = [Admin, Lead, Designer],
        ["ITrussService.SaveMembersAsync"] = [Admin, Lead, Designer],
        ["ITrussService.SaveSupportsAsync"] = [Admin, Lead, Designer],
        ["ITrussService.SaveRestraintsAsync"] = [Admin, Lead, Designer],
        ["ITrussService.SaveGroupsAsync"] = [Admin, Lead, Designer],
        ["ITrussService.SaveActionsAsync"] = [Admin, Lead, Designer],
        ["ITrussService.SaveCombinationsAsync"] = [Admin, Lead, Designer],
        ["ITrussService.ResetCombinationsAsync"] = [Admin, Lead, Designer],
        ["IDesignService.DesignTrussAsync"] = [Admin, Lead, Designer],
        ["IDesignService.GetTrussDesignAsync"] = [Admin, Lead, Designer, Checker],
        ["IDesignService.GetMemberDesignAsync"] = [Admin, Lead, Designer, Checker],
        ["IDesignService.ProposeSizingAsync"] = [Admin, Lead, Designer],
        ["IDesignService.AcceptSizingAsync"] = [Admin, Lead, Designer],
        ["IDesignService.DiscardSizingAsync"] = [Admin, Lead, Designer],
        ["IDesignService.UpdateMemberDesignAsync"] = [Admin, Lead, Designer],
        ["ICatalogueService.ListSectionsAsync"] = [Admin, Lead, Designer, Checker, Outsider],
        ["ICatalogueService.GetSectionAsync"] = [Admin, Lead, Designer, Checker, Outsider],
        ["ICatalogueService.ListGradesAsync"] = [Admin, Lead, Designer, Checker, Outsider],
        ["ICatalogueService.ListStandardsAsync"] = [Admin, Lead, Designer, Checker, Outsider],
        ["ICatalogueService.ImportCatalogueAsync"] = [Admin],
        ["ICatalogueService.SaveGradeAsync"] = [Admin],
        ["IUserAdminService.ListUsersAsync"] = [Admin],
        ["IUserAdminService.CreateUserAsync"] = [Admin],
        ["IUserAdminService.SetRolesAsync"] = [Admin],
        ["IUserAdminService.ResetPasswordAsync"] = [Admin],
        ["IUserAdminService.SetLockedAsync"] = [Admin],
        ["IUserAdminService.GetSystemInfoAsync"] = [Admin],
        ["IReviewService.SubmitAsync"] = [Admin, Lead, Designer],
        ["IReviewService.SubmitTrussAsync"] = [Admin, Lead, Designer],
        ["IReviewService.ResubmitAsync"] = [Admin, Lead, Designer],
        ["IReviewService.WithdrawAsync"] = [Admin, Lead, Designer],
        ["IReviewService.ApproveAsync"] = [Admin, Lead, Checker],
        ["IReviewService.ReturnAsync"] = [Admin, Lead, Checker],
        ["IReviewService.ReassignCheckerAsync"] = [Admin, Lead],
        ["IReviewService.ListEligibleCheckersAsync"] = [Admin, Lead, Designer, Checker],
        ["IReviewService.GetMemberReviewAsync"] = [Admin, Lead, Designer, Checker],
        ["IReviewService.GetTrussReviewAsync"] = [Admin, Lead, Designer, Checker],
        ["IReviewService.GetChangesSinceApprovalAsync"] = [Admin, Lead, Designer, Checker],
        ["IReviewService.ListMyQueueAsync"] = [Admin, Lead, Designer, Checker, Outsider],
        ["IReviewService.GetRollUpAsync"] = [Admin, Lead, Designer, Checker],
        ["IReviewService.GetAuditAsync"] = [Admin, Lead, Designer, Checker],
        ["IReviewService.ExportAuditCsvAsync"] = [Admin, Lead, Designer, Checker],
        ["IReviewService.GetIssueStatusAsync"] = [Admin, Lead, Designer, Checker],
        ["IReviewService.IssueFinalSetAsync"] = [Admin, Lead],
        ["IExportService.GetReadinessAsync"] = [Admin, Lead, Designer, Checker],
        ["IExportService.StartAsync"] = [Admin, Lead, Designer, Checker],
        ["IExportService.StartFinalSetAsync"] = [Admin, Lead],
        ["IExportService.GetJobAsync"] = [Admin, Lead, Designer, Checker],
        ["IExportService.ListJobsAsync"] = [Admin, Lead, Designer, Checker],
        ["IExportService.OpenFileAsync"] = [Admin, Lead, Designer, Checker],
        ["IExportService.CancelAsync"] = [Admin, Lead, Designer, Checker],
        ["IApiTokenService.ListMyTokensAsync"] = [Admin, Lead, Designer, Checker, Outsider],
        ["IApiTokenService.CreateAsync"] = [Admin, Lead, Designer, Checker, Outsider],
        ["IApiTokenService.RevokeAsync"] = [Admin, Lead, Designer, Checker, Outsider],
    };

    public static IEnumerable<string> InterfaceMethods() =>
        typeof(IProjectService).Assembly.GetTypes()
            .Where(t => t.IsInterface && t.Namespace == typeof(IProjectService).Namespace && t.Name.EndsWith("Service", StringComparison.Ordinal))
            .SelectMany(t => t.GetMethods(BindingFlags.Public | BindingFlags.Instance).Select(m => $"{t.Name}.{m.Name}"))
            .Order(StringComparer.Ordinal);

    [Fact]
    public void Every_service_interface_method_has_a_permission_entry_and_an_expected_row()
    {
        var methods = InterfaceMethods().ToList();
        Assert.Equal(8, methods.Select(m => m.Split('.')[0]).Distinct().Count());
        Assert.Empty(methods.Except(PermissionTable.Methods.Keys));
        Assert.Empty(methods.Except(Expected.Keys));
        Assert.Empty(PermissionTable.Methods.Keys.Except(methods));
    }

    [Fact]
    public void The_table_grants_exactly_the_documented_roles()
    {
        foreach (var method in InterfaceMethods())
        {
            var level = PermissionTable.Methods[method];
            foreach (var who in new[] { Admin, Lead, Designer, Checker, Outsider })
            {
                var (global, projectRole) = who switch
                {
                    Admin => (new HashSet<string> { Roles.Administrator }, (string?)null),
                    Lead => (new HashSet<string> { Roles.ProjectLead }, Roles.ProjectLead),
                    Designer => (new HashSet<string> { Roles.Designer }, Roles.Designer),
                    Checker => (new HashSet<string> { Roles.Checker }, Roles.Checker),
                    _ => (new HashSet<string> { Roles.Designer }, null),
                };
                Assert.True(Expected[method].Contains(who) == PermissionTable.Allows(level, global, projectRole), $"{method} for {who}");
            }
        }
    }

    [Fact]
    public void A_caller_who_is_not_signed_in_is_refused_even_for_signed_in_reads()
    {
        var authorizer = new Authorizer(new TrussWeb.Services.Hosting.AnonymousCaller());
        var refusal = authorizer.Check<Done>(PermissionTable.Key<ICatalogueService>(nameof(ICatalogueService.ListGradesAsync)));
        Assert.Equal(ResultKind.Forbidden, refusal!.Kind);
        var unknown = new Authorizer(new TrussWeb.Services.Hosting.FixedCaller("u1", "U", Roles.Designer)).Check<Done>("IProjectService.NoSuchMethod");
        Assert.Equal(ResultKind.Forbidden, unknown!.Kind);
    }
}
