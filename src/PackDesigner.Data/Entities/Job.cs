namespace PackDesigner.Data.Entities;

/// <summary>A job for a customer: one vehicle or system a pack is designed for.</summary>
public sealed class Job
{
    public int Id { get; set; }
    public int CustomerId { get; set; }
    public Customer? Customer { get; set; }
    public required string Title { get; set; }
    /// <summary>The vehicle or system the pack goes into, as free text.</summary>
    public string? VehicleOrSystem { get; set; }
    public string? Notes { get; set; }
    public DateTime CreatedUtc { get; set; }
    public DateTime UpdatedUtc { get; set; }
}
