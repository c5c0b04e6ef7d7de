using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Configurations;

/// <summary>Maps <see cref="ProjectMembership"/>: one membership per user and project.</summary>
public sealed class ProjectMembershipConfiguration : IEntityTypeConfiguration<ProjectMembership>
{
    public void Configure(EntityTypeBuilder<ProjectMembership> builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.ToTable("ProjectMemberships");
        builder.ConfigureTracked();
        builder.Property(m => m.UserId).HasMaxLength(TrackedEntityConfiguration.UserIdLength).IsRequired();
        builder.Property(m => m.Role).HasMaxLength(50).IsRequired();
        builder.HasOne(m => m.Project).WithMany(p => p.Memberships).HasForeignKey(m => m.ProjectId).OnDelete(DeleteBehavior.Cascade);
        builder.HasOne(m => m.User).WithMany().HasForeignKey(m => m.UserId).OnDelete(DeleteBehavior.Cascade);
        builder.HasIndex(m => new { m.ProjectId, m.UserId }).IsUnique();
    }
}
