using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Configurations;

/// <summary>Maps <see cref="Project"/>.</summary>
public sealed class ProjectConfiguration : IEntityTypeConfiguration<Project>
{
    public void Configure(EntityTypeBuilder<Project> builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.ToTable("Projects");
        builder.ConfigureTracked();
        builder.Property(p => p.Name).HasMaxLength(TrackedEntityConfiguration.NameLength).IsRequired();
        builder.Property(p => p.Client).HasMaxLength(TrackedEntityConfiguration.NameLength);
        builder.Property(p => p.Reference).HasMaxLength(TrackedEntityConfiguration.CodeLength);
        builder.Property(p => p.Location).HasMaxLength(TrackedEntityConfiguration.NameLength);
        builder.Property(p => p.Revision).HasMaxLength(20).IsRequired();
        builder.Property(p => p.StandardCode).HasMaxLength(TrackedEntityConfiguration.CodeLength).IsRequired();
        builder.Property(p => p.DefaultGradeName).HasMaxLength(TrackedEntityConfiguration.CodeLength);
        builder.Property(p => p.Units).HasMaxLength(50).IsRequired();
        builder.HasIndex(p => p.Reference);
    }
}
