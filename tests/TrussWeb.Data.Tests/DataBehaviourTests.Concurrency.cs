using Microsoft.EntityFrameworkCore;
using TrussWeb.Data.Concurrency;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Tests;

/// <summary>Versions, audit stamps and conflicting saves.</summary>
public abstract partial class DataBehaviourTests
{
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
}
