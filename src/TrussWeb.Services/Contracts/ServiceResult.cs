namespace TrussWeb.Services.Contracts;

/// <summary>What kind of outcome a service call had. Only <see cref="Ok"/> carries a value.</summary>
public enum ResultKind
{
    /// <summary>The call succeeded; <see cref="ServiceResult{T}.Value"/> is set.</summary>
    Ok,

    /// <summary>The input was refused; <see cref="ServiceResult{T}.Errors"/> names each field and its limit. Nothing was saved.</summary>
    Invalid,

    /// <summary>Someone else saved one of the rows since the caller loaded it; <see cref="ServiceResult{T}.Conflicts"/> says who and what. Nothing was saved.</summary>
    Conflict,

    /// <summary>The caller may see the object but not do this to it.</summary>
    Forbidden,

    /// <summary>The object does not exist or the caller may not see it.</summary>
    NotFound,
}

/// <summary>One refused input: the field (property name of the input record, with an index for rows, e.g. "Rows[3].XMm"), a sentence with the limit, and for files where it is.</summary>
public sealed record FieldError(string Field, string Message, string? File = null, int? Line = null)
{
    public override string ToString() =>
        File is null ? $"{Field}: {Message}" : $"{File}:{Line?.ToString(System.Globalization.CultureInfo.InvariantCulture) ?? "?"} {Field}: {Message}";
}

/// <summary>
/// One row whose save lost a race. <see cref="YourValues"/> are the values the caller tried to save
/// (kept, so the page can show and re-apply them); <see cref="StoredValues"/> are what is stored now.
/// Values are invariant-culture text.
/// </summary>
public sealed record ConflictDetail(
    string EntityType,
    string Key,
    string? Label,
    string? ChangedByUserId,
    string? ChangedByName,
    DateTime? ChangedUtc,
    bool WasDeleted,
    IReadOnlyList<string> ConflictingFields,
    IReadOnlyDictionary<string, string?> YourValues,
    IReadOnlyDictionary<string, string?>? StoredValues,
    string Message);

/// <summary>Value of a call that returns nothing else.</summary>
public readonly record struct Done;

/// <summary>
/// Outcome of every service call. Expected failures (bad input, conflicts, missing rights, missing
/// rows) come back as a kind with a message; pages never need to catch exceptions for them.
/// </summary>
public sealed record ServiceResult<T>
{
    public required ResultKind Kind { get; init; }

    /// <summary>Set when <see cref="Kind"/> is <see cref="ResultKind.Ok"/>.</summary>
    public T? Value { get; init; }

    public IReadOnlyList<FieldError> Errors { get; init; } = [];

    public IReadOnlyList<ConflictDetail> Conflicts { get; init; } = [];

    /// <summary>A sentence for the user when the call did not succeed.</summary>
    public string? Message { get; init; }

    public bool IsOk => Kind == ResultKind.Ok;

    public static ServiceResult<T> Ok(T value) => new() { Kind = ResultKind.Ok, Value = value };

    public static ServiceResult<T> Invalid(IReadOnlyList<FieldError> errors) =>
        new() { Kind = ResultKind.Invalid, Errors = errors, Message = errors.Count == 1 ? errors[0].ToString() : $"{errors.Count} inputs need attention" };

    public static ServiceResult<T> Invalid(string field, string message) => Invalid([new FieldError(field, message)]);

    public static ServiceResult<T> Conflict(IReadOnlyList<ConflictDetail> conflicts) =>
        new() { Kind = ResultKind.Conflict, Conflicts = conflicts, Message = string.Join(" ", conflicts.Select(c => c.Message)) };

    public static ServiceResult<T> Forbidden(string message) => new() { Kind = ResultKind.Forbidden, Message = message };

    public static ServiceResult<T> NotFound(string message) => new() { Kind = ResultKind.NotFound, Message = message };

    /// <summary>The same failure with another value type (for passing a failure up).</summary>
    public ServiceResult<TOther> As<TOther>() =>
        IsOk ? throw new InvalidOperationException("An Ok result has a value; map it instead.")
             : new ServiceResult<TOther> { Kind = Kind, Errors = Errors, Conflicts = Conflicts, Message = Message };
}

/// <summary>A row the caller loaded and refers to (for deletes and for table-wide operations), with the version it loaded.</summary>
public sealed record RowRef(Guid Id, long Version);
