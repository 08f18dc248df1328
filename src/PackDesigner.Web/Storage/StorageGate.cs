using Microsoft.Data.Sqlite;
using Npgsql;
using PackDesigner.Data.DependencyInjection;
using PackDesigner.Data.Storage;

namespace PackDesigner.Web.Storage;

/// <summary>
/// Makes sure the database is migrated before a request uses it, so that the app can start while the database is
/// down. Start-up tries once (<see cref="TryOpenAsync"/>); when that fails the app still starts and the next request
/// that needs storage tries again, one attempt at a time, until one succeeds. Nothing broken is cached: a failed
/// attempt leaves the gate closed and clears the connection pools, so the next attempt opens fresh connections.
/// </summary>
public sealed partial class StorageGate(IServiceProvider services, ILogger<StorageGate> logger)
{
    private readonly SemaphoreSlim _attempt = new(1, 1);
    private volatile bool _open;

    /// <summary>True once the migrations have been applied in this process.</summary>
    public bool IsOpen => _open;

    /// <summary>Migrates the database unless that has been done already.</summary>
    /// <exception cref="StorageUnavailableException">The database cannot be reached (the request answers 503).</exception>
    public async Task EnsureOpenAsync(CancellationToken ct)
    {
        if (_open)
        {
            return;
        }

        await _attempt.WaitAsync(ct);
        try
        {
            if (_open)
            {
                return;
            }

            await services.MigratePackDesignerDatabaseAsync(ct);
            _open = true;
            LogOpened(logger);
        }
        catch (StorageUnavailableException)
        {
            ClearPools();
            throw;
        }
        finally
        {
            _attempt.Release();
        }
    }

    /// <summary>The start-up attempt: logs and returns false when the database is unreachable, instead of stopping the app.</summary>
    public async Task<bool> TryOpenAsync(CancellationToken ct = default)
    {
        try
        {
            await EnsureOpenAsync(ct);
            return true;
        }
        catch (StorageUnavailableException ex)
        {
            LogStartWithoutStorage(logger, ex.InnerException?.Message ?? ex.Message);
            return false;
        }
    }

    /// <summary>
    /// Forgets pooled connections after the database failed, so that the first request after it is back does not
    /// pick up a connection to the old, dead server.
    /// </summary>
    public static void ClearPools()
    {
        NpgsqlConnection.ClearAllPools();
        SqliteConnection.ClearAllPools();
    }

    /// <summary>True when the request's endpoint needs the database (it is not marked <see cref="StorageFreeAttribute"/>).</summary>
    public static bool Needs(HttpContext context) =>
        context.GetEndpoint() is { } endpoint && endpoint.Metadata.GetMetadata<StorageFreeAttribute>() is null;

    [LoggerMessage(Level = LogLevel.Information, Message = "Design storage is open")]
    private static partial void LogOpened(ILogger logger);

    [LoggerMessage(Level = LogLevel.Warning, Message = "Design storage is unavailable at start-up ({Reason}); the app starts anyway and retries on the next request that needs storage")]
    private static partial void LogStartWithoutStorage(ILogger logger, string reason);
}
