using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Configurations;

/// <summary>Maps <see cref="ApiToken"/>: unique prefix and hash; the tokens go with their user.</summary>
public sealed class ApiTokenConfiguration : IEntityTypeConfiguration<ApiToken>
{
    public void Configure(EntityTypeBuilder<ApiToken> builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.ToTable("ApiTokens");
        builder.ConfigureTracked();
        builder.Property(t => t.UserId).HasMaxLength(TrackedEntityConfiguration.UserIdLength).IsRequired();
        builder.Property(t => t.Name).HasMaxLength(TrackedEntityConfiguration.NameLength).IsRequired();
        builder.Property(t => t.Prefix).HasMaxLength(ApiToken.PrefixLength).IsRequired();
        builder.Property(t => t.TokenHash).HasMaxLength(ApiToken.HashLength).IsFixedLength().IsRequired();
        builder.Property(t => t.Scope).HasMaxLength(20).IsRequired();
        builder.HasOne(t => t.User).WithMany().HasForeignKey(t => t.UserId).OnDelete(DeleteBehavior.Cascade);
        builder.HasIndex(t => t.Prefix).IsUnique();
        builder.HasIndex(t => t.TokenHash).IsUnique();
        builder.HasIndex(t => t.UserId);
    }
}
