using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;

namespace PackDesigner.Core.Charging;

/// <summary>Charger setpoints and the end-of-charge state they lead to.</summary>
public sealed record ChargeSetpoints(ChargerResult Result, EndOfChargeState EndOfCharge, StringChargeModel Model, double UnroundedConstantVoltage, double DesiredConstantVoltage);

/// <summary>
/// CV, CC and termination current. CV is the highest charger setting (rounded down to its step) that keeps
/// the weakest group at or below the OV release and the typical group at or below the window's top at the end
/// of charge, unless a target cell voltage is given; then CV = S × target, rounded down. CC is the least of the
/// charger's maximum, P × the cell's maximum charge current, and the BMS charge trip less the margin.
/// Termination is the datasheet's figure × P, or C/20 × P. There is no float stage for lithium cells.
/// </summary>
public static class ChargeSetpointCalculator
{
    public const string LimitedByWindowTop = "window-top";
    public const string LimitedByOverVoltageRelease = "ov-release";
    public const string LimitedByCharger = "charger-max";
    public const string LimitedByTarget = "target-cell-voltage";

    public static ChargeSetpoints Compute(PackContext ctx, ThresholdSet cellThresholds)
    {
        var cell = ctx.Cell;
        var charger = ctx.Input.Charger;
        var terminationA = cell.TerminationCurrentA * ctx.P;
        var eta = terminationA * ctx.CellResistanceOhm / ctx.P;
        var drop = terminationA * ctx.ExternalOhm;
        var model = new StringChargeModel(cell.OcvCurve, ctx.S, ctx.GroupCapacityAh, ctx.WeakestGroupCapacityAh, ctx.Input.Balancing, eta, drop);

        double wanted;
        string limitedBy;
        if (charger.TargetCellVoltage is { } target)
        {
            wanted = target * ctx.S;
            limitedBy = LimitedByTarget;
        }
        else
        {
            // Bottom-balanced: the CV that ends a string of typical groups at the window's top. The smaller
            // groups sit higher on the curve, so with them the typical group ends a little below the top, and a
            // wider tolerance can only lower the CV (through the OV-release limit). Top-balanced: the smaller
            // group sits lower, so the CV is solved for the typical group at the top with the string as it is.
            var byTop = ctx.Input.Balancing == BalancingMethod.Bottom
                ? ctx.S * (cell.OcvCurve.VoltageAt(ctx.SocHigh) + eta) + drop
                : model.ConstantVoltageForTypicalSoc(ctx.SocHigh);
            var byRelease = model.ConstantVoltageForHighestGroup(cellThresholds.OverVoltageRelease);
            wanted = Math.Min(byTop, byRelease);
            limitedBy = byTop <= byRelease ? LimitedByWindowTop : LimitedByOverVoltageRelease;
        }

        var desired = wanted;
        if (charger.MaxVoltage < wanted)
        {
            wanted = charger.MaxVoltage;
            limitedBy = LimitedByCharger;
        }

        var cv = RoundDown(wanted, charger.VoltageStepV);
        var eoc = model.EndOfCharge(cv);
        var cc = Math.Min(charger.MaxCurrentA,
            Math.Min(cell.MaxChargeCurrentA * ctx.P, cellThresholds.ChargeOverCurrentA * ctx.P * (1 - ctx.Margins.ChargeCurrentMarginPercent / 100.0)));
        var result = new ChargerResult(
            ConstantVoltage: cv,
            ConstantVoltagePerCell: cv / ctx.S,
            ConstantCurrentA: cc,
            TerminationCurrentA: terminationA,
            FloatCharge: false,
            WeakestCellEndOfChargeVoltage: eoc.WeakestVoltage,
            TypicalCellEndOfChargeVoltage: eoc.TypicalVoltage,
            WeakestGroupEndOfChargeSocPercent: eoc.WeakestSoc * 100,
            TypicalGroupEndOfChargeSocPercent: eoc.TypicalSoc * 100,
            WeakestGroupCapacityAh: ctx.WeakestGroupCapacityAh,
            ConstantVoltageLimitedBy: limitedBy,
            ChargeTemperatureMinC: cellThresholds.ChargeTemperatureLowTripC,
            ChargeTemperatureMaxC: cellThresholds.ChargeTemperatureHighTripC);
        return new ChargeSetpoints(result, eoc, model, wanted, desired);
    }

    /// <summary>Largest multiple of <paramref name="step"/> at or below <paramref name="volts"/> (a relative 1e-9 guards against binary rounding).</summary>
    public static double RoundDown(double volts, double step)
    {
        var n = Math.Floor(volts / step + 1e-9);
        return Math.Round(n * step, 6);
    }
}
