namespace TrussWeb.Data.Entities;

/// <summary>
/// A row edited by users. <see cref="Version"/> is the optimistic-concurrency token: the
/// <c>VersionInterceptor</c> sets it to 1 on insert and to original + 1 on every update, and EF Core
/// puts the original value in the UPDATE/DELETE WHERE clause. The same mechanism runs on SQLite and
/// PostgreSQL (no provider row versions).
/// </summary>
public interface IVersioned
{
    /// <summary>Concurrency token; never set it by hand except to carry the value a user loaded.</summary>
    long Version { get; set; }
}
