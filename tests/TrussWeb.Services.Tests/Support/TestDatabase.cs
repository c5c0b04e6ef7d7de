using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Time.Testing;
using TrussWeb.Data;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Hosting;
using TrussWeb.Testing;

namespace TrussWeb.Services.Tests.Support;

/// <summary>Service providers over a test database, built the way the app builds them.</summary>
public static class TestDatabaseServices
{
    /// <summary>
    /// A service provider built the way the app builds it (AddTrussWebData + AddTrussWebServices from
    /// configuration), whose caller (and audit-stamp user) is whatever <paramref name="callers"/> holds now.
    /// </summary>
    public static ServiceProvider BuildServices(this TestDatabase database, FakeTimeProvider clock, CallerHolder callers, Action<IServiceCollection>? configure = null)
    {
        var configuration = database.Configuration();
        var services = new ServiceCollection();
        services.AddLogging();
        services.AddSingleton<TimeProvider>(clock);
        services.AddSingleton(callers);
        services.AddScoped<ICallerContext>(sp => sp.GetRequiredService<CallerHolder>().Current);
        services.AddScoped<ICurrentUser>(sp => sp.GetRequiredService<CallerHolder>().Current);
        services.AddTrussWebData(configuration, Path.GetTempPath());
        services.AddTrussWebServices(configuration);
        configure?.Invoke(services);
        return services.BuildServiceProvider(new ServiceProviderOptions { ValidateScopes = true });
    }
}

/// <summary>Who the next scope acts as.</summary>
public sealed class CallerHolder
{
    public FixedCaller Current { get; set; } = new(null, "nobody");
}
