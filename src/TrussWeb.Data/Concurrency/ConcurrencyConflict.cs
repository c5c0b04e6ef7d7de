namespace TrussWeb.Data.Concurrency;

/// <summary>
/// One row whose save lost a concurrency race: which row, who saved it meanwhile, and both sides'
/// values so the UI can show them and let the user merge.
/// </summary>
/// <param name="EntityType">CLR type name, e.g. "TrussMember".</param>
/// <param name="Key">Primary key as text.</param>
/// <param name="Label">Human name of the row (Mark, Name, Label or Designation) when it has one.</param>
/// <param name="ChangedBy">User id that saved the stored version; null when the system did or the row is gone.</param>
/// <param name="ChangedUtc">When the stored version was saved; null when the row is gone.</param>
/// <param name="WasDeleted">The row no longer exists in the database.</param>
/// <param name="YourValues">Values this save tried to write, by property name.</param>
/// <param name="DatabaseValues">Values stored now, by property name; null when the row was deleted.</param>
/// <param name="ConflictingProperties">Edited properties whose stored value differs from the value this save tried to write.</param>
/// <param name="Message">A sentence for the user naming the row and who changed it.</param>
public sealed record ConcurrencyConflict(
    string EntityType,
    string Key,
    string? Label,
    string? ChangedBy,
    DateTime? ChangedUtc,
    bool WasDeleted,
    IReadOnlyDictionary<string, object?> YourValues,
    IReadOnlyDictionary<string, object?>? DatabaseValues,
    IReadOnlyList<string> ConflictingProperties,
    string Message);
