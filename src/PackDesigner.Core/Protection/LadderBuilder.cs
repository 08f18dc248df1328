using System.Globalization;
using PackDesigner.Core.Charging;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Findings;
using PackDesigner.Core.Voltages;

namespace PackDesigner.Core.Protection;

/// <summary>
/// The protection ladder: every voltage threshold from the datasheet maximum down to the datasheet minimum,
/// per cell and per pack, in the order they must keep. Each layer must sit at or below the one above it
/// (strictly below for a trip and its release).
/// </summary>
public static class LadderBuilder
{
    public const string DatasheetMax = "datasheet-max";
    public const string OverVoltageTrip = "ov-trip";
    public const string OverVoltageRelease = "ov-release";
    public const string HighestCellEndOfCharge = "highest-cell-end-of-charge";
    public const string ChargeVoltage = "charge-voltage";
    public const string WindowTop = "window-top";
    public const string WindowBottom = "window-bottom";
    public const string LowestCellUnderLoad = "lowest-cell-under-load";
    public const string ControllerCutoff = "controller-cutoff";
    public const string UnderVoltageRelease = "uv-release";
    public const string UnderVoltageTrip = "uv-trip";
    public const string DatasheetMin = "datasheet-min";

    public static IReadOnlyList<LadderLayer> Build(PackContext ctx, ThresholdSet cell, ChargeSetpoints charge, PackVoltages voltages)
    {
        var s = ctx.S;
        var atCells = (charge.Result.ConstantVoltage - charge.Result.TerminationCurrentA * ctx.ExternalOhm) / s;
        LadderLayer L(string key, string label, double perCell) => new(key, label, perCell, perCell * s);
        return
        [
            L(DatasheetMax, "Datasheet maximum charge voltage", ctx.Cell.MaxChargeVoltage),
            L(OverVoltageTrip, "BMS over-voltage trip", cell.OverVoltageTrip),
            L(OverVoltageRelease, "BMS over-voltage release", cell.OverVoltageRelease),
            L(HighestCellEndOfCharge, "Highest cell at end of charge", charge.EndOfCharge.HighestVoltage),
            L(ChargeVoltage, "Charger CV per cell (at the cells)", atCells),
            L(WindowTop, "Window top at rest", voltages.WindowHigh / s),
            L(WindowBottom, "Window bottom at rest", voltages.WindowLow / s),
            L(LowestCellUnderLoad, "Lowest cell under peak load, cold, at the window bottom", voltages.LowestCellUnderLoad),
            L(ControllerCutoff, "Controller low-voltage cut-off", ctx.Input.Controller.MinVoltage / s),
            L(UnderVoltageRelease, "BMS under-voltage release", cell.UnderVoltageRelease),
            L(UnderVoltageTrip, "BMS under-voltage trip", cell.UnderVoltageTrip),
            L(DatasheetMin, "Datasheet minimum discharge voltage", ctx.Cell.MinDischargeVoltage),
        ];
    }

    /// <summary>The input fields that move a layer.</summary>
    public static IReadOnlyList<string> FieldsOf(string layer) => layer switch
    {
        DatasheetMax => ["cell.maxChargeVoltage"],
        OverVoltageTrip => ["margins.overVoltageTripBelowMaxV"],
        OverVoltageRelease => ["margins.overVoltageHysteresisV"],
        HighestCellEndOfCharge => ["cell.capacityTolerancePercent", "charger.targetCellVoltage"],
        ChargeVoltage => ["charger.targetCellVoltage", "charger.maxVoltage"],
        WindowTop => ["socWindow.maxPercent"],
        WindowBottom => ["socWindow.minPercent"],
        LowestCellUnderLoad => ["controller.peakCurrentA", "ambient.minC", "parallel"],
        ControllerCutoff => ["controller.minVoltage"],
        UnderVoltageRelease => ["margins.underVoltageHysteresisV"],
        UnderVoltageTrip => ["margins.underVoltageTripAboveMinV"],
        DatasheetMin => ["cell.minDischargeVoltage"],
        _ => [],
    };

    /// <summary>An error finding for every adjacent pair out of order, naming both layers.</summary>
    /// <param name="ladder">The layers, highest first.</param>
    /// <param name="chargerStepPerCellV">
    /// The charger's voltage step divided by S. The CV is rounded down to that step, so the charge voltage may end
    /// up to one step per cell below the window top it was solved for without the ladder being out of order.
    /// </param>
    public static IEnumerable<Finding> Check(IReadOnlyList<LadderLayer> ladder, double chargerStepPerCellV = 0)
    {
        for (var i = 1; i < ladder.Count; i++)
        {
            var upper = ladder[i - 1];
            var lower = ladder[i];
            var strict = (upper.Layer == OverVoltageTrip && lower.Layer == OverVoltageRelease)
                || (upper.Layer == UnderVoltageRelease && lower.Layer == UnderVoltageTrip);
            // 0.1 mV tolerance: values built to coincide must not trip on binary rounding.
            var tolerance = upper.Layer == ChargeVoltage && lower.Layer == WindowTop ? Math.Max(1e-4, chargerStepPerCellV) : 1e-4;
            var broken = strict ? lower.PerCellVoltage >= upper.PerCellVoltage : lower.PerCellVoltage > upper.PerCellVoltage + tolerance;
            if (broken)
            {
                yield return new Finding(
                    Severity.Error,
                    "ladder.out-of-order",
                    string.Create(CultureInfo.InvariantCulture,
                        $"Protection ladder out of order: \"{lower.Label}\" ({lower.PerCellVoltage:0.000} V per cell) must be {(strict ? "below" : "at or below")} \"{upper.Label}\" ({upper.PerCellVoltage:0.000} V per cell)."),
                    [.. FieldsOf(upper.Layer), .. FieldsOf(lower.Layer)]);
            }
        }
    }
}
