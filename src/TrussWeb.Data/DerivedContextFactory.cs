using Microsoft.EntityFrameworkCore;

namespace TrussWeb.Data;

/// <summary>Serves the provider context (a subclass) as <see cref="IDbContextFactory{TrussWebDbContext}"/>.</summary>
internal sealed class DerivedContextFactory<TContext>(IDbContextFactory<TContext> inner) : IDbContextFactory<TrussWebDbContext>
    where TContext : TrussWebDbContext
{
    public TrussWebDbContext CreateDbContext() => inner.CreateDbContext();

    public async Task<TrussWebDbContext> CreateDbContextAsync(CancellationToken cancellationToken = default) =>
        await inner.CreateDbContextAsync(cancellationToken).ConfigureAwait(false);
}
