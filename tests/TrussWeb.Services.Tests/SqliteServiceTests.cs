using TrussWeb.Services.Tests.Support;

namespace TrussWeb.Services.Tests;

/// <summary>The service behaviours on a real SQLite file.</summary>
public sealed partial class SqliteServiceTests : ServiceBehaviourTests
{
    protected override Task<TestDatabase> CreateEmptyDatabaseAsync() => Task.FromResult<TestDatabase>(new SqliteTestDatabase());
}
