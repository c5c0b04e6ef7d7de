using Microsoft.AspNetCore.DataProtection;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Time.Testing;
using TrussWeb.Data.Entities;
using TrussWeb.Data.Tests.Support;

namespace TrussWeb.Data.Tests;

/// <summary>
/// The data-layer behaviours every provider must show. Each concrete subclass supplies empty databases
/// of one provider; each test gets its own fresh, migrated database (created in
/// <see cref="InitializeAsync"/>, removed in <see cref="DisposeAsync"/>).
/// </summary>
public abstract partial class DataBehaviourTests : IAsyncLifetime
{
    protected static readonly DateTimeOffset Start = new(2026, 3, 14, 8, 30, 0, TimeSpan.Zero);

    private readonly List<TestDatabase> databases = [];
    private readonly List<ServiceProvider> providers = [];

    protected FakeTimeProvider Clock { get; } = new(Start);

    protected TestUser User { get; } = new() { UserId = "alice" };

    protected TestDatabase Database { get; private set; } = null!;

    protected ServiceProvider Services { get; private set; } = null!;

    /// <summary>Creates an empty database (no tables) of the provider under test.</summary>
    protected abstract Task<TestDatabase> CreateEmptyDatabaseAsync();

    public async Task InitializeAsync()
    {
        Database = await NewDatabaseAsync();
        Services = NewServices(Database);
        await DatabaseMigrator.MigrateAsync(Services);
    }

    public async Task DisposeAsync()
    {
        foreach (var provider in providers)
        {
            await provider.DisposeAsync();
        }

        foreach (var database in databases)
        {
            await database.DisposeAsync();
        }
    }

    [Fact]
    public async Task Migrations_apply_to_an_empty_database_and_match_the_model()
    {
        var empty = await NewDatabaseAsync();
        var services = NewServices(empty);
        await using (var before = await CreateContextAsync(services))
        {
            Assert.Empty(await before.Database.GetAppliedMigrationsAsync());
            Assert.Contains(before.Database.GetMigrations(), m => m.EndsWith("_InitialCreate", StringComparison.Ordinal));
        }

        await DatabaseMigrator.MigrateAsync(services);

        await using var context = await CreateContextAsync(services);
        Assert.Equal(empty.Provider == DatabaseProvider.Postgres, context.Database.IsNpgsql());
        Assert.Equal(empty.Provider == DatabaseProvider.Sqlite, context.Database.IsSqlite());
        Assert.Equal(context.Database.GetMigrations(), await context.Database.GetAppliedMigrationsAsync());
        Assert.Empty(await context.Database.GetPendingMigrationsAsync());
        Assert.False(context.Database.HasPendingModelChanges(), "The model differs from the migrations' snapshot: add a migration for both providers.");
        Assert.Equal(0, await context.Projects.CountAsync());
        Assert.Equal(0, await context.Users.CountAsync());
        Assert.Equal(
            Roles.All.OrderBy(r => r, StringComparer.Ordinal),
            (await context.Roles.Select(r => r.Name!).ToListAsync()).OrderBy(r => r, StringComparer.Ordinal));
        Assert.Equal(
            Roles.All.Select(r => r.ToUpperInvariant()).Order(StringComparer.Ordinal),
            (await context.Roles.Select(r => r.NormalizedName!).ToListAsync()).Order(StringComparer.Ordinal));
    }

    [Fact]
    public async Task Project_with_a_truss_and_its_design_data_round_trips()
    {
        Guid projectId;
        await using (var context = await CreateContextAsync())
        {
            context.Users.Add(new AppUser { Id = "alice", UserName = "alice", DisplayName = "Alice Designer" });
            var project = ProjectBuilder.Build(memberUserId: "alice");
            context.Projects.Add(project);
            var saved = project.Trusses[0];
            context.DesignSnapshots.Add(ProjectBuilder.Snapshot(saved, saved.Members.Single(m => m.Mark == "W1")));
            context.DesignSnapshots.Add(ProjectBuilder.Snapshot(saved, member: null));
            await context.SaveChangesAsync();
            projectId = project.Id;
        }

        await using var read = await CreateContextAsync();
        var loaded = await read.Projects
            .Include(p => p.Memberships).ThenInclude(m => m.User)
            .Include(p => p.Trusses).ThenInclude(t => t.Nodes).ThenInclude(n => n.Support)
            .Include(p => p.Trusses).ThenInclude(t => t.Groups)
            .Include(p => p.Trusses).ThenInclude(t => t.Members)
            .Include(p => p.Trusses).ThenInclude(t => t.Actions)
            .Include(p => p.Trusses).ThenInclude(t => t.PointLoads)
            .Include(p => p.Trusses).ThenInclude(t => t.Combinations)
            .AsSplitQuery()
            .SingleAsync(p => p.Id == projectId);

        Assert.Equal("Warehouse roof", loaded.Name);
        Assert.Equal("J-2041", loaded.Reference);
        Assert.Equal("SANS 10162-1", loaded.StandardCode);
        Assert.Equal("S355JR", loaded.DefaultGradeName);
        Assert.Equal("SI-kN-m", loaded.Units);
        Assert.Equal(Start.UtcDateTime, loaded.CreatedUtc);
        Assert.Equal(DateTimeKind.Utc, loaded.CreatedUtc.Kind);
        Assert.Equal("alice", loaded.CreatedBy);
        Assert.Equal(1, loaded.Version);
        Assert.Equal("Alice Designer", Assert.Single(loaded.Memberships).User!.DisplayName);
        Assert.Equal(Roles.ProjectLead, loaded.Memberships[0].Role);

        var truss = Assert.Single(loaded.Trusses);
        Assert.Equal("""{"panels":2,"pitchDeg":10}""", truss.GeneratorParametersJson);
        Assert.Equal(1500.5, truss.PurlinSpacingMm);
        Assert.Equal(0.1, truss.ConnectionAllowanceFraction);
        Assert.Equal(4, truss.Nodes.Count);
        var apex = truss.Nodes.Single(n => n.Label == "N4");
        Assert.Equal(793.4567, apex.YMm);
        Assert.True(apex.IsPurlinPoint);
        Assert.False(apex.IsLaterallyRestrained);
        Assert.Null(apex.Support);
        Assert.Equal(SupportKind.RollerX, truss.Nodes.Single(n => n.Label == "N3").Support!.Kind);
        Assert.Equal(SupportKind.Pin, truss.Nodes.Single(n => n.Label == "N1").Support!.Kind);

        var chords = truss.Groups.Single(g => g.Name == "Chords");
        Assert.Equal("2L 60x60x6", chords.SectionDesignation);
        Assert.Equal(10, chords.DoubleAngleGapMm);
        Assert.Equal(5, truss.Members.Count);
        var t1 = truss.Members.Single(m => m.Mark == "T1");
        Assert.Equal(chords.Id, t1.GroupId);
        Assert.Equal("N1", truss.Nodes.Single(n => n.Id == t1.StartNodeId).Label);
        Assert.Equal(0.9, t1.Kx);
        Assert.Null(t1.Ky);
        Assert.Equal(4571.3, t1.LengthYMm);
        Assert.Equal(3, t1.ConnectorCount);
        Assert.True(t1.UseModifiedSlenderness);
        Assert.Equal("Draft", t1.ReviewState);
        Assert.Equal(new DateTime(2026, 3, 1, 12, 0, 0, DateTimeKind.Utc), t1.SubmittedUtc);
        Assert.Equal(DateTimeKind.Utc, t1.SubmittedUtc!.Value.Kind);
        var w1 = truss.Members.Single(m => m.Mark == "W1");
        Assert.Equal("L 50x50x5", w1.SectionDesignationOverride);
        Assert.Equal(650.25, w1.KLvMm);
        Assert.Equal("""{"bolts":2,"diameterMm":16}""", w1.ConnectionDetailsJson);

        Assert.Equal(0.25, truss.Actions!.ImposedKPa);
        Assert.Equal("""[{"name":"W1","leftSlopeKPa":-0.6,"rightSlopeKPa":-0.4}]""", truss.Actions.WindCasesJson);
        var load = Assert.Single(truss.PointLoads);
        Assert.Equal(-2500.5, load.FyN);
        Assert.Equal("N2", truss.Nodes.Single(n => n.Id == load.NodeId).Label);
        Assert.Equal(
            [("1.2D + 1.6L", LimitState.Uls), ("1.1D + 1.0L", LimitState.Sls)],
            truss.Combinations.OrderBy(c => c.SortOrder).Select(c => (c.Name, c.LimitState)));

        var snapshots = await read.DesignSnapshots.Where(s => s.TrussId == truss.Id).ToListAsync();
        Assert.Equal(2, snapshots.Count);
        var memberSnapshot = snapshots.Single(s => s.MemberId == w1.Id);
        Assert.Equal(ProjectBuilder.Fingerprint, memberSnapshot.Fingerprint);
        Assert.Equal(0.27031, memberSnapshot.Utilization);
        Assert.Equal("""{"steps":[{"symbol":"Cr","value":45678.9,"unit":"N"}]}""", memberSnapshot.ResultJson);
        Assert.Equal("2011", memberSnapshot.StandardVersion);
        Assert.Contains(snapshots, s => s.MemberId is null);
    }

    [Fact]
    public async Task A_new_service_provider_over_the_same_database_sees_everything_saved()
    {
        var memberId = await SaveSampleProjectAsync();
        await using (var context = await CreateContextAsync())
        {
            context.AuditEntries.Add(NewAuditEntry());
            await context.SaveChangesAsync();
        }

        await Services.DisposeAsync();
        var restarted = NewServices(Database);
        await DatabaseMigrator.MigrateAsync(restarted);

        await using var read = await CreateContextAsync(restarted);
        var member = await read.TrussMembers.Include(m => m.Truss).ThenInclude(t => t!.Project).SingleAsync(m => m.Id == memberId);
        Assert.Equal("T1", member.Mark);
        Assert.Equal("Warehouse roof", member.Truss!.Project!.Name);
        Assert.Equal(4, await read.TrussNodes.CountAsync(n => n.TrussId == member.TrussId));
        Assert.Equal(5, await read.TrussMembers.CountAsync(m => m.TrussId == member.TrussId));
        Assert.Equal(2, await read.LoadCombinations.CountAsync(c => c.TrussId == member.TrussId));
        Assert.Equal("Created", (await read.AuditEntries.SingleAsync()).Action);
    }

    [Fact]
    public async Task Data_protection_keys_kept_in_the_database_are_shared_by_two_app_instances()
    {
        static void AddKeys(IServiceCollection services) =>
            services.AddDataProtection().SetApplicationName("TrussWeb").PersistKeysToDbContext<TrussWebDbContext>();

        var first = NewServices(Database, AddKeys);
        var protectedText = first.GetRequiredService<IDataProtectionProvider>().CreateProtector("test").Protect("member T1");

        var second = NewServices(Database, AddKeys);
        var text = second.GetRequiredService<IDataProtectionProvider>().CreateProtector("test").Unprotect(protectedText);

        Assert.Equal("member T1", text);
        await using var context = await CreateContextAsync();
        Assert.Equal(1, await context.DataProtectionKeys.CountAsync());
    }

    protected async Task<TestDatabase> NewDatabaseAsync()
    {
        var database = await CreateEmptyDatabaseAsync();
        databases.Add(database);
        return database;
    }

    protected ServiceProvider NewServices(TestDatabase database, Action<IServiceCollection>? configure = null)
    {
        var provider = database.BuildServices(Clock, User, configure);
        providers.Add(provider);
        return provider;
    }

    /// <summary>A short-lived context from the factory in a new scope, as a service operation gets one.</summary>
    protected Task<TrussWebDbContext> CreateContextAsync(IServiceProvider? services = null)
    {
        var scope = (services ?? Services).CreateScope();
        return scope.ServiceProvider.GetRequiredService<IDbContextFactory<TrussWebDbContext>>().CreateDbContextAsync();
    }

    /// <summary>Saves the sample project as alice and returns the id of member T1.</summary>
    protected async Task<Guid> SaveSampleProjectAsync()
    {
        await using var context = await CreateContextAsync();
        var project = ProjectBuilder.Build();
        context.Projects.Add(project);
        await context.SaveChangesAsync();
        return project.Trusses[0].Members.Single(m => m.Mark == "T1").Id;
    }

    private async Task<long> SaveAuditEntryAsync()
    {
        await using var context = await CreateContextAsync();
        var entry = NewAuditEntry();
        context.AuditEntries.Add(entry);
        await context.SaveChangesAsync();
        return entry.Id;
    }

    private AuditEntry NewAuditEntry() => new()
    {
        UtcTime = Clock.GetUtcNow().UtcDateTime,
        UserId = User.UserId,
        ProjectId = Guid.NewGuid(),
        EntityType = nameof(MemberGroup),
        EntityId = Guid.NewGuid().ToString(),
        Action = "Created",
        Field = nameof(MemberGroup.SectionDesignation),
        OldValue = null,
        NewValue = "2L 60x60x6",
        Fingerprint = ProjectBuilder.Fingerprint,
    };

    private static SectionCatalogueEntry Section(string family, string designation) => new()
    {
        Family = family,
        Designation = designation,
        DepthMm = 50,
        WidthMm = 50,
        ThicknessMm = 5,
        RootRadiusMm = 6,
        ToeRadiusMm = 3,
        Source = "invented test catalogue",
    };

    private static SteelGradeEntry Grade(string name) => new()
    {
        Name = name,
        Standard = "test",
        BandsJson = """[{"maxThicknessMm":16,"fyMPa":355}]""",
        FuMPa = 470,
        EMPa = 200000,
        GMPa = 77000,
    };
}
