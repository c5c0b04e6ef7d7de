using System.Globalization;
using Microsoft.EntityFrameworkCore;
using Microsoft.EntityFrameworkCore.ChangeTracking;
using TrussWeb.Data.Entities;

namespace TrussWeb.Data.Concurrency;

/// <summary>
/// Turns a <see cref="DbUpdateConcurrencyException"/> into a <see cref="ConcurrencyConflictException"/>
/// that names each row and who changed it, keeping both edits' values. The tracked entries are left
/// as they were (the user's values stay current), so the caller can merge and save again after
/// <c>entry.OriginalValues.SetValues(databaseValues)</c>.
/// </summary>
public static class ConcurrencyConflicts
{
    private static readonly string[] LabelProperties = ["Mark", "Name", "Label", "Designation"];

    private static readonly HashSet<string> BookkeepingProperties =
    [
        nameof(IVersioned.Version), nameof(IAuditable.CreatedUtc), nameof(IAuditable.CreatedBy),
        nameof(IAuditable.UpdatedUtc), nameof(IAuditable.UpdatedBy),
    ];

    /// <summary>Reads the stored values of every conflicting row and describes the conflict.</summary>
    public static async Task<ConcurrencyConflictException> DescribeAsync(
        DbUpdateConcurrencyException exception, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(exception);
        var conflicts = new List<ConcurrencyConflict>();
        foreach (var entry in exception.Entries)
        {
            var stored = await entry.GetDatabaseValuesAsync(cancellationToken).ConfigureAwait(false);
            conflicts.Add(Describe(entry, stored));
        }

        var message = conflicts.Count == 0
            ? "The data was changed by someone else while you were editing it. Reload and apply your edits again."
            : string.Join(" ", conflicts.Select(c => c.Message));
        return new ConcurrencyConflictException(message, conflicts, exception);
    }

    private static ConcurrencyConflict Describe(EntityEntry entry, PropertyValues? stored)
    {
        var entityType = entry.Metadata.ClrType.Name;
        var key = string.Join(
            ",",
            entry.Metadata.FindPrimaryKey()?.Properties.Select(p => Convert.ToString(entry.Property(p.Name).CurrentValue, CultureInfo.InvariantCulture))
            ?? []);
        var label = LabelProperties
            .Where(name => entry.Metadata.FindProperty(name) is not null)
            .Select(name => entry.Property(name).CurrentValue as string)
            .FirstOrDefault(value => !string.IsNullOrEmpty(value));

        var yours = entry.Metadata.GetProperties().ToDictionary(p => p.Name, p => entry.Property(p.Name).CurrentValue);
        var theirs = stored?.Properties.ToDictionary(p => p.Name, p => stored[p]);

        var conflicting = theirs is null
            ? []
            : entry.Metadata.GetProperties()
                .Where(p => !BookkeepingProperties.Contains(p.Name) && entry.Property(p.Name).IsModified)
                .Where(p => !Equals(yours[p.Name], theirs[p.Name]))
                .Select(p => p.Name)
                .ToList();

        var changedBy = theirs is not null && theirs.TryGetValue(nameof(IAuditable.UpdatedBy), out var by) ? by as string : null;
        DateTime? changedUtc = theirs is not null && theirs.TryGetValue(nameof(IAuditable.UpdatedUtc), out var at) && at is DateTime time
            ? time
            : null;

        var row = label is null ? $"{entityType} {key}" : $"{entityType} '{label}' ({key})";
        string message;
        if (theirs is null)
        {
            message = $"{row} was deleted by someone else after you loaded it; your changes were not saved.";
        }
        else
        {
            var who = changedBy is null ? "the system" : $"user '{changedBy}'";
            var when = changedUtc is null ? string.Empty : $" at {changedUtc.Value.ToString("yyyy-MM-dd HH:mm:ss", CultureInfo.InvariantCulture)} UTC";
            var fields = conflicting.Count == 0
                ? string.Empty
                : " Conflicting fields: " + string.Join(
                    "; ",
                    conflicting.Select(name => $"{name} (yours: {Show(yours[name])}, saved: {Show(theirs[name])})")) + ".";
            message = $"{row} was changed by {who}{when} after you loaded it; your changes were not saved.{fields}";
        }

        return new ConcurrencyConflict(entityType, key, label, changedBy, changedUtc, theirs is null, yours, theirs, conflicting, message);
    }

    private static string Show(object? value) =>
        value is null ? "empty" : $"'{Convert.ToString(value, CultureInfo.InvariantCulture)}'";
}
