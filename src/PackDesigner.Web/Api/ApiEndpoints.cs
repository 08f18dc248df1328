using Microsoft.AspNetCore.Http.Json;
using Microsoft.Extensions.Options;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Evaluation;
using PackDesigner.Web.Storage;

namespace PackDesigner.Web.Api;

/// <summary>The JSON API, version 1.</summary>
public static class ApiEndpoints
{
    public const string Prefix = "/api";
    public const string Evaluate = "/api/v1/evaluate";
    public const string Presets = "/api/v1/presets";

    public static bool IsApiRequest(HttpContext context) => context.Request.Path.StartsWithSegments(Prefix);

    public static IEndpointRouteBuilder MapPackDesignerApi(this IEndpointRouteBuilder app)
    {
        app.MapPost(Evaluate, EvaluateAsync)
            .Accepts<EvaluateRequest>("application/json")
            .Produces<EvaluationResult>()
            .ProducesValidationProblem()
            .WithTags("Evaluate")
            .WithSummary("Evaluates a design without saving it.")
            .WithMetadata(StorageFreeAttribute.Instance)
            .DisableAntiforgery();
        app.MapGet(Presets, () => TypedResults.Ok(PresetsResponse.From(ChemistryPresets.All)))
            .WithTags("Evaluate")
            .WithSummary("The chemistry presets and the sources of their typical figures.")
            .WithMetadata(StorageFreeAttribute.Instance);
        app.MapSpreadEndpoints();
        app.MapCellEndpoints();
        app.MapCustomerEndpoints();
        return app;
    }

    private static async Task<IResult> EvaluateAsync(HttpRequest request, IOptions<JsonOptions> json, CancellationToken ct)
    {
        var body = await JsonBody.ReadAsync<EvaluateRequest>(request, json.Value.SerializerOptions, ct);
        if (body.Value is not { } design)
        {
            return body.Problem!;
        }

        var outcome = DesignRequestMapper.Evaluate(design);
        return outcome.Result is { } result ? TypedResults.Ok(result) : ApiProblems.Invalid(outcome.Errors);
    }
}
