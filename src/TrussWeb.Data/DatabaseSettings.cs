using Microsoft.Data.Sqlite;
using Microsoft.Extensions.Configuration;

namespace TrussWeb.Data;

/// <summary>
/// The database configuration read from <see cref="IConfiguration"/>: which provider and which
/// connection string. Invalid or missing required values throw at start-up naming the key.
/// </summary>
public sealed record DatabaseSettings(DatabaseProvider Provider, string ConnectionString)
{
    /// <summary>Configuration key of the provider: <c>Sqlite</c> (default) or <c>Postgres</c>.</summary>
    public const string ProviderKey = "TrussWeb:Database:Provider";

    /// <summary>Configuration key of the connection string (required for PostgreSQL).</summary>
    public const string ConnectionStringKey = "TrussWeb:Database:ConnectionString";

    /// <summary>SQLite connection string used when none is configured; relative to the content root.</summary>
    public const string DefaultSqliteConnectionString = "Data Source=data/trussweb.db";

    /// <summary>
    /// Reads the settings. A relative SQLite <c>Data Source</c> is resolved against
    /// <paramref name="contentRootPath"/> and its folder is created.
    /// </summary>
    /// <exception cref="InvalidOperationException">The provider is unknown or a required key is missing.</exception>
    public static DatabaseSettings FromConfiguration(IConfiguration configuration, string contentRootPath)
    {
        ArgumentNullException.ThrowIfNull(configuration);
        ArgumentException.ThrowIfNullOrWhiteSpace(contentRootPath);

        var providerText = configuration[ProviderKey];
        var provider = DatabaseProvider.Sqlite;
        if (!string.IsNullOrWhiteSpace(providerText)
            && (!char.IsLetter(providerText.Trim()[0])
                || !Enum.TryParse(providerText.Trim(), ignoreCase: true, out provider)
                || !Enum.IsDefined(provider)))
        {
            throw new InvalidOperationException(
                $"Configuration '{ProviderKey}' is '{providerText}'; expected 'Sqlite' or 'Postgres'.");
        }

        var connectionString = configuration[ConnectionStringKey];
        return provider switch
        {
            DatabaseProvider.Postgres => string.IsNullOrWhiteSpace(connectionString)
                ? throw new InvalidOperationException(
                    $"Configuration '{ConnectionStringKey}' is required when '{ProviderKey}' is 'Postgres'.")
                : new DatabaseSettings(provider, connectionString),
            _ => new DatabaseSettings(
                DatabaseProvider.Sqlite,
                ResolveSqlite(string.IsNullOrWhiteSpace(connectionString) ? DefaultSqliteConnectionString : connectionString, contentRootPath)),
        };
    }

    /// <summary>Names the provider only: the connection string may hold a password and must not reach logs.</summary>
    public override string ToString() => $"DatabaseSettings {{ Provider = {Provider} }}";

    private static string ResolveSqlite(string connectionString, string contentRootPath)
    {
        SqliteConnectionStringBuilder builder;
        try
        {
            builder = new SqliteConnectionStringBuilder(connectionString);
        }
        catch (ArgumentException ex)
        {
            throw new InvalidOperationException($"Configuration '{ConnectionStringKey}' is not a valid SQLite connection string: {ex.Message}", ex);
        }

        if (string.IsNullOrWhiteSpace(builder.DataSource))
        {
            throw new InvalidOperationException($"Configuration '{ConnectionStringKey}' has no 'Data Source' (the SQLite file).");
        }

        var isInMemory = builder.Mode == SqliteOpenMode.Memory || builder.DataSource.Equals(":memory:", StringComparison.OrdinalIgnoreCase);
        if (!isInMemory)
        {
            var path = Path.GetFullPath(builder.DataSource, contentRootPath);
            var folder = Path.GetDirectoryName(path);
            if (!string.IsNullOrEmpty(folder))
            {
                Directory.CreateDirectory(folder);
            }

            builder.DataSource = path;
        }

        return builder.ToString();
    }
}
