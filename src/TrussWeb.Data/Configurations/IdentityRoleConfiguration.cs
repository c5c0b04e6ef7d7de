using Microsoft.AspNetCore.Identity;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;

namespace TrussWeb.Data.Configurations;

/// <summary>
/// Seeds the four application roles (<see cref="Roles"/>) through the migrations, with fixed ids and
/// stamps so the model stays deterministic and every database has the same role rows.
/// </summary>
public sealed class IdentityRoleConfiguration : IEntityTypeConfiguration<IdentityRole>
{
    public void Configure(EntityTypeBuilder<IdentityRole> builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.HasData(Roles.All.Select(name => new IdentityRole
        {
            Id = "role-" + name.ToLowerInvariant(),
            Name = name,
            NormalizedName = name.ToUpperInvariant(),
            ConcurrencyStamp = "seed-" + name.ToLowerInvariant(),
        }));
    }
}
