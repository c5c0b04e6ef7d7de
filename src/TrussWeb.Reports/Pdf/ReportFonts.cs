using PdfSharp.Fonts;

namespace TrussWeb.Reports.Pdf;

/// <summary>
/// Installs the <see cref="DejaVuFontResolver"/> once per process (PDFsharp holds its resolver in a
/// global setting). Call <see cref="Configure"/> at start-up with the configured folder; the builders
/// call <see cref="EnsureConfigured"/>, which uses <see cref="DejaVuFontResolver.FolderVariable"/> or the default folder.
/// </summary>
public static class ReportFonts
{
    private static readonly Lock Gate = new();
    private static DejaVuFontResolver? _resolver;

    /// <summary>The folder in use, or null before configuration.</summary>
    public static string? Folder => _resolver?.Folder;

    /// <summary>Installs the resolver for <paramref name="folder"/> (null: environment variable, else the default folder).</summary>
    /// <exception cref="FileNotFoundException">The fonts are missing; the message names the folder.</exception>
    /// <exception cref="InvalidOperationException">Fonts were already configured from another folder.</exception>
    public static void Configure(string? folder = null)
    {
        var wanted = folder ?? Environment.GetEnvironmentVariable(DejaVuFontResolver.FolderVariable) ?? DejaVuFontResolver.DefaultFolder;
        lock (Gate)
        {
            if (_resolver is not null)
            {
                if (!string.Equals(Path.GetFullPath(_resolver.Folder), Path.GetFullPath(wanted), StringComparison.Ordinal))
                {
                    throw new InvalidOperationException($"Report fonts are already configured from '{_resolver.Folder}'; cannot switch to '{wanted}' in the same process.");
                }

                return;
            }

            var resolver = new DejaVuFontResolver(wanted);
            GlobalFontSettings.FontResolver = resolver;
            _resolver = resolver;
        }
    }

    /// <summary>Configures the default fonts when nothing is configured yet.</summary>
    public static void EnsureConfigured()
    {
        if (_resolver is null)
        {
            lock (Gate)
            {
                if (_resolver is null)
                {
                    var folder = Environment.GetEnvironmentVariable(DejaVuFontResolver.FolderVariable) ?? DejaVuFontResolver.DefaultFolder;
                    var resolver = new DejaVuFontResolver(folder);
                    GlobalFontSettings.FontResolver = resolver;
                    _resolver = resolver;
                }
            }
        }
    }
}
