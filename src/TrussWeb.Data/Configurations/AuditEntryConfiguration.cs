using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Configurations;

/// <summary>Maps <see cref="AuditEntry"/>: no foreign keys, so the history outlives what it describes.</summary>
public sealed class AuditEntryConfiguration : IEntityTypeConfiguration<AuditEntry>
{
    /// <summary>Table name; the migrations' append-only triggers refer to it.</summary>
    public const string TableName = "AuditEntries";

    public void Configure(EntityTypeBuilder<AuditEntry> builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.ToTable(TableName);
        builder.HasKey(a => a.Id);
        builder.Property(a => a.Id).ValueGeneratedOnAdd();
        builder.Property(a => a.UserId).HasMaxLength(TrackedEntityConfiguration.UserIdLength);
        builder.Property(a => a.EntityType).HasMaxLength(TrackedEntityConfiguration.CodeLength).IsRequired();
        builder.Property(a => a.EntityId).HasMaxLength(TrackedEntityConfiguration.CodeLength).IsRequired();
        builder.Property(a => a.Action).HasMaxLength(50).IsRequired();
        builder.Property(a => a.Field).HasMaxLength(TrackedEntityConfiguration.NameLength);
        builder.Property(a => a.Fingerprint).HasMaxLength(DesignSnapshot.FingerprintLength).IsFixedLength();
        builder.HasIndex(a => new { a.ProjectId, a.UtcTime });
        builder.HasIndex(a => new { a.EntityType, a.EntityId });
    }
}
