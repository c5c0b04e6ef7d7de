using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Design;

namespace TrussWeb.Data.DesignTime;

/// <summary>
/// Lets <c>dotnet ef</c> build the PostgreSQL context without a host. Adding a migration needs no server;
/// the connection string names no real one.
/// </summary>
public sealed class PostgresDesignTimeFactory : IDesignTimeDbContextFactory<PostgresTrussWebDbContext>
{
    public PostgresTrussWebDbContext CreateDbContext(string[] args)
    {
        var options = new DbContextOptionsBuilder<PostgresTrussWebDbContext>();
        DependencyInjection.ConfigurePostgres(options, "Host=localhost;Database=trussweb_design");
        return new PostgresTrussWebDbContext(options.Options);
    }
}
