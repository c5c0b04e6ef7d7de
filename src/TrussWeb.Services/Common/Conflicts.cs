using System.Globalization;
using Microsoft.EntityFrameworkCore;
using TrussWeb.Data;
using TrussWeb.Data.Concurrency;
using TrussWeb.Services.Contracts;

namespace TrussWeb.Services.Common;

/// <summary>Turns the data layer's concurrency conflicts into <see cref="ConflictDetail"/> with user names.</summary>
internal static class Conflicts
{
    public static async Task<IReadOnlyList<ConflictDetail>> DescribeAsync(TrussWebDbContext db, DbUpdateConcurrencyException exception, CancellationToken cancellationToken)
    {
        var described = await ConcurrencyConflicts.DescribeAsync(exception, cancellationToken).ConfigureAwait(false);
        var ids = described.Conflicts.Select(c => c.ChangedBy).OfType<string>().Distinct().ToList();
        var names = await db.Users.Where(u => ids.Contains(u.Id)).ToDictionaryAsync(u => u.Id, u => u.DisplayName.Length > 0 ? u.DisplayName : u.Email ?? u.Id, cancellationToken)
            .ConfigureAwait(false);
        return described.Conflicts.Select(c => FromData(c, c.ChangedBy is { } id && names.TryGetValue(id, out var n) ? n : null)).ToList();
    }

    /// <summary>A conflict found before saving (the caller's loaded version is older than the stored one).</summary>
    public static ConflictDetail Stale(string entityType, Guid key, string? label, long yourVersion, long storedVersion, string? changedBy, string? changedByName,
        DateTime? changedUtc, IReadOnlyDictionary<string, string?> yourValues)
    {
        var who = changedByName ?? changedBy ?? "the system";
        var row = label is null ? $"{entityType} {key}" : $"{entityType} '{label}'";
        var when = changedUtc is null ? string.Empty : $" at {changedUtc.Value.ToString("yyyy-MM-dd HH:mm:ss", CultureInfo.InvariantCulture)} UTC";
        return new ConflictDetail(entityType, key.ToString(), label, changedBy, changedByName, changedUtc, false, [],
            yourValues, null,
            $"{row} was changed by {who}{when} after you loaded it (your version {yourVersion}, stored {storedVersion}); your changes were not saved.");
    }

    public static ConflictDetail Deleted(string entityType, Guid key, string? label) =>
        new(entityType, key.ToString(), label, null, null, null, true, [], new Dictionary<string, string?>(), null,
            $"{entityType} '{label ?? key.ToString()}' was deleted by someone else after you loaded it; your changes were not saved.");

    private static ConflictDetail FromData(ConcurrencyConflict c, string? name)
    {
        var message = name is null || c.ChangedBy is null ? c.Message : c.Message.Replace($"user '{c.ChangedBy}'", $"{name} ({c.ChangedBy})", StringComparison.Ordinal);
        return new ConflictDetail(c.EntityType, c.Key, c.Label, c.ChangedBy, name, c.ChangedUtc, c.WasDeleted, c.ConflictingProperties,
            c.YourValues.ToDictionary(p => p.Key, p => Text(p.Value)),
            c.DatabaseValues?.ToDictionary(p => p.Key, p => Text(p.Value)),
            message);
    }

    public static string? Text(object? value) => value switch
    {
        null => null,
        double d => d.ToString("R", CultureInfo.InvariantCulture),
        IFormattable f => f.ToString(null, CultureInfo.InvariantCulture),
        _ => value.ToString(),
    };
}
