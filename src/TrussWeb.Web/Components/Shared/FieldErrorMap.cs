using TrussWeb.Services.Contracts;

namespace TrussWeb.Web.Components.Shared;

/// <summary>
/// The field errors of the last refused save, by field name ("Name", "Rows[3].XMm"), for showing each
/// message next to its input. Field names compare case-insensitively.
/// </summary>
public sealed class FieldErrorMap
{
    private readonly Dictionary<string, List<string>> _byField = new(StringComparer.OrdinalIgnoreCase);

    public bool Any => _byField.Count > 0;

    public void Clear() => _byField.Clear();

    /// <summary>Replaces the errors with those of a refused result.</summary>
    public void Set(IEnumerable<FieldError> errors)
    {
        ArgumentNullException.ThrowIfNull(errors);
        _byField.Clear();
        foreach (var e in errors)
        {
            if (!_byField.TryGetValue(e.Field, out var list))
            {
                _byField[e.Field] = list = [];
            }

            list.Add(e.Message);
        }
    }

    public bool Has(string field) => _byField.ContainsKey(field);

    /// <summary>The messages for one field joined into a sentence, or null.</summary>
    public string? For(string field) => _byField.TryGetValue(field, out var list) ? string.Join("; ", list) : null;

    /// <summary>Errors whose field is not one of <paramref name="shown"/> (shown in a summary so nothing is lost).</summary>
    public IReadOnlyList<string> Others(IEnumerable<string> shown)
    {
        var known = new HashSet<string>(shown, StringComparer.OrdinalIgnoreCase);
        return _byField.Where(kv => !known.Contains(kv.Key)).SelectMany(kv => kv.Value.Select(m => $"{kv.Key}: {m}")).ToList();
    }

    /// <summary>Every error as "field: message".</summary>
    public IReadOnlyList<string> All() => _byField.SelectMany(kv => kv.Value.Select(m => $"{kv.Key}: {m}")).ToList();
}
