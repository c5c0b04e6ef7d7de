using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Configurations;

/// <summary>Maps <see cref="PointLoad"/>: deleted with its truss or its node.</summary>
public sealed class PointLoadConfiguration : IEntityTypeConfiguration<PointLoad>
{
    public void Configure(EntityTypeBuilder<PointLoad> builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.ToTable("PointLoads");
        builder.ConfigureTracked();
        builder.Property(p => p.CaseName).HasMaxLength(TrackedEntityConfiguration.CodeLength).IsRequired();
        builder.HasOne(p => p.Truss).WithMany(t => t.PointLoads).HasForeignKey(p => p.TrussId).OnDelete(DeleteBehavior.Cascade);
        builder.HasOne(p => p.Node).WithMany().HasForeignKey(p => p.NodeId).OnDelete(DeleteBehavior.Cascade);
        builder.HasIndex(p => new { p.TrussId, p.CaseName });
    }
}
