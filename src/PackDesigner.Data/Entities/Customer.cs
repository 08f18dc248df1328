namespace PackDesigner.Data.Entities;

/// <summary>A customer of the shop: who a design or job is for.</summary>
public sealed class Customer : ISearchable
{
    public int Id { get; set; }
    public required string Name { get; set; }
    /// <summary>Lower-cased <see cref="Name"/> for case-insensitive search on every provider; kept by the DbContext.</summary>
    public string SearchKey { get; set; } = "";
    /// <summary>Free-text contact details (phone, e-mail, address).</summary>
    public string? Contact { get; set; }
    public string? Notes { get; set; }
    public DateTime CreatedUtc { get; set; }
    public DateTime UpdatedUtc { get; set; }
    public List<Job> Jobs { get; set; } = [];

    string ISearchable.SearchSource => Name;
}
