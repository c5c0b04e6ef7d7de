using Microsoft.Extensions.Configuration;

namespace TrussWeb.Services.Exports;

/// <summary>
/// Where export files go and how long they are kept (configuration <c>TrussWeb:Exports:*</c>, docs/dev/reports.md).
/// </summary>
public sealed record ExportOptions
{
    public const string SectionKey = "TrussWeb:Exports";

    /// <summary>Absolute folder for finished files and their temporary names while being written.</summary>
    public required string Folder { get; init; }

    /// <summary>How long a finished job and its file are kept.</summary>
    public TimeSpan Retention { get; init; } = TimeSpan.FromHours(24);

    /// <summary>Jobs rendered at once (1 or 2: the renderers are CPU-bound).</summary>
    public int Concurrency { get; init; } = 1;

    /// <summary>How often expired jobs and stray files are removed.</summary>
    public TimeSpan CleanupInterval { get; init; } = TimeSpan.FromMinutes(15);

    /// <summary>
    /// Reads <c>TrussWeb:Exports:Folder</c> (default <c>data/exports</c>, relative to <paramref name="contentRoot"/>),
    /// <c>RetentionHours</c> (1 to 720, default 24) and <c>Concurrency</c> (1 or 2, default 1). A value out of range
    /// fails at start-up naming the key and the limit.
    /// </summary>
    public static ExportOptions From(IConfiguration configuration, string contentRoot)
    {
        ArgumentNullException.ThrowIfNull(configuration);
        var section = configuration.GetSection(SectionKey);
        var folder = section["Folder"];
        var hours = Number(section["RetentionHours"], 24, 1, 720, "RetentionHours");
        var concurrency = (int)Number(section["Concurrency"], 1, 1, 2, "Concurrency");
        return new ExportOptions
        {
            Folder = Path.GetFullPath(string.IsNullOrWhiteSpace(folder) ? Path.Combine("data", "exports") : folder, contentRoot),
            Retention = TimeSpan.FromHours(hours),
            Concurrency = concurrency,
        };
    }

    private static double Number(string? text, double fallback, double min, double max, string key)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            return fallback;
        }

        if (!double.TryParse(text, System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out var v) || v < min || v > max)
        {
            throw new InvalidOperationException($"Configuration '{SectionKey}:{key}' is '{text}'; expected a number from {min} to {max}.");
        }

        return v;
    }
}
