namespace TrussWeb.Data;

/// <summary>The database engines TrussWeb runs on (configuration key <see cref="DatabaseSettings.ProviderKey"/>).</summary>
public enum DatabaseProvider
{
    /// <summary>Embedded SQLite file (the default).</summary>
    Sqlite,

    /// <summary>PostgreSQL server (several app instances).</summary>
    Postgres,
}
