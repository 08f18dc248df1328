namespace PackDesigner.Data.Infrastructure;

internal static class UtcClock
{
    /// <summary>
    /// The current UTC time cut to whole microseconds: PostgreSQL's timestamptz keeps microseconds, so the value
    /// in memory equals the value read back on both providers (and cell stamps compare equal).
    /// </summary>
    public static DateTime Now(TimeProvider clock)
    {
        var t = clock.GetUtcNow().UtcDateTime;
        return new DateTime(t.Ticks - t.Ticks % 10, DateTimeKind.Utc);
    }
}
