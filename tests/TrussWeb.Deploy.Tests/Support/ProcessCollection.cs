namespace TrussWeb.Deploy.Tests.Support;

/// <summary>The tests that start app processes share one PostgreSQL cluster and run one after another (2 cores).</summary>
[CollectionDefinition(Name)]
public sealed class ProcessCollection : ICollectionFixture<PostgresClusterFixture>
{
    public const string Name = "App processes";
}
