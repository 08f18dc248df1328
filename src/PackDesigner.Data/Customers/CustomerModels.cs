namespace PackDesigner.Data.Customers;

/// <summary>What a person enters for a customer.</summary>
public sealed record CustomerData(string Name, string? Contact = null, string? Notes = null);

/// <summary>What a person enters for a job.</summary>
public sealed record JobData(string Title, string? VehicleOrSystem = null, string? Notes = null);

public sealed record JobDetails(int Id, int CustomerId, string Title, string? VehicleOrSystem, string? Notes, DateTime CreatedUtc, DateTime UpdatedUtc);

public sealed record CustomerDetails(
    int Id,
    string Name,
    string? Contact,
    string? Notes,
    DateTime CreatedUtc,
    DateTime UpdatedUtc,
    IReadOnlyList<JobDetails> Jobs);

/// <summary>One row of the customer list.</summary>
public sealed record CustomerRow(int Id, string Name, string? Contact, int JobCount, int DesignCount, DateTime UpdatedUtc);
