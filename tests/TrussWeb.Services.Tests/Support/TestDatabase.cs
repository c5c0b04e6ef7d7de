using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Time.Testing;
using TrussWeb.Data;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Hosting;

namespace TrussWeb.Services.Tests.Support;

/// <summary>One empty database of one provider, private to a test, removed on dispose.</summary>
public abstract class TestDatabase : IAsyncDisposable
{
    public abstract DatabaseProvider Provider { get; }

    public abstract string ConnectionString { get; }

    /// <summary>
    /// A service provider built the way the app builds it (AddTrussWebData + AddTrussWebServices from
    /// configuration), whose caller (and audit-stamp user) is whatever <paramref name="callers"/> holds now.
    /// </summary>
    public ServiceProvider BuildServices(FakeTimeProvider clock, CallerHolder callers)
    {
        var configuration = new ConfigurationBuilder()
            .AddInMemoryCollection(new Dictionary<string, string?>
            {
                [DatabaseSettings.ProviderKey] = Provider.ToString(),
                [DatabaseSettings.ConnectionStringKey] = ConnectionString,
            })
            .Build();
        var services = new ServiceCollection();
        services.AddLogging();
        services.AddSingleton<TimeProvider>(clock);
        services.AddSingleton(callers);
        services.AddScoped<ICallerContext>(sp => sp.GetRequiredService<CallerHolder>().Current);
        services.AddScoped<ICurrentUser>(sp => sp.GetRequiredService<CallerHolder>().Current);
        services.AddTrussWebData(configuration, Path.GetTempPath());
        services.AddTrussWebServices(configuration);
        return services.BuildServiceProvider(new ServiceProviderOptions { ValidateScopes = true });
    }

    public abstract ValueTask DisposeAsync();
}

/// <summary>Who the next scope acts as.</summary>
public sealed class CallerHolder
{
    public FixedCaller Current { get; set; } = new(null, "nobody");
}
