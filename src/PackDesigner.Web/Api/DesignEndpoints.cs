using Microsoft.AspNetCore.Http.Json;
using Microsoft.Extensions.Options;
using PackDesigner.Core.Design;
using PackDesigner.Core.Validation;
using PackDesigner.Data.Designs;
using PackDesigner.Data.Results;
using PackDesigner.Web.Pages.Designs;

namespace PackDesigner.Web.Api;

/// <summary>
/// <c>/api/v1/designs</c>: designs and their append-only revisions. Saving adds a revision; no endpoint changes or
/// deletes a saved revision, and a design cannot be deleted. Errors are ProblemDetails: 400 with field paths
/// (<c>input.cell.capacityAh</c>), 404, 409 when the revision a save is based on is no longer the latest, and 503
/// when the database cannot be reached (see <see cref="ApiExceptionHandler"/>).
/// </summary>
public static class DesignEndpoints
{
    /// <summary>Who saved, when a client does not say.</summary>
    public const string DefaultCreatedBy = "api";

    /// <summary>Fields of the design requests themselves; every other error is about the design input.</summary>
    private static readonly HashSet<string> OwnFields = new(StringComparer.Ordinal)
    {
        "name", "customerId", "jobId", "cellId", "createdBy", "note", "basedOnRevision", "input",
    };

    public static IEndpointRouteBuilder MapDesignApi(this IEndpointRouteBuilder app)
    {
        var designs = app.MapGroup(DesignRoutes.Api).WithTags("Designs").DisableAntiforgery();
        designs.MapPost("/", CreateAsync)
            .Accepts<CreateDesignRequest>("application/json")
            .Produces<DesignResponse>(StatusCodes.Status201Created)
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status503ServiceUnavailable)
            .WithSummary("Creates a design with revision 1 of the input (the evaluate request).");
        designs.MapGet("/", ListAsync)
            .Produces<DesignListResponse>()
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status503ServiceUnavailable)
            .WithSummary("One page of designs; search matches the design, customer or library cell name.");
        designs.MapGet("/{id:int}", GetAsync)
            .Produces<DesignResponse>()
            .ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status503ServiceUnavailable)
            .WithSummary("A design with its latest revision.");
        designs.MapPut("/{id:int}", SaveAsync)
            .Accepts<SaveRevisionRequest>("application/json")
            .Produces<DesignResponse>()
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status409Conflict)
            .ProducesProblem(StatusCodes.Status503ServiceUnavailable)
            .WithSummary("Saves the input as the next revision; 409 when basedOnRevision is no longer the latest.");
        designs.MapGet("/{id:int}/revisions", RevisionsAsync)
            .Produces<IReadOnlyList<RevisionSummaryResponse>>()
            .ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status503ServiceUnavailable)
            .WithSummary("The revision history, newest first.");
        designs.MapGet("/{id:int}/revisions/{number:int}", RevisionAsync)
            .Produces<RevisionResponse>()
            .ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status503ServiceUnavailable)
            .WithSummary("One revision with its input and result, as stored.");
        designs.MapPost("/{id:int}/revisions/{number:int}/restore", RestoreAsync)
            .Accepts<RestoreRevisionRequest>("application/json")
            .Produces<DesignResponse>()
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status409Conflict)
            .ProducesProblem(StatusCodes.Status503ServiceUnavailable)
            .WithSummary("Saves the input of an older revision as a new revision.");
        designs.MapPost("/{id:int}/duplicate", DuplicateAsync)
            .Accepts<DuplicateDesignRequest>("application/json")
            .Produces<DesignResponse>(StatusCodes.Status201Created)
            .ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status404NotFound)
            .ProducesProblem(StatusCodes.Status503ServiceUnavailable)
            .WithSummary("A new design whose revision 1 is the latest input of this one.");
        return app;
    }

    private static async Task<IResult> CreateAsync(HttpRequest request, IOptions<JsonOptions> json, DesignStore store, CancellationToken ct)
    {
        var body = await JsonBody.ReadAsync<CreateDesignRequest>(request, json.Value.SerializerOptions, ct);
        if (body.Value is not { } create)
        {
            return body.Problem!;
        }

        var errors = new List<ValidationError>();
        Unknown(errors, create.UnknownFields);
        var input = MapInput(create.Input, errors);
        if (errors.Count > 0 || input is null)
        {
            return ApiProblems.Invalid(errors);
        }

        var saved = await store.CreateDesignAsync(create.Name ?? string.Empty, create.CustomerId, create.JobId, create.CellId, input,
            create.CreatedBy ?? DefaultCreatedBy, create.Note, ct);
        return saved.IsOk
            ? TypedResults.Created(DesignRoutes.ApiDesign(saved.Value!.Id), DesignResponse.From(saved.Value))
            : Failure(saved);
    }

    private static async Task<IResult> ListAsync(DesignStore store, string? search, string? sort, string? page, string? pageSize, CancellationToken ct)
    {
        var query = DesignListQuery.Parse(search, sort, page, pageSize, out var errors);
        if (errors.Count > 0)
        {
            return ApiProblems.Invalid(errors);
        }

        var rows = await store.ListDesignsAsync(query.Search, query.Sort, query.Page, query.PageSize, ct);
        return TypedResults.Ok(DesignListResponse.From(rows));
    }

    private static async Task<IResult> GetAsync(int id, DesignStore store, CancellationToken ct)
    {
        var design = await store.GetDesignAsync(id, ct);
        return design.IsOk ? TypedResults.Ok(DesignResponse.From(design.Value!)) : Failure(design);
    }

    private static async Task<IResult> SaveAsync(int id, HttpRequest request, IOptions<JsonOptions> json, DesignStore store, CancellationToken ct)
    {
        var body = await JsonBody.ReadAsync<SaveRevisionRequest>(request, json.Value.SerializerOptions, ct);
        if (body.Value is not { } save)
        {
            return body.Problem!;
        }

        var errors = new List<ValidationError>();
        Unknown(errors, save.UnknownFields);
        if (save.BasedOnRevision is null)
        {
            errors.Add(new ValidationError("basedOnRevision", "Required: the number of the revision your changes are based on."));
        }

        var input = MapInput(save.Input, errors);
        if (errors.Count > 0 || input is null)
        {
            return ApiProblems.Invalid(errors);
        }

        var saved = await store.SaveRevisionAsync(id, save.BasedOnRevision!.Value, input, save.CreatedBy ?? DefaultCreatedBy, save.Name,
            save.Note, ct: ct);
        if (saved.Status == StoreStatus.Conflict)
        {
            return await ConflictAsync(id, saved.Message!, store, save.Input, ct);
        }

        return saved.IsOk ? TypedResults.Ok(DesignResponse.From(saved.Value!)) : Failure(saved);
    }

    private static async Task<IResult> RevisionsAsync(int id, DesignStore store, CancellationToken ct)
    {
        var list = await store.GetRevisionsAsync(id, ct);
        return list.IsOk ? TypedResults.Ok(list.Value!.Select(RevisionSummaryResponse.From).ToList()) : Failure(list);
    }

    private static async Task<IResult> RevisionAsync(int id, int number, DesignStore store, CancellationToken ct)
    {
        var revision = await store.GetRevisionAsync(id, number, ct);
        return revision.IsOk ? TypedResults.Ok(RevisionResponse.From(revision.Value!)) : Failure(revision);
    }

    private static async Task<IResult> RestoreAsync(int id, int number, HttpRequest request, IOptions<JsonOptions> json, DesignStore store, CancellationToken ct)
    {
        var body = await JsonBody.ReadAsync<RestoreRevisionRequest>(request, json.Value.SerializerOptions, ct);
        if (body.Value is not { } restore)
        {
            return body.Problem!;
        }

        var errors = new List<ValidationError>();
        Unknown(errors, restore.UnknownFields);
        if (restore.BasedOnRevision is null)
        {
            errors.Add(new ValidationError("basedOnRevision", "Required: the number of the latest revision you have seen."));
        }

        if (errors.Count > 0)
        {
            return ApiProblems.Invalid(errors);
        }

        var saved = await store.RestoreRevisionAsync(id, number, restore.BasedOnRevision!.Value, restore.CreatedBy ?? DefaultCreatedBy, ct);
        if (saved.Status == StoreStatus.Conflict)
        {
            return await ConflictAsync(id, saved.Message!, store, null, ct);
        }

        return saved.IsOk ? TypedResults.Ok(DesignResponse.From(saved.Value!)) : Failure(saved);
    }

    private static async Task<IResult> DuplicateAsync(int id, HttpRequest request, IOptions<JsonOptions> json, DesignStore store, CancellationToken ct)
    {
        var options = new DuplicateDesignRequest();
        if (request.ContentLength is not 0 && request.HasJsonContentType())
        {
            var body = await JsonBody.ReadAsync<DuplicateDesignRequest>(request, json.Value.SerializerOptions, ct);
            if (body.Value is null)
            {
                return body.Problem!;
            }

            options = body.Value;
        }

        var errors = new List<ValidationError>();
        Unknown(errors, options.UnknownFields);
        if (errors.Count > 0)
        {
            return ApiProblems.Invalid(errors);
        }

        var saved = await store.DuplicateAsync(id, options.Name, options.CreatedBy ?? DefaultCreatedBy, ct);
        return saved.IsOk
            ? TypedResults.Created(DesignRoutes.ApiDesign(saved.Value!.Id), DesignResponse.From(saved.Value))
            : Failure(saved);
    }

    /// <summary>Maps the <c>input</c> member; its errors are keyed <c>input.…</c>.</summary>
    private static DesignInput? MapInput(EvaluateRequest? request, List<ValidationError> errors)
    {
        if (request is null)
        {
            errors.Add(new ValidationError("input", "Required: the design input, in the form of the evaluate request."));
            return null;
        }

        var input = DesignRequestMapper.TryMap(request, out var mapping);
        errors.AddRange(mapping.Select(InInput));
        return input;
    }

    private static void Unknown(List<ValidationError> errors, Dictionary<string, System.Text.Json.JsonElement>? members) =>
        errors.AddRange((members?.Keys ?? Enumerable.Empty<string>()).Select(k => new ValidationError(k, DesignRequestMapper.UnknownMessage)));

    /// <summary>The store reports Core's errors by their path inside the design input; the API names them from the body's root.</summary>
    private static ValidationError InInput(ValidationError e) =>
        OwnFields.Contains(e.Field) ? e : e with { Field = "input." + e.Field };

    private static ValidationError InRequest(ValidationError e) =>
        OwnFields.Contains(e.Field) ? e : e with { Field = e.Field.Length == 0 ? "input" : "input." + e.Field };

    private static IResult Failure<T>(StoreResult<T> result) => result.Status switch
    {
        StoreStatus.Invalid => ApiProblems.Invalid(result.Errors.Select(InRequest)),
        StoreStatus.NotFound => ApiProblems.Status(StatusCodes.Status404NotFound, "Not found.", result.Message!),
        StoreStatus.Conflict => ApiProblems.Status(StatusCodes.Status409Conflict, "Conflict.", result.Message!),
        _ => throw new InvalidOperationException("An Ok result is not a failure."),
    };

    /// <summary>409 naming the latest revision, with the input that was not saved returned as sent.</summary>
    private static async Task<IResult> ConflictAsync(int id, string message, DesignStore store, EvaluateRequest? unsaved, CancellationToken ct)
    {
        var latest = await store.GetDesignAsync(id, ct);
        var extensions = new Dictionary<string, object?>(StringComparer.Ordinal);
        if (latest.IsOk)
        {
            extensions["latestRevision"] = latest.Value!.LatestRevisionNumber;
            extensions["latestRevisionUrl"] = DesignRoutes.ApiRevision(id, latest.Value.LatestRevisionNumber);
        }

        if (unsaved is not null)
        {
            extensions["unsavedInput"] = unsaved;
        }

        return TypedResults.Problem(statusCode: StatusCodes.Status409Conflict, title: "Conflict: someone else saved first.",
            detail: message, extensions: extensions);
    }
}
