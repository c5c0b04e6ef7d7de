using Microsoft.Extensions.Configuration;

namespace TrussWeb.Web.Options;

/// <summary>Settings of the web app, bound from the configuration section <c>TrussWeb</c>.</summary>
public sealed class TrussWebOptions
{
    /// <summary>Configuration section name.</summary>
    public const string SectionName = "TrussWeb";

    /// <summary>Configuration key of <see cref="SeedDataFolder"/>.</summary>
    public const string SeedDataKey = SectionName + ":SeedData";

    /// <summary>Default seed-data folder, relative to the content root.</summary>
    public const string DefaultSeedDataFolder = "seed-data";

    /// <summary>
    /// Folder holding <c>sections/*.csv</c> and <c>grades.csv</c> (key <c>TrussWeb:SeedData</c>). A relative
    /// path is resolved against the content root; when that folder does not exist, the folders above
    /// <see cref="AppContext.BaseDirectory"/> are searched for one named <c>seed-data</c>.
    /// </summary>
    [ConfigurationKeyName("SeedData")]
    public string SeedDataFolder { get; set; } = DefaultSeedDataFolder;
}
