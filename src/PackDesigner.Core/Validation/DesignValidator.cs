using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;

namespace PackDesigner.Core.Validation;

/// <summary>
/// Range and consistency checks of a whole design. Returns every problem at once, each keyed by its
/// camelCase field path; the cell's own checks come from <see cref="CellResolver"/>.
/// </summary>
public static class DesignValidator
{
    public const int MaxSeries = 1000;
    public const int MaxParallel = 200;

    public static IReadOnlyList<ValidationError> Validate(DesignInput input, CellSpec? cell)
    {
        var e = new ErrorList();
        e.Range("series", input.Series, 1, MaxSeries, "cells");
        e.Range("parallel", input.Parallel, 1, MaxParallel, "cells");
        e.Range("linkResistanceMilliohm", input.LinkResistanceMilliohm, 0, 100, "mΩ");
        if (input.Cable is { } cable)
        {
            e.Range("cable.crossSectionMm2", cable.CrossSectionMm2, 0.5, 1000, "mm²");
            e.Range("cable.lengthM", cable.LengthM, 0.01, 100, "m");
        }

        var w = input.SocWindow;
        var minOk = e.Range("socWindow.minPercent", w.MinPercent, 0, 100, "%");
        var maxOk = e.Range("socWindow.maxPercent", w.MaxPercent, 0, 100, "%");
        if (minOk && maxOk && w.MinPercent >= w.MaxPercent)
        {
            e.Add("socWindow.maxPercent", "The window's highest state of charge must be above its lowest.");
        }

        ValidateController(input.Controller, e);
        ValidateCharger(input.Charger, cell, e);

        var a = input.Ambient;
        var aMin = e.Range("ambient.minC", a.MinC, -60, 80, "°C");
        var aMax = e.Range("ambient.maxC", a.MaxC, -60, 80, "°C");
        if (aMin && aMax && a.MinC > a.MaxC)
        {
            e.Add("ambient.maxC", "The hottest ambient cannot be below the coldest.");
        }

        ValidateMargins(input.Margins ?? new MarginsInput(), cell, e);
        return e;
    }

    private static void ValidateController(ControllerInput c, ErrorList e)
    {
        var minOk = e.Range("controller.minVoltage", c.MinVoltage, 0, 2000, "V", exclusiveLow: true);
        var maxOk = e.Range("controller.maxVoltage", c.MaxVoltage, 0, 2000, "V", exclusiveLow: true);
        if (minOk && maxOk && c.MinVoltage >= c.MaxVoltage)
        {
            e.Add("controller.maxVoltage", "The controller's maximum input voltage must be above its minimum.");
        }

        var contOk = e.Range("controller.continuousCurrentA", c.ContinuousCurrentA, 0, 100_000, "A", exclusiveLow: true);
        var peakOk = e.Range("controller.peakCurrentA", c.PeakCurrentA, 0, 200_000, "A", exclusiveLow: true);
        if (contOk && peakOk && c.PeakCurrentA < c.ContinuousCurrentA)
        {
            e.Add("controller.peakCurrentA", "The peak current cannot be below the continuous current.");
        }

        e.Range("controller.peakDurationS", c.PeakDurationS, 0, 3600, "s", exclusiveLow: true);
        e.Range("controller.regenCurrentA", c.RegenCurrentA, 0, 100_000, "A");
        e.Range("controller.dcLinkCapacitanceMicrofarad", c.DcLinkCapacitanceMicrofarad, 0, 1_000_000, "µF");
        e.Range("controller.prechargeTimeS", c.PrechargeTimeS, 0, 60, "s", exclusiveLow: true);
    }

    private static void ValidateCharger(ChargerInput c, CellSpec? cell, ErrorList e)
    {
        e.Range("charger.maxVoltage", c.MaxVoltage, 0, 2000, "V", exclusiveLow: true);
        e.Range("charger.maxCurrentA", c.MaxCurrentA, 0, 10_000, "A", exclusiveLow: true);
        e.Range("charger.voltageStepV", c.VoltageStepV, 0, 10, "V", exclusiveLow: true);
        if (c.TargetCellVoltage is { } target && cell is not null)
        {
            e.Range("charger.targetCellVoltage", target, cell.OcvCurve.EmptyVoltage, cell.MaxChargeVoltage, "V", exclusiveLow: true);
        }
        else if (c.TargetCellVoltage is { } t && !double.IsFinite(t))
        {
            e.Add("charger.targetCellVoltage", "Must be a finite number.");
        }
    }

    private static void ValidateMargins(MarginsInput m, CellSpec? cell, ErrorList e)
    {
        var ok = e.Range("margins.overVoltageTripBelowMaxV", m.OverVoltageTripBelowMaxV, 0, 1, "V");
        ok &= e.Range("margins.overVoltageHysteresisV", m.OverVoltageHysteresisV, 0, 1, "V", exclusiveLow: true);
        ok &= e.Range("margins.underVoltageTripAboveMinV", m.UnderVoltageTripAboveMinV, 0, 1, "V");
        ok &= e.Range("margins.underVoltageHysteresisV", m.UnderVoltageHysteresisV, 0, 1, "V", exclusiveLow: true);
        e.Range("margins.temperatureMarginC", m.TemperatureMarginC, 0, 20, "K");
        e.Range("margins.temperatureHysteresisC", m.TemperatureHysteresisC, 0, 30, "K", exclusiveLow: true);
        e.Range("margins.chargeCurrentMarginPercent", m.ChargeCurrentMarginPercent, 0, 90, "%");
        e.Range("margins.shortCircuitTripFactor", m.ShortCircuitTripFactor, 1, 20, "×");
        e.Range("margins.overVoltageDelayS", m.OverVoltageDelayS, 0, 600, "s");
        e.Range("margins.underVoltageDelayS", m.UnderVoltageDelayS, 0, 600, "s");
        e.Range("margins.chargeOverCurrentDelayS", m.ChargeOverCurrentDelayS, 0, 600, "s");
        e.Range("margins.shortCircuitDelayMicroseconds", m.ShortCircuitDelayMicroseconds, 0, 100_000, "µs");

        if (ok && cell is not null)
        {
            var ovRelease = cell.MaxChargeVoltage - m.OverVoltageTripBelowMaxV - m.OverVoltageHysteresisV;
            var uvRelease = cell.MinDischargeVoltage + m.UnderVoltageTripAboveMinV + m.UnderVoltageHysteresisV;
            if (ovRelease <= uvRelease)
            {
                e.Add("margins.overVoltageHysteresisV",
                    "The voltage margins leave no room: the over-voltage release must stay above the under-voltage release.");
            }
        }
    }
}
