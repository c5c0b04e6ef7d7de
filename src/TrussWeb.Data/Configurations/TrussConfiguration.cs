using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Configurations;

/// <summary>Maps <see cref="Truss"/>: names unique per project; children are deleted with it.</summary>
public sealed class TrussConfiguration : IEntityTypeConfiguration<Truss>
{
    public void Configure(EntityTypeBuilder<Truss> builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.ToTable("Trusses");
        builder.ConfigureTracked();
        builder.Property(t => t.Name).HasMaxLength(TrackedEntityConfiguration.NameLength).IsRequired();
        builder.Property(t => t.Kind).HasMaxLength(TrackedEntityConfiguration.CodeLength).IsRequired();
        builder.Property(t => t.GeneratorParametersJson).IsRequired();
        builder.HasOne(t => t.Project).WithMany(p => p.Trusses).HasForeignKey(t => t.ProjectId).OnDelete(DeleteBehavior.Cascade);
        builder.HasIndex(t => new { t.ProjectId, t.Name }).IsUnique();
    }
}
