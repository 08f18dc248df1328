using PackDesigner.Core.Cells;
using PackDesigner.Data.Entities;
using PackDesigner.Data.Json;

namespace PackDesigner.Data.Cells;

/// <summary>Hand mapping between the library entity and Core's <see cref="CellInput"/>.</summary>
internal static class CellMapping
{
    public static CellInput ToInput(Cell c) => new()
    {
        Chemistry = c.Chemistry,
        CapacityAh = c.CapacityAh,
        NominalVoltage = c.NominalVoltage,
        MaxChargeVoltage = c.MaxChargeVoltage,
        MinDischargeVoltage = c.MinDischargeVoltage,
        MaxChargeCurrentA = c.MaxChargeCurrentA,
        MaxDischargeCurrentA = c.MaxDischargeCurrentA,
        PeakDischargeCurrentA = c.PeakDischargeCurrentA,
        PeakDischargeDurationS = c.PeakDischargeDurationS,
        InternalResistanceMilliohm = c.InternalResistanceMilliohm,
        ColdInternalResistanceMilliohm = c.ColdInternalResistanceMilliohm,
        ColdResistanceTemperatureC = c.ColdResistanceTemperatureC,
        MassKg = c.MassKg,
        CapacityTolerancePercent = c.CapacityTolerancePercent,
        ChargeTemperatureMinC = c.ChargeTemperatureMinC,
        ChargeTemperatureMaxC = c.ChargeTemperatureMaxC,
        DischargeTemperatureMinC = c.DischargeTemperatureMinC,
        DischargeTemperatureMaxC = c.DischargeTemperatureMaxC,
        TerminationCurrentA = c.TerminationCurrentA,
        OcvCurve = c.OcvCurveJson is null ? null : CanonicalDesignJson.DeserializeCurve(c.OcvCurveJson),
    };

    public static void ApplyFigures(Cell c, CellInput f)
    {
        c.Chemistry = f.Chemistry;
        c.CapacityAh = f.CapacityAh;
        c.NominalVoltage = f.NominalVoltage;
        c.MaxChargeVoltage = f.MaxChargeVoltage;
        c.MinDischargeVoltage = f.MinDischargeVoltage;
        c.MaxChargeCurrentA = f.MaxChargeCurrentA;
        c.MaxDischargeCurrentA = f.MaxDischargeCurrentA;
        c.PeakDischargeCurrentA = f.PeakDischargeCurrentA;
        c.PeakDischargeDurationS = f.PeakDischargeDurationS;
        c.InternalResistanceMilliohm = f.InternalResistanceMilliohm;
        c.ColdInternalResistanceMilliohm = f.ColdInternalResistanceMilliohm;
        c.ColdResistanceTemperatureC = f.ColdResistanceTemperatureC;
        c.MassKg = f.MassKg;
        c.CapacityTolerancePercent = f.CapacityTolerancePercent;
        c.ChargeTemperatureMinC = f.ChargeTemperatureMinC;
        c.ChargeTemperatureMaxC = f.ChargeTemperatureMaxC;
        c.DischargeTemperatureMinC = f.DischargeTemperatureMinC;
        c.DischargeTemperatureMaxC = f.DischargeTemperatureMaxC;
        c.TerminationCurrentA = f.TerminationCurrentA;
        c.OcvCurveJson = f.OcvCurve is null ? null : CanonicalDesignJson.SerializeCurve(f.OcvCurve);
    }

    public static CellDetails ToDetails(Cell c) =>
        new(c.Id, c.Name, c.Maker, c.Model, c.Notes, ToInput(c), c.CreatedUtc, c.UpdatedUtc, c.Version);
}
