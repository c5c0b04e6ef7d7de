using System.Security.Cryptography;
using Microsoft.AspNetCore.Identity;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Logging;
using Microsoft.Extensions.Logging.Abstractions;
using TrussWeb.Core.Materials;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Catalogue;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Users;

namespace TrussWeb.Services.Hosting;

/// <summary>
/// Start-up: migrations, seeding of grades and sections when their tables are empty, the first
/// administrator when there is no user, and in demo mode the demo project and sign-ins.
/// </summary>
public static class TrussWebStartup
{
    public static async Task InitialiseAsync(IServiceProvider services, TrussWebStartupOptions options, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(services);
        ArgumentNullException.ThrowIfNull(options);
        var logger = services.GetService<ILoggerFactory>()?.CreateLogger(typeof(TrussWebStartup).FullName!) ?? NullLogger.Instance;
        await using var scope = services.CreateAsyncScope();
        var factory = scope.ServiceProvider.GetRequiredService<IDbContextFactory<TrussWebDbContext>>();
        if (options.MigrateOnStart)
        {
            await DatabaseMigrator.MigrateAsync(factory, cancellationToken).ConfigureAwait(false);
        }
        else
        {
            await RequireMigratedAsync(factory, cancellationToken).ConfigureAwait(false);
        }

        await SeedCataloguesAsync(factory, options.SeedDataPath, logger, cancellationToken).ConfigureAwait(false);
        await CreateFirstAdministratorAsync(scope.ServiceProvider, options, logger).ConfigureAwait(false);
        if (options.Demo)
        {
            await DemoSeeder.SeedAsync(scope.ServiceProvider, options.Output, logger, cancellationToken).ConfigureAwait(false);
        }
    }

    /// <summary>With the start-up migration off: refuses to start while the database has pending migrations, naming them and the remedy.</summary>
    internal static async Task RequireMigratedAsync(IDbContextFactory<TrussWebDbContext> factory, CancellationToken cancellationToken)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var pending = (await db.Database.GetPendingMigrationsAsync(cancellationToken).ConfigureAwait(false)).ToList();
        if (pending.Count > 0)
        {
            throw new InvalidOperationException(
                $"The database has {pending.Count} pending migration(s) ({string.Join(", ", pending)}) and {TrussWebStartupOptions.MigrateOnStartKey} is false: " +
                "run 'TrussWeb.Web migrate' once (or start one instance with the setting on), then start this instance again.");
        }
    }

    /// <summary>Seeds grades and sections from the seed-data folder when the tables are empty; a file with any error is not seeded and its errors are logged.</summary>
    internal static async Task SeedCataloguesAsync(IDbContextFactory<TrussWebDbContext> factory, string? folder, ILogger logger, CancellationToken cancellationToken)
    {
        await using var db = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        var needGrades = !await db.SteelGrades.AnyAsync(cancellationToken).ConfigureAwait(false);
        var needSections = !await db.SectionCatalogue.AnyAsync(cancellationToken).ConfigureAwait(false);
        if (!needGrades && !needSections)
        {
            return;
        }

        if (folder is null)
        {
            logger.LogError("No seed-data folder found (set {Key}); grades and sections are not seeded.", SeedData.PathKey);
            return;
        }

        if (needGrades)
        {
            var grades = GradeCatalogue.Load(Path.Combine(folder, "grades.csv"));
            foreach (var e in grades.Errors)
            {
                logger.LogError("Seed grade error {File}:{Line} {Field}: {Message}", e.File, e.Line, e.Field, e.Message);
            }

            if (grades.Errors.Count == 0)
            {
                db.SteelGrades.AddRange(grades.Grades.Select(CatalogueMapper.ToRow));
            }
        }

        if (needSections)
        {
            foreach (var path in Directory.GetFiles(Path.Combine(folder, "sections"), "*.csv").Order(StringComparer.Ordinal))
            {
                var name = Path.GetFileName(path);
                var (_, errors) = await CatalogueService.ImportAsync(db, name, await File.ReadAllTextAsync(path, cancellationToken).ConfigureAwait(false), cancellationToken)
                    .ConfigureAwait(false);
                foreach (var e in errors)
                {
                    logger.LogError("Seed section error {File}:{Line} {Field}: {Message}", e.File, e.Line, e.Field, e.Message);
                }
            }
        }

        await db.SaveChangesAsync(cancellationToken).ConfigureAwait(false);
    }

    internal static async Task CreateFirstAdministratorAsync(IServiceProvider scope, TrussWebStartupOptions options, ILogger logger)
    {
        var users = scope.GetRequiredService<UserManager<AppUser>>();
        if (await users.Users.AnyAsync().ConfigureAwait(false))
        {
            return;
        }

        var generated = options.AdminPassword is null;
        var password = options.AdminPassword ?? GeneratePassword();
        var (user, errors) = await UserAdminService.CreateAsync(users, new CreateUserInput(options.AdminEmail, "Administrator", password, [Roles.Administrator])).ConfigureAwait(false);
        if (user is null)
        {
            logger.LogError("The first administrator could not be created: {Errors}", string.Join("; ", errors));
            await options.Output.WriteLineAsync($"TrussWeb: the first administrator could not be created: {string.Join("; ", errors)}").ConfigureAwait(false);
            return;
        }

        await options.Output.WriteLineAsync(generated
            ? $"TrussWeb: created the first administrator {options.AdminEmail} with the generated password {password} (shown once; change it after signing in)."
            : $"TrussWeb: created the first administrator {options.AdminEmail} with the password from {TrussWebStartupOptions.AdminPasswordKey}.").ConfigureAwait(false);
    }

    /// <summary>A random 20-character password with letters and digits (meets the rules).</summary>
    public static string GeneratePassword()
    {
        const string letters = "abcdefghijkmnpqrstuvwxyzABCDEFGHJKLMNPQRSTUVWXYZ";
        const string digits = "23456789";
        var chars = new char[20];
        for (var i = 0; i < chars.Length; i++)
        {
            var pool = i % 4 == 3 ? digits : letters;
            chars[i] = pool[RandomNumberGenerator.GetInt32(pool.Length)];
        }

        return new string(chars);
    }
}
