using PdfSharp.Fonts;

namespace TrussWeb.Reports.Pdf;

/// <summary>
/// PDFsharp font resolver over the DejaVu TrueType files in one folder. Families: "DejaVu Sans"
/// (regular, bold), "DejaVu Sans Mono" and "DejaVu Sans Condensed" (regular, bold). Every file is
/// checked when the resolver is made, so a missing font fails at start-up with the folder named.
/// </summary>
public sealed class DejaVuFontResolver : IFontResolver
{
    /// <summary>Where Debian and Ubuntu install the DejaVu fonts (package fonts-dejavu-core).</summary>
    public const string DefaultFolder = "/usr/share/fonts/truetype/dejavu";

    /// <summary>Environment variable that overrides the font folder.</summary>
    public const string FolderVariable = "TRUSSWEB_FONT_DIR";

    public const string Sans = "DejaVu Sans";

    public const string Mono = "DejaVu Sans Mono";

    public const string Condensed = "DejaVu Sans Condensed";

    private static readonly Dictionary<string, string> Files = new(StringComparer.Ordinal)
    {
        ["DejaVuSans"] = "DejaVuSans.ttf",
        ["DejaVuSans-Bold"] = "DejaVuSans-Bold.ttf",
        ["DejaVuSansMono"] = "DejaVuSansMono.ttf",
        ["DejaVuSansCondensed"] = "DejaVuSansCondensed.ttf",
        ["DejaVuSansCondensed-Bold"] = "DejaVuSansCondensed-Bold.ttf",
    };

    private readonly Dictionary<string, byte[]> _faces = new(StringComparer.Ordinal);

    /// <param name="folder">Folder holding the .ttf files.</param>
    /// <exception cref="FileNotFoundException">A font file is missing; the message names the folder and the file.</exception>
    public DejaVuFontResolver(string folder)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(folder);
        Folder = folder;
        var missing = Files.Values.Where(f => !File.Exists(Path.Combine(folder, f))).ToList();
        if (missing.Count > 0)
        {
            throw new FileNotFoundException(
                $"The report fonts are missing from '{folder}': {string.Join(", ", missing)}. Install the DejaVu fonts " +
                $"(Debian/Ubuntu: apt-get install fonts-dejavu-core) or set {FolderVariable} (or the Reports font folder option) to a folder that holds them.",
                Path.Combine(folder, missing[0]));
        }

        foreach (var (face, file) in Files)
        {
            _faces[face] = File.ReadAllBytes(Path.Combine(folder, file));
        }
    }

    /// <summary>The folder the fonts were read from.</summary>
    public string Folder { get; }

    /// <inheritdoc />
    public FontResolverInfo? ResolveTypeface(string familyName, bool bold, bool italic)
    {
        var face = familyName switch
        {
            Mono => "DejaVuSansMono",
            Condensed => bold ? "DejaVuSansCondensed-Bold" : "DejaVuSansCondensed",
            _ => bold ? "DejaVuSans-Bold" : "DejaVuSans",
        };
        return new FontResolverInfo(face);
    }

    /// <inheritdoc />
    public byte[]? GetFont(string faceName) => _faces.TryGetValue(faceName, out var bytes) ? bytes : null;
}
