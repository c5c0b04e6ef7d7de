namespace TrussWeb.Data;

/// <summary>Names of the application roles (Identity roles and project membership roles).</summary>
public static class Roles
{
    /// <summary>Enters projects, trusses and members and runs designs.</summary>
    public const string Designer = "Designer";

    /// <summary>Approves or returns members.</summary>
    public const string Checker = "Checker";

    /// <summary>Owns a project and exports its documents.</summary>
    public const string ProjectLead = "ProjectLead";

    /// <summary>Manages users, catalogues and settings.</summary>
    public const string Administrator = "Administrator";

    /// <summary>Every role, in the order above.</summary>
    public static IReadOnlyList<string> All { get; } = [Designer, Checker, ProjectLead, Administrator];
}
