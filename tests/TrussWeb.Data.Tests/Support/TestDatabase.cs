using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Time.Testing;

namespace TrussWeb.Data.Tests.Support;

/// <summary>One empty database of one provider, private to a test, removed on dispose.</summary>
public abstract class TestDatabase : IAsyncDisposable
{
    public abstract DatabaseProvider Provider { get; }

    public abstract string ConnectionString { get; }

    /// <summary>
    /// A fresh service provider over this database, built the way the app builds it
    /// (<see cref="DependencyInjection.AddTrussWebData"/> from configuration), with the given clock and user.
    /// </summary>
    public ServiceProvider BuildServices(FakeTimeProvider clock, TestUser user, Action<IServiceCollection>? configure = null)
    {
        var configuration = new ConfigurationBuilder()
            .AddInMemoryCollection(new Dictionary<string, string?>
            {
                [DatabaseSettings.ProviderKey] = Provider.ToString(),
                [DatabaseSettings.ConnectionStringKey] = ConnectionString,
            })
            .Build();
        var services = new ServiceCollection();
        services.AddSingleton<TimeProvider>(clock);
        services.AddSingleton<ICurrentUser>(user);
        services.AddTrussWebData(configuration, Path.GetTempPath());
        configure?.Invoke(services);
        return services.BuildServiceProvider(new ServiceProviderOptions { ValidateScopes = true, ValidateOnBuild = true });
    }

    public abstract ValueTask DisposeAsync();
}
