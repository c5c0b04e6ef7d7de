using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Hosting;

namespace TrussWeb.Web.Tests.Http;

/// <summary>The real app in demo mode over a throwaway SQLite file (deleted on dispose).</summary>
public sealed class DemoAppFactory : WebApplicationFactory<Program>
{
    private readonly string _file = Path.Combine(Path.GetTempPath(), $"tw-web-tests-{Guid.NewGuid():N}.db");

    /// <summary>The export folder of this app (deleted on dispose).</summary>
    public string ExportFolder { get; } = Path.Combine(Path.GetTempPath(), $"tw-web-exports-{Guid.NewGuid():N}");

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        builder.UseSetting("TrussWeb:Database:ConnectionString", $"Data Source={_file}");
        builder.UseSetting(TrussWebStartupOptions.DemoKey, "true");
        builder.UseSetting("TrussWeb:Exports:Folder", ExportFolder);
        builder.UseEnvironment("Development");
    }

    public HttpClient CreateBrowser() =>
        CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false, HandleCookies = true });

    /// <summary>Adds a user with a global role (member of no project).</summary>
    public async Task CreateUserAsync(string email, string password, string role)
    {
        using var scope = Services.CreateScope();
        var users = scope.ServiceProvider.GetRequiredService<UserManager<AppUser>>();
        var user = new AppUser { UserName = email, Email = email, EmailConfirmed = true, DisplayName = "Test " + role };
        var created = await users.CreateAsync(user, password);
        Assert.True(created.Succeeded, string.Join("; ", created.Errors.Select(e => e.Description)));
        Assert.True((await users.AddToRoleAsync(user, role)).Succeeded);
    }

    protected override void Dispose(bool disposing)
    {
        base.Dispose(disposing);
        Microsoft.Data.Sqlite.SqliteConnection.ClearAllPools();
        if (Directory.Exists(ExportFolder))
        {
            Directory.Delete(ExportFolder, recursive: true);
        }

        foreach (var f in new[] { _file, _file + "-wal", _file + "-shm" })
        {
            if (File.Exists(f))
            {
                File.Delete(f);
            }
        }
    }
}
