using Microsoft.AspNetCore.Http.Json;
using Microsoft.Extensions.Options;
using PackDesigner.Core.Finder;
using PackDesigner.Core.Spread;
using PackDesigner.Web.Storage;

namespace PackDesigner.Web.Api;

/// <summary>
/// <c>POST /api/v1/spread</c> (cell-to-cell spread Monte Carlo of a design) and <c>POST /api/v1/configurations</c>
/// (the S×P configurations of a cell that fit the equipment). Both are pure computations: nothing is stored. The
/// request's abort token cancels the computation when the client goes away.
/// </summary>
public static partial class SpreadEndpoints
{
    public const string Spread = "/api/v1/spread";
    public const string Configurations = "/api/v1/configurations";

    /// <summary>Status written when the client went away before the answer (nginx's "client closed request"); nobody reads it.</summary>
    public const int ClientClosedRequest = 499;

    public static IEndpointRouteBuilder MapSpreadEndpoints(this IEndpointRouteBuilder app)
    {
        app.MapPost(Spread, SpreadAsync)
            .WithName("AnalyzeSpread")
            .Accepts<SpreadApiRequest>("application/json")
            .Produces<SpreadResult>()
            .ProducesValidationProblem()
            .WithTags("Spread")
            .WithSummary("Monte Carlo of the cell-to-cell spread of a design: trip probabilities, percentiles and the recommended CV.")
            .WithMetadata(StorageFreeAttribute.Instance)
            .DisableAntiforgery();
        app.MapPost(Configurations, ConfigurationsAsync)
            .WithName("FindConfigurations")
            .Accepts<ConfigurationsApiRequest>("application/json")
            .Produces<ConfigurationResult>()
            .ProducesValidationProblem()
            .WithTags("Spread")
            .WithSummary("Every S×P of a cell that fits the controller, charger and targets, and why the others do not.")
            .WithMetadata(StorageFreeAttribute.Instance)
            .DisableAntiforgery();
        return app;
    }

    private static async Task<IResult> SpreadAsync(HttpContext context, IOptions<JsonOptions> json, ILoggerFactory loggers)
    {
        var ct = context.RequestAborted;
        var body = await JsonBody.ReadAsync<SpreadApiRequest>(context.Request, json.Value.SerializerOptions, ct, "the design and the spread settings");
        if (body.Value is not { } request)
        {
            return body.Problem!;
        }

        if (DesignRequestMapper.TryMapSpread(request, out var errors) is not { } spread)
        {
            return ApiProblems.Invalid(errors);
        }

        try
        {
            var outcome = SpreadMonteCarlo.Analyze(spread, ct);
            return outcome.Result is { } result ? TypedResults.Ok(result) : ApiProblems.Invalid(outcome.Errors);
        }
        catch (OperationCanceledException) when (ct.IsCancellationRequested)
        {
            LogCancelled(loggers.CreateLogger(typeof(SpreadEndpoints)), Spread);
            return TypedResults.StatusCode(ClientClosedRequest);
        }
    }

    private static async Task<IResult> ConfigurationsAsync(HttpContext context, IOptions<JsonOptions> json, ILoggerFactory loggers)
    {
        var ct = context.RequestAborted;
        var body = await JsonBody.ReadAsync<ConfigurationsApiRequest>(context.Request, json.Value.SerializerOptions, ct, "the cell and the equipment limits");
        if (body.Value is not { } request)
        {
            return body.Problem!;
        }

        if (DesignRequestMapper.TryMapConfigurations(request, out var errors) is not { } search)
        {
            return ApiProblems.Invalid(errors);
        }

        try
        {
            var outcome = ConfigurationFinder.Find(search, ct);
            return outcome.Result is { } result ? TypedResults.Ok(result) : ApiProblems.Invalid(outcome.Errors);
        }
        catch (OperationCanceledException) when (ct.IsCancellationRequested)
        {
            LogCancelled(loggers.CreateLogger(typeof(SpreadEndpoints)), Configurations);
            return TypedResults.StatusCode(ClientClosedRequest);
        }
    }

    [LoggerMessage(Level = LogLevel.Information, Message = "{Path}: the client went away; the computation was cancelled")]
    private static partial void LogCancelled(ILogger logger, string path);
}
