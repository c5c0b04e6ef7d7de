using TrussWeb.Data;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Authorization;

/// <summary>
/// The one table of who may call what: every public method of every service interface, by
/// "Interface.Method". A method missing here is refused (and the authorization test fails).
/// </summary>
public static class PermissionTable
{
    public static IReadOnlyDictionary<string, AccessLevel> Methods { get; } = new Dictionary<string, AccessLevel>(StringComparer.Ordinal)
    {
        [Key<IProjectService>(nameof(IProjectService.ListMyProjectsAsync))] = AccessLevel.SignedIn,
        [Key<IProjectService>(nameof(IProjectService.GetAsync))] = AccessLevel.ProjectRead,
        [Key<IProjectService>(nameof(IProjectService.CreateAsync))] = AccessLevel.CreateProject,
        [Key<IProjectService>(nameof(IProjectService.UpdateSettingsAsync))] = AccessLevel.ProjectManage,
        [Key<IProjectService>(nameof(IProjectService.GetMembersAsync))] = AccessLevel.ProjectRead,
        [Key<IProjectService>(nameof(IProjectService.ListCandidateMembersAsync))] = AccessLevel.ProjectManage,
        [Key<IProjectService>(nameof(IProjectService.AddMemberAsync))] = AccessLevel.ProjectManage,
        [Key<IProjectService>(nameof(IProjectService.RemoveMemberAsync))] = AccessLevel.ProjectManage,

        [Key<ITrussService>(nameof(ITrussService.CreateFromGeneratorAsync))] = AccessLevel.ProjectEdit,
        [Key<ITrussService>(nameof(ITrussService.GetAsync))] = AccessLevel.ProjectRead,
        [Key<ITrussService>(nameof(ITrussService.SaveSettingsAsync))] = AccessLevel.ProjectEdit,
        [Key<ITrussService>(nameof(ITrussService.SaveNodesAsync))] = AccessLevel.ProjectEdit,
        [Key<ITrussService>(nameof(ITrussService.SaveMembersAsync))] = AccessLevel.ProjectEdit,
        [Key<ITrussService>(nameof(ITrussService.SaveSupportsAsync))] = AccessLevel.ProjectEdit,
        [Key<ITrussService>(nameof(ITrussService.SaveRestraintsAsync))] = AccessLevel.ProjectEdit,
        [Key<ITrussService>(nameof(ITrussService.SaveGroupsAsync))] = AccessLevel.ProjectEdit,
        [Key<ITrussService>(nameof(ITrussService.SaveActionsAsync))] = AccessLevel.ProjectEdit,
        [Key<ITrussService>(nameof(ITrussService.SaveCombinationsAsync))] = AccessLevel.ProjectEdit,
        [Key<ITrussService>(nameof(ITrussService.ResetCombinationsAsync))] = AccessLevel.ProjectEdit,

        [Key<IDesignService>(nameof(IDesignService.DesignTrussAsync))] = AccessLevel.ProjectEdit,
        [Key<IDesignService>(nameof(IDesignService.GetTrussDesignAsync))] = AccessLevel.ProjectRead,
        [Key<IDesignService>(nameof(IDesignService.GetMemberDesignAsync))] = AccessLevel.ProjectRead,
        [Key<IDesignService>(nameof(IDesignService.ProposeSizingAsync))] = AccessLevel.ProjectEdit,
        [Key<IDesignService>(nameof(IDesignService.AcceptSizingAsync))] = AccessLevel.ProjectEdit,
        [Key<IDesignService>(nameof(IDesignService.DiscardSizingAsync))] = AccessLevel.ProjectEdit,
        [Key<IDesignService>(nameof(IDesignService.UpdateMemberDesignAsync))] = AccessLevel.ProjectEdit,

        [Key<ICatalogueService>(nameof(ICatalogueService.ListSectionsAsync))] = AccessLevel.SignedIn,
        [Key<ICatalogueService>(nameof(ICatalogueService.GetSectionAsync))] = AccessLevel.SignedIn,
        [Key<ICatalogueService>(nameof(ICatalogueService.ListGradesAsync))] = AccessLevel.SignedIn,
        [Key<ICatalogueService>(nameof(ICatalogueService.ListStandardsAsync))] = AccessLevel.SignedIn,
        [Key<ICatalogueService>(nameof(ICatalogueService.ImportCatalogueAsync))] = AccessLevel.Administrator,
        [Key<ICatalogueService>(nameof(ICatalogueService.SaveGradeAsync))] = AccessLevel.Administrator,

        [Key<IUserAdminService>(nameof(IUserAdminService.ListUsersAsync))] = AccessLevel.Administrator,
        [Key<IUserAdminService>(nameof(IUserAdminService.CreateUserAsync))] = AccessLevel.Administrator,
        [Key<IUserAdminService>(nameof(IUserAdminService.SetRolesAsync))] = AccessLevel.Administrator,
        [Key<IUserAdminService>(nameof(IUserAdminService.ResetPasswordAsync))] = AccessLevel.Administrator,
        [Key<IUserAdminService>(nameof(IUserAdminService.SetLockedAsync))] = AccessLevel.Administrator,
        [Key<IUserAdminService>(nameof(IUserAdminService.GetSystemInfoAsync))] = AccessLevel.Administrator,

        [Key<IReviewService>(nameof(IReviewService.SubmitAsync))] = AccessLevel.ProjectEdit,
        [Key<IReviewService>(nameof(IReviewService.SubmitTrussAsync))] = AccessLevel.ProjectEdit,
        [Key<IReviewService>(nameof(IReviewService.ResubmitAsync))] = AccessLevel.ProjectEdit,
        [Key<IReviewService>(nameof(IReviewService.WithdrawAsync))] = AccessLevel.ProjectEdit,
        [Key<IReviewService>(nameof(IReviewService.ApproveAsync))] = AccessLevel.ProjectCheck,
        [Key<IReviewService>(nameof(IReviewService.ReturnAsync))] = AccessLevel.ProjectCheck,
        [Key<IReviewService>(nameof(IReviewService.ReassignCheckerAsync))] = AccessLevel.ProjectManage,
        [Key<IReviewService>(nameof(IReviewService.ListEligibleCheckersAsync))] = AccessLevel.ProjectRead,
        [Key<IReviewService>(nameof(IReviewService.GetMemberReviewAsync))] = AccessLevel.ProjectRead,
        [Key<IReviewService>(nameof(IReviewService.GetTrussReviewAsync))] = AccessLevel.ProjectRead,
        [Key<IReviewService>(nameof(IReviewService.GetChangesSinceApprovalAsync))] = AccessLevel.ProjectRead,
        [Key<IReviewService>(nameof(IReviewService.ListMyQueueAsync))] = AccessLevel.SignedIn,
        [Key<IReviewService>(nameof(IReviewService.GetRollUpAsync))] = AccessLevel.ProjectRead,
        [Key<IReviewService>(nameof(IReviewService.GetAuditAsync))] = AccessLevel.ProjectRead,
        [Key<IReviewService>(nameof(IReviewService.ExportAuditCsvAsync))] = AccessLevel.ProjectRead,
        [Key<IReviewService>(nameof(IReviewService.GetIssueStatusAsync))] = AccessLevel.ProjectRead,
        [Key<IReviewService>(nameof(IReviewService.IssueFinalSetAsync))] = AccessLevel.ProjectManage,
        [Key<IExportService>(nameof(IExportService.GetReadinessAsync))] = AccessLevel.ProjectRead,
        [Key<IExportService>(nameof(IExportService.StartAsync))] = AccessLevel.ProjectRead,
        [Key<IExportService>(nameof(IExportService.StartFinalSetAsync))] = AccessLevel.ProjectManage,
        [Key<IExportService>(nameof(IExportService.GetJobAsync))] = AccessLevel.ProjectRead,
        [Key<IExportService>(nameof(IExportService.ListJobsAsync))] = AccessLevel.ProjectRead,
        [Key<IExportService>(nameof(IExportService.OpenFileAsync))] = AccessLevel.ProjectRead,
        [Key<IExportService>(nameof(IExportService.CancelAsync))] = AccessLevel.ProjectRead,

        [Key<IApiTokenService>(nameof(IApiTokenService.ListMyTokensAsync))] = AccessLevel.SignedIn,
        [Key<IApiTokenService>(nameof(IApiTokenService.CreateAsync))] = AccessLevel.SignedIn,
        [Key<IApiTokenService>(nameof(IApiTokenService.RevokeAsync))] = AccessLevel.SignedIn,
    };

    public static string Key<TService>(string method) => $"{typeof(TService).Name}.{method}";

    /// <summary>
    /// Whether a caller with these global roles and this project role (null: not a member, or the
    /// operation is not about a project) may run the operation.
    /// </summary>
    public static bool Allows(AccessLevel level, IReadOnlySet<string> globalRoles, string? projectRole)
    {
        ArgumentNullException.ThrowIfNull(globalRoles);
        if (globalRoles.Contains(Roles.Administrator))
        {
            return true;
        }

        return level switch
        {
            AccessLevel.SignedIn => true,
            AccessLevel.CreateProject => globalRoles.Contains(Roles.ProjectLead),
            AccessLevel.ProjectRead => projectRole is not null,
            AccessLevel.ProjectEdit => projectRole is Roles.Designer or Roles.ProjectLead,
            AccessLevel.ProjectCheck => projectRole is Roles.Checker or Roles.ProjectLead,
            AccessLevel.ProjectManage => projectRole is Roles.ProjectLead,
            _ => false,
        };
    }
}
