using System.Collections.Concurrent;
using System.Globalization;
using System.Net;
using System.Net.Http.Headers;
using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using TrussWeb.Reliability.Tests.Support;
using TrussWeb.Services.Hosting;

namespace TrussWeb.Reliability.Tests;

/// <summary>
/// The real web server (the built TrussWeb.Web.dll in demo mode) is killed with SIGKILL while a client streams
/// member saves through the HTTP API (PUT /api/v1/trusses/{truss}/members/{member} with the Version it was
/// given). Then the database must pass its integrity check, every save the server acknowledged (200 with the new
/// version) must be stored with its value, read back both through the restarted server's API and straight from the
/// database, versions must agree, and saving must go on. <see cref="KillDuringSavesTests"/> does the same one layer
/// down (the storage stack in a console host).
/// </summary>
public abstract class ServerKillDuringSavesTests
{
    private static readonly TimeSpan Patience = TimeSpan.FromSeconds(150);

    protected abstract Task<TestDatabase> CreateDatabaseAsync();

    /// <summary>The engine's own consistency check after the crash.</summary>
    protected abstract Task AssertIntactAsync(TestDatabase database);

    private sealed record ApiSave(int Seq, Guid MemberId, double Kx, long Version);

    private sealed class Member(Guid id, JsonObject overrides, long version)
    {
        public Guid Id { get; } = id;

        public JsonObject Overrides { get; set; } = overrides;

        public long Version { get; set; } = version;
    }

    [Fact]
    public async Task Killing_the_server_mid_stream_loses_no_acknowledged_save()
    {
        await using var database = await CreateDatabaseAsync();
        var environment = HarnessProcess.Environment(database);
        var designer = DemoSeeder.Users.Single(u => u.Role == "Designer").Email;
        using var http = new HttpClient { Timeout = TimeSpan.FromSeconds(30) };

        var tries = new ConcurrentQueue<ApiSave>();
        var acks = new ConcurrentQueue<ApiSave>();
        Guid trussId;
        List<Member> members;
        string token;
        Task? stream = null;
        var app = AppProcess.Start(Repo.WebDll, environment, "--demo");
        try
        {
            await app.WaitReadyAsync(http);
            // A read-write token from the administrator verb, as an operator would make one.
            var (code, output) = await AppProcess.RunVerbAsync(Repo.WebDll, environment, "create-token", designer, "kill-test", "--scope", "read-write", "--days", "1");
            Assert.True(code == 0, output);
            token = output.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)[^1];
            Assert.StartsWith("tw_", token, StringComparison.Ordinal);
            http.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", token);

            trussId = await DemoTrussAsync(http, app.BaseAddress);
            members = await MembersAsync(http, app.BaseAddress, trussId);
            Assert.True(members.Count >= 4, $"the demo truss has {members.Count} members");

            stream = StreamAsync(http, app.BaseAddress, trussId, members, 0, 100_000, tries, acks, CancellationToken.None);
            var deadline = DateTime.UtcNow + Patience;
            while (acks.Count < 30)
            {
                Assert.True(DateTime.UtcNow < deadline, $"only {acks.Count} saves acknowledged within {Patience}:\n{app.Output}");
                Assert.False(stream.IsCompleted, $"the stream ended early: {stream.Exception}\n{app.Output}");
                await Task.Delay(20);
            }

            // Land the kill somewhere inside the next save rather than just after an acknowledgement.
            await Task.Delay(Random.Shared.Next(0, 40));
        }
        finally
        {
            // AppProcess.DisposeAsync is Process.Kill(entireProcessTree: true): SIGKILL on Linux, no shutdown hooks.
            await app.DisposeAsync();
        }

        // The stream ends when the server stops answering; any other failure (a 5xx, a wrong version) surfaces here.
        await stream!;

        var acknowledged = acks.ToArray();
        var attempted = tries.ToArray();
        Assert.True(acknowledged.Length >= 30);
        await AssertIntactAsync(database);

        // Straight from the database: every member's last acknowledged value, or the one save in flight when the
        // server died (tried, not acknowledged), which may or may not have committed.
        var stored = await StoredData.MembersAsync(database);
        var audited = await StoredData.AuditedKxAsync(database.Provider.ToString(), database.ConnectionString);
        var inFlight = attempted.Where(t => t.Seq > acknowledged.Max(a => a.Seq)).MaxBy(t => t.Seq);
        var expected = new Dictionary<Guid, (double Kx, long Version)>();
        foreach (var group in acknowledged.GroupBy(a => a.MemberId))
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

            expected[group.Key] = (row.Kx!.Value, row.Version);
        }

        // The same server restarted over the same database (no demo flag: the seeded data and the token are stored).
        await using var again = AppProcess.Start(Repo.WebDll, environment);
        await again.WaitReadyAsync(http);

        // Through the API: the same values and versions (with the ETag), for every member that was saved.
        var reread = await MembersAsync(http, again.BaseAddress, trussId);
        foreach (var (memberId, (kx, version)) in expected)
        {
            var member = reread.Single(m => m.Id == memberId);
            Assert.Equal(kx, member.Overrides["kx"]!.GetValue<double>());
            Assert.Equal(version, member.Version);
        }

        // And saving goes on where it stopped: every member once more, each acknowledged with its version plus one.
        var moreTries = new ConcurrentQueue<ApiSave>();
        var moreAcks = new ConcurrentQueue<ApiSave>();
        await StreamAsync(http, again.BaseAddress, trussId, reread, 9_000, reread.Count, moreTries, moreAcks, CancellationToken.None);
        Assert.Equal(reread.Count, moreAcks.Count);
        var after = await StoredData.MembersAsync(database);
        foreach (var ack in moreAcks)
        {
            Assert.Equal(ack.Kx, after[ack.MemberId].Kx);
            Assert.Equal(ack.Version, after[ack.MemberId].Version);
        }

        foreach (var (memberId, (_, version)) in expected)
        {
            Assert.Equal(version + 1, after[memberId].Version);
        }
    }

    /// <summary>
    /// Saves member (seq mod n) with Kx = <see cref="TrussWeb.FaultHarness.SaveStream.KxOf"/>(seq), one after another,
    /// recording each attempt before it is sent and each 200 with its new version. Returns when the server stops
    /// answering (it was killed) or after <paramref name="count"/> saves; any other answer fails the stream.
    /// </summary>
    private static async Task StreamAsync(HttpClient http, Uri baseAddress, Guid trussId, List<Member> members, int from, int count,
        ConcurrentQueue<ApiSave> tries, ConcurrentQueue<ApiSave> acks, CancellationToken cancellationToken)
    {
        await Task.Yield();
        for (var seq = from; seq < from + count && !cancellationToken.IsCancellationRequested; seq++)
        {
            var member = members[seq % members.Count];
            var kx = TrussWeb.FaultHarness.SaveStream.KxOf(seq);
            var overrides = (JsonObject)member.Overrides.DeepClone();
            overrides["kx"] = kx;
            var body = new JsonObject { ["overrides"] = overrides, ["version"] = member.Version }.ToJsonString();
            tries.Enqueue(new ApiSave(seq, member.Id, kx, member.Version));
            HttpResponseMessage response;
            try
            {
                response = await http.PutAsync(new Uri(baseAddress, $"api/v1/trusses/{trussId}/members/{member.Id}"),
                    new StringContent(body, Encoding.UTF8, "application/json"), cancellationToken);
            }
            catch (Exception ex) when (ex is HttpRequestException or TaskCanceledException or IOException)
            {
                return; // the server is gone
            }

            using (response)
            {
                var text = await ReadOrNullAsync(response);
                if (text is null)
                {
                    return; // the server died while answering: not acknowledged
                }

                if (response.StatusCode != HttpStatusCode.OK)
                {
                    throw new InvalidOperationException($"save {seq} answered {(int)response.StatusCode}: {text}");
                }

                var saved = JsonNode.Parse(text)!;
                var version = saved["memberVersion"]!.GetValue<long>();
                if (version != member.Version + 1 || saved["overrides"]!["kx"]!.GetValue<double>() != kx)
                {
                    throw new InvalidOperationException($"save {seq} acknowledged version {version} (sent {member.Version}): {text}");
                }

                member.Version = version;
                member.Overrides = saved["overrides"]!.AsObject().DeepClone().AsObject();
                acks.Enqueue(new ApiSave(seq, member.Id, kx, version));
            }
        }
    }

    private static async Task<string?> ReadOrNullAsync(HttpResponseMessage response)
    {
        try
        {
            return await response.Content.ReadAsStringAsync();
        }
        catch (Exception ex) when (ex is HttpRequestException or IOException or TaskCanceledException)
        {
            return null;
        }
    }

    private static async Task<Guid> DemoTrussAsync(HttpClient http, Uri baseAddress)
    {
        var projects = JsonDocument.Parse(await http.GetStringAsync(new Uri(baseAddress, "api/v1/projects"))).RootElement;
        var project = projects.EnumerateArray().Single(p => p.GetProperty("name").GetString() == DemoSeeder.ProjectName);
        return project.GetProperty("trusses").EnumerateArray().First().GetProperty("trussId").GetGuid();
    }

    /// <summary>Every member of the truss with its stored overrides and version (GET of each member; the ETag must be its version).</summary>
    private static async Task<List<Member>> MembersAsync(HttpClient http, Uri baseAddress, Guid trussId)
    {
        var truss = JsonDocument.Parse(await http.GetStringAsync(new Uri(baseAddress, $"api/v1/trusses/{trussId}"))).RootElement;
        var list = new List<Member>();
        foreach (var id in truss.GetProperty("members").EnumerateArray().OrderBy(m => m.GetProperty("mark").GetString(), StringComparer.Ordinal).Select(m => m.GetProperty("id").GetGuid()))
        {
            using var response = await http.GetAsync(new Uri(baseAddress, $"api/v1/trusses/{trussId}/members/{id}"));
            var text = await response.Content.ReadAsStringAsync();
            Assert.True(response.StatusCode == HttpStatusCode.OK, text);
            var detail = JsonNode.Parse(text)!;
            var version = detail["memberVersion"]!.GetValue<long>();
            Assert.Equal(string.Create(CultureInfo.InvariantCulture, $"\"{version}\""), response.Headers.ETag?.Tag);
            list.Add(new Member(id, detail["overrides"]!.AsObject().DeepClone().AsObject(), version));
        }

        return list;
    }
}

public sealed class SqliteServerKillDuringSavesTests : ServerKillDuringSavesTests
{
    protected override Task<TestDatabase> CreateDatabaseAsync() => Task.FromResult<TestDatabase>(new SqliteTestDatabase());

    protected override Task AssertIntactAsync(TestDatabase database)
    {
        Assert.Equal("ok", StoredData.SqliteIntegrity(((SqliteTestDatabase)database).FilePath));
        return Task.CompletedTask;
    }
}

[Collection(PostgresCollection.Name)]
public sealed class PostgresServerKillDuringSavesTests(PostgresClusterFixture cluster) : ServerKillDuringSavesTests
{
    protected override async Task<TestDatabase> CreateDatabaseAsync() => await PostgresTestDatabase.CreateAsync(cluster.AdminConnectionString);

    protected override async Task AssertIntactAsync(TestDatabase database) =>
        Assert.True(await StoredData.PostgresIndexCheckAsync(database.ConnectionString) > 10, "amcheck ran over the indexes");
}
