using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Configurations;

/// <summary>Maps <see cref="TrussActions"/>: one row per truss.</summary>
public sealed class TrussActionsConfiguration : IEntityTypeConfiguration<TrussActions>
{
    public void Configure(EntityTypeBuilder<TrussActions> builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.ToTable("TrussActions");
        builder.ConfigureTracked();
        builder.Property(a => a.WindCasesJson).IsRequired();
        builder.HasOne(a => a.Truss).WithOne(t => t.Actions).HasForeignKey<TrussActions>(a => a.TrussId).OnDelete(DeleteBehavior.Cascade);
        builder.HasIndex(a => a.TrussId).IsUnique();
    }
}
