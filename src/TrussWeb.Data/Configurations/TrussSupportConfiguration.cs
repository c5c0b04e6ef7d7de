using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Configurations;

/// <summary>Maps <see cref="TrussSupport"/>: at most one per node, kind stored as text.</summary>
public sealed class TrussSupportConfiguration : IEntityTypeConfiguration<TrussSupport>
{
    public void Configure(EntityTypeBuilder<TrussSupport> builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.ToTable("TrussSupports");
        builder.ConfigureTracked();
        builder.Property(s => s.Kind).HasConversion<string>().HasMaxLength(20).IsRequired();
        builder.HasOne(s => s.Node).WithOne(n => n.Support).HasForeignKey<TrussSupport>(s => s.NodeId).OnDelete(DeleteBehavior.Cascade);
        builder.HasIndex(s => s.NodeId).IsUnique();
    }
}
