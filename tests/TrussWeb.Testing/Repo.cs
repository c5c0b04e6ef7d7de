using System.Reflection;

namespace TrussWeb.Testing;

/// <summary>The repository the tests run in and the web app built in the test assembly's configuration.</summary>
public static class Repo
{
    public static string Root { get; } = FindRoot();

    /// <summary>Debug or Release: the configuration this test assembly was built in.</summary>
    public static string Configuration { get; } =
        typeof(Repo).Assembly.GetCustomAttribute<AssemblyConfigurationAttribute>()?.Configuration ?? "Debug";

    /// <summary>The web app's build output folder (same configuration as the tests).</summary>
    public static string WebOutput => Path.Combine(Root, "src", "TrussWeb.Web", "bin", Configuration, "net10.0");

    public static string WebDll => Path.Combine(WebOutput, "TrussWeb.Web.dll");

    public static string SeedData => Path.Combine(Root, "seed-data");

    public static string PathOf(string relative) => Path.Combine(Root, relative.Replace('/', Path.DirectorySeparatorChar));

    private static string FindRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "TrussWeb.sln")))
            {
                return dir.FullName;
            }
        }

        throw new InvalidOperationException($"TrussWeb.sln not found above {AppContext.BaseDirectory}");
    }
}
