using Microsoft.EntityFrameworkCore.Storage.ValueConversion;

namespace TrussWeb.Data;

/// <summary>
/// Stores every <see cref="DateTime"/> as UTC and reads it back with <see cref="DateTimeKind.Utc"/>.
/// A local time is converted; an unspecified one is taken to be UTC already (stamps come from
/// <see cref="TimeProvider.GetUtcNow"/>). Same behaviour on SQLite (text) and PostgreSQL (timestamptz).
/// </summary>
public sealed class UtcDateTimeConverter : ValueConverter<DateTime, DateTime>
{
    public UtcDateTimeConverter()
        : base(
            v => v.Kind == DateTimeKind.Local ? v.ToUniversalTime() : DateTime.SpecifyKind(v, DateTimeKind.Utc),
            v => DateTime.SpecifyKind(v, DateTimeKind.Utc))
    {
    }
}
