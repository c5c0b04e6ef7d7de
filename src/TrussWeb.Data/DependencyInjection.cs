using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.Configuration;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.DependencyInjection.Extensions;
using TrussWeb.Data.Interceptors;

namespace TrussWeb.Data;

/// <summary>Registers the data layer; the only place where the database provider is chosen.</summary>
public static class DependencyInjection
{
    /// <summary>
    /// Registers <see cref="IDbContextFactory{TrussWebDbContext}"/> (scoped, so the interceptors see the
    /// scope's <see cref="ICurrentUser"/>; create one short-lived context per operation), a scoped
    /// <see cref="TrussWebDbContext"/> for the Identity stores only, <see cref="TimeProvider.System"/> and
    /// <see cref="SystemCurrentUser"/> unless already registered. Reads <see cref="DatabaseSettings.ProviderKey"/>
    /// and <see cref="DatabaseSettings.ConnectionStringKey"/>; fails here, at start-up, when they are invalid.
    /// </summary>
    /// <param name="services">The service collection.</param>
    /// <param name="configuration">Configuration holding the <c>TrussWeb:Database</c> section.</param>
    /// <param name="contentRootPath">Folder a relative SQLite file is resolved against; defaults to the
    /// host's <c>contentRoot</c> setting, else the current directory.</param>
    public static IServiceCollection AddTrussWebData(
        this IServiceCollection services, IConfiguration configuration, string? contentRootPath = null)
    {
        ArgumentNullException.ThrowIfNull(services);
        ArgumentNullException.ThrowIfNull(configuration);

        var root = contentRootPath ?? configuration["contentRoot"] ?? Directory.GetCurrentDirectory();
        var settings = DatabaseSettings.FromConfiguration(configuration, root);
        services.AddSingleton(settings);
        services.TryAddSingleton(TimeProvider.System);
        services.TryAddScoped<ICurrentUser, SystemCurrentUser>();
        services.AddScoped<AuditStampInterceptor>();

        switch (settings.Provider)
        {
            case DatabaseProvider.Postgres:
                services.AddDbContextFactory<PostgresTrussWebDbContext>(
                    (sp, options) => ConfigurePostgres(options, settings.ConnectionString).AddInterceptors(CommonInterceptors(sp)),
                    ServiceLifetime.Scoped);
                services.AddScoped<IDbContextFactory<TrussWebDbContext>>(sp =>
                    new DerivedContextFactory<PostgresTrussWebDbContext>(sp.GetRequiredService<IDbContextFactory<PostgresTrussWebDbContext>>()));
                break;
            default:
                services.AddDbContextFactory<SqliteTrussWebDbContext>(
                    (sp, options) => ConfigureSqlite(options, settings.ConnectionString).AddInterceptors(CommonInterceptors(sp)),
                    ServiceLifetime.Scoped);
                services.AddScoped<IDbContextFactory<TrussWebDbContext>>(sp =>
                    new DerivedContextFactory<SqliteTrussWebDbContext>(sp.GetRequiredService<IDbContextFactory<SqliteTrussWebDbContext>>()));
                break;
        }

        services.AddScoped<TrussWebDbContext>(sp => sp.GetRequiredService<IDbContextFactory<TrussWebDbContext>>().CreateDbContext());
        return services;
    }

    /// <summary>Provider options for SQLite, shared with the design-time factory.</summary>
    internal static DbContextOptionsBuilder ConfigureSqlite(DbContextOptionsBuilder options, string connectionString) =>
        options
            .UseSqlite(connectionString, sqlite => sqlite.MigrationsHistoryTable("__EFMigrationsHistory"))
            .AddInterceptors(SqlitePragmaInterceptor.Instance);

    /// <summary>Provider options for PostgreSQL, shared with the design-time factory.</summary>
    internal static DbContextOptionsBuilder ConfigurePostgres(DbContextOptionsBuilder options, string connectionString) =>
        options.UseNpgsql(connectionString, npgsql => npgsql.MigrationsHistoryTable("__EFMigrationsHistory"));

    private static Microsoft.EntityFrameworkCore.Diagnostics.IInterceptor[] CommonInterceptors(IServiceProvider services) =>
        [services.GetRequiredService<AuditStampInterceptor>(), VersionInterceptor.Instance];
}
