using TrussWeb.Reliability.Tests.Support;

namespace TrussWeb.Reliability.Tests;

/// <summary>
/// The backup verb of the app (<c>TrussWeb.Web backup &lt;file&gt;</c>) taken while the fault harness keeps saving;
/// the restore verb into a fresh database; the restored copy must hold every save acknowledged before the
/// backup began, pass the integrity check, hold nothing newer than the backup's end, and the app must start over it.
/// </summary>
public sealed class BackupWhileWritingTests
{
    private static readonly TimeSpan Patience = TimeSpan.FromSeconds(150);

    [Fact]
    public async Task A_backup_taken_during_saves_restores_every_save_acknowledged_before_it()
    {
        await using var source = new SqliteTestDatabase();
        await using var fresh = new SqliteTestDatabase();
        var backupFile = Path.Combine(source.Folder, "during-saves.backup.db");
        var environment = HarnessProcess.Environment(source);
        IReadOnlyList<Save> before;
        IReadOnlyList<Save> triedByEnd;
        await using (var harness = HarnessProcess.Start(environment, "--count", "5000"))
        {
            await harness.WaitForAcksAsync(15, Patience);
            before = harness.Acks;
            var (code, output) = await AppProcess.RunVerbAsync(Repo.WebDll, environment, "backup", backupFile);
            triedByEnd = harness.Tries;
            Assert.True(code == 0, output);
            var acksAtEnd = harness.Acks.Count;
            Assert.False(harness.HasExited, "the writer kept running through the backup");
            await harness.WaitForAcksAsync(acksAtEnd + 3, Patience);
            await harness.KillHardAsync();
        }

        var restoreEnvironment = HarnessProcess.Environment(fresh);
        var (restoreCode, restoreOutput) = await AppProcess.RunVerbAsync(Repo.WebDll, restoreEnvironment, "restore", backupFile);
        Assert.True(restoreCode == 0, restoreOutput);
        Assert.Equal("ok", StoredData.SqliteIntegrity(fresh.FilePath));

        var stored = await StoredData.MembersAsync(fresh);
        var audited = await StoredData.AuditedKxAsync(fresh.Provider.ToString(), fresh.ConnectionString);
        foreach (var ack in before)
        {
            Assert.Contains(ack.Kx, audited[ack.MemberId]);
        }

        // Each member holds its value from a save at or after its last one acknowledged before the backup,
        // and no later than the saves tried by the time the backup ended (a consistent point in time).
        var latestTried = triedByEnd.Max(t => t.Seq);
        foreach (var group in before.GroupBy(a => a.MemberId))
        {
            var lastBefore = group.MaxBy(a => a.Seq)!;
            var row = stored[group.Key];
            var candidates = triedByEnd.Where(t => t.MemberId == group.Key && t.Seq >= lastBefore.Seq && t.Seq <= latestTried).Select(t => t.Kx).ToList();
            Assert.True(row.Kx is { } kx && candidates.Contains(kx),
                $"member {row.Mark}: restored Kx {row.Kx}; expected one of {string.Join(", ", candidates)}");
        }

        await using var app = AppProcess.Start(Repo.WebDll, restoreEnvironment);
        using var http = new HttpClient { Timeout = TimeSpan.FromSeconds(10) };
        var ready = await app.WaitReadyAsync(http);
        Assert.Equal(System.Text.Json.JsonValueKind.Object, ready.ValueKind);
    }
}
