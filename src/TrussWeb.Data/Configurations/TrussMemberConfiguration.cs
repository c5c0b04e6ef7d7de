using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Configurations;

/// <summary>
/// Maps <see cref="TrussMember"/>: marks unique per truss. The member goes with its truss; its nodes and
/// group cannot be deleted while it refers to them (NO ACTION, checked at the end of the statement, so a
/// truss delete that removes all of them together succeeds).
/// </summary>
public sealed class TrussMemberConfiguration : IEntityTypeConfiguration<TrussMember>
{
    public void Configure(EntityTypeBuilder<TrussMember> builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.ToTable("TrussMembers");
        builder.ConfigureTracked();
        builder.Property(m => m.Mark).HasMaxLength(TrackedEntityConfiguration.CodeLength).IsRequired();
        builder.Property(m => m.SectionDesignationOverride).HasMaxLength(TrackedEntityConfiguration.CodeLength);
        builder.Property(m => m.ReviewState).HasMaxLength(20).IsRequired();
        builder.Property(m => m.SubmittedBy).HasMaxLength(TrackedEntityConfiguration.UserIdLength);
        builder.Property(m => m.CheckerId).HasMaxLength(TrackedEntityConfiguration.UserIdLength);
        builder.Property(m => m.DesignerOfRecordId).HasMaxLength(TrackedEntityConfiguration.UserIdLength);
        builder.Property(m => m.ApprovedFingerprint).HasMaxLength(DesignSnapshot.FingerprintLength).IsFixedLength();
        builder.HasOne(m => m.Truss).WithMany(t => t.Members).HasForeignKey(m => m.TrussId).OnDelete(DeleteBehavior.Cascade);
        builder.HasOne(m => m.StartNode).WithMany().HasForeignKey(m => m.StartNodeId).OnDelete(DeleteBehavior.NoAction);
        builder.HasOne(m => m.EndNode).WithMany().HasForeignKey(m => m.EndNodeId).OnDelete(DeleteBehavior.NoAction);
        builder.HasOne(m => m.Group).WithMany(g => g.Members).HasForeignKey(m => m.GroupId).OnDelete(DeleteBehavior.NoAction);
        builder.HasIndex(m => new { m.TrussId, m.Mark }).IsUnique();
    }
}
