using Microsoft.EntityFrameworkCore;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Common;

/// <summary>
/// Adds audit entries for the input changes tracked in a context (one entry per changed field) and for
/// actions (design runs, sizing). Call before SaveChanges so they commit with the change.
/// </summary>
internal static class AuditWriter
{
    private static readonly HashSet<string> Bookkeeping = ["Version", "CreatedUtc", "CreatedBy", "UpdatedUtc", "UpdatedBy", "Id"];

    /// <summary>Review columns of a member: ReviewService and <c>ReviewStaleness</c> write their own entries (state, comment, fingerprint).</summary>
    private static readonly HashSet<string> ReviewColumns =
    [
        nameof(TrussMember.ReviewState), nameof(TrussMember.SubmittedBy), nameof(TrussMember.SubmittedUtc), nameof(TrussMember.CheckerId),
        nameof(TrussMember.ReviewedUtc), nameof(TrussMember.ReviewComment), nameof(TrussMember.ApprovedFingerprint),
        nameof(TrussMember.DesignerOfRecordId), nameof(TrussMember.ApprovedInputsJson), nameof(TrussMember.ApprovedResultJson),
    ];

    /// <summary>One entry per changed field of every added, modified or deleted tracked row (audit rows and snapshots excluded).</summary>
    public static void AddChanges(TrussWebDbContext db, ICallerContext caller, TimeProvider clock, Guid? projectId, string? fingerprint = null)
    {
        var now = clock.GetUtcNow().UtcDateTime;
        var entries = db.ChangeTracker.Entries<TrackedEntity>()
            .Where(e => e.State is EntityState.Added or EntityState.Modified or EntityState.Deleted && e.Entity is not DesignSnapshot)
            .ToList();
        foreach (var entry in entries)
        {
            var type = entry.Metadata.ClrType.Name;
            var key = entry.Entity.Id.ToString();
            switch (entry.State)
            {
                case EntityState.Added:
                    db.AuditEntries.Add(New(caller, now, projectId, type, key, "Created", null, null, Describe(entry), fingerprint));
                    break;
                case EntityState.Deleted:
                    db.AuditEntries.Add(New(caller, now, projectId, type, key, "Deleted", null, Describe(entry), null, fingerprint));
                    break;
                default:
                    foreach (var p in entry.Properties.Where(p => p.IsModified && !Bookkeeping.Contains(p.Metadata.Name)
                                 && !(entry.Entity is TrussMember && ReviewColumns.Contains(p.Metadata.Name))))
                    {
                        var old = Conflicts.Text(p.OriginalValue);
                        var @new = Conflicts.Text(p.CurrentValue);
                        if (old != @new)
                        {
                            db.AuditEntries.Add(New(caller, now, projectId, type, key, "Updated", p.Metadata.Name, old, @new, fingerprint));
                        }
                    }

                    break;
            }
        }
    }

    public static void AddAction(TrussWebDbContext db, ICallerContext caller, TimeProvider clock, Guid? projectId, string entityType, string entityId,
        string action, string? field = null, string? oldValue = null, string? newValue = null, string? fingerprint = null, string? comment = null)
    {
        var entry = New(caller, clock.GetUtcNow().UtcDateTime, projectId, entityType, entityId, action, field, oldValue, newValue, fingerprint);
        entry.Comment = Clip(comment);
        db.AuditEntries.Add(entry);
    }

    private static AuditEntry New(ICallerContext caller, DateTime now, Guid? projectId, string type, string key, string action, string? field,
        string? oldValue, string? newValue, string? fingerprint) => new()
    {
        UtcTime = now,
        UserId = caller.UserId,
        ProjectId = projectId,
        EntityType = type,
        EntityId = key,
        Action = action,
        Field = field,
        OldValue = Clip(oldValue),
        NewValue = Clip(newValue),
        Fingerprint = fingerprint,
    };

    private static string? Describe(Microsoft.EntityFrameworkCore.ChangeTracking.EntityEntry entry)
    {
        foreach (var name in new[] { "Mark", "Name", "Label", "Designation" })
        {
            if (entry.Metadata.FindProperty(name) is not null && entry.Property(name).CurrentValue is string s)
            {
                return s;
            }
        }

        return null;
    }

    private static string? Clip(string? value) => value is { Length: > 4000 } ? value[..4000] : value;
}
