namespace PackDesigner.Data.Entities;

/// <summary>
/// One status change of a revision (the first one, sequence 1, records its creation). Append-only like the
/// revisions: the current status is the change with the highest <see cref="Sequence"/>; (RevisionId, Sequence) is
/// unique, so of two changes made from the same state only one is stored.
/// </summary>
public sealed class DesignRevisionStatusChange
{
    public long Id { get; set; }
    public int RevisionId { get; set; }
    public DesignRevision? Revision { get; set; }
    /// <summary>1..n within the revision.</summary>
    public int Sequence { get; set; }
    public RevisionStatus Status { get; set; }
    public required string ChangedBy { get; set; }
    public DateTime ChangedUtc { get; set; }
    public string? Note { get; set; }
}
