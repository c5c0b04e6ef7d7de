using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Time.Testing;

using TrussWeb.Testing;

namespace TrussWeb.Data.Tests.Support;

/// <summary>Service providers over a test database, built the way the app builds them.</summary>
public static class TestDatabaseServices
{
    /// <summary>
    /// A fresh service provider over this database, built the way the app builds it
    /// (<see cref="DependencyInjection.AddTrussWebData"/> from configuration), with the given clock and user.
    /// </summary>
    public static ServiceProvider BuildServices(this TestDatabase database, FakeTimeProvider clock, TestUser user, Action<IServiceCollection>? configure = null)
    {
        var configuration = database.Configuration();
        var services = new ServiceCollection();
        services.AddSingleton<TimeProvider>(clock);
        services.AddSingleton<ICurrentUser>(user);
        services.AddTrussWebData(configuration, Path.GetTempPath());
        configure?.Invoke(services);
        return services.BuildServiceProvider(new ServiceProviderOptions { ValidateScopes = true, ValidateOnBuild = true });
    }
}
