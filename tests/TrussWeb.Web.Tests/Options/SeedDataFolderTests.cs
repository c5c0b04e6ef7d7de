using Microsoft.Extensions.FileProviders;
using Microsoft.Extensions.Hosting;
using TrussWeb.Web.Options;

namespace TrussWeb.Web.Tests.Options;

public sealed class SeedDataFolderTests : IDisposable
{
    private readonly string _root = Directory.CreateTempSubdirectory("tw-seed-").FullName;

    public void Dispose() => Directory.Delete(_root, recursive: true);

    [Fact]
    public void Relative_folder_is_found_under_the_content_root()
    {
        var seed = Directory.CreateDirectory(Path.Combine(_root, "content", "seed-data")).FullName;

        var found = CatalogueServiceExtensions.ResolveSeedDataFolder("seed-data", Path.Combine(_root, "content"), Path.Combine(_root, "elsewhere"));

        Assert.Equal(seed, found);
    }

    [Fact]
    public void Relative_folder_is_found_by_walking_up_from_the_base_directory()
    {
        var seed = Directory.CreateDirectory(Path.Combine(_root, "seed-data")).FullName;
        var bin = Directory.CreateDirectory(Path.Combine(_root, "src", "App", "bin", "Debug")).FullName;

        var found = CatalogueServiceExtensions.ResolveSeedDataFolder("seed-data", Path.Combine(_root, "src", "App"), bin);

        Assert.Equal(seed, found);
    }

    [Fact]
    public void Missing_folder_resolves_to_nothing_and_the_validator_names_the_key()
    {
        var content = Directory.CreateDirectory(Path.Combine(_root, "content")).FullName;
        Assert.Null(CatalogueServiceExtensions.ResolveSeedDataFolder(Path.Combine(_root, "absent"), content, content));

        var result = new TrussWebOptionsValidator(new Environment(content))
            .Validate(null, new TrussWebOptions { SeedDataFolder = Path.Combine(_root, "absent") });

        Assert.True(result.Failed);
        Assert.Contains(TrussWebOptions.SeedDataKey, result.FailureMessage);
    }

    [Fact]
    public void Existing_absolute_folder_passes_validation()
    {
        var seed = Directory.CreateDirectory(Path.Combine(_root, "data")).FullName;

        var result = new TrussWebOptionsValidator(new Environment(_root)).Validate(null, new TrussWebOptions { SeedDataFolder = seed });

        Assert.True(result.Succeeded);
    }

    private sealed class Environment(string contentRoot) : IHostEnvironment
    {
        public string EnvironmentName { get; set; } = "Test";

        public string ApplicationName { get; set; } = "TrussWeb.Web";

        public string ContentRootPath { get; set; } = contentRoot;

        public IFileProvider ContentRootFileProvider { get; set; } = new NullFileProvider();
    }
}
