using PackDesigner.Core.Evaluation;

namespace PackDesigner.Core.Protection;

/// <summary>
/// BMS thresholds from the datasheet and the margins (common practice: trips a margin inside the datasheet
/// limits, releases a hysteresis further inside). Per cell; the pack set multiplies voltages by S and currents by P.
/// </summary>
public static class ThresholdCalculator
{
    public static (ThresholdSet PerCell, ThresholdSet PerPack) Compute(PackContext ctx)
    {
        var c = ctx.Cell;
        var m = ctx.Margins;
        var ovTrip = c.MaxChargeVoltage - m.OverVoltageTripBelowMaxV;
        var uvTrip = c.MinDischargeVoltage + m.UnderVoltageTripAboveMinV;
        var tm = m.TemperatureMarginC;
        var th = m.TemperatureHysteresisC;
        var cell = new ThresholdSet(
            OverVoltageTrip: ovTrip,
            OverVoltageRelease: ovTrip - m.OverVoltageHysteresisV,
            OverVoltageDelayS: m.OverVoltageDelayS,
            UnderVoltageTrip: uvTrip,
            UnderVoltageRelease: uvTrip + m.UnderVoltageHysteresisV,
            UnderVoltageDelayS: m.UnderVoltageDelayS,
            ChargeOverCurrentA: c.MaxChargeCurrentA,
            ChargeOverCurrentDelayS: m.ChargeOverCurrentDelayS,
            DischargeOverCurrentA: c.MaxDischargeCurrentA,
            // Above the continuous rating the cell may carry current only as long as a peak lasts.
            DischargeOverCurrentDelayS: c.PeakDischargeDurationS,
            DischargePeakCurrentA: c.PeakDischargeCurrentA,
            DischargePeakDurationS: c.PeakDischargeDurationS,
            ShortCircuitA: c.PeakDischargeCurrentA * m.ShortCircuitTripFactor,
            ShortCircuitDelayMicroseconds: m.ShortCircuitDelayMicroseconds,
            ChargeTemperatureLowTripC: c.ChargeTemperatureMinC + tm,
            ChargeTemperatureLowReleaseC: c.ChargeTemperatureMinC + tm + th,
            ChargeTemperatureHighTripC: c.ChargeTemperatureMaxC - tm,
            ChargeTemperatureHighReleaseC: c.ChargeTemperatureMaxC - tm - th,
            DischargeTemperatureLowTripC: c.DischargeTemperatureMinC + tm,
            DischargeTemperatureLowReleaseC: c.DischargeTemperatureMinC + tm + th,
            DischargeTemperatureHighTripC: c.DischargeTemperatureMaxC - tm,
            DischargeTemperatureHighReleaseC: c.DischargeTemperatureMaxC - tm - th);

        var s = ctx.S;
        var p = ctx.P;
        var pack = cell with
        {
            OverVoltageTrip = cell.OverVoltageTrip * s,
            OverVoltageRelease = cell.OverVoltageRelease * s,
            UnderVoltageTrip = cell.UnderVoltageTrip * s,
            UnderVoltageRelease = cell.UnderVoltageRelease * s,
            ChargeOverCurrentA = cell.ChargeOverCurrentA * p,
            DischargeOverCurrentA = cell.DischargeOverCurrentA * p,
            DischargePeakCurrentA = cell.DischargePeakCurrentA * p,
            ShortCircuitA = cell.ShortCircuitA * p,
        };
        return (cell, pack);
    }
}
