using Microsoft.AspNetCore.Identity;
using Microsoft.Data.Sqlite;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Hosting;

namespace TrussWeb.Services.Tests;

public abstract partial class ServiceBehaviourTests
{
    [Fact]
    public async Task Start_up_seeds_catalogues_creates_the_first_administrator_once_and_the_demo_once()
    {
        await TrussWebStartup.InitialiseAsync(Services, Options(demo: true));
        await TrussWebStartup.InitialiseAsync(Services, Options(demo: true));

        await using var db = await ContextAsync();
        Assert.True(await db.SteelGrades.CountAsync() >= 5);
        Assert.True(await db.SectionCatalogue.CountAsync() > 100);
        var output = StartupOutput.ToString();
        Assert.Single(System.Text.RegularExpressions.Regex.Matches(output, "created the first administrator"));
        Assert.Equal(2, System.Text.RegularExpressions.Regex.Matches(output, "DEMO MODE").Count);
        Assert.Contains("designer@demo.trussweb.local", output, StringComparison.Ordinal);
        var demo = await db.Projects.Include(p => p.Memberships).SingleAsync(p => p.Name == DemoSeeder.ProjectName);
        Assert.Equal(3, demo.Memberships.Count);
        var truss = await db.Trusses.SingleAsync(t => t.ProjectId == demo.Id);
        var memberCount = await db.TrussMembers.CountAsync(m => m.TrussId == truss.Id);
        Assert.Equal(memberCount + 1, await db.DesignSnapshots.CountAsync(s => s.TrussId == truss.Id));
        Assert.True(await db.AuditEntries.AnyAsync(a => a.Action == "SizingAccepted" && a.EntityId == truss.Id.ToString()));
        Assert.Equal(4, await db.Users.CountAsync(u => u.Email!.EndsWith("@demo.trussweb.local")));
        await using var scope = Services.CreateAsyncScope();
        var users = scope.ServiceProvider.GetRequiredService<UserManager<AppUser>>();
        var designer = await users.FindByEmailAsync("designer@demo.trussweb.local");
        Assert.True(await users.CheckPasswordAsync(designer!, DemoSeeder.Users[0].Password));
        var first = await users.FindByEmailAsync(TrussWebStartupOptions.DefaultAdminEmail);
        Assert.True(await users.IsInRoleAsync(first!, Roles.Administrator));
        Assert.True(await users.CheckPasswordAsync(first!, "first-admin-pass-1"));
    }

    [Fact]
    public async Task The_create_user_and_reset_password_verbs_work_and_refuse_bad_input()
    {
        var output = new StringWriter();
        var error = new StringWriter();

        Assert.Equal(0, await AdminCommands.RunAsync(["create-user", "vusi.verb@example.test", "checker", "--password", "verb-password-1"], Services, output, error));
        Assert.Equal(1, await AdminCommands.RunAsync(["create-user", "vusi.verb@example.test", "Checker", "--password", "verb-password-1"], Services, output, error));
        Assert.Equal(1, await AdminCommands.RunAsync(["create-user", "vusi.other@example.test", "Wizard"], Services, output, error));
        Assert.Equal(0, await AdminCommands.RunAsync(["reset-password", "vusi.verb@example.test", "--password", "reset-password-2"], Services, output, error));
        Assert.Equal(1, await AdminCommands.RunAsync(["reset-password", "nobody@example.test"], Services, output, error));
        Assert.Equal(1, await AdminCommands.RunAsync(["frobnicate"], Services, output, error));
        Assert.Equal(0, await AdminCommands.RunAsync(["migrate"], Services, output, error));

        Assert.Contains("exists already", error.ToString(), StringComparison.Ordinal);
        Assert.Contains("unknown role 'Wizard'", error.ToString(), StringComparison.Ordinal);
        await using var scope = Services.CreateAsyncScope();
        var users = scope.ServiceProvider.GetRequiredService<UserManager<AppUser>>();
        var user = await users.FindByEmailAsync("vusi.verb@example.test");
        Assert.True(await users.IsInRoleAsync(user!, Roles.Checker));
        Assert.True(await users.CheckPasswordAsync(user!, "reset-password-2"));
        Assert.False(await users.CheckPasswordAsync(user!, "verb-password-1"));
    }

    [Fact]
    public async Task Backup_then_restore_brings_back_the_saved_rows_and_restore_refuses_a_file_that_is_not_a_database()
    {
        var (_, _) = await ProjectWithTrussAsync();
        var folder = Path.Combine(Path.GetTempPath(), "trussweb-backup-tests", Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(folder);
        try
        {
            var backup = Path.Combine(folder, "backup.db");
            var output = new StringWriter();
            var error = new StringWriter();
            var code = await AdminCommands.RunAsync(["backup", backup], Services, output, error);
            if (Database.Provider == DatabaseProvider.Postgres)
            {
                Assert.Equal(1, code);
                Assert.Contains("pg_dump", error.ToString(), StringComparison.Ordinal);
                Assert.Equal(1, await AdminCommands.RunAsync(["restore", backup], Services, output, error));
                return;
            }

            Assert.Equal(0, code);
            var counts = await CountsAsync();
            Ok(await As(Lead).Projects.CreateAsync(new ProjectInput("Added after the backup", null, null, null, "A", "SANS 10162-1", "S355JR")));
            Assert.NotEqual(counts, await CountsAsync());

            var junk = Path.Combine(folder, "notes.db");
            await File.WriteAllTextAsync(junk, "these are meeting notes, not a database");
            Assert.Equal(1, await AdminCommands.RunAsync(["restore", junk], Services, output, error));
            Assert.Contains("not a SQLite database", error.ToString(), StringComparison.Ordinal);

            SqliteConnection.ClearAllPools();
            Assert.Equal(0, await AdminCommands.RunAsync(["restore", backup], Services, output, error));
            Assert.Equal(counts, await CountsAsync(NewServices()));
        }
        finally
        {
            SqliteConnection.ClearAllPools();
            Directory.Delete(folder, recursive: true);
        }
    }

    private async Task<string> CountsAsync(ServiceProvider? provider = null)
    {
        await using var db = await ContextAsync(provider);
        return string.Join(",",
            await db.Projects.CountAsync(), await db.Trusses.CountAsync(), await db.TrussNodes.CountAsync(), await db.TrussMembers.CountAsync(),
            await db.MemberGroups.CountAsync(), await db.LoadCombinations.CountAsync(), await db.DesignSnapshots.CountAsync(), await db.AuditEntries.CountAsync(),
            await db.Users.CountAsync(), await db.SectionCatalogue.CountAsync(), await db.SteelGrades.CountAsync());
    }
}
