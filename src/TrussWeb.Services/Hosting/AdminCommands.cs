using Microsoft.AspNetCore.Identity;
using Microsoft.Data.Sqlite;
using Microsoft.Extensions.DependencyInjection;
using TrussWeb.Data;
using TrussWeb.Data.Entities;
using TrussWeb.Services.Contracts;
using TrussWeb.Services.Tokens;
using TrussWeb.Services.Users;

namespace TrussWeb.Services.Hosting;

/// <summary>
/// The administrator's command-line verbs of the web executable: <c>migrate</c>,
/// <c>create-user &lt;email&gt; &lt;role&gt; [--password P]</c>, <c>reset-password &lt;email&gt; [--password P]</c>,
/// <c>backup &lt;file&gt;</c>, <c>restore &lt;file&gt;</c>,
/// <c>create-token &lt;email&gt; &lt;name&gt; [--scope read|read-write] [--days N]</c> (prints the token once). Each returns the process exit code (0 ok, 1 failed).
/// </summary>
public static class AdminCommands
{
    public static IReadOnlyList<string> Verbs { get; } = ["migrate", "create-user", "reset-password", "backup", "restore", "create-token"];

    public static bool IsVerb(string[] args) => args is { Length: > 0 } && Verbs.Contains(args[0], StringComparer.Ordinal);

    public static string Usage =>
        "usage: TrussWeb.Web migrate | create-user <email> <role> [--password P] | reset-password <email> [--password P] | backup <file> | restore <file> | create-token <email> <name> [--scope read|read-write] [--days N]";

    public static async Task<int> RunAsync(string[] args, IServiceProvider services, TextWriter output, TextWriter error, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(args);
        ArgumentNullException.ThrowIfNull(services);
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(error);
        try
        {
            return args.FirstOrDefault() switch
            {
                "migrate" => await MigrateAsync(services, output, cancellationToken).ConfigureAwait(false),
                "create-user" when args.Length >= 3 => await CreateUserAsync(services, args[1], args[2], Option(args, "--password"), output, error, cancellationToken).ConfigureAwait(false),
                "reset-password" when args.Length >= 2 => await ResetPasswordAsync(services, args[1], Option(args, "--password"), output, error, cancellationToken).ConfigureAwait(false),
                "backup" when args.Length >= 2 => await BackupAsync(services, args[1], output, error).ConfigureAwait(false),
                "restore" when args.Length >= 2 => await RestoreAsync(services, args[1], output, error).ConfigureAwait(false),
                "create-token" when args.Length >= 3 => await CreateTokenAsync(services, args[1], args[2], Option(args, "--scope"), Option(args, "--days"), output, error, cancellationToken).ConfigureAwait(false),
                _ => await FailAsync(error, Usage).ConfigureAwait(false),
            };
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException or SqliteException or InvalidOperationException)
        {
            return await FailAsync(error, $"{args[0]} failed: {ex.Message}").ConfigureAwait(false);
        }
    }

    private static async Task<int> MigrateAsync(IServiceProvider services, TextWriter output, CancellationToken cancellationToken)
    {
        await DatabaseMigrator.MigrateAsync(services, cancellationToken).ConfigureAwait(false);
        await output.WriteLineAsync("Database migrated.").ConfigureAwait(false);
        return 0;
    }

    private static async Task<int> CreateUserAsync(IServiceProvider services, string email, string role, string? password, TextWriter output, TextWriter error, CancellationToken cancellationToken)
    {
        await DatabaseMigrator.MigrateAsync(services, cancellationToken).ConfigureAwait(false);
        await using var scope = services.CreateAsyncScope();
        var users = scope.ServiceProvider.GetRequiredService<UserManager<AppUser>>();
        var generated = password is null;
        password ??= TrussWebStartup.GeneratePassword();
        var match = Roles.All.FirstOrDefault(r => string.Equals(r, role, StringComparison.OrdinalIgnoreCase)) ?? role;
        var (user, errors) = await UserAdminService.CreateAsync(users, new CreateUserInput(email, email, password, [match])).ConfigureAwait(false);
        if (user is null)
        {
            return await FailAsync(error, "create-user failed: " + string.Join("; ", errors)).ConfigureAwait(false);
        }

        await output.WriteLineAsync(generated ? $"Created {email} ({match}) with the generated password {password}" : $"Created {email} ({match}).").ConfigureAwait(false);
        return 0;
    }

    private static async Task<int> ResetPasswordAsync(IServiceProvider services, string email, string? password, TextWriter output, TextWriter error, CancellationToken cancellationToken)
    {
        await DatabaseMigrator.MigrateAsync(services, cancellationToken).ConfigureAwait(false);
        await using var scope = services.CreateAsyncScope();
        var users = scope.ServiceProvider.GetRequiredService<UserManager<AppUser>>();
        var user = await users.FindByEmailAsync(email).ConfigureAwait(false);
        if (user is null)
        {
            return await FailAsync(error, $"reset-password failed: no user with e-mail {email}").ConfigureAwait(false);
        }

        var generated = password is null;
        password ??= TrussWebStartup.GeneratePassword();
        var errors = await UserAdminService.ResetAsync(users, user, password).ConfigureAwait(false);
        if (errors.Count > 0)
        {
            return await FailAsync(error, "reset-password failed: " + string.Join("; ", errors)).ConfigureAwait(false);
        }

        await users.SetLockoutEndDateAsync(user, null).ConfigureAwait(false);
        await users.ResetAccessFailedCountAsync(user).ConfigureAwait(false);
        await output.WriteLineAsync(generated ? $"Password of {email} reset to the generated password {password}" : $"Password of {email} reset.").ConfigureAwait(false);
        return 0;
    }

    /// <summary>Default lifetime of a token made on the command line, days.</summary>
    public const int DefaultTokenDays = 90;

    private static async Task<int> CreateTokenAsync(IServiceProvider services, string email, string name, string? scope, string? days, TextWriter output, TextWriter error,
        CancellationToken cancellationToken)
    {
        await DatabaseMigrator.MigrateAsync(services, cancellationToken).ConfigureAwait(false);
        await using var scope1 = services.CreateAsyncScope();
        var users = scope1.ServiceProvider.GetRequiredService<UserManager<AppUser>>();
        var user = await users.FindByEmailAsync(email).ConfigureAwait(false);
        if (user is null)
        {
            return await FailAsync(error, $"create-token failed: no user with e-mail {email}").ConfigureAwait(false);
        }

        var lifetime = DefaultTokenDays;
        if (days is not null && !int.TryParse(days, System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out lifetime))
        {
            return await FailAsync(error, $"create-token failed: --days must be a whole number of days from 1 to {ApiTokenService.MaxLifetime.TotalDays} (got {days})").ConfigureAwait(false);
        }

        var clock = scope1.ServiceProvider.GetRequiredService<TimeProvider>();
        var input = new ApiTokenInput(name, scope ?? ApiTokenScopes.ReadWrite, clock.GetUtcNow().UtcDateTime.AddDays(lifetime));
        var errors = ApiTokenService.Validate(input, clock.GetUtcNow().UtcDateTime);
        if (errors.Count > 0)
        {
            return await FailAsync(error, "create-token failed: " + string.Join("; ", errors)).ConfigureAwait(false);
        }

        var roles = await users.GetRolesAsync(user).ConfigureAwait(false);
        var caller = new FixedCaller(user.Id, user.DisplayName, [.. roles]);
        var service = ServiceCollectionExtensions.TokenServiceFor(scope1.ServiceProvider, caller);
        var created = await service.CreateAsync(input, cancellationToken).ConfigureAwait(false);
        if (!created.IsOk)
        {
            return await FailAsync(error, "create-token failed: " + created.Message).ConfigureAwait(false);
        }

        await output.WriteLineAsync($"Created token '{created.Value!.View.Name}' ({created.Value.View.Scope}, expires {created.Value.View.ExpiresUtc:yyyy-MM-dd HH:mm} UTC) for {email}. " +
            "It is shown only now; store it safely:").ConfigureAwait(false);
        await output.WriteLineAsync(created.Value.Token).ConfigureAwait(false);
        return 0;
    }

    private static async Task<int> BackupAsync(IServiceProvider services, string file, TextWriter output, TextWriter error)
    {
        var settings = services.GetRequiredService<DatabaseSettings>();
        if (settings.Provider != DatabaseProvider.Sqlite)
        {
            return await FailAsync(error, "backup works on the SQLite database only; for PostgreSQL use pg_dump (and pg_restore to restore).").ConfigureAwait(false);
        }

        var target = Path.GetFullPath(file);
        if (File.Exists(target))
        {
            return await FailAsync(error, $"backup refused: {target} exists already; choose a new file name.").ConfigureAwait(false);
        }

        Directory.CreateDirectory(Path.GetDirectoryName(target)!);
        await using (var source = new SqliteConnection(settings.ConnectionString))
        await using (var destination = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = target, Pooling = false }.ToString()))
        {
            await source.OpenAsync().ConfigureAwait(false);
            await destination.OpenAsync().ConfigureAwait(false);
            source.BackupDatabase(destination);
        }

        SqliteConnection.ClearAllPools();
        await output.WriteLineAsync($"Backed up the database to {target}.").ConfigureAwait(false);
        return 0;
    }

    private static async Task<int> RestoreAsync(IServiceProvider services, string file, TextWriter output, TextWriter error)
    {
        var settings = services.GetRequiredService<DatabaseSettings>();
        if (settings.Provider != DatabaseProvider.Sqlite)
        {
            return await FailAsync(error, "restore works on the SQLite database only; for PostgreSQL use pg_restore.").ConfigureAwait(false);
        }

        var source = Path.GetFullPath(file);
        if (CheckBackup(source) is { } why)
        {
            return await FailAsync(error, $"restore refused: {source} {why}").ConfigureAwait(false);
        }

        var target = new SqliteConnectionStringBuilder(settings.ConnectionString).DataSource;
        if (File.Exists(target) && IsInUse(target))
        {
            return await FailAsync(error, $"restore refused: the database {target} is in use; stop TrussWeb first.").ConfigureAwait(false);
        }

        SqliteConnection.ClearAllPools();
        var staging = target + ".restoring";
        File.Copy(source, staging, overwrite: true);
        if (File.Exists(target))
        {
            var keep = $"{target}.before-restore-{DateTime.UtcNow:yyyyMMddHHmmss}";
            File.Copy(target, keep);
            await output.WriteLineAsync($"The replaced database is kept as {keep}.").ConfigureAwait(false);
        }

        foreach (var side in new[] { target + "-wal", target + "-shm" })
        {
            File.Delete(side);
        }

        File.Move(staging, target, overwrite: true);
        await output.WriteLineAsync($"Restored {target} from {source}.").ConfigureAwait(false);
        return 0;
    }

    /// <summary>Null when the file is a sound TrussWeb SQLite database; else why not.</summary>
    internal static string? CheckBackup(string path)
    {
        if (!File.Exists(path))
        {
            return "does not exist.";
        }

        try
        {
            using var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = path, Mode = SqliteOpenMode.ReadOnly, Pooling = false }.ToString());
            connection.Open();
            using (var check = connection.CreateCommand())
            {
                check.CommandText = "PRAGMA integrity_check";
                var result = check.ExecuteScalar() as string;
                if (!string.Equals(result, "ok", StringComparison.OrdinalIgnoreCase))
                {
                    return $"fails the SQLite integrity check ({result}).";
                }
            }

            using var tables = connection.CreateCommand();
            tables.CommandText = "SELECT COUNT(*) FROM sqlite_master WHERE type = 'table' AND name IN ('__EFMigrationsHistory', 'Projects', 'AspNetUsers')";
            if (Convert.ToInt64(tables.ExecuteScalar(), System.Globalization.CultureInfo.InvariantCulture) != 3)
            {
                return "is a SQLite database but not a TrussWeb database (no migrations history, projects or users table).";
            }

            using var migrations = connection.CreateCommand();
            migrations.CommandText = "SELECT COUNT(*) FROM \"__EFMigrationsHistory\"";
            return Convert.ToInt64(migrations.ExecuteScalar(), System.Globalization.CultureInfo.InvariantCulture) == 0 ? "has no applied migrations." : null;
        }
        catch (SqliteException ex)
        {
            return $"is not a SQLite database ({ex.Message}).";
        }
    }

    private static bool IsInUse(string path)
    {
        try
        {
            using var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = path, Pooling = false, DefaultTimeout = 1 }.ToString());
            connection.Open();
            using var command = connection.CreateCommand();
            command.CommandText = "PRAGMA busy_timeout = 0; BEGIN EXCLUSIVE; ROLLBACK;";
            command.ExecuteNonQuery();
            return false;
        }
        catch (SqliteException)
        {
            return true;
        }
    }

    private static string? Option(string[] args, string name)
    {
        var i = Array.IndexOf(args, name);
        return i >= 0 && i + 1 < args.Length ? args[i + 1] : null;
    }

    private static async Task<int> FailAsync(TextWriter error, string message)
    {
        await error.WriteLineAsync(message).ConfigureAwait(false);
        return 1;
    }
}
