using Microsoft.EntityFrameworkCore.Storage.ValueConversion;

namespace PackDesigner.Data.Configurations;

/// <summary>
/// Every stored time is UTC. Writing: a local time is converted to UTC, an unspecified one is taken as UTC.
/// Reading: the kind is set to UTC (SQLite gives it back unspecified). Applied to every DateTime property by convention.
/// </summary>
internal sealed class UtcDateTimeConverter() : ValueConverter<DateTime, DateTime>(v => ToUtc(v), v => DateTime.SpecifyKind(v, DateTimeKind.Utc))
{
    internal static DateTime ToUtc(DateTime v) => v.Kind switch
    {
        DateTimeKind.Utc => v,
        DateTimeKind.Local => v.ToUniversalTime(),
        _ => DateTime.SpecifyKind(v, DateTimeKind.Utc),
    };
}
