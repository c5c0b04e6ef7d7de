namespace TrussWeb.Services.Authorization;

/// <summary>What a service operation needs from the caller. See docs/dev/authorization.md.</summary>
public enum AccessLevel
{
    /// <summary>Any signed-in user (reads of shared reference data, the caller's own project list).</summary>
    SignedIn,

    /// <summary>Global role ProjectLead or Administrator.</summary>
    CreateProject,

    /// <summary>Any member of the project (any project role), or an Administrator.</summary>
    ProjectRead,

    /// <summary>Project role Designer or ProjectLead, or an Administrator.</summary>
    ProjectEdit,

    /// <summary>Project role Checker or ProjectLead, or an Administrator (review decisions).</summary>
    ProjectCheck,

    /// <summary>Project role ProjectLead, or an Administrator.</summary>
    ProjectManage,

    /// <summary>Global role Administrator only.</summary>
    Administrator,
}
