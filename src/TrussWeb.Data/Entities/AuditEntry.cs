namespace TrussWeb.Data.Entities;

/// <summary>
/// One append-only audit record. The context refuses to update or delete audit entries
/// (<see cref="TrussWebDbContext"/> throws on save), and the migrations add database triggers that
/// refuse it too.
/// </summary>
public class AuditEntry
{
    public long Id { get; set; }

    public DateTime UtcTime { get; set; }

    /// <summary>Acting user; null for the system.</summary>
    public string? UserId { get; set; }

    public Guid? ProjectId { get; set; }

    /// <summary>Entity type name, e.g. "TrussMember".</summary>
    public string EntityType { get; set; } = string.Empty;

    /// <summary>Key of the entity as text.</summary>
    public string EntityId { get; set; } = string.Empty;

    /// <summary>What happened, e.g. "Created", "Updated", "Approved".</summary>
    public string Action { get; set; } = string.Empty;

    public string? Field { get; set; }

    public string? OldValue { get; set; }

    public string? NewValue { get; set; }

    /// <summary>Free text given with the action, e.g. a checker's return comment or a designer's answer.</summary>
    public string? Comment { get; set; }

    /// <summary>Fingerprint involved (e.g. of an approved snapshot), 64 hex characters.</summary>
    public string? Fingerprint { get; set; }
}
