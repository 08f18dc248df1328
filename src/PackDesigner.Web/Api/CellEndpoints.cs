using System.Globalization;
using System.Text;
using Microsoft.AspNetCore.Http.Json;
using Microsoft.Extensions.Options;
using PackDesigner.Core.Validation;
using PackDesigner.Data.Cells;

namespace PackDesigner.Web.Api;

/// <summary>
/// <c>/api/v1/cells</c>: the cell library. Error keys are the body's own paths (<c>capacityAh</c>,
/// <c>ocvCurve[3].voltage</c>, <c>name</c>); a CSV upload's errors are under <c>ocvCsv</c>, one per file line.
/// </summary>
public static class CellEndpoints
{
    public const string Route = "/api/v1/cells";
    public const int DefaultPageSize = 20;
    private const string CsvMediaType = "text/csv";
    private const string Tag = "Cells";

    public static IEndpointRouteBuilder MapCellEndpoints(this IEndpointRouteBuilder app)
    {
        var cells = app.MapGroup(Route).WithTags(Tag).DisableAntiforgery();
        cells.MapGet("/", ListAsync).WithName("ListCells")
            .WithSummary("Lists library cells by name; search matches part of the name, maker or model.");
        cells.MapGet("/{id:int}", GetAsync).WithName("GetCell").WithSummary("One library cell with every figure.")
            .Produces<CellResponse>().ProducesProblem(StatusCodes.Status404NotFound);
        cells.MapPost("/", CreateAsync).WithName("CreateCell").WithSummary("Adds a cell to the library.")
            .Accepts<CellBody>("application/json").Produces<CellResponse>(StatusCodes.Status201Created).ProducesValidationProblem();
        cells.MapPut("/{id:int}", UpdateAsync).WithName("UpdateCell")
            .WithSummary("Replaces a cell's names and figures; the body's version must be the cell's current one (else 409).")
            .Accepts<CellBody>("application/json").Produces<CellResponse>().ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status404NotFound).ProducesProblem(StatusCodes.Status409Conflict);
        cells.MapDelete("/{id:int}", DeleteAsync).WithName("DeleteCell")
            .WithSummary("Deletes a cell at the given version; linked designs keep their own copy of its figures and lose the link.")
            .Produces(StatusCodes.Status204NoContent).ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status404NotFound).ProducesProblem(StatusCodes.Status409Conflict);
        cells.MapPost("/{id:int}/clone", CloneAsync).WithName("CloneCell")
            .WithSummary("Copies a cell under a new name (default: the name with \" (copy)\"); the body is optional.")
            .Accepts<CloneCellBody>("application/json").Produces<CellResponse>(StatusCodes.Status201Created)
            .ProducesValidationProblem().ProducesProblem(StatusCodes.Status404NotFound);
        cells.MapGet("/{id:int}/ocv.csv", ExportCsvAsync).WithName("ExportCellOcvCsv")
            .WithSummary("The cell's OCV table as CSV (socPercent,voltage); the chemistry's typical table when it has none of its own.")
            .Produces<string>(StatusCodes.Status200OK, CsvMediaType).ProducesProblem(StatusCodes.Status404NotFound);
        cells.MapPut("/{id:int}/ocv.csv", ImportCsvAsync).WithName("ImportCellOcvCsv")
            .WithSummary("Replaces the cell's OCV table from CSV (header socPercent,voltage, at most 64 KiB); ?version= is the cell's current version.")
            .Accepts<string>(CsvMediaType).Produces<CellResponse>().ProducesValidationProblem()
            .ProducesProblem(StatusCodes.Status404NotFound).ProducesProblem(StatusCodes.Status409Conflict);
        return app;
    }

    /// <summary>"cell.capacityAh" (Core's and the library's key) → "capacityAh" (the body's own path).</summary>
    public static string BodyPath(string field) => field.StartsWith("cell.", StringComparison.Ordinal) ? field[5..] : field;

    /// <summary>The library's input from a body, or null with the mapping errors (keyed like Core's, <c>cell.*</c>).</summary>
    public static CellData? ToData(CellBody body, out IReadOnlyList<ValidationError> errors)
    {
        ArgumentNullException.ThrowIfNull(body);
        var figures = DesignRequestMapper.TryMapCell(body, out errors);
        return figures is null ? null : new CellData(body.Name ?? string.Empty, figures, body.Maker, body.Model, body.Notes);
    }

    private static async Task<IResult> ListAsync(CellLibrary cells, string? search, int? page, int? pageSize, CancellationToken ct)
    {
        var rows = await cells.ListAsync(search, page ?? 1, pageSize ?? DefaultPageSize, ct);
        return TypedResults.Ok(PageResponse<CellSummaryResponse>.From(rows, CellSummaryResponse.From));
    }

    private static async Task<IResult> GetAsync(int id, CellLibrary cells, CancellationToken ct)
    {
        var result = await cells.GetAsync(id, ct);
        return result.IsOk ? TypedResults.Ok(CellResponse.From(result.Value!)) : ApiProblems.From(result, BodyPath);
    }

    private static async Task<IResult> CreateAsync(HttpRequest request, CellLibrary cells, IOptions<JsonOptions> json, CancellationToken ct)
    {
        var body = await JsonBody.ReadAsync<CellBody>(request, json.Value.SerializerOptions, ct, "the cell");
        if (body.Value is not { } cell)
        {
            return body.Problem!;
        }

        if (ToData(cell, out var errors) is not { } data)
        {
            return Invalid(cell, errors);
        }

        var result = await cells.CreateAsync(data, ct);
        return result.IsOk ? Created(result.Value!) : Problem(cell, result);
    }

    private static async Task<IResult> UpdateAsync(int id, HttpRequest request, CellLibrary cells, IOptions<JsonOptions> json, CancellationToken ct)
    {
        var body = await JsonBody.ReadAsync<CellBody>(request, json.Value.SerializerOptions, ct, "the cell");
        if (body.Value is not { } cell)
        {
            return body.Problem!;
        }

        var data = ToData(cell, out var errors);
        if (cell.Version is null)
        {
            errors = [.. errors, new ValidationError("version", "Required: the version of the cell your edit is based on (from GET).")];
        }

        if (data is null || cell.Version is not { } version)
        {
            return Invalid(cell, errors);
        }

        var result = await cells.UpdateAsync(id, version, data, ct);
        return result.IsOk ? TypedResults.Ok(CellResponse.From(result.Value!)) : Problem(cell, result);
    }

    private static async Task<IResult> DeleteAsync(int id, long? version, CellLibrary cells, CancellationToken ct)
    {
        if (version is not { } v)
        {
            return ApiProblems.Field("version", "Required: ?version= the version of the cell you are deleting (from GET).");
        }

        var result = await cells.DeleteAsync(id, v, ct);
        return result.IsOk ? TypedResults.NoContent() : ApiProblems.From(result, BodyPath);
    }

    private static async Task<IResult> CloneAsync(int id, HttpRequest request, CellLibrary cells, IOptions<JsonOptions> json, CancellationToken ct)
    {
        string? name = null;
        if (HasBody(request))
        {
            var body = await JsonBody.ReadAsync<CloneCellBody>(request, json.Value.SerializerOptions, ct, "the copy's name");
            if (body.Value is not { } clone)
            {
                return body.Problem!;
            }

            if (clone.UnknownFields is { Count: > 0 } unknown)
            {
                return ApiProblems.Invalid(unknown.Keys.Select(k => new ValidationError(k, DesignRequestMapper.UnknownMessage)));
            }

            name = clone.Name;
        }

        var result = await cells.CloneAsync(id, name, ct);
        return result.IsOk ? Created(result.Value!) : ApiProblems.From(result, BodyPath);
    }

    private static async Task<IResult> ExportCsvAsync(int id, CellLibrary cells, CancellationToken ct)
    {
        var result = await cells.ExportOcvCsvAsync(id, ct);
        if (!result.IsOk)
        {
            return result.Errors.Count > 0 ? ApiProblems.NotFound(result.Errors[0].Message) : ApiProblems.From(result);
        }

        var name = string.Create(CultureInfo.InvariantCulture, $"cell-{id}-ocv.csv");
        return TypedResults.File(Encoding.UTF8.GetBytes(result.Value!), CsvMediaType + "; charset=utf-8", name);
    }

    private static async Task<IResult> ImportCsvAsync(int id, long? version, HttpRequest request, CellLibrary cells, CancellationToken ct)
    {
        if (request.HasJsonContentType() || request.HasFormContentType)
        {
            return ApiProblems.Status(StatusCodes.Status415UnsupportedMediaType, "Unsupported media type.",
                "Send the table as text/csv: a header line socPercent,voltage, then one row per line.");
        }

        if (version is not { } v)
        {
            return ApiProblems.Field("version", "Required: ?version= the version of the cell your table is for (from GET).");
        }

        var result = await cells.ImportOcvCsvAsync(id, v, request.Body, ct);
        return result.IsOk ? TypedResults.Ok(CellResponse.From(result.Value!)) : ApiProblems.From(result, BodyPath);
    }

    private static IResult Created(CellDetails cell) =>
        TypedResults.Created(string.Create(CultureInfo.InvariantCulture, $"{Route}/{cell.Id}"), CellResponse.From(cell));

    private static IResult Invalid(CellBody body, IReadOnlyList<ValidationError> errors) =>
        ApiProblems.Invalid(DesignRequestMapper.ExplainPresetCurve(body, errors).Select(e => e with { Field = BodyPath(e.Field) }));

    private static IResult Problem(CellBody body, Data.Results.StoreResult<CellDetails> result) =>
        result.Status == Data.Results.StoreStatus.Invalid ? Invalid(body, result.Errors) : ApiProblems.From(result);

    private static bool HasBody(HttpRequest request) =>
        request.ContentLength > 0 || (request.ContentLength is null && request.Headers.TransferEncoding.Count > 0);
}
