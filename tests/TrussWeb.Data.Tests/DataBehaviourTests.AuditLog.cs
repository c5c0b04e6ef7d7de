using System.Data.Common;
using Microsoft.EntityFrameworkCore;
using TrussWeb.Data.Tests.Support;

namespace TrussWeb.Data.Tests;

/// <summary>The append-only audit log.</summary>
public abstract partial class DataBehaviourTests
{
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
}
