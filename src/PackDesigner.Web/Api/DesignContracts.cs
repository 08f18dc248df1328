using System.Text.Json;
using PackDesigner.Data.Designs;
using PackDesigner.Data.Entities;
using PackDesigner.Data.Results;

namespace PackDesigner.Web.Api;

/// <summary>Body of <c>POST /api/v1/designs</c>: a new design with revision 1 of <see cref="Input"/> (the evaluate request).</summary>
public sealed record CreateDesignRequest : RequestObject
{
    public string? Name { get; init; }
    public int? CustomerId { get; init; }
    public int? JobId { get; init; }
    /// <summary>The library cell the figures came from (the revision keeps its own copy of them).</summary>
    public int? CellId { get; init; }
    /// <summary>Who saves; "api" when left out.</summary>
    public string? CreatedBy { get; init; }
    public string? Note { get; init; }
    public EvaluateRequest? Input { get; init; }
}

/// <summary>Body of <c>PUT /api/v1/designs/{id}</c>: the next revision, based on revision <see cref="BasedOnRevision"/>.</summary>
public sealed record SaveRevisionRequest : RequestObject
{
    public int? BasedOnRevision { get; init; }
    public EvaluateRequest? Input { get; init; }
    /// <summary>Renames the design when given.</summary>
    public string? Name { get; init; }
    public string? CreatedBy { get; init; }
    public string? Note { get; init; }
}

/// <summary>Body of <c>POST /api/v1/designs/{id}/revisions/{number}/restore</c>.</summary>
public sealed record RestoreRevisionRequest : RequestObject
{
    public int? BasedOnRevision { get; init; }
    public string? CreatedBy { get; init; }
}

/// <summary>Body of <c>POST /api/v1/designs/{id}/duplicate</c> (may be empty).</summary>
public sealed record DuplicateDesignRequest : RequestObject
{
    public string? Name { get; init; }
    public string? CreatedBy { get; init; }
}

/// <summary>The library cell a revision's figures came from, and whether it has changed since.</summary>
public sealed record LibraryCellResponse(int CellId, string? NameAtSave, DateTime? UpdatedAtSave, LibraryCellState State);

/// <summary>A saved revision with its canonical input and stored result, exactly as stored.</summary>
public sealed record RevisionResponse(
    int Number,
    string InputHash,
    RevisionStatus Status,
    DateTime CreatedAt,
    string CreatedBy,
    string CalculationVersion,
    string? Note,
    bool IsLatest,
    LibraryCellResponse? LibraryCell,
    JsonElement Input,
    JsonElement Result)
{
    public static RevisionResponse From(RevisionDetails r) => new(
        r.Number, r.InputSha256, r.Status, r.CreatedUtc, r.CreatedBy, r.CalculationVersion, r.Note, r.IsLatest,
        r.LibraryCell is { } c ? new LibraryCellResponse(c.CellId, c.NameAtSave, c.UpdatedUtcAtSave, c.State) : null,
        Parse(r.InputJson), Parse(r.ResultJson));

    private static JsonElement Parse(string json)
    {
        using var doc = JsonDocument.Parse(json);
        return doc.RootElement.Clone();
    }
}

/// <summary>A revision in the history list.</summary>
public sealed record RevisionSummaryResponse(
    int Number,
    string InputHash,
    RevisionStatus Status,
    DateTime CreatedAt,
    string CreatedBy,
    string? Note,
    string CalculationVersion,
    string Configuration)
{
    public static RevisionSummaryResponse From(RevisionSummary r) => new(
        r.Number, r.InputSha256, r.Status, r.CreatedUtc, r.CreatedBy, r.Note, r.CalculationVersion,
        FormattableString.Invariant($"{r.Series}S{r.Parallel}P"));
}

/// <summary>A design with its links and its latest revision.</summary>
public sealed record DesignResponse(
    int Id,
    string Name,
    int? CustomerId,
    string? CustomerName,
    int? JobId,
    string? JobTitle,
    int? CellId,
    string? CellName,
    DateTime CreatedAt,
    DateTime UpdatedAt,
    RevisionResponse LatestRevision)
{
    public static DesignResponse From(DesignDetails d) => new(
        d.Id, d.Name, d.CustomerId, d.CustomerName, d.JobId, d.JobTitle, d.CellId, d.CellName, d.CreatedUtc, d.UpdatedUtc,
        RevisionResponse.From(d.LatestRevision));
}

/// <summary>One row of the design list.</summary>
public sealed record DesignRowResponse(
    int Id,
    string Name,
    int? CustomerId,
    string? CustomerName,
    int? JobId,
    string? JobTitle,
    int? CellId,
    string? CellName,
    int LatestRevisionNumber,
    string Configuration,
    RevisionStatus Status,
    DateTime CreatedAt,
    DateTime UpdatedAt)
{
    public static DesignRowResponse From(DesignRow r) => new(
        r.Id, r.Name, r.CustomerId, r.CustomerName, r.JobId, r.JobTitle, r.CellId, r.CellName, r.LatestRevisionNumber,
        r.Configuration, r.Status, r.CreatedUtc, r.UpdatedUtc);
}

/// <summary>One page of the design list.</summary>
public sealed record DesignListResponse(IReadOnlyList<DesignRowResponse> Items, int Page, int PageSize, int TotalCount, int PageCount)
{
    public static DesignListResponse From(PagedResult<DesignRow> page) =>
        new(page.Items.Select(DesignRowResponse.From).ToList(), page.Page, page.PageSize, page.TotalCount, page.PageCount);
}
