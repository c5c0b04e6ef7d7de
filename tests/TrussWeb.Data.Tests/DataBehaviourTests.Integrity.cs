using Microsoft.EntityFrameworkCore;
using TrussWeb.Data.Entities;
using TrussWeb.Data.Tests.Support;

namespace TrussWeb.Data.Tests;

/// <summary>Unique keys, foreign keys and cascades.</summary>
public abstract partial class DataBehaviourTests
{
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
}
