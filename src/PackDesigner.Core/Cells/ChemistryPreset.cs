using PackDesigner.Core.Curves;

namespace PackDesigner.Core.Cells;

/// <summary>
/// Typical figures for a chemistry family, used where a datasheet figure is omitted. Every figure is
/// "typical, common practice" unless <see cref="Sources"/> names a published source for it.
/// </summary>
public sealed record ChemistryPreset(
    Chemistry Chemistry,
    string Description,
    double CapacityAh,
    double NominalVoltage,
    double MaxChargeVoltage,
    double MinDischargeVoltage,
    double MaxChargeCurrentA,
    double MaxDischargeCurrentA,
    double PeakDischargeCurrentA,
    double PeakDischargeDurationS,
    double InternalResistanceMilliohm,
    double MassKg,
    double CapacityTolerancePercent,
    double ChargeTemperatureMinC,
    double ChargeTemperatureMaxC,
    double DischargeTemperatureMinC,
    double DischargeTemperatureMaxC,
    IReadOnlyList<OcvPoint> OcvCurve,
    IReadOnlyDictionary<string, string> Sources);
