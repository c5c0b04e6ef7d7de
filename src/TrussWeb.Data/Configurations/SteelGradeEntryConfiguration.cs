using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Configurations;

/// <summary>Maps <see cref="SteelGradeEntry"/>: names unique.</summary>
public sealed class SteelGradeEntryConfiguration : IEntityTypeConfiguration<SteelGradeEntry>
{
    public void Configure(EntityTypeBuilder<SteelGradeEntry> builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.ToTable("SteelGrades");
        builder.ConfigureTracked();
        builder.Property(g => g.Name).HasMaxLength(TrackedEntityConfiguration.CodeLength).IsRequired();
        builder.Property(g => g.Standard).HasMaxLength(TrackedEntityConfiguration.CodeLength).IsRequired();
        builder.Property(g => g.BandsJson).IsRequired();
        builder.HasIndex(g => g.Name).IsUnique();
    }
}
