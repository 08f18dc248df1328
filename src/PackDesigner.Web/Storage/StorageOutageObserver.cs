using Microsoft.AspNetCore.Diagnostics;
using PackDesigner.Data.Storage;

namespace PackDesigner.Web.Storage;

/// <summary>
/// Runs first on every unhandled exception: when the database was unreachable it clears the connection pools
/// (see <see cref="StorageGate.ClearPools"/>) so that the app recovers by itself once the database is back. It never
/// handles the exception; the API handler or the error page answers 503.
/// </summary>
public sealed partial class StorageOutageObserver(ILogger<StorageOutageObserver> logger) : IExceptionHandler
{
    public ValueTask<bool> TryHandleAsync(HttpContext httpContext, Exception exception, CancellationToken cancellationToken)
    {
        if (StorageFailure.IsUnavailable(exception))
        {
            LogOutage(logger, httpContext.Request.Method, httpContext.Request.Path.Value ?? string.Empty);
            StorageGate.ClearPools();
        }

        return ValueTask.FromResult(false);
    }

    [LoggerMessage(Level = LogLevel.Warning, Message = "Design storage unavailable during {Method} {Path}; connection pools cleared")]
    private static partial void LogOutage(ILogger logger, string method, string path);
}
