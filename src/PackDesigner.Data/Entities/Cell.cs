using PackDesigner.Core.Cells;

namespace PackDesigner.Data.Entities;

/// <summary>
/// A cell in the shop's library: a datasheet as entered, with every figure of <see cref="CellInput"/>.
/// Units as in <see cref="CellInput"/>: V, A, mΩ, kg, °C, s. Figures left null take the chemistry preset's value.
/// </summary>
public sealed class Cell : ISearchable
{
    public int Id { get; set; }
    public required string Name { get; set; }
    /// <summary>Lower-cased name, maker and model for search; kept by the DbContext.</summary>
    public string SearchKey { get; set; } = "";
    /// <summary>Maker of the cell, free text.</summary>
    public string? Maker { get; set; }
    /// <summary>The maker's model designation, free text.</summary>
    public string? Model { get; set; }
    public string? Notes { get; set; }

    public Chemistry Chemistry { get; set; } = Chemistry.Lfp;
    public double? CapacityAh { get; set; }
    public double? NominalVoltage { get; set; }
    public double? MaxChargeVoltage { get; set; }
    public double? MinDischargeVoltage { get; set; }
    public double? MaxChargeCurrentA { get; set; }
    public double? MaxDischargeCurrentA { get; set; }
    public double? PeakDischargeCurrentA { get; set; }
    public double? PeakDischargeDurationS { get; set; }
    public double? InternalResistanceMilliohm { get; set; }
    public double? ColdInternalResistanceMilliohm { get; set; }
    public double? ColdResistanceTemperatureC { get; set; }
    public double? MassKg { get; set; }
    public double? CapacityTolerancePercent { get; set; }
    public double? ChargeTemperatureMinC { get; set; }
    public double? ChargeTemperatureMaxC { get; set; }
    public double? DischargeTemperatureMinC { get; set; }
    public double? DischargeTemperatureMaxC { get; set; }
    public double? TerminationCurrentA { get; set; }

    /// <summary>
    /// The rest-voltage table as canonical JSON (<c>[{"socPercent":0,"voltage":2.5},...]</c>), or null for the
    /// preset's typical curve.
    /// </summary>
    public string? OcvCurveJson { get; set; }

    public DateTime CreatedUtc { get; set; }
    public DateTime UpdatedUtc { get; set; }

    /// <summary>Concurrency token: raised by one on every update (the DbContext does it), checked in the UPDATE's WHERE.</summary>
    public long Version { get; set; }

    string ISearchable.SearchSource => string.Join(' ', new[] { Name, Maker, Model }.Where(t => !string.IsNullOrWhiteSpace(t)));
}
