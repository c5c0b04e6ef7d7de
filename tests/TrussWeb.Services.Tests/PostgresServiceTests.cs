using TrussWeb.Services.Tests.Support;

namespace TrussWeb.Services.Tests;

/// <summary>The service behaviours on a real PostgreSQL 15 server (a fresh database per test).</summary>
[Collection(PostgresCollection.Name)]
public sealed class PostgresServiceTests(PostgresClusterFixture cluster) : ServiceBehaviourTests
{
    protected override async Task<TestDatabase> CreateEmptyDatabaseAsync() => await PostgresTestDatabase.CreateAsync(cluster.AdminConnectionString);
}
