using PackDesigner.Data.Cells;
using PackDesigner.Data.Customers;
using PackDesigner.Data.Results;

namespace PackDesigner.Web.Api;

/// <summary>
/// Body of <c>POST /api/v1/cells</c> and <c>PUT /api/v1/cells/{id}</c>: the cell's names beside its datasheet
/// figures (flat, as in the evaluate request's <c>cell</c>). A PUT names the <see cref="Version"/> it was based on.
/// </summary>
public sealed record CellBody : CellRequest
{
    public string? Name { get; init; }
    public string? Maker { get; init; }
    public string? Model { get; init; }
    public string? Notes { get; init; }
    /// <summary>The version the edit is based on (PUT only); a stale one gets 409.</summary>
    public long? Version { get; init; }

    /// <summary>Read-only members of <see cref="CellResponse"/>: accepted and ignored, so a GET's body can be sent back changed.</summary>
    public int? Id { get; init; }

    /// <inheritdoc cref="Id"/>
    public DateTime? CreatedAt { get; init; }

    /// <inheritdoc cref="Id"/>
    public DateTime? UpdatedAt { get; init; }
}

/// <summary>Optional body of <c>POST /api/v1/cells/{id}/clone</c>.</summary>
public sealed record CloneCellBody : RequestObject
{
    /// <summary>The copy's name; omitted means the original's name with " (copy)".</summary>
    public string? Name { get; init; }
}

/// <summary>A library cell: the same flat shape as <see cref="CellBody"/>, plus its id, version and times (UTC).</summary>
public sealed record CellResponse : CellRequest
{
    public required int Id { get; init; }
    public required string Name { get; init; }
    public string? Maker { get; init; }
    public string? Model { get; init; }
    public string? Notes { get; init; }
    /// <summary>Send it back with a PUT; it rises by one with every change.</summary>
    public required long Version { get; init; }
    public required DateTime CreatedAt { get; init; }
    public required DateTime UpdatedAt { get; init; }

    public static CellResponse From(CellDetails d)
    {
        ArgumentNullException.ThrowIfNull(d);
        var figures = DesignRequestMapper.ToCellRequest(d.Figures);
        return new CellResponse
        {
            Id = d.Id,
            Name = d.Name,
            Maker = d.Maker,
            Model = d.Model,
            Notes = d.Notes,
            Version = d.Version,
            CreatedAt = d.CreatedUtc,
            UpdatedAt = d.UpdatedUtc,
            Chemistry = figures.Chemistry,
            CapacityAh = figures.CapacityAh,
            NominalVoltage = figures.NominalVoltage,
            MaxChargeVoltage = figures.MaxChargeVoltage,
            MinDischargeVoltage = figures.MinDischargeVoltage,
            MaxChargeCurrentA = figures.MaxChargeCurrentA,
            MaxDischargeCurrentA = figures.MaxDischargeCurrentA,
            PeakDischargeCurrentA = figures.PeakDischargeCurrentA,
            PeakDischargeDurationS = figures.PeakDischargeDurationS,
            InternalResistanceMilliohm = figures.InternalResistanceMilliohm,
            ColdInternalResistanceMilliohm = figures.ColdInternalResistanceMilliohm,
            ColdResistanceTemperatureC = figures.ColdResistanceTemperatureC,
            MassKg = figures.MassKg,
            CapacityTolerancePercent = figures.CapacityTolerancePercent,
            ChargeTemperatureMinC = figures.ChargeTemperatureMinC,
            ChargeTemperatureMaxC = figures.ChargeTemperatureMaxC,
            DischargeTemperatureMinC = figures.DischargeTemperatureMinC,
            DischargeTemperatureMaxC = figures.DischargeTemperatureMaxC,
            TerminationCurrentA = figures.TerminationCurrentA,
            OcvCurve = figures.OcvCurve,
        };
    }
}

/// <summary>One row of <c>GET /api/v1/cells</c>.</summary>
public sealed record CellSummaryResponse(
    int Id,
    string Name,
    string? Maker,
    string? Model,
    Core.Cells.Chemistry Chemistry,
    double? CapacityAh,
    double? NominalVoltage,
    bool HasOwnOcvCurve,
    long Version,
    DateTime UpdatedAt)
{
    public static CellSummaryResponse From(CellRow r) =>
        new(r.Id, r.Name, r.Maker, r.Model, r.Chemistry, r.CapacityAh, r.NominalVoltage, r.HasOwnOcvCurve, r.Version, r.UpdatedUtc);
}

/// <summary>Body of <c>POST</c> and <c>PUT /api/v1/customers[/{id}]</c>.</summary>
public sealed record CustomerBody : RequestObject
{
    public string? Name { get; init; }
    public string? Contact { get; init; }
    public string? Notes { get; init; }
}

/// <summary>Body of <c>POST</c> and <c>PUT /api/v1/customers/{id}/jobs[/{jobId}]</c>.</summary>
public sealed record JobBody : RequestObject
{
    public string? Title { get; init; }
    public string? VehicleOrSystem { get; init; }
    public string? Notes { get; init; }
}

public sealed record JobResponse(int Id, int CustomerId, string Title, string? VehicleOrSystem, string? Notes, DateTime CreatedAt, DateTime UpdatedAt)
{
    public static JobResponse From(JobDetails j) => new(j.Id, j.CustomerId, j.Title, j.VehicleOrSystem, j.Notes, j.CreatedUtc, j.UpdatedUtc);
}

/// <summary>A customer with its jobs, newest first.</summary>
public sealed record CustomerResponse(int Id, string Name, string? Contact, string? Notes, DateTime CreatedAt, DateTime UpdatedAt, IReadOnlyList<JobResponse> Jobs)
{
    public static CustomerResponse From(CustomerDetails c) =>
        new(c.Id, c.Name, c.Contact, c.Notes, c.CreatedUtc, c.UpdatedUtc, c.Jobs.Select(JobResponse.From).ToList());
}

/// <summary>One row of <c>GET /api/v1/customers</c>.</summary>
public sealed record CustomerSummaryResponse(int Id, string Name, string? Contact, int JobCount, int DesignCount, DateTime UpdatedAt)
{
    public static CustomerSummaryResponse From(CustomerRow r) => new(r.Id, r.Name, r.Contact, r.JobCount, r.DesignCount, r.UpdatedUtc);
}

/// <summary>One page of a list: the items, the total count over all pages, and where this page is.</summary>
public sealed record PageResponse<T>(IReadOnlyList<T> Items, int TotalCount, int Page, int PageSize, int PageCount)
{
    public static PageResponse<T> From<TRow>(PagedResult<TRow> page, Func<TRow, T> map)
    {
        ArgumentNullException.ThrowIfNull(page);
        return new(page.Items.Select(map).ToList(), page.TotalCount, page.Page, page.PageSize, page.PageCount);
    }
}
