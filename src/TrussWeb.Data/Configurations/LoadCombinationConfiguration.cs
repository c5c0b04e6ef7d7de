using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Configurations;

/// <summary>Maps <see cref="LoadCombination"/>: names unique per truss, limit state stored as text.</summary>
public sealed class LoadCombinationConfiguration : IEntityTypeConfiguration<LoadCombination>
{
    public void Configure(EntityTypeBuilder<LoadCombination> builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.ToTable("LoadCombinations");
        builder.ConfigureTracked();
        builder.Property(c => c.Name).HasMaxLength(TrackedEntityConfiguration.NameLength).IsRequired();
        builder.Property(c => c.LimitState).HasConversion<string>().HasMaxLength(10).IsRequired();
        builder.Property(c => c.FactorsJson).IsRequired();
        builder.HasOne(c => c.Truss).WithMany(t => t.Combinations).HasForeignKey(c => c.TrussId).OnDelete(DeleteBehavior.Cascade);
        builder.HasIndex(c => new { c.TrussId, c.Name }).IsUnique();
    }
}
