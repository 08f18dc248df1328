using PackDesigner.Core.Evaluation;

namespace PackDesigner.Core.Thermal;

/// <summary>
/// Thermal quick check, adiabatic (no heat leaves the cell, the worst case): Joule heat I²R per cell at the
/// controller's continuous current, ΔT = I²·R·t / (m·c) over the peak, and the rise per hour at continuous
/// current. R is the 25 °C value; c is a typical specific heat of a lithium-ion cell.
/// </summary>
public static class ThermalCalculator
{
    /// <summary>Typical specific heat of a lithium-ion cell, J/(kg·K) (common practice; cells measure roughly 0.9–1.3 kJ/(kg·K)).</summary>
    public const double TypicalSpecificHeatJPerKgK = 1000;

    public static ThermalResult Compute(PackContext ctx)
    {
        var controller = ctx.Input.Controller;
        var r = ctx.CellResistanceOhm;
        var mc = ctx.Cell.MassKg * TypicalSpecificHeatJPerKgK;
        var iCont = controller.ContinuousCurrentA / ctx.P;
        var iPeak = controller.PeakCurrentA / ctx.P;
        var cellHeat = iCont * iCont * r;
        var packHeat = ctx.S * ctx.P * cellHeat + controller.ContinuousCurrentA * controller.ContinuousCurrentA * ctx.ExternalOhm;
        var peakRise = iPeak * iPeak * r * controller.PeakDurationS / mc;
        var risePerHour = cellHeat * 3600 / mc;
        var limit = ctx.Cell.DischargeTemperatureMaxC;
        var headroom = limit - ctx.Input.Ambient.MaxC;
        var minutes = headroom <= 0 ? 0 : risePerHour <= 0 ? 1e6 : Math.Min(1e6, headroom / risePerHour * 60);
        return new ThermalResult(
            CellHeatAtContinuousW: cellHeat,
            PackHeatAtContinuousW: packHeat,
            SpecificHeatJPerKgK: TypicalSpecificHeatJPerKgK,
            PeakTemperatureRiseK: peakRise,
            ContinuousTemperatureRisePerHourK: risePerHour,
            CellTemperatureAfterPeakC: ctx.Input.Ambient.MaxC + peakRise,
            MinutesToDischargeLimitAtContinuous: minutes,
            DischargeTemperatureMaxC: limit);
    }
}
