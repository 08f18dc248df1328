using PackDesigner.Core.Charging;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Standards;

namespace PackDesigner.Core.Voltages;

/// <summary>Pack voltages (V) at the datasheet limits, at the window's ends at rest, and under load.</summary>
public sealed record PackVoltages(
    double Max,
    double Nominal,
    double Min,
    double WindowHigh,
    double WindowLow,
    double LoadedLow,
    double RegenHigh,
    double LowestCellUnderLoad,
    VoltageClass VoltageClass);

/// <summary>
/// Max/nominal/min = S × the cell's datasheet values; window ends = S × OCV(SOC); under peak discharge at the
/// window's bottom and the coldest ambient: V = S·OCV(SOC_low) − I_peak·(S·R_cold/P + links + cable); under regen
/// at the window's top: V = S·OCV(SOC_high) + I_regen·R_pack,cold. The lowest cell under load is the lower of
/// the typical and the weakest group, OCV − (I_peak/P)·R_cold. Voltage class of the pack maximum, ISO 6469-3.
/// </summary>
public static class PackVoltageCalculator
{
    public static PackVoltages Compute(PackContext ctx, StringChargeModel model)
    {
        var curve = ctx.Cell.OcvCurve;
        var s = ctx.S;
        var c = ctx.Input.Controller;
        var windowLowCell = curve.VoltageAt(ctx.SocLow);
        var windowHighCell = curve.VoltageAt(ctx.SocHigh);
        var loadedLow = Math.Max(0, s * windowLowCell - c.PeakCurrentA * ctx.PackResistanceColdOhm);
        var regenHigh = s * windowHighCell + c.RegenCurrentA * ctx.PackResistanceColdOhm;
        var weakestRest = curve.VoltageAt(Math.Clamp(model.WeakestSoc(ctx.SocLow), 0, 1));
        var lowestCell = Math.Max(0, Math.Min(windowLowCell, weakestRest) - c.PeakCurrentA / ctx.P * ctx.CellResistanceColdOhm);
        var max = s * ctx.Cell.MaxChargeVoltage;
        return new PackVoltages(
            max,
            s * ctx.Cell.NominalVoltage,
            s * ctx.Cell.MinDischargeVoltage,
            s * windowHighCell,
            s * windowLowCell,
            loadedLow,
            regenHigh,
            lowestCell,
            VoltageClassifier.Classify(max));
    }
}
