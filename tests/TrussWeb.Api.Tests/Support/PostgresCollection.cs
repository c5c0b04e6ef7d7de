namespace TrussWeb.Api.Tests.Support;

/// <summary>Test classes in this collection share one PostgreSQL cluster.</summary>
[CollectionDefinition(Name)]
public sealed class PostgresCollection : ICollectionFixture<PostgresClusterFixture>
{
    public const string Name = "Postgres";
}
