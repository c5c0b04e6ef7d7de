namespace TrussWeb.Data.Entities;

/// <summary>
/// A row with creation and last-update stamps. The <c>AuditStampInterceptor</c> fills them from the
/// injected <see cref="TimeProvider"/> and <see cref="ICurrentUser"/>; callers never set them.
/// </summary>
public interface IAuditable
{
    /// <summary>When the row was inserted (UTC).</summary>
    DateTime CreatedUtc { get; set; }

    /// <summary>User id that inserted the row; null for the system (start-up, seeding).</summary>
    string? CreatedBy { get; set; }

    /// <summary>When the row was last updated (UTC); equals <see cref="CreatedUtc"/> on insert.</summary>
    DateTime UpdatedUtc { get; set; }

    /// <summary>User id that last updated the row; null for the system.</summary>
    string? UpdatedBy { get; set; }
}
