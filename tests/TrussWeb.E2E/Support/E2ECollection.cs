namespace TrussWeb.E2E.Support;

/// <summary>The browser journeys share one app and one browser and run one after another (2 cores).</summary>
[CollectionDefinition(Name)]
public sealed class E2ECollection : ICollectionFixture<DemoApp>, ICollectionFixture<BrowserSession>
{
    public const string Name = "Browser journeys";
}
