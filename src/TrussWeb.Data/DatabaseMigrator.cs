using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;

namespace TrussWeb.Data;

/// <summary>Applies pending migrations of the configured provider; call once at start-up.</summary>
public static class DatabaseMigrator
{
    /// <summary>Creates a scope, takes the context factory from it and migrates.</summary>
    public static async Task MigrateAsync(IServiceProvider services, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(services);
        var scope = services.CreateAsyncScope();
        await using (scope.ConfigureAwait(false))
        {
            var factory = scope.ServiceProvider.GetRequiredService<IDbContextFactory<TrussWebDbContext>>();
            await MigrateAsync(factory, cancellationToken).ConfigureAwait(false);
        }
    }

    /// <summary>Migrates the database the factory's contexts point at.</summary>
    public static async Task MigrateAsync(IDbContextFactory<TrussWebDbContext> factory, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(factory);
        var context = await factory.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
        await using (context.ConfigureAwait(false))
        {
            await context.Database.MigrateAsync(cancellationToken).ConfigureAwait(false);
        }
    }
}
