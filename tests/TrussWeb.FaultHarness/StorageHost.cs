using Microsoft.AspNetCore.Identity;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Hosting;
using Microsoft.Extensions.Logging;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Hosting;

namespace TrussWeb.FaultHarness;

/// <summary>
/// The app's storage stack without the web server: configuration from the environment (TrussWeb__*), the
/// command line and <c>settings</c>; <c>AddTrussWebData</c> + <c>AddTrussWebServices</c> as Program.cs calls
/// them; <c>TrussWebStartup.InitialiseAsync</c> in demo mode (migrations, seed catalogues, the demo project
/// and sign-ins). Each <see cref="ScopeAs"/> is one "signed-in session": a DI scope whose caller is a user.
/// </summary>
public sealed class StorageHost : IAsyncDisposable
{
    private readonly IHost host;

    private StorageHost(IHost host) => this.host = host;

    public IServiceProvider Services => host.Services;

    public static async Task<StorageHost> StartAsync(string[] args, IReadOnlyDictionary<string, string?>? settings = null, CancellationToken cancellationToken = default)
    {
        var builder = Host.CreateApplicationBuilder(new HostApplicationBuilderSettings { Args = args, ContentRootPath = AppContext.BaseDirectory });
        if (settings is not null)
        {
            builder.Configuration.AddInMemoryCollection(settings);
        }

        builder.Logging.ClearProviders();
        builder.Logging.AddConsole(o => o.LogToStandardErrorThreshold = LogLevel.Trace);
        builder.Logging.SetMinimumLevel(LogLevel.Warning);
        builder.Services.AddScoped<ScopedCaller>();
        builder.Services.AddScoped<ICallerContext>(sp => sp.GetRequiredService<ScopedCaller>());
        builder.Services.AddScoped<ICurrentUser>(sp => sp.GetRequiredService<ScopedCaller>());
        builder.Services.AddTrussWebData(builder.Configuration, builder.Environment.ContentRootPath);
        builder.Services.AddTrussWebServices(builder.Configuration);
        var host = builder.Build();
        var options = TrussWebStartupOptions.From(builder.Configuration, ["--demo"], builder.Environment.ContentRootPath) with { Output = TextWriter.Null };
        await TrussWebStartup.InitialiseAsync(host.Services, options, cancellationToken).ConfigureAwait(false);
        return new StorageHost(host);
    }

    /// <summary>The demo user of <paramref name="role"/> (DemoSeeder) as a caller.</summary>
    public async Task<FixedCaller> DemoUserAsync(string role)
    {
        var (email, name, r, _) = DemoSeeder.Users.First(u => u.Role == role);
        return await UserAsync(email, name, r).ConfigureAwait(false);
    }

    public async Task<FixedCaller> UserAsync(string email, string displayName, string role)
    {
        await using var scope = host.Services.CreateAsyncScope();
        var users = scope.ServiceProvider.GetRequiredService<UserManager<AppUser>>();
        var user = await users.FindByEmailAsync(email).ConfigureAwait(false) ?? throw new InvalidOperationException($"No user {email}");
        return new FixedCaller(user.Id, displayName, role);
    }

    /// <summary>A DI scope acting as <paramref name="caller"/> (dispose it when done).</summary>
    public AsyncServiceScope ScopeAs(FixedCaller caller)
    {
        var scope = host.Services.CreateAsyncScope();
        scope.ServiceProvider.GetRequiredService<ScopedCaller>().Caller = caller;
        return scope;
    }

    /// <summary>The demo truss id (as the demo designer sees it).</summary>
    public async Task<Guid> DemoTrussIdAsync(CancellationToken cancellationToken = default)
    {
        await using var scope = ScopeAs(await DemoUserAsync(Roles.Designer).ConfigureAwait(false));
        var projects = await scope.ServiceProvider.GetRequiredService<IProjectService>().ListMyProjectsAsync(cancellationToken).ConfigureAwait(false);
        if (!projects.IsOk)
        {
            throw new InvalidOperationException($"Projects could not be listed: {projects.Message}");
        }

        return projects.Value!.First(p => p.Name == DemoSeeder.ProjectName).Trusses.First(t => t.Name == DemoSeeder.TrussName).TrussId;
    }

    public async ValueTask DisposeAsync()
    {
        if (host is IAsyncDisposable d)
        {
            await d.DisposeAsync().ConfigureAwait(false);
        }
        else
        {
            host.Dispose();
        }
    }
}

/// <summary>The caller of one scope (the web host's equivalent is the signed-in user of a request or circuit); nobody until set.</summary>
public sealed class ScopedCaller : ICallerContext, ICurrentUser
{
    public FixedCaller Caller { get; set; } = new(null, "nobody");

    public string? UserId => Caller.UserId;

    public string DisplayName => Caller.DisplayName;

    public IReadOnlySet<string> Roles => Caller.Roles;
}
