using Microsoft.EntityFrameworkCore;

namespace TrussWeb.Data;

/// <summary>The context used with SQLite; owns the migrations in Migrations/Sqlite.</summary>
public sealed class SqliteTrussWebDbContext : TrussWebDbContext
{
    public SqliteTrussWebDbContext(DbContextOptions<SqliteTrussWebDbContext> options)
        : base(options)
    {
    }
}
