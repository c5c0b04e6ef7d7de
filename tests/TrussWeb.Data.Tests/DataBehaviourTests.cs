using System.Data.Common;
using Microsoft.AspNetCore.DataProtection;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Time.Testing;
using TrussWeb.Data.Concurrency;
using TrussWeb.Data.Entities;
using TrussWeb.Data.Tests.Support;

namespace TrussWeb.Data.Tests;

/// <summary>
/// The data-layer behaviours every provider must show. Each concrete subclass supplies empty databases
/// of one provider; each test gets its own fresh, migrated database (created in
/// <see cref="InitializeAsync"/>, removed in <see cref="DisposeAsync"/>).
/// </summary>
public abstract class DataBehaviourTests : IAsyncLifetime
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
    public async Task Update_bumps_the_version_and_stamps_the_updater_but_keeps_the_creation_stamp()
    {
        var memberId = await SaveSampleProjectAsync();

        Clock.Advance(TimeSpan.FromHours(2));
        User.UserId = "bob";
        await using (var context = await CreateContextAsync())
        {
            var member = await context.TrussMembers.SingleAsync(m => m.Id == memberId);
            member.Kx = 0.75;
            member.CreatedBy = "mallory";
            await context.SaveChangesAsync();
        }

        await using var read = await CreateContextAsync();
        var stored = await read.TrussMembers.SingleAsync(m => m.Id == memberId);
        Assert.Equal(0.75, stored.Kx);
        Assert.Equal(2, stored.Version);
        Assert.Equal("alice", stored.CreatedBy);
        Assert.Equal(Start.UtcDateTime, stored.CreatedUtc);
        Assert.Equal("bob", stored.UpdatedBy);
        Assert.Equal(Start.UtcDateTime.AddHours(2), stored.UpdatedUtc);
        var untouched = await read.TrussMembers.SingleAsync(m => m.Mark == "T2");
        Assert.Equal(1, untouched.Version);
    }

    [Fact]
    public async Task Second_of_two_conflicting_saves_of_a_member_fails_with_a_message_naming_the_row_and_who_changed_it()
    {
        var memberId = await SaveSampleProjectAsync();
        await using var first = await CreateContextAsync();
        await using var second = await CreateContextAsync();
        var mine = await first.TrussMembers.SingleAsync(m => m.Id == memberId);
        var theirs = await second.TrussMembers.SingleAsync(m => m.Id == memberId);

        User.UserId = "bob";
        Clock.Advance(TimeSpan.FromMinutes(5));
        mine.SectionDesignationOverride = "2L 70x70x6";
        await first.SaveChangesAsync();

        User.UserId = "carol";
        theirs.SectionDesignationOverride = "2L 80x80x8";
        var error = await Assert.ThrowsAsync<DbUpdateConcurrencyException>(() => second.SaveChangesAsync());

        var described = await ConcurrencyConflicts.DescribeAsync(error);
        var conflict = Assert.Single(described.Conflicts);
        Assert.Equal(nameof(TrussMember), conflict.EntityType);
        Assert.Equal("T1", conflict.Label);
        Assert.Equal(memberId.ToString(), conflict.Key);
        Assert.Equal("bob", conflict.ChangedBy);
        Assert.Equal(Start.UtcDateTime.AddMinutes(5), conflict.ChangedUtc);
        Assert.False(conflict.WasDeleted);
        Assert.Equal(["SectionDesignationOverride"], conflict.ConflictingProperties);
        Assert.Equal("2L 80x80x8", conflict.YourValues["SectionDesignationOverride"]);
        Assert.Equal("2L 70x70x6", conflict.DatabaseValues!["SectionDesignationOverride"]);
        Assert.Contains("TrussMember 'T1'", described.Message, StringComparison.Ordinal);
        Assert.Contains("user 'bob'", described.Message, StringComparison.Ordinal);
        Assert.Contains("yours: '2L 80x80x8', saved: '2L 70x70x6'", described.Message, StringComparison.Ordinal);
        Assert.Same(error, described.InnerException);

        await using (var check = await CreateContextAsync())
        {
            Assert.Equal("2L 70x70x6", (await check.TrussMembers.SingleAsync(m => m.Id == memberId)).SectionDesignationOverride);
        }

        // The losing edit is still current in its context: accepting the stored values as the new
        // originals (the user chose to overwrite) lets the save go through on the next version.
        var entry = second.Entry(theirs);
        entry.OriginalValues.SetValues(await entry.GetDatabaseValuesAsync() ?? throw new InvalidOperationException("row vanished"));
        await second.SaveChangesAsync();
        await using var after = await CreateContextAsync();
        var stored = await after.TrussMembers.SingleAsync(m => m.Id == memberId);
        Assert.Equal("2L 80x80x8", stored.SectionDesignationOverride);
        Assert.Equal(3, stored.Version);
        Assert.Equal("carol", stored.UpdatedBy);
    }

    [Fact]
    public async Task Editing_a_member_someone_else_deleted_is_described_as_deleted()
    {
        var memberId = await SaveSampleProjectAsync();
        await using var editor = await CreateContextAsync();
        var member = await editor.TrussMembers.SingleAsync(m => m.Id == memberId);
        await using (var other = await CreateContextAsync())
        {
            other.TrussMembers.Remove(await other.TrussMembers.SingleAsync(m => m.Id == memberId));
            await other.SaveChangesAsync();
        }

        member.Kx = 0.5;
        var error = await Assert.ThrowsAsync<DbUpdateConcurrencyException>(() => editor.SaveChangesAsync());
        var conflict = Assert.Single((await ConcurrencyConflicts.DescribeAsync(error)).Conflicts);

        Assert.True(conflict.WasDeleted);
        Assert.Null(conflict.DatabaseValues);
        Assert.Equal(0.5, conflict.YourValues["Kx"]);
        Assert.Contains("TrussMember 'T1'", conflict.Message, StringComparison.Ordinal);
        Assert.Contains("was deleted", conflict.Message, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Rows_saved_without_a_signed_in_user_are_stamped_as_the_system()
    {
        User.UserId = null;
        var memberId = await SaveSampleProjectAsync();
        await using var read = await CreateContextAsync();
        var member = await read.TrussMembers.SingleAsync(m => m.Id == memberId);
        Assert.Null(member.CreatedBy);
        Assert.Null(member.UpdatedBy);
        Assert.Equal(Start.UtcDateTime, member.UpdatedUtc);
    }

    [Fact]
    public async Task Saving_a_detached_member_with_a_stale_version_fails()
    {
        var memberId = await SaveSampleProjectAsync();
        TrussMember loaded;
        await using (var context = await CreateContextAsync())
        {
            loaded = await context.TrussMembers.AsNoTracking().SingleAsync(m => m.Id == memberId);
        }

        await using (var other = await CreateContextAsync())
        {
            (await other.TrussMembers.SingleAsync(m => m.Id == memberId)).Ky = 0.8;
            await other.SaveChangesAsync();
        }

        loaded.Kz = 1.2;
        await using var stale = await CreateContextAsync();
        stale.TrussMembers.Update(loaded);
        await Assert.ThrowsAsync<DbUpdateConcurrencyException>(() => stale.SaveChangesAsync());
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
    public async Task An_audit_entry_cannot_be_modified_through_the_context()
    {
        var id = await SaveAuditEntryAsync();
        await using (var context = await CreateContextAsync())
        {
            var entry = await context.AuditEntries.SingleAsync(a => a.Id == id);
            entry.NewValue = "tampered";
            var error = await Assert.ThrowsAsync<InvalidOperationException>(() => context.SaveChangesAsync());
            Assert.Contains("append-only", error.Message, StringComparison.Ordinal);
            Assert.Contains($"audit entry {id} is modified", error.Message, StringComparison.Ordinal);
        }

        await using var read = await CreateContextAsync();
        Assert.Equal("2L 60x60x6", (await read.AuditEntries.SingleAsync(a => a.Id == id)).NewValue);
    }

    [Fact]
    public async Task An_audit_entry_cannot_be_deleted_through_the_context()
    {
        var id = await SaveAuditEntryAsync();
        await using (var context = await CreateContextAsync())
        {
            context.AuditEntries.Remove(await context.AuditEntries.SingleAsync(a => a.Id == id));
            var error = Assert.Throws<InvalidOperationException>(() => context.SaveChanges());
            Assert.Contains($"audit entry {id} is deleted", error.Message, StringComparison.Ordinal);
        }

        await using var read = await CreateContextAsync();
        Assert.Equal(1, await read.AuditEntries.CountAsync());
    }

    [Fact]
    public async Task The_database_refuses_bulk_updates_and_deletes_of_audit_entries()
    {
        await SaveAuditEntryAsync();
        await using var context = await CreateContextAsync();

        await Assert.ThrowsAnyAsync<DbException>(
            () => context.AuditEntries.ExecuteUpdateAsync(s => s.SetProperty(a => a.NewValue, "tampered")));
        await Assert.ThrowsAnyAsync<DbException>(() => context.AuditEntries.ExecuteDeleteAsync());

        var stored = await context.AuditEntries.AsNoTracking().SingleAsync();
        Assert.Equal("2L 60x60x6", stored.NewValue);
    }

    [Fact]
    public async Task Audit_entries_can_be_appended()
    {
        await SaveAuditEntryAsync();
        await SaveAuditEntryAsync();
        await using var context = await CreateContextAsync();
        var entries = await context.AuditEntries.OrderBy(a => a.Id).ToListAsync();
        Assert.Equal(2, entries.Count);
        Assert.True(entries[1].Id > entries[0].Id);
        Assert.Equal(DateTimeKind.Utc, entries[0].UtcTime.Kind);
        Assert.Equal(ProjectBuilder.Fingerprint, entries[0].Fingerprint);
    }

    [Fact]
    public async Task A_designation_is_unique_within_a_family_but_may_repeat_across_families()
    {
        await using (var context = await CreateContextAsync())
        {
            context.SectionCatalogue.Add(Section("EqualAngle", "50x50x5"));
            context.SectionCatalogue.Add(Section("UnequalAngle", "50x50x5"));
            await context.SaveChangesAsync();
        }

        await using (var context = await CreateContextAsync())
        {
            context.SectionCatalogue.Add(Section("EqualAngle", "50x50x5"));
            await Assert.ThrowsAsync<DbUpdateException>(() => context.SaveChangesAsync());
        }

        await using var read = await CreateContextAsync();
        Assert.Equal(2, await read.SectionCatalogue.CountAsync());
    }

    [Fact]
    public async Task A_steel_grade_name_is_unique()
    {
        await using (var context = await CreateContextAsync())
        {
            context.SteelGrades.Add(Grade("S355JR"));
            await context.SaveChangesAsync();
        }

        await using var again = await CreateContextAsync();
        again.SteelGrades.Add(Grade("S355JR"));
        await Assert.ThrowsAsync<DbUpdateException>(() => again.SaveChangesAsync());
    }

    [Fact]
    public async Task A_node_of_a_truss_that_does_not_exist_is_refused()
    {
        await using var context = await CreateContextAsync();
        context.TrussNodes.Add(new TrussNode { TrussId = Guid.NewGuid(), Label = "N1" });
        await Assert.ThrowsAsync<DbUpdateException>(() => context.SaveChangesAsync());
    }

    [Fact]
    public async Task Deleting_a_project_deletes_its_trusses_and_their_data_but_keeps_the_audit_log()
    {
        var memberId = await SaveSampleProjectAsync();
        await SaveAuditEntryAsync();
        await using (var context = await CreateContextAsync())
        {
            var truss = await context.Trusses.SingleAsync();
            context.DesignSnapshots.Add(ProjectBuilder.Snapshot(truss, await context.TrussMembers.SingleAsync(m => m.Id == memberId)));
            await context.SaveChangesAsync();
        }

        await using (var context = await CreateContextAsync())
        {
            context.Projects.Remove(await context.Projects.SingleAsync());
            await context.SaveChangesAsync();
        }

        await using var read = await CreateContextAsync();
        Assert.Equal(0, await read.Trusses.CountAsync());
        Assert.Equal(0, await read.TrussNodes.CountAsync());
        Assert.Equal(0, await read.TrussSupports.CountAsync());
        Assert.Equal(0, await read.TrussMembers.CountAsync());
        Assert.Equal(0, await read.MemberGroups.CountAsync());
        Assert.Equal(0, await read.TrussActions.CountAsync());
        Assert.Equal(0, await read.PointLoads.CountAsync());
        Assert.Equal(0, await read.LoadCombinations.CountAsync());
        Assert.Equal(0, await read.DesignSnapshots.CountAsync());
        Assert.Equal(1, await read.AuditEntries.CountAsync());
    }

    [Fact]
    public async Task A_node_used_by_a_member_cannot_be_deleted()
    {
        await SaveSampleProjectAsync();
        await using var context = await CreateContextAsync();
        context.TrussNodes.Remove(await context.TrussNodes.SingleAsync(n => n.Label == "N4"));
        await Assert.ThrowsAsync<DbUpdateException>(() => context.SaveChangesAsync());
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
