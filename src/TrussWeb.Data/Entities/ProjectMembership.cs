namespace TrussWeb.Data.Entities;

/// <summary>A user's role in one project (one of <see cref="Roles"/>).</summary>
public class ProjectMembership : TrackedEntity
{
    public Guid ProjectId { get; set; }

    public Project? Project { get; set; }

    public string UserId { get; set; } = string.Empty;

    public AppUser? User { get; set; }

    /// <summary>Role in this project, one of the <see cref="Roles"/> constants.</summary>
    public string Role { get; set; } = string.Empty;
}
