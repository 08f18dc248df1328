using PackDesigner.Core.Curves;
using PackDesigner.Core.Design;

namespace PackDesigner.Core.Tests.TestData;

/// <summary>
/// Every numeric input field of a design with its key and a setter, so that tests can put a bad value in any of
/// them. The key is the camelCase path Core reports the error under.
/// </summary>
public static class InvalidFields
{
    public static readonly IReadOnlyList<(string Key, Func<DesignInput, double, DesignInput> Set)> All =
    [
        ("series", (d, v) => d with { Series = ToInt(v) }),
        ("parallel", (d, v) => d with { Parallel = ToInt(v) }),
        ("linkResistanceMilliohm", (d, v) => d with { LinkResistanceMilliohm = v }),
        ("cable.crossSectionMm2", (d, v) => d with { Cable = (d.Cable ?? new CableInput(25, 2)) with { CrossSectionMm2 = v } }),
        ("cable.lengthM", (d, v) => d with { Cable = (d.Cable ?? new CableInput(25, 2)) with { LengthM = v } }),
        ("socWindow.minPercent", (d, v) => d with { SocWindow = d.SocWindow with { MinPercent = v } }),
        ("socWindow.maxPercent", (d, v) => d with { SocWindow = d.SocWindow with { MaxPercent = v } }),
        ("controller.minVoltage", (d, v) => d with { Controller = d.Controller with { MinVoltage = v } }),
        ("controller.maxVoltage", (d, v) => d with { Controller = d.Controller with { MaxVoltage = v } }),
        ("controller.continuousCurrentA", (d, v) => d with { Controller = d.Controller with { ContinuousCurrentA = v } }),
        ("controller.peakCurrentA", (d, v) => d with { Controller = d.Controller with { PeakCurrentA = v } }),
        ("controller.peakDurationS", (d, v) => d with { Controller = d.Controller with { PeakDurationS = v } }),
        ("controller.regenCurrentA", (d, v) => d with { Controller = d.Controller with { RegenCurrentA = v } }),
        ("controller.dcLinkCapacitanceMicrofarad", (d, v) => d with { Controller = d.Controller with { DcLinkCapacitanceMicrofarad = v } }),
        ("controller.prechargeTimeS", (d, v) => d with { Controller = d.Controller with { PrechargeTimeS = v } }),
        ("charger.maxVoltage", (d, v) => d with { Charger = d.Charger with { MaxVoltage = v } }),
        ("charger.maxCurrentA", (d, v) => d with { Charger = d.Charger with { MaxCurrentA = v } }),
        ("charger.voltageStepV", (d, v) => d with { Charger = d.Charger with { VoltageStepV = v } }),
        ("charger.targetCellVoltage", (d, v) => d with { Charger = d.Charger with { TargetCellVoltage = v } }),
        ("ambient.minC", (d, v) => d with { Ambient = d.Ambient with { MinC = v } }),
        ("ambient.maxC", (d, v) => d with { Ambient = d.Ambient with { MaxC = v } }),
        ("margins.overVoltageTripBelowMaxV", (d, v) => d with { Margins = Margins(d) with { OverVoltageTripBelowMaxV = v } }),
        ("margins.overVoltageHysteresisV", (d, v) => d with { Margins = Margins(d) with { OverVoltageHysteresisV = v } }),
        ("margins.underVoltageTripAboveMinV", (d, v) => d with { Margins = Margins(d) with { UnderVoltageTripAboveMinV = v } }),
        ("margins.underVoltageHysteresisV", (d, v) => d with { Margins = Margins(d) with { UnderVoltageHysteresisV = v } }),
        ("margins.temperatureMarginC", (d, v) => d with { Margins = Margins(d) with { TemperatureMarginC = v } }),
        ("margins.temperatureHysteresisC", (d, v) => d with { Margins = Margins(d) with { TemperatureHysteresisC = v } }),
        ("margins.chargeCurrentMarginPercent", (d, v) => d with { Margins = Margins(d) with { ChargeCurrentMarginPercent = v } }),
        ("margins.shortCircuitTripFactor", (d, v) => d with { Margins = Margins(d) with { ShortCircuitTripFactor = v } }),
        ("margins.overVoltageDelayS", (d, v) => d with { Margins = Margins(d) with { OverVoltageDelayS = v } }),
        ("margins.underVoltageDelayS", (d, v) => d with { Margins = Margins(d) with { UnderVoltageDelayS = v } }),
        ("margins.chargeOverCurrentDelayS", (d, v) => d with { Margins = Margins(d) with { ChargeOverCurrentDelayS = v } }),
        ("margins.shortCircuitDelayMicroseconds", (d, v) => d with { Margins = Margins(d) with { ShortCircuitDelayMicroseconds = v } }),
        ("cell.capacityAh", (d, v) => d with { Cell = d.Cell with { CapacityAh = v } }),
        ("cell.nominalVoltage", (d, v) => d with { Cell = d.Cell with { NominalVoltage = v } }),
        ("cell.maxChargeVoltage", (d, v) => d with { Cell = d.Cell with { MaxChargeVoltage = v } }),
        ("cell.minDischargeVoltage", (d, v) => d with { Cell = d.Cell with { MinDischargeVoltage = v } }),
        ("cell.maxChargeCurrentA", (d, v) => d with { Cell = d.Cell with { MaxChargeCurrentA = v } }),
        ("cell.maxDischargeCurrentA", (d, v) => d with { Cell = d.Cell with { MaxDischargeCurrentA = v } }),
        ("cell.peakDischargeCurrentA", (d, v) => d with { Cell = d.Cell with { PeakDischargeCurrentA = v } }),
        ("cell.peakDischargeDurationS", (d, v) => d with { Cell = d.Cell with { PeakDischargeDurationS = v } }),
        ("cell.internalResistanceMilliohm", (d, v) => d with { Cell = d.Cell with { InternalResistanceMilliohm = v } }),
        ("cell.coldInternalResistanceMilliohm", (d, v) => d with { Cell = d.Cell with { ColdInternalResistanceMilliohm = v, ColdResistanceTemperatureC = -10 } }),
        ("cell.coldResistanceTemperatureC", (d, v) => d with { Cell = d.Cell with { ColdInternalResistanceMilliohm = 50, ColdResistanceTemperatureC = v } }),
        ("cell.massKg", (d, v) => d with { Cell = d.Cell with { MassKg = v } }),
        ("cell.capacityTolerancePercent", (d, v) => d with { Cell = d.Cell with { CapacityTolerancePercent = v } }),
        ("cell.chargeTemperatureMinC", (d, v) => d with { Cell = d.Cell with { ChargeTemperatureMinC = v } }),
        ("cell.chargeTemperatureMaxC", (d, v) => d with { Cell = d.Cell with { ChargeTemperatureMaxC = v } }),
        ("cell.dischargeTemperatureMinC", (d, v) => d with { Cell = d.Cell with { DischargeTemperatureMinC = v } }),
        ("cell.dischargeTemperatureMaxC", (d, v) => d with { Cell = d.Cell with { DischargeTemperatureMaxC = v } }),
        ("cell.terminationCurrentA", (d, v) => d with { Cell = d.Cell with { TerminationCurrentA = v } }),
        ("cell.ocvCurve[1].voltage", (d, v) => d with { Cell = d.Cell with { OcvCurve = [new OcvPoint(0, 2.6), new OcvPoint(50, v), new OcvPoint(100, 3.4)] } }),
        ("cell.ocvCurve[1].socPercent", (d, v) => d with { Cell = d.Cell with { OcvCurve = [new OcvPoint(0, 2.6), new OcvPoint(v, 3.0), new OcvPoint(100, 3.4)] } }),
    ];

    /// <summary>NaN and the infinities become 0 for the integer fields, which is out of range for both.</summary>
    private static int ToInt(double v) => double.IsFinite(v) && Math.Abs(v) < int.MaxValue ? (int)v : 0;

    private static MarginsInput Margins(DesignInput d) => d.Margins ?? new MarginsInput();
}
