using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.Design;

namespace TrussWeb.Data.DesignTime;

/// <summary>Lets <c>dotnet ef</c> build the SQLite context without a host (migrations only).</summary>
public sealed class SqliteDesignTimeFactory : IDesignTimeDbContextFactory<SqliteTrussWebDbContext>
{
    public SqliteTrussWebDbContext CreateDbContext(string[] args)
    {
        var options = new DbContextOptionsBuilder<SqliteTrussWebDbContext>();
        DependencyInjection.ConfigureSqlite(options, "Data Source=design-time.db");
        return new SqliteTrussWebDbContext(options.Options);
    }
}
