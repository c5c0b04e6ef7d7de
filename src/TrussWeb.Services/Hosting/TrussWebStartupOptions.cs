namespace TrussWeb.Services.Hosting;

/// <summary>What <see cref="TrussWebStartup.InitialiseAsync"/> does and where it writes.</summary>
public sealed record TrussWebStartupOptions
{
    /// <summary>Configuration key that turns demo mode on (or pass <c>--demo</c>).</summary>
    public const string DemoKey = "TrussWeb:Demo:Enabled";

    /// <summary>Configuration key of the first administrator's password (else one is generated and printed once).</summary>
    public const string AdminPasswordKey = "TrussWeb:Admin:Password";

    /// <summary>Configuration key of the first administrator's e-mail.</summary>
    public const string AdminEmailKey = "TrussWeb:Admin:Email";

    /// <summary>
    /// Configuration key that turns the start-up migration off (default on). With several instances, run
    /// <c>TrussWeb.Web migrate</c> once and start the others with it off; they then refuse to start on a
    /// database with pending migrations.
    /// </summary>
    public const string MigrateOnStartKey = "TrussWeb:Database:MigrateOnStart";

    public const string DefaultAdminEmail = "admin@trussweb.local";

    public bool Demo { get; init; }

    /// <summary>Apply pending migrations at start-up (default); when false, start-up fails if any are pending.</summary>
    public bool MigrateOnStart { get; init; } = true;

    /// <summary>Seed-data folder; null: located with <see cref="SeedData.Locate"/>.</summary>
    public string? SeedDataPath { get; init; }

    public string AdminEmail { get; init; } = DefaultAdminEmail;

    public string? AdminPassword { get; init; }

    /// <summary>Where sign-in details are printed (the console).</summary>
    public TextWriter Output { get; init; } = Console.Out;

    /// <summary>Reads the options from configuration and the command line.</summary>
    public static TrussWebStartupOptions From(Microsoft.Extensions.Configuration.IConfiguration configuration, string[] args, string contentRoot)
    {
        ArgumentNullException.ThrowIfNull(configuration);
        ArgumentNullException.ThrowIfNull(args);
        return new TrussWebStartupOptions
        {
            MigrateOnStart = !string.Equals(configuration[MigrateOnStartKey]?.Trim(), "false", StringComparison.OrdinalIgnoreCase),
            Demo = args.Contains("--demo", StringComparer.Ordinal) || string.Equals(configuration[DemoKey], "true", StringComparison.OrdinalIgnoreCase),
            SeedDataPath = SeedData.Locate(
                string.IsNullOrWhiteSpace(configuration[SeedData.PathKey]) && Path.IsPathRooted(configuration[SeedData.FolderKey])
                    ? configuration[SeedData.FolderKey]
                    : configuration[SeedData.PathKey],
                contentRoot),
            AdminEmail = string.IsNullOrWhiteSpace(configuration[AdminEmailKey]) ? DefaultAdminEmail : configuration[AdminEmailKey]!,
            AdminPassword = string.IsNullOrWhiteSpace(configuration[AdminPasswordKey]) ? null : configuration[AdminPasswordKey],
        };
    }
}
