using PackDesigner.Core.Curves;

namespace PackDesigner.Core.Cells;

/// <summary>Where a resolved cell figure came from.</summary>
public enum FigureOrigin
{
    /// <summary>Entered from the cell maker's datasheet.</summary>
    Datasheet,
    /// <summary>The chemistry preset's typical value (common practice).</summary>
    Preset,
    /// <summary>Derived by a stated rule (for example termination current = C/20).</summary>
    Derived,
}

/// <summary>A cell with every figure resolved. Units as in <see cref="CellInput"/>.</summary>
public sealed record CellSpec(
    Chemistry Chemistry,
    double CapacityAh,
    double NominalVoltage,
    double MaxChargeVoltage,
    double MinDischargeVoltage,
    double MaxChargeCurrentA,
    double MaxDischargeCurrentA,
    double PeakDischargeCurrentA,
    double PeakDischargeDurationS,
    double InternalResistanceMilliohm,
    double? ColdInternalResistanceMilliohm,
    double? ColdResistanceTemperatureC,
    double MassKg,
    double CapacityTolerancePercent,
    double ChargeTemperatureMinC,
    double ChargeTemperatureMaxC,
    double DischargeTemperatureMinC,
    double DischargeTemperatureMaxC,
    double TerminationCurrentA,
    OcvCurve OcvCurve,
    IReadOnlyDictionary<string, FigureOrigin> Origins);
