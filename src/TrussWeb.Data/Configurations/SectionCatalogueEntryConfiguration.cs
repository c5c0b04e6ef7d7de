using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Configurations;

/// <summary>Maps <see cref="SectionCatalogueEntry"/>: designation unique within a family.</summary>
public sealed class SectionCatalogueEntryConfiguration : IEntityTypeConfiguration<SectionCatalogueEntry>
{
    public void Configure(EntityTypeBuilder<SectionCatalogueEntry> builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.ToTable("SectionCatalogue");
        builder.ConfigureTracked();
        builder.Property(s => s.Family).HasMaxLength(50).IsRequired();
        builder.Property(s => s.Designation).HasMaxLength(TrackedEntityConfiguration.CodeLength).IsRequired();
        builder.Property(s => s.Source).HasMaxLength(TrackedEntityConfiguration.NameLength).IsRequired();
        builder.HasIndex(s => new { s.Family, s.Designation }).IsUnique();
    }
}
