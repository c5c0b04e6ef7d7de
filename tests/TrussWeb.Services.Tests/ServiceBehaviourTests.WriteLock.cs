using System.Globalization;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Npgsql;
using TrussWeb.Data;
using TrussWeb.Services.Common;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Design;

namespace TrussWeb.Services.Tests;

/// <summary>
/// Saves of one truss queue behind its write lock (Common/TrussWriteLock) instead of racing on the truss's snapshot
/// rows: saves of different members never conflict, also from two app instances (two service providers over one
/// database); a stale save of the same member is still a Conflict. No timing is asserted.
/// </summary>
public abstract partial class ServiceBehaviourTests
{
    private static string Invariant(double v) => v.ToString("R", CultureInfo.InvariantCulture);

    [Fact]
    public async Task Saves_of_different_members_from_two_app_instances_at_once_all_succeed_and_the_stored_design_has_every_value()
    {
        var (_, truss) = await ProjectWithTrussAsync();
        var second = NewServices(); // a second app instance over the same database (own pools, own DI)
        var members = truss.Members.OrderBy(m => m.Mark, StringComparer.Ordinal).Take(12).ToList();
        Assert.True(members.Count >= 10, $"the generated truss has only {members.Count} members");
        // Every session loads its member before anyone saves: all start from the same stored state.
        var sessions = new List<(IDesignService Design, Guid MemberId, MemberDesignDetail Loaded, double Kx)>();
        for (var i = 0; i < members.Count; i++)
        {
            var design = As(Designer, i % 2 == 0 ? Services : second).Design;
            var loaded = Ok(await design.GetMemberDesignAsync(truss.Id, members[i].Id));
            // Kx values no other session uses, inside Core's plausible 0.1 to 10 (common practice: K below 1 for a braced member)
            sessions.Add((design, members[i].Id, loaded, Math.Round(0.61 + i * 0.017, 3)));
        }

        using var gate = new SemaphoreSlim(0, sessions.Count);
        var saves = sessions.Select(s => Task.Run(async () =>
        {
            await gate.WaitAsync();
            return await s.Design.UpdateMemberDesignAsync(truss.Id, s.MemberId, new MemberDesignInput(s.Loaded.Overrides with { Kx = s.Kx }, s.Loaded.MemberVersion));
        })).ToList();
        gate.Release(sessions.Count);
        var results = await Task.WhenAll(saves).WaitAsync(TimeSpan.FromMinutes(3));

        Assert.All(results, r => Assert.True(r.IsOk, $"{r.Kind}: {r.Message}"));
        await using var db = await ContextAsync();
        var stored = await db.TrussMembers.AsNoTracking().Where(m => m.TrussId == truss.Id).ToDictionaryAsync(m => m.Id);
        var storedDesign = Ok(await As(Checker).Design.GetTrussDesignAsync(truss.Id)).Members.ToDictionary(m => m.MemberId);
        foreach (var (s, r) in sessions.Zip(results))
        {
            Assert.Equal(s.Kx, stored[s.MemberId].Kx);
            // one version step per save: nobody else wrote the row and no save was lost
            Assert.Equal(s.Loaded.MemberVersion + 1, stored[s.MemberId].Version);
            Assert.Equal(stored[s.MemberId].Version, r.Value!.MemberVersion);
            // the stored design (from whichever save came last) was computed with every other session's value
            Assert.Equal(s.Kx, storedDesign[s.MemberId].Lengths.Kx);
        }
    }

    [Fact]
    public async Task Two_saves_of_the_same_member_from_the_same_loaded_version_on_two_app_instances_give_exactly_one_conflict()
    {
        var (_, truss) = await ProjectWithTrussAsync();
        var second = NewServices();
        var member = truss.Members.OrderBy(m => m.Mark, StringComparer.Ordinal).First();
        var first = As(Designer).Design;
        var other = As(Designer, second).Design;
        var loadedByFirst = Ok(await first.GetMemberDesignAsync(truss.Id, member.Id));
        var loadedByOther = Ok(await other.GetMemberDesignAsync(truss.Id, member.Id));
        Assert.Equal(loadedByFirst.MemberVersion, loadedByOther.MemberVersion);

        using var gate = new SemaphoreSlim(0, 2);
        Task<ServiceResult<MemberDesignDetail>> Save(IDesignService design, MemberDesignDetail loaded, double kx) => Task.Run(async () =>
        {
            await gate.WaitAsync();
            return await design.UpdateMemberDesignAsync(truss.Id, member.Id, new MemberDesignInput(loaded.Overrides with { Kx = kx }, loaded.MemberVersion));
        });
        var a = Save(first, loadedByFirst, 0.72);
        var b = Save(other, loadedByOther, 0.86);
        gate.Release(2);
        var results = await Task.WhenAll(a, b).WaitAsync(TimeSpan.FromMinutes(2));

        Assert.Single(results, r => r.IsOk);
        var loser = Assert.Single(results, r => !r.IsOk);
        Assert.Equal(ResultKind.Conflict, loser.Kind);
        var (winnerKx, loserKx) = results[0].IsOk ? (0.72, 0.86) : (0.86, 0.72);
        var conflict = Assert.Single(loser.Conflicts);
        Assert.Equal("TrussMember", conflict.EntityType);
        Assert.Equal(Invariant(loserKx), conflict.YourValues["Kx"]);
        await using var db = await ContextAsync();
        var stored = await db.TrussMembers.AsNoTracking().SingleAsync(m => m.Id == member.Id);
        Assert.Equal(winnerKx, stored.Kx);
        Assert.Equal(loadedByFirst.MemberVersion + 1, stored.Version);
    }

    [Fact]
    public async Task The_truss_write_lock_is_held_from_the_start_of_the_save_transaction_until_it_commits()
    {
        var (_, truss) = await ProjectWithTrussAsync();
        await using var holder = await ContextAsync();

        Assert.True(await OtherWriterGetsInAsync(truss.Id), "nothing holds the lock yet, another writer must get in");
        await TrussWriteLock.AcquireAsync(holder, truss.Id, CancellationToken.None);
        Assert.True(TrussWriteLock.IsHeld(holder));
        // the lock is held before the save has read or written anything of the truss
        Assert.False(await OtherWriterGetsInAsync(truss.Id), "another writer got in while the lock was held");
        await TrussWriteLock.CommitAsync(holder, CancellationToken.None);
        Assert.False(TrussWriteLock.IsHeld(holder));
        Assert.True(await OtherWriterGetsInAsync(truss.Id), "the lock was not released by the commit");
    }

    [Fact]
    public async Task Snapshots_of_an_existing_truss_are_never_replaced_without_its_write_lock()
    {
        var (_, truss) = await ProjectWithTrussAsync();
        await using var db = await ContextAsync();
        var row = await DesignInputBuilder.LoadTrussAsync(db, truss.Id, CancellationToken.None);

        var refused = await Assert.ThrowsAsync<InvalidOperationException>(() =>
            DesignRunner.DesignAndStageAsync(db, row!, Designer, Clock, CancellationToken.None));

        Assert.Contains("write lock", refused.Message, StringComparison.Ordinal);
    }

    /// <summary>
    /// Whether a writer on a connection of its own could take the truss's write lock right now, without waiting:
    /// SQLite <c>BEGIN IMMEDIATE</c> with no busy wait; PostgreSQL the same row lock with <c>NOWAIT</c>.
    /// </summary>
    private async Task<bool> OtherWriterGetsInAsync(Guid trussId)
    {
        if (Database is SqliteTestDatabase sqlite)
        {
            await using var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = sqlite.FilePath, Pooling = false, DefaultTimeout = 1 }.ToString());
            await connection.OpenAsync();
            await using var command = connection.CreateCommand();
            command.CommandText = "PRAGMA busy_timeout = 0;";
            await command.ExecuteNonQueryAsync();
            try
            {
                command.CommandText = "BEGIN IMMEDIATE;";
                await command.ExecuteNonQueryAsync();
            }
            catch (SqliteException ex) when (ex.SqliteErrorCode == 5) // SQLITE_BUSY: another connection holds the write lock
            {
                return false;
            }

            command.CommandText = "ROLLBACK;";
            await command.ExecuteNonQueryAsync();
            return true;
        }

        await using var pg = new NpgsqlConnection(Database.ConnectionString);
        await pg.OpenAsync();
        await using var transaction = await pg.BeginTransactionAsync();
        await using var probe = new NpgsqlCommand("SELECT \"Id\" FROM \"Trusses\" WHERE \"Id\" = @id FOR NO KEY UPDATE NOWAIT", pg, transaction);
        probe.Parameters.AddWithValue("id", trussId);
        try
        {
            Assert.Equal(trussId, await probe.ExecuteScalarAsync());
        }
        catch (PostgresException ex) when (ex.SqlState == PostgresErrorCodes.LockNotAvailable)
        {
            return false;
        }

        await transaction.RollbackAsync();
        return true;
    }
}
