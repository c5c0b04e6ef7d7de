using Microsoft.EntityFrameworkCore.Metadata.Builders;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Configurations;

/// <summary>Mapping shared by every <see cref="TrackedEntity"/>: key, concurrency token, stamps.</summary>
internal static class TrackedEntityConfiguration
{
    /// <summary>Length of an Identity user id column.</summary>
    public const int UserIdLength = 450;

    /// <summary>Length of short names and codes.</summary>
    public const int NameLength = 200;

    /// <summary>Length of labels, marks and designations.</summary>
    public const int CodeLength = 100;

    public static void ConfigureTracked<T>(this EntityTypeBuilder<T> builder)
        where T : TrackedEntity
    {
        builder.HasKey(e => e.Id);
        builder.Property(e => e.Version).IsConcurrencyToken();
        builder.Property(e => e.CreatedBy).HasMaxLength(UserIdLength);
        builder.Property(e => e.UpdatedBy).HasMaxLength(UserIdLength);
    }
}
