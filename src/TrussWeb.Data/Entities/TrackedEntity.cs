namespace TrussWeb.Data.Entities;

/// <summary>Base of every user-edited entity: a Guid key, audit stamps and a concurrency version.</summary>
public abstract class TrackedEntity : IVersioned, IAuditable
{
    /// <summary>Primary key; EF Core generates it on the client when the row is added with an empty Guid.</summary>
    public Guid Id { get; set; }

    /// <inheritdoc />
    public long Version { get; set; }

    /// <inheritdoc />
    public DateTime CreatedUtc { get; set; }

    /// <inheritdoc />
    public string? CreatedBy { get; set; }

    /// <inheritdoc />
    public DateTime UpdatedUtc { get; set; }

    /// <inheritdoc />
    public string? UpdatedBy { get; set; }
}
