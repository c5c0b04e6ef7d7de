using System.Reflection;

namespace TrussWeb.Web.Hosting;

/// <summary>The app's version as built: the web assembly's informational version (e.g. <c>0.1.0+&lt;commit&gt;</c>).</summary>
public static class AppVersion
{
    public static string Informational { get; } =
        typeof(AppVersion).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion
        ?? typeof(AppVersion).Assembly.GetName().Version?.ToString()
        ?? "unknown";
}
