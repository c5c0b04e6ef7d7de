namespace TrussWeb.Services.Contracts;

/// <summary>The capacity in which a user acts on a review: their role in the project, or Administrator.</summary>
public enum ReviewActor
{
    Designer,
    Checker,
    ProjectLead,
    Administrator,
}
