using System.Net.Http.Headers;
using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Identity;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Hosting;

namespace TrussWeb.Api.Tests.Support;

/// <summary>
/// The real app in demo mode over a real database (a SQLite file by default, or the given test
/// database), Production environment (so nothing depends on the developer exception page).
/// </summary>
public class ApiAppFactory(TestDatabase database, int requestsPerWindow = 100_000) : WebApplicationFactory<Program>
{
    public TestDatabase Database { get; } = database;

    /// <summary>This app's own export folder: the export runner deletes files no live job of its own owns, so apps running side by side must not share one.</summary>
    public string ExportFolder { get; } = Path.Combine(Path.GetTempPath(), "trussweb-api-exports-" + Guid.NewGuid().ToString("N")[..8]);

    protected override void ConfigureWebHost(IWebHostBuilder builder)
    {
        builder.UseSetting("TrussWeb:Database:Provider", Database.Provider.ToString());
        builder.UseSetting("TrussWeb:Database:ConnectionString", Database.ConnectionString);
        builder.UseSetting(TrussWebStartupOptions.DemoKey, "true");
        builder.UseSetting("TrussWeb:Exports:Folder", ExportFolder);
        builder.UseSetting("TrussWeb:Api:RequestsPerWindow", requestsPerWindow.ToString(System.Globalization.CultureInfo.InvariantCulture));
        builder.UseSetting("TrussWeb:Api:WindowSeconds", "60");
        builder.UseEnvironment("Production");
    }

    /// <summary>A client without cookies or redirects.</summary>
    public HttpClient Anonymous() => CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false, HandleCookies = false });

    /// <summary>A client sending the token as a bearer credential.</summary>
    public HttpClient WithToken(string token)
    {
        var client = Anonymous();
        client.DefaultRequestHeaders.Authorization = new AuthenticationHeaderValue("Bearer", token);
        return client;
    }

    /// <summary>Creates a token for the demo user with <paramref name="email"/> through the token service.</summary>
    public async Task<CreatedApiToken> CreateTokenAsync(string email, string scope = ApiTokenScopes.ReadWrite, string name = "test")
    {
        using var scope1 = Services.CreateScope();
        var caller = await CallerAsync(scope1.ServiceProvider, email);
        var service = ServiceCollectionExtensions.TokenServiceFor(scope1.ServiceProvider, caller);
        var result = await service.CreateAsync(new ApiTokenInput(name, scope, DateTime.UtcNow.AddDays(30)));
        Assert.True(result.IsOk, result.Message);
        return result.Value!;
    }

    public async Task<ServiceResult<ApiTokenView>> RevokeAsync(string email, ApiTokenView token)
    {
        using var scope1 = Services.CreateScope();
        var caller = await CallerAsync(scope1.ServiceProvider, email);
        return await ServiceCollectionExtensions.TokenServiceFor(scope1.ServiceProvider, caller).RevokeAsync(token.Id, token.Version);
    }

    public async Task<string> UserIdAsync(string email)
    {
        using var scope1 = Services.CreateScope();
        var users = scope1.ServiceProvider.GetRequiredService<UserManager<AppUser>>();
        return (await users.FindByEmailAsync(email))!.Id;
    }

    /// <summary>Runs <paramref name="work"/> on a fresh context of the app's database.</summary>
    public async Task<T> WithDbAsync<T>(Func<TrussWebDbContext, Task<T>> work)
    {
        using var scope1 = Services.CreateScope();
        var factory = scope1.ServiceProvider.GetRequiredService<Microsoft.EntityFrameworkCore.IDbContextFactory<TrussWebDbContext>>();
        await using var db = await factory.CreateDbContextAsync();
        return await work(db);
    }

    private static async Task<FixedCaller> CallerAsync(IServiceProvider services, string email)
    {
        var users = services.GetRequiredService<UserManager<AppUser>>();
        var user = await users.FindByEmailAsync(email) ?? throw new InvalidOperationException($"no user {email}");
        return new FixedCaller(user.Id, user.DisplayName, [.. await users.GetRolesAsync(user)]);
    }

    public override async ValueTask DisposeAsync()
    {
        await base.DisposeAsync();
        await Database.DisposeAsync();
        try
        {
            if (Directory.Exists(ExportFolder))
            {
                Directory.Delete(ExportFolder, recursive: true);
            }
        }
        catch (IOException)
        {
            // a file still open; the temp folder is cleaned by the system
        }
    }
}
