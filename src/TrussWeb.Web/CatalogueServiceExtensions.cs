using Microsoft.Extensions.Options;
using TrussWeb.Core.Sections;
using TrussWeb.Web.Options;

namespace TrussWeb.Web;

/// <summary>Registers the section catalogue loaded from the seed-data folder.</summary>
public static class CatalogueServiceExtensions
{
    /// <summary>
    /// Binds <see cref="TrussWebOptions"/> from <c>TrussWeb</c> and registers the section catalogue
    /// (<see cref="CatalogueLoadResult"/>) as a singleton, loaded once from
    /// <c>{SeedDataFolder}/sections</c>. Rows that fail to load are logged as warnings; a missing
    /// folder fails on start, naming the key.
    /// </summary>
    public static IServiceCollection AddTrussWebCatalogue(this IServiceCollection services, IConfiguration configuration)
    {
        ArgumentNullException.ThrowIfNull(services);
        ArgumentNullException.ThrowIfNull(configuration);
        services.AddOptions<TrussWebOptions>()
            .Bind(configuration.GetSection(TrussWebOptions.SectionName))
            .ValidateOnStart();
        services.AddSingleton<IValidateOptions<TrussWebOptions>, TrussWebOptionsValidator>();
        services.AddSingleton(sp =>
        {
            var options = sp.GetRequiredService<IOptions<TrussWebOptions>>().Value;
            var environment = sp.GetRequiredService<IHostEnvironment>();
            var folder = ResolveSeedDataFolder(options.SeedDataFolder, environment.ContentRootPath, AppContext.BaseDirectory)
                ?? throw new InvalidOperationException(
                    $"Seed-data folder '{options.SeedDataFolder}' not found (configuration key {TrussWebOptions.SeedDataKey}; " +
                    $"looked under the content root '{environment.ContentRootPath}' and above '{AppContext.BaseDirectory}').");
            var catalogue = SectionCatalogue.Load(Path.Combine(folder, "sections"));
            var logger = sp.GetRequiredService<ILoggerFactory>().CreateLogger(typeof(CatalogueServiceExtensions));
            logger.LogInformation("Section catalogue: {Count} sections from {Folder}", catalogue.Entries.Count, folder);
            foreach (var error in catalogue.Errors)
            {
                logger.LogWarning("Section catalogue: {File} line {Line}, {Field}: {Message}", error.File, error.Line, error.Field, error.Message);
            }

            return catalogue;
        });
        return services;
    }

    /// <summary>
    /// The seed-data folder: <paramref name="configured"/> if absolute and present; else resolved
    /// against <paramref name="contentRoot"/>; else the first folder named like its last segment found
    /// walking up from <paramref name="baseDirectory"/> (so <c>dotnet run</c> and test runs in the
    /// repository find <c>seed-data</c>). Null when none exists.
    /// </summary>
    public static string? ResolveSeedDataFolder(string configured, string contentRoot, string baseDirectory)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(configured);
        if (Path.IsPathRooted(configured))
        {
            return Directory.Exists(configured) ? configured : null;
        }

        var underRoot = Path.GetFullPath(Path.Combine(contentRoot, configured));
        if (Directory.Exists(underRoot))
        {
            return underRoot;
        }

        for (var dir = new DirectoryInfo(baseDirectory); dir is not null; dir = dir.Parent)
        {
            var candidate = Path.Combine(dir.FullName, configured);
            if (Directory.Exists(candidate))
            {
                return candidate;
            }
        }

        return null;
    }
}
