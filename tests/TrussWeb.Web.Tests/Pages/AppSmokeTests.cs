using System.Net;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.AspNetCore.Hosting;
using Microsoft.Extensions.Configuration;
using TrussWeb.Core;

namespace TrussWeb.Web.Tests.Pages;

public class AppSmokeTests : IClassFixture<WebApplicationFactory<Program>>
{
    private readonly WebApplicationFactory<Program> _factory;

    public AppSmokeTests(WebApplicationFactory<Program> factory) => _factory = factory;

    [Theory]
    [InlineData("/")]
    [InlineData("/sections")]
    public async Task Page_answers_200_with_the_caution_in_the_footer(string path)
    {
        using var client = _factory.CreateClient();

        using var response = await client.GetAsync(path);
        var html = await response.Content.ReadAsStringAsync();

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Contains(WebUtility.HtmlEncode(Caution.Text), html);
    }

    [Fact]
    public async Task Sections_page_is_prerendered_with_catalogue_rows()
    {
        using var client = _factory.CreateClient();

        var html = await client.GetStringAsync("/sections");

        Assert.Contains("data-testid=\"catalogue-row\"", html);
        Assert.Contains("L100x100x10", html);
    }

    [Fact]
    public void Start_fails_naming_the_key_when_the_seed_data_folder_is_missing()
    {
        var missing = Path.Combine(Path.GetTempPath(), "tw-no-such-folder-" + Guid.NewGuid().ToString("N"));
        using var factory = _factory.WithWebHostBuilder(b => b.ConfigureAppConfiguration((_, config) =>
            config.AddInMemoryCollection(new Dictionary<string, string?> { [TrussWeb.Web.Options.TrussWebOptions.SeedDataKey] = missing })));

        var ex = Assert.ThrowsAny<Exception>(() => factory.CreateClient());

        Assert.Contains(TrussWeb.Web.Options.TrussWebOptions.SeedDataKey, ex.ToString());
    }

    [Fact]
    public void Configured_seed_data_folder_is_the_one_loaded()
    {
        var folder = Directory.CreateTempSubdirectory("tw-seed-").FullName;
        try
        {
            Directory.CreateDirectory(Path.Combine(folder, "sections"));
            File.WriteAllText(Path.Combine(folder, "sections", "tubes.csv"), "designation,D,t\nCHS 99x3,99,3\n");
            using var factory = _factory.WithWebHostBuilder(b => b.ConfigureAppConfiguration((_, config) =>
                config.AddInMemoryCollection(new Dictionary<string, string?> { [TrussWeb.Web.Options.TrussWebOptions.SeedDataKey] = folder })));

            var catalogue = Microsoft.Extensions.DependencyInjection.ServiceProviderServiceExtensions
                .GetRequiredService<Core.Sections.CatalogueLoadResult>(factory.Services);

            Assert.Equal("CHS 99x3", Assert.Single(catalogue.Entries).Designation);
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }
}
