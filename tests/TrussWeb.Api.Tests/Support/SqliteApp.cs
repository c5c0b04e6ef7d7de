namespace TrussWeb.Api.Tests.Support;

/// <summary>One app over a fresh SQLite file per test class.</summary>
public sealed class SqliteApp() : ApiAppFactory(new SqliteTestDatabase());

/// <summary>One app with a rate limit of 5 requests a minute per token.</summary>
public sealed class RateLimitedApp() : ApiAppFactory(new SqliteTestDatabase(), requestsPerWindow: 5);
