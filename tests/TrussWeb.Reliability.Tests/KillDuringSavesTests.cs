using TrussWeb.Reliability.Tests.Support;

namespace TrussWeb.Reliability.Tests;

/// <summary>
/// The fault harness (the app's storage stack, tests/TrussWeb.FaultHarness) streams member saves and is
/// killed with SIGKILL in the middle of the stream; then the database must pass its integrity check, the
/// app must start over it, every acknowledged save must be there with its value, and saving must go on.
/// </summary>
public abstract class KillDuringSavesTests
{
    private static readonly TimeSpan Patience = TimeSpan.FromSeconds(150);

    protected abstract Task<TestDatabase> CreateDatabaseAsync();

    /// <summary>The engine's own consistency check after the crash.</summary>
    protected abstract Task AssertIntactAsync(TestDatabase database);

    [Fact]
    public async Task Killing_the_writer_mid_stream_loses_no_acknowledged_save()
    {
        await using var database = await CreateDatabaseAsync();
        var environment = HarnessProcess.Environment(database);
        IReadOnlyList<Save> acks;
        IReadOnlyList<Save> tries;
        await using (var harness = HarnessProcess.Start(environment, "--count", "5000"))
        {
            await harness.WaitForAcksAsync(30, Patience);
            // land the kill somewhere inside the next save rather than just after an ack
            await Task.Delay(Random.Shared.Next(0, 40));
            await harness.KillHardAsync();
            acks = harness.Acks;
            tries = harness.Tries;
            Assert.False(harness.Done, "the stream was still running when it was killed");
        }

        Assert.True(acks.Count >= 30);
        await AssertIntactAsync(database);

        var stored = await StoredData.MembersAsync(database);
        var audited = await StoredData.AuditedKxAsync(database.Provider.ToString(), database.ConnectionString);
        // The save in flight when the process died (tried, not acknowledged) may or may not have committed.
        var inFlight = tries.Where(t => t.Seq > acks.Max(a => a.Seq)).MaxBy(t => t.Seq);
        foreach (var group in acks.GroupBy(a => a.MemberId))
        {
            var last = group.MaxBy(a => a.Seq)!;
            var row = stored[group.Key];
            var committedInFlight = inFlight is not null && inFlight.MemberId == group.Key && row.Kx == inFlight.Kx;
            Assert.True(row.Kx == last.Kx || committedInFlight,
                $"member {row.Mark}: stored Kx {row.Kx}, last acknowledged {last.Kx} (save {last.Seq}), in flight {inFlight?.Kx}");
            Assert.Equal(committedInFlight ? last.Version + 1 : last.Version, row.Version);
            foreach (var ack in group)
            {
                Assert.Contains(ack.Kx, audited[group.Key]);
            }
        }

        // The real app starts over the crashed database and reports ready.
        await using (var app = AppProcess.Start(Repo.WebDll, environment))
        {
            using var http = new HttpClient { Timeout = TimeSpan.FromSeconds(10) };
            await app.WaitReadyAsync(http);
        }

        // And saving goes on where it stopped.
        await using (var again = HarnessProcess.Start(environment, "--from", "9000", "--count", "3"))
        {
            Assert.Equal(0, await again.WaitExitAsync(Patience));
            Assert.True(again.Done, again.Log);
            Assert.Equal(3, again.Acks.Count);
        }
    }
}

public sealed class SqliteKillDuringSavesTests : KillDuringSavesTests
{
    protected override Task<TestDatabase> CreateDatabaseAsync() => Task.FromResult<TestDatabase>(new SqliteTestDatabase());

    protected override Task AssertIntactAsync(TestDatabase database)
    {
        Assert.Equal("ok", StoredData.SqliteIntegrity(((SqliteTestDatabase)database).FilePath));
        return Task.CompletedTask;
    }
}

[Collection(PostgresCollection.Name)]
public sealed class PostgresKillDuringSavesTests(PostgresClusterFixture cluster) : KillDuringSavesTests
{
    protected override async Task<TestDatabase> CreateDatabaseAsync() => await PostgresTestDatabase.CreateAsync(cluster.AdminConnectionString);

    protected override async Task AssertIntactAsync(TestDatabase database) =>
        Assert.True(await StoredData.PostgresIndexCheckAsync(database.ConnectionString) > 10, "amcheck ran over the indexes");
}
