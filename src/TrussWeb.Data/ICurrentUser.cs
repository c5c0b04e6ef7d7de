namespace TrussWeb.Data;

/// <summary>
/// Who is saving: read by the audit-stamp interceptor for <c>CreatedBy</c>/<c>UpdatedBy</c>. The web
/// host registers a scoped implementation backed by the signed-in user; the default is
/// <see cref="SystemCurrentUser"/>.
/// </summary>
public interface ICurrentUser
{
    /// <summary>Identity user id of the acting user; null for the system (start-up, seeding, CLI).</summary>
    string? UserId { get; }
}
