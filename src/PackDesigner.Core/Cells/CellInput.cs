using PackDesigner.Core.Curves;

namespace PackDesigner.Core.Cells;

/// <summary>
/// A cell datasheet as entered. Every figure is optional except for <see cref="Chemistry.Custom"/>:
/// an omitted figure takes the chemistry preset's typical value (see <see cref="ChemistryPresets"/>).
/// Voltages in V, currents in A, resistance in mΩ, mass in kg, temperatures in °C, durations in s.
/// </summary>
public sealed record CellInput
{
    public Chemistry Chemistry { get; init; } = Chemistry.Lfp;
    public double? CapacityAh { get; init; }
    public double? NominalVoltage { get; init; }
    public double? MaxChargeVoltage { get; init; }
    public double? MinDischargeVoltage { get; init; }
    public double? MaxChargeCurrentA { get; init; }
    public double? MaxDischargeCurrentA { get; init; }
    public double? PeakDischargeCurrentA { get; init; }
    public double? PeakDischargeDurationS { get; init; }
    /// <summary>DC internal resistance at 25 °C, mΩ.</summary>
    public double? InternalResistanceMilliohm { get; init; }
    /// <summary>Optional second DC resistance, mΩ, measured at <see cref="ColdResistanceTemperatureC"/>.</summary>
    public double? ColdInternalResistanceMilliohm { get; init; }
    public double? ColdResistanceTemperatureC { get; init; }
    public double? MassKg { get; init; }
    /// <summary>Capacity tolerance, ± % of the rated capacity.</summary>
    public double? CapacityTolerancePercent { get; init; }
    public double? ChargeTemperatureMinC { get; init; }
    public double? ChargeTemperatureMaxC { get; init; }
    public double? DischargeTemperatureMinC { get; init; }
    public double? DischargeTemperatureMaxC { get; init; }
    /// <summary>Charge termination current per cell, A; omitted means C/20.</summary>
    public double? TerminationCurrentA { get; init; }
    /// <summary>Rest voltage against state of charge at 25 °C; omitted means the preset's typical curve.</summary>
    public IReadOnlyList<OcvPoint>? OcvCurve { get; init; }
}
