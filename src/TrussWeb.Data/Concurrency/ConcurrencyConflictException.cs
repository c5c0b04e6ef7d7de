namespace TrussWeb.Data.Concurrency;

/// <summary>
/// A save lost a concurrency race on one or more rows. <see cref="Exception.Message"/> names each row
/// and who changed it; <see cref="Conflicts"/> keeps both edits' values.
/// </summary>
public sealed class ConcurrencyConflictException : Exception
{
    public ConcurrencyConflictException()
        : this("The data was changed by someone else.", [], null)
    {
    }

    public ConcurrencyConflictException(string message)
        : this(message, [], null)
    {
    }

    public ConcurrencyConflictException(string message, Exception? innerException)
        : this(message, [], innerException)
    {
    }

    public ConcurrencyConflictException(string message, IReadOnlyList<ConcurrencyConflict> conflicts, Exception? innerException)
        : base(message, innerException)
    {
        ArgumentNullException.ThrowIfNull(conflicts);
        Conflicts = conflicts;
    }

    /// <summary>The rows in conflict.</summary>
    public IReadOnlyList<ConcurrencyConflict> Conflicts { get; }
}
