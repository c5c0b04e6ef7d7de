using TrussWeb.Data.Tests.Support;

namespace TrussWeb.Data.Tests;

/// <summary>The shared data behaviours on a real PostgreSQL server, a fresh database per test.</summary>
[Collection(PostgresCollection.Name)]
public sealed class PostgresDataTests(PostgresClusterFixture cluster) : DataBehaviourTests
{
    protected override async Task<TestDatabase> CreateEmptyDatabaseAsync() =>
        await PostgresTestDatabase.CreateAsync(cluster.AdminConnectionString);
}
