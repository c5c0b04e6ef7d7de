using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Configurations;

/// <summary>Maps <see cref="MemberGroup"/>: names unique per truss.</summary>
public sealed class MemberGroupConfiguration : IEntityTypeConfiguration<MemberGroup>
{
    public void Configure(EntityTypeBuilder<MemberGroup> builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.ToTable("MemberGroups");
        builder.ConfigureTracked();
        builder.Property(g => g.Name).HasMaxLength(TrackedEntityConfiguration.NameLength).IsRequired();
        builder.Property(g => g.Role).HasMaxLength(50).IsRequired();
        builder.Property(g => g.AllowedSectionsJson).IsRequired();
        builder.Property(g => g.GradeName).HasMaxLength(TrackedEntityConfiguration.CodeLength);
        builder.Property(g => g.SectionDesignation).HasMaxLength(TrackedEntityConfiguration.CodeLength);
        builder.Property(g => g.BackToBackOrientation).HasMaxLength(50);
        builder.HasOne(g => g.Truss).WithMany(t => t.Groups).HasForeignKey(g => g.TrussId).OnDelete(DeleteBehavior.Cascade);
        builder.HasIndex(g => new { g.TrussId, g.Name }).IsUnique();
    }
}
