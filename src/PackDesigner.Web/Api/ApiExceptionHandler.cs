using Microsoft.AspNetCore.Diagnostics;
using Microsoft.AspNetCore.Mvc;
using PackDesigner.Data.Storage;

namespace PackDesigner.Web.Api;

/// <summary>
/// The API's one exception path: any exception under <c>/api</c> becomes a ProblemDetails with a generic message;
/// the exception itself goes only to the log. Other requests fall through to the error page.
/// </summary>
public sealed partial class ApiExceptionHandler(IProblemDetailsService problems, ILogger<ApiExceptionHandler> logger) : IExceptionHandler
{
    public async ValueTask<bool> TryHandleAsync(HttpContext httpContext, Exception exception, CancellationToken cancellationToken)
    {
        // By now the middleware has pointed the request at the error page; the feature keeps the original path.
        var path = httpContext.Features.Get<IExceptionHandlerPathFeature>()?.Path ?? httpContext.Request.Path.Value ?? string.Empty;
        if (!path.StartsWith(ApiEndpoints.Prefix + "/", StringComparison.OrdinalIgnoreCase) && !path.Equals(ApiEndpoints.Prefix, StringComparison.OrdinalIgnoreCase))
        {
            return false;
        }

        var status = StatusOf(exception);
        LogFailure(logger, exception, httpContext.Request.Method, path, status);
        httpContext.Response.StatusCode = status;
        return await problems.TryWriteAsync(new ProblemDetailsContext
        {
            HttpContext = httpContext,
            ProblemDetails = new ProblemDetails
            {
                Status = status,
                Title = status switch
                {
                    StatusCodes.Status500InternalServerError => "An unexpected error occurred.",
                    StatusCodes.Status503ServiceUnavailable => "Storage unavailable.",
                    _ => "The request could not be read.",
                },
                Detail = status switch
                {
                    StatusCodes.Status500InternalServerError => "The error has been logged. Please try again or report the request that caused it.",
                    StatusCodes.Status503ServiceUnavailable => "The design database cannot be reached. Nothing was saved; try again in a moment.",
                    _ => "Check the request's size, headers and body.",
                },
            },
        });
    }

    /// <summary>Client errors the server raises while reading a request keep their 4xx status; the rest are 500.</summary>
    public static int StatusOf(Exception exception) => exception switch
    {
        BadHttpRequestException bad => bad.StatusCode,
        _ when StorageFailure.IsUnavailable(exception) => StatusCodes.Status503ServiceUnavailable,
        _ => StatusCodes.Status500InternalServerError,
    };

    [LoggerMessage(Level = LogLevel.Error, Message = "Unhandled exception on {Method} {Path}, answered with {Status}")]
    private static partial void LogFailure(ILogger logger, Exception exception, string method, string path, int status);
}
