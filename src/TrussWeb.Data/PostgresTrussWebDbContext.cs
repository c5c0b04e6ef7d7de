using Microsoft.EntityFrameworkCore;

namespace TrussWeb.Data;

/// <summary>The context used with PostgreSQL; owns the migrations in Migrations/Postgres.</summary>
public sealed class PostgresTrussWebDbContext : TrussWebDbContext
{
    public PostgresTrussWebDbContext(DbContextOptions<PostgresTrussWebDbContext> options)
        : base(options)
    {
    }
}
