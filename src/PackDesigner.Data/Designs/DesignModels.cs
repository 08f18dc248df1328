using PackDesigner.Core.Design;
using PackDesigner.Data.Entities;

namespace PackDesigner.Data.Designs;

/// <summary>Whether the library cell a revision's figures came from has changed since the revision was saved.</summary>
public enum LibraryCellState
{
    Unchanged,
    /// <summary>The cell was edited after the revision was saved: the page can say "library cell changed since".</summary>
    ChangedSince,
    /// <summary>The cell has been deleted from the library.</summary>
    Deleted,
}

/// <summary>Which library cell a revision took its figures from, as it was then.</summary>
public sealed record LibraryCellSnapshot(int CellId, string? NameAtSave, DateTime? UpdatedUtcAtSave, LibraryCellState State);

/// <summary>One status change of a revision.</summary>
public sealed record StatusChangeDetails(int Sequence, RevisionStatus Status, string ChangedBy, DateTime ChangedUtc, string? Note);

/// <summary>A saved revision with its input (read back into Core) and stored result JSON.</summary>
public sealed record RevisionDetails(
    int Id,
    int DesignId,
    int Number,
    bool IsLatest,
    DesignInput Input,
    string InputJson,
    string InputSha256,
    string ResultJson,
    string CalculationVersion,
    RevisionStatus Status,
    string? Note,
    DateTime CreatedUtc,
    string CreatedBy,
    LibraryCellSnapshot? LibraryCell,
    IReadOnlyList<StatusChangeDetails> StatusHistory);

/// <summary>A revision in the history list (no JSON).</summary>
public sealed record RevisionSummary(
    int Id,
    int Number,
    int Series,
    int Parallel,
    RevisionStatus Status,
    string? Note,
    DateTime CreatedUtc,
    string CreatedBy,
    string InputSha256,
    string CalculationVersion);

/// <summary>A design with its links and its latest revision.</summary>
public sealed record DesignDetails(
    int Id,
    string Name,
    int? CustomerId,
    string? CustomerName,
    int? JobId,
    string? JobTitle,
    int? CellId,
    string? CellName,
    DateTime CreatedUtc,
    DateTime UpdatedUtc,
    int LatestRevisionNumber,
    RevisionDetails LatestRevision);

/// <summary>One row of the design list.</summary>
public sealed record DesignRow(
    int Id,
    string Name,
    int? CustomerId,
    string? CustomerName,
    int? JobId,
    string? JobTitle,
    int? CellId,
    string? CellName,
    int LatestRevisionNumber,
    int Series,
    int Parallel,
    RevisionStatus Status,
    DateTime CreatedUtc,
    DateTime UpdatedUtc)
{
    /// <summary>The configuration as written on the design sheet, e.g. <c>16S2P</c>.</summary>
    public string Configuration => $"{Series}S{Parallel}P";
}

/// <summary>Sort orders of the design list; every order ends with the id so pages never overlap.</summary>
public enum DesignSort
{
    UpdatedNewest,
    UpdatedOldest,
    NameAscending,
    NameDescending,
    /// <summary>By customer name; designs without a customer last.</summary>
    CustomerAscending,
    CustomerDescending,
    /// <summary>By library cell name; designs without a library cell last.</summary>
    CellAscending,
    CellDescending,
    CreatedNewest,
    CreatedOldest,
}

/// <summary>A change of the library cell link on save: <c>new CellLink(5)</c> links cell 5, <c>new CellLink(null)</c> unlinks.</summary>
public sealed record CellLink(int? CellId);

/// <summary>A change of the customer and job on save: a job alone implies its customer; both null means none.</summary>
public sealed record DesignOwner(int? CustomerId, int? JobId);
