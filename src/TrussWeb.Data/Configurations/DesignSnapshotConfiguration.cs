using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Metadata.Builders;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Configurations;

/// <summary>Maps <see cref="DesignSnapshot"/>: fixed-length fingerprint, JSON as text.</summary>
public sealed class DesignSnapshotConfiguration : IEntityTypeConfiguration<DesignSnapshot>
{
    public void Configure(EntityTypeBuilder<DesignSnapshot> builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        builder.ToTable("DesignSnapshots");
        builder.ConfigureTracked();
        builder.Property(s => s.Fingerprint).HasMaxLength(DesignSnapshot.FingerprintLength).IsFixedLength().IsRequired();
        builder.Property(s => s.CoreVersion).HasMaxLength(50).IsRequired();
        builder.Property(s => s.StandardCode).HasMaxLength(TrackedEntityConfiguration.CodeLength).IsRequired();
        builder.Property(s => s.StandardVersion).HasMaxLength(50).IsRequired();
        builder.Property(s => s.InputsJson).IsRequired();
        builder.Property(s => s.ResultJson).IsRequired();
        builder.Property(s => s.Status).HasMaxLength(20).IsRequired();
        builder.HasOne(s => s.Truss).WithMany().HasForeignKey(s => s.TrussId).OnDelete(DeleteBehavior.Cascade);
        builder.HasOne(s => s.Member).WithMany().HasForeignKey(s => s.MemberId).OnDelete(DeleteBehavior.Cascade);
        builder.HasIndex(s => new { s.MemberId, s.CreatedUtc });
        builder.HasIndex(s => new { s.TrussId, s.CreatedUtc });
        builder.HasIndex(s => s.Fingerprint);
    }
}
