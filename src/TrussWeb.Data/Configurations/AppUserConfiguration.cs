using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Configurations;

/// <summary>Maps <see cref="AppUser"/> (the Identity tables are mapped by IdentityDbContext).</summary>
public sealed class AppUserConfiguration : IEntityTypeConfiguration<AppUser>
{
    public void Configure(EntityTypeBuilder<AppUser> builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.Property(u => u.DisplayName).HasMaxLength(TrackedEntityConfiguration.NameLength).IsRequired();
    }
}
