namespace TrussWeb.Services.Hosting;

/// <summary>Finds the seed-data folder (grades.csv + sections/): configured path, else next to the app, else up from the content root or the app folder.</summary>
public static class SeedData
{
    /// <summary>Configuration key of an explicit seed-data folder.</summary>
    public const string PathKey = "TrussWeb:SeedData:Path";

    /// <summary>The web app's seed-data folder key; when it holds an absolute path and <see cref="PathKey"/> is unset, seeding uses it too (one setting for administrators).</summary>
    public const string FolderKey = "TrussWeb:SeedData";

    public static string? Locate(string? configured, string contentRoot)
    {
        if (!string.IsNullOrWhiteSpace(configured))
        {
            return IsSeedFolder(configured) ? Path.GetFullPath(configured) : null;
        }

        foreach (var start in new[] { AppContext.BaseDirectory, contentRoot })
        {
            for (var dir = new DirectoryInfo(start); dir is not null; dir = dir.Parent)
            {
                var candidate = Path.Combine(dir.FullName, "seed-data");
                if (IsSeedFolder(candidate))
                {
                    return candidate;
                }
            }
        }

        return null;
    }

    private static bool IsSeedFolder(string path) => File.Exists(Path.Combine(path, "grades.csv")) && Directory.Exists(Path.Combine(path, "sections"));
}
