using System.Net.Sockets;
using Microsoft.Data.Sqlite;
using Npgsql;

namespace PackDesigner.Data.Storage;

/// <summary>Tells an unreachable or unanswering database apart from a bug or a constraint violation.</summary>
public static class StorageFailure
{
    // SQLite result codes (https://www.sqlite.org/rescode.html): the file cannot be opened, read or written.
    private const int SqliteBusy = 5;
    private const int SqliteLocked = 6;
    private const int SqliteReadOnly = 8;
    private const int SqliteIoErr = 10;
    private const int SqliteFull = 13;
    private const int SqliteCantOpen = 14;
    private const int SqliteNotADb = 26;
    private const int SqliteConstraintForeignKey = 787;
    private const int SqliteConstraintPrimaryKey = 1555;
    private const int SqliteConstraintUnique = 2067;

    /// <summary>
    /// True when <paramref name="exception"/> or one of its inner exceptions says the database is down,
    /// unreachable, refusing connections, out of resources or too slow: connection failures and timeouts of
    /// Npgsql, PostgreSQL's connection/resource/shutdown errors (SQLSTATE classes 08, 53, 57P, 28, and 3D000), SQLite
    /// files that cannot be opened, read, written or locked, sockets and timeouts. Constraint violations, trigger
    /// errors and concurrency conflicts are not.
    /// </summary>
    public static bool IsUnavailable(Exception? exception)
    {
        for (var e = exception; e is not null; e = e.InnerException)
        {
            switch (e)
            {
                case StorageUnavailableException:
                    return true;
                case PostgresException pg when IsUnavailableSqlState(pg.SqlState):
                    return true;
                case PostgresException:
                    // A server-side error such as a constraint or trigger: only a timeout behind it counts.
                    continue;
                case NpgsqlException npgsql when npgsql.IsTransient:
                    return true;
                case SqliteException sqlite when sqlite.SqliteErrorCode is SqliteBusy or SqliteLocked or SqliteReadOnly
                    or SqliteIoErr or SqliteFull or SqliteCantOpen or SqliteNotADb:
                    return true;
                case TimeoutException or SocketException or EndOfStreamException:
                    return true;
                case IOException when e.InnerException is SocketException:
                    return true;
            }
        }

        return false;
    }

    /// <summary>
    /// PostgreSQL error codes (Appendix A of its manual): 08 connection exception, 53 insufficient resources,
    /// 57P01–57P05 shutdown / cannot connect now / idle timeouts, 28 authorisation, 3D000 no such database.
    /// </summary>
    private static bool IsUnavailableSqlState(string sqlState) =>
        sqlState.StartsWith("08", StringComparison.Ordinal)
        || sqlState.StartsWith("53", StringComparison.Ordinal)
        || sqlState.StartsWith("57P", StringComparison.Ordinal)
        || sqlState.StartsWith("28", StringComparison.Ordinal)
        || sqlState == "3D000";

    /// <summary>True when a unique index refused the write (PostgreSQL 23505, SQLite SQLITE_CONSTRAINT_UNIQUE/PRIMARYKEY).</summary>
    public static bool IsUniqueViolation(Exception? exception)
    {
        for (var e = exception; e is not null; e = e.InnerException)
        {
            if (e is PostgresException { SqlState: PostgresErrorCodes.UniqueViolation }
                || e is SqliteException { SqliteExtendedErrorCode: SqliteConstraintUnique or SqliteConstraintPrimaryKey })
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>True when a foreign key refused the write (PostgreSQL 23503, SQLite SQLITE_CONSTRAINT_FOREIGNKEY).</summary>
    public static bool IsForeignKeyViolation(Exception? exception)
    {
        for (var e = exception; e is not null; e = e.InnerException)
        {
            if (e is PostgresException { SqlState: PostgresErrorCodes.ForeignKeyViolation }
                || e is SqliteException { SqliteExtendedErrorCode: SqliteConstraintForeignKey })
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>Runs <paramref name="operation"/> and turns an unavailable-database failure into <see cref="StorageUnavailableException"/>.</summary>
    internal static async Task<T> GuardAsync<T>(Func<Task<T>> operation)
    {
        try
        {
            return await operation().ConfigureAwait(false);
        }
        catch (Exception ex) when (ex is not StorageUnavailableException && IsUnavailable(ex))
        {
            throw new StorageUnavailableException("The design database is unavailable.", ex);
        }
    }
}
