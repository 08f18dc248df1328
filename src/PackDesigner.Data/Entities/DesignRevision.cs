namespace PackDesigner.Data.Entities;

/// <summary>
/// One saved state of a design. Append-only: the DbContext refuses to update or delete it, and database triggers
/// refuse UPDATE and DELETE on its table. Its status changes are rows of <see cref="DesignRevisionStatusChange"/>.
/// </summary>
public sealed class DesignRevision
{
    public int Id { get; set; }
    public int DesignId { get; set; }
    public Design? Design { get; set; }
    /// <summary>1..n within the design; (DesignId, Number) is unique.</summary>
    public int Number { get; set; }

    /// <summary>Canonical JSON of the Core <c>DesignInput</c> (see <c>CanonicalDesignJson</c>); it holds every cell figure used.</summary>
    public required string InputJson { get; set; }
    /// <summary>Lower-case hex SHA-256 of the UTF-8 bytes of <see cref="InputJson"/>.</summary>
    public required string InputSha256 { get; set; }
    /// <summary>JSON of the Core <c>EvaluationResult</c> at save time; written, never read back into Core types.</summary>
    public required string ResultJson { get; set; }
    /// <summary>The calculation rules' version that produced <see cref="ResultJson"/>.</summary>
    public required string CalculationVersion { get; set; }

    /// <summary>Series count from the input, kept as a column for lists.</summary>
    public int Series { get; set; }
    /// <summary>Parallel count from the input, kept as a column for lists.</summary>
    public int Parallel { get; set; }

    /// <summary>The status the revision was created with; the current status is its latest status change.</summary>
    public RevisionStatus Status { get; set; }
    public string? Note { get; set; }
    public DateTime CreatedUtc { get; set; }
    public required string CreatedBy { get; set; }

    /// <summary>The library cell the input's cell figures were taken from (no foreign key: the cell may later be deleted).</summary>
    public int? LibraryCellId { get; set; }
    /// <summary>The library cell's <c>UpdatedUtc</c> when this revision was saved, to tell that the cell changed since.</summary>
    public DateTime? LibraryCellUpdatedUtc { get; set; }
    /// <summary>The library cell's name when this revision was saved.</summary>
    public string? LibraryCellName { get; set; }

    public List<DesignRevisionStatusChange> StatusChanges { get; set; } = [];
}
