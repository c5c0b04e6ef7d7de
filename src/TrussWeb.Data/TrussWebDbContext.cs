using Microsoft.AspNetCore.DataProtection.EntityFrameworkCore;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Identity.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data;

/// <summary>
/// The TrussWeb database: Identity tables plus projects, trusses, loads, design snapshots, catalogues
/// and the append-only audit log. Create short-lived instances through
/// <see cref="IDbContextFactory{TContext}"/> (see <see cref="DependencyInjection.AddTrussWebData"/>);
/// it also holds the ASP.NET Core data-protection keys so several app instances share them
/// (<c>PersistKeysToDbContext&lt;TrussWebDbContext&gt;()</c>). The provider-specific subclasses <see cref="SqliteTrussWebDbContext"/> and
/// <see cref="PostgresTrussWebDbContext"/> exist only to own their migrations.
/// </summary>
public class TrussWebDbContext : IdentityDbContext<AppUser, IdentityRole, string>, IDataProtectionKeyContext
{
    /// <summary>Creates a context from options built for this type.</summary>
    public TrussWebDbContext(DbContextOptions<TrussWebDbContext> options)
        : base(options)
    {
    }

    /// <summary>Creates a context from options built for a derived provider context.</summary>
    protected TrussWebDbContext(DbContextOptions options)
        : base(options)
    {
    }

    public DbSet<Project> Projects => Set<Project>();

    public DbSet<ProjectMembership> ProjectMemberships => Set<ProjectMembership>();

    public DbSet<Truss> Trusses => Set<Truss>();

    public DbSet<TrussNode> TrussNodes => Set<TrussNode>();

    public DbSet<TrussSupport> TrussSupports => Set<TrussSupport>();

    public DbSet<MemberGroup> MemberGroups => Set<MemberGroup>();

    public DbSet<TrussMember> TrussMembers => Set<TrussMember>();

    public DbSet<TrussActions> TrussActions => Set<TrussActions>();

    public DbSet<PointLoad> PointLoads => Set<PointLoad>();

    public DbSet<LoadCombination> LoadCombinations => Set<LoadCombination>();

    public DbSet<DesignSnapshot> DesignSnapshots => Set<DesignSnapshot>();

    public DbSet<SectionCatalogueEntry> SectionCatalogue => Set<SectionCatalogueEntry>();

    public DbSet<SteelGradeEntry> SteelGrades => Set<SteelGradeEntry>();

    public DbSet<AuditEntry> AuditEntries => Set<AuditEntry>();

    public DbSet<ApiToken> ApiTokens => Set<ApiToken>();

    /// <inheritdoc />
    public DbSet<DataProtectionKey> DataProtectionKeys => Set<DataProtectionKey>();

    private List<IDisposable>? releasedOnDispose;

    /// <summary>
    /// Disposes <paramref name="release"/> when this context is disposed, after the context has rolled back and closed
    /// any transaction still open (the Services use it to release the in-process part of a truss's write lock).
    /// </summary>
    public void ReleaseOnDispose(IDisposable release)
    {
        ArgumentNullException.ThrowIfNull(release);
        (releasedOnDispose ??= []).Add(release);
    }

    /// <inheritdoc />
    public override void Dispose()
    {
        try
        {
            base.Dispose();
        }
        finally
        {
            ReleaseAll();
        }
    }

    /// <inheritdoc />
    public override async ValueTask DisposeAsync()
    {
        try
        {
            await base.DisposeAsync().ConfigureAwait(false);
        }
        finally
        {
            ReleaseAll();
        }
    }

    private void ReleaseAll()
    {
        var releases = releasedOnDispose;
        releasedOnDispose = null;
        foreach (var release in releases ?? [])
        {
            release.Dispose();
        }
    }

    /// <inheritdoc />
    public override int SaveChanges(bool acceptAllChangesOnSuccess)
    {
        EnsureAuditLogIsAppendOnly();
        return base.SaveChanges(acceptAllChangesOnSuccess);
    }

    /// <inheritdoc />
    public override Task<int> SaveChangesAsync(bool acceptAllChangesOnSuccess, CancellationToken cancellationToken = default)
    {
        EnsureAuditLogIsAppendOnly();
        return base.SaveChangesAsync(acceptAllChangesOnSuccess, cancellationToken);
    }

    /// <inheritdoc />
    protected override void OnModelCreating(ModelBuilder builder)
    {
        ArgumentNullException.ThrowIfNull(builder);
        base.OnModelCreating(builder);
        builder.ApplyConfigurationsFromAssembly(typeof(TrussWebDbContext).Assembly);
    }

    /// <inheritdoc />
    protected override void ConfigureConventions(ModelConfigurationBuilder configurationBuilder)
    {
        ArgumentNullException.ThrowIfNull(configurationBuilder);
        base.ConfigureConventions(configurationBuilder);
        configurationBuilder.Properties<DateTime>().HaveConversion<UtcDateTimeConverter>();
    }

    private void EnsureAuditLogIsAppendOnly()
    {
        if (ChangeTracker.AutoDetectChangesEnabled)
        {
            ChangeTracker.DetectChanges();
        }

        foreach (var entry in ChangeTracker.Entries<AuditEntry>())
        {
            if (entry.State is EntityState.Modified or EntityState.Deleted)
            {
                throw new InvalidOperationException(
                    $"Audit entries are append-only: audit entry {entry.Entity.Id} is {entry.State.ToString().ToLowerInvariant()} " +
                    "and cannot be saved. Add a new AuditEntry instead of changing or removing one.");
            }
        }
    }
}
