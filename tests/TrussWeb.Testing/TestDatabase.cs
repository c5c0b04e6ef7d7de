using Microsoft.Extensions.Configuration;
using TrussWeb.Data;

namespace TrussWeb.Testing;

/// <summary>One empty database of one provider, private to a test, removed on dispose.</summary>
public abstract class TestDatabase : IAsyncDisposable
{
    public abstract DatabaseProvider Provider { get; }

    public abstract string ConnectionString { get; }

    /// <summary>The configuration the app would read for this database (provider and connection string keys).</summary>
    public IConfiguration Configuration() => new ConfigurationBuilder()
        .AddInMemoryCollection(new Dictionary<string, string?>
        {
            [DatabaseSettings.ProviderKey] = Provider.ToString(),
            [DatabaseSettings.ConnectionStringKey] = ConnectionString,
        })
        .Build();

    public abstract ValueTask DisposeAsync();
}
