using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Configurations;

/// <summary>Maps <see cref="TrussNode"/>: labels unique per truss.</summary>
public sealed class TrussNodeConfiguration : IEntityTypeConfiguration<TrussNode>
{
    public void Configure(EntityTypeBuilder<TrussNode> builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.ToTable("TrussNodes");
        builder.ConfigureTracked();
        builder.Property(n => n.Label).HasMaxLength(TrackedEntityConfiguration.CodeLength).IsRequired();
        builder.HasOne(n => n.Truss).WithMany(t => t.Nodes).HasForeignKey(n => n.TrussId).OnDelete(DeleteBehavior.Cascade);
        builder.HasIndex(n => new { n.TrussId, n.Label }).IsUnique();
    }
}
