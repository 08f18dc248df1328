namespace PackDesigner.Data.Entities;

/// <summary>
/// A pack design: its name and links, and the number of its latest revision. The figures live in
/// <see cref="DesignRevision"/> rows, which are never changed once written.
/// </summary>
public sealed class Design : ISearchable
{
    public int Id { get; set; }
    public required string Name { get; set; }
    public string SearchKey { get; set; } = "";
    public int? CustomerId { get; set; }
    public Customer? Customer { get; set; }
    public int? JobId { get; set; }
    public Job? Job { get; set; }
    /// <summary>The library cell the design's cell figures came from, if any.</summary>
    public int? CellId { get; set; }
    public Cell? Cell { get; set; }
    public DateTime CreatedUtc { get; set; }
    /// <summary>When the latest revision was saved (or the name or links last changed).</summary>
    public DateTime UpdatedUtc { get; set; }

    /// <summary>
    /// Number of the latest revision (1..n). Concurrency token: a save based on revision k updates this from k to
    /// k + 1 with <c>WHERE latest_revision_number = k</c>, so only one of two saves from the same revision succeeds.
    /// </summary>
    public int LatestRevisionNumber { get; set; }

    public List<DesignRevision> Revisions { get; set; } = [];

    string ISearchable.SearchSource => Name;
}
