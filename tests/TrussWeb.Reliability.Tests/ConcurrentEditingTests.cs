using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Data;
using TrussWeb.FaultHarness;
using TrussWeb.Reliability.Tests.Support;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Reliability.Tests;

/// <summary>
/// Many users editing one project at once through the services, in process, on each provider: no lost
/// update, no deadlock (the run is bounded and must finish), no conflict for users of different members
/// (also across two app instances), and a race on one member ends in a conflict for the loser, never a
/// silent overwrite. Correctness only; latency is measured by the harness's load
/// mode (docs/PERFORMANCE.md), never asserted here.
/// </summary>
public abstract class ConcurrentEditingTests
{
    private const int Users = 20;
    private const int SavesPerUser = 4;

    protected abstract Task<TestDatabase> CreateDatabaseAsync();

    private static Dictionary<string, string?> Settings(TestDatabase database) => new()
    {
        [DatabaseSettings.ProviderKey] = database.Provider.ToString(),
        [DatabaseSettings.ConnectionStringKey] = database.ConnectionString,
        ["TrussWeb:SeedData"] = Repo.SeedData,
    };

    [Fact]
    public async Task Twenty_users_editing_different_members_get_no_conflict_and_lose_no_update()
    {
        await using var database = await CreateDatabaseAsync();
        await using var host = await StorageHost.StartAsync([], Settings(database));

        var outcomes = await LoadRun.RunAsync(host, Users, SavesPerUser, TimeSpan.FromMinutes(5));

        await AssertEveryUserSavedAlone(database, outcomes);
    }

    [Fact]
    public async Task Twenty_users_on_two_app_instances_editing_different_members_get_no_conflict_and_lose_no_update()
    {
        await using var database = await CreateDatabaseAsync();
        await using var first = await StorageHost.StartAsync([], Settings(database));
        await using var second = await StorageHost.StartAsync([], Settings(database)); // a second instance: its own DI, pools and start-up

        var outcomes = await LoadRun.RunAsync([first, second], Users, SavesPerUser, TimeSpan.FromMinutes(5));

        await AssertEveryUserSavedAlone(database, outcomes);
    }

    /// <summary>Each user's saves all returned Ok at the first attempt (no conflict: the saves queue behind the truss's write lock), and the stored rows hold them.</summary>
    private static async Task AssertEveryUserSavedAlone(TestDatabase database, IReadOnlyList<UserOutcome> outcomes)
    {
        var stored = await StoredData.MembersAsync(database);
        Assert.Equal(Users, outcomes.Select(o => o.MemberId).Distinct().Count());
        foreach (var o in outcomes)
        {
            Assert.Equal(0, o.Conflicts);
            Assert.Equal(SavesPerUser, o.Saves);
            Assert.Equal(LoadRun.KxOf(o.User, SavesPerUser - 1), o.LastAckKx);
            var row = stored[o.MemberId];
            Assert.Equal(o.LastAckKx, row.Kx);
            Assert.Equal(o.LastAckVersion, row.Version);
            // one version step per successful save: nothing else wrote the row, no save vanished
            Assert.Equal(o.InitialVersion + o.Saves, row.Version);
        }
    }

    [Fact]
    public async Task Two_users_saving_the_same_member_at_once_give_the_loser_a_conflict()
    {
        await using var database = await CreateDatabaseAsync();
        await using var host = await StorageHost.StartAsync([], Settings(database));
        var trussId = await host.DemoTrussIdAsync();
        var other = (await LoadRun.CreateUsersAsync(host, trussId, 1, CancellationToken.None))[0];
        var designer = await host.DemoUserAsync(Roles.Designer);

        await using var first = host.ScopeAs(designer);
        await using var second = host.ScopeAs(other);
        var firstDesign = first.ServiceProvider.GetRequiredService<IDesignService>();
        var secondDesign = second.ServiceProvider.GetRequiredService<IDesignService>();
        var detail = await first.ServiceProvider.GetRequiredService<ITrussService>().GetAsync(trussId);
        var member = detail.Value!.Members.OrderBy(m => m.Mark, StringComparer.Ordinal).First();
        var loadedByFirst = await firstDesign.GetMemberDesignAsync(trussId, member.Id);
        var loadedBySecond = await secondDesign.GetMemberDesignAsync(trussId, member.Id);
        Assert.Equal(loadedByFirst.Value!.MemberVersion, loadedBySecond.Value!.MemberVersion);

        using var go = new SemaphoreSlim(0, 2);
        async Task<ServiceResult<MemberDesignDetail>> Save(IDesignService design, MemberDesignDetail loaded, double kx)
        {
            await go.WaitAsync();
            return await design.UpdateMemberDesignAsync(trussId, member.Id, new MemberDesignInput(loaded.Overrides with { Kx = kx }, loaded.MemberVersion));
        }

        var a = Task.Run(() => Save(firstDesign, loadedByFirst.Value, 0.71));
        var b = Task.Run(() => Save(secondDesign, loadedBySecond.Value, 0.83));
        go.Release(2);
        var results = await Task.WhenAll(a, b).WaitAsync(TimeSpan.FromMinutes(2));

        Assert.Single(results, r => r.IsOk);
        var loser = Assert.Single(results, r => !r.IsOk);
        Assert.Equal(ResultKind.Conflict, loser.Kind);
        Assert.NotEmpty(loser.Conflicts);
        Assert.False(string.IsNullOrWhiteSpace(loser.Message));
        var winnerKx = results[0].IsOk ? 0.71 : 0.83;
        var loserKx = results[0].IsOk ? 0.83 : 0.71;
        // The conflict names only the member (saves queue behind the truss's write lock, so nothing else races) and keeps the loser's own value.
        var memberConflict = Assert.Single(loser.Conflicts);
        Assert.Equal("TrussMember", memberConflict.EntityType);
        Assert.Equal(loserKx.ToString("R", System.Globalization.CultureInfo.InvariantCulture), memberConflict.YourValues["Kx"]);

        var stored = await StoredData.MembersAsync(database);
        Assert.Equal(winnerKx, stored[member.Id].Kx);
        Assert.Equal(loadedByFirst.Value.MemberVersion + 1, stored[member.Id].Version);
    }
}

public sealed class SqliteConcurrentEditingTests : ConcurrentEditingTests
{
    protected override Task<TestDatabase> CreateDatabaseAsync() => Task.FromResult<TestDatabase>(new SqliteTestDatabase());
}

[Collection(PostgresCollection.Name)]
public sealed class PostgresConcurrentEditingTests(PostgresClusterFixture cluster) : ConcurrentEditingTests
{
    protected override async Task<TestDatabase> CreateDatabaseAsync() => await PostgresTestDatabase.CreateAsync(cluster.AdminConnectionString);
}
