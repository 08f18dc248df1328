using PackDesigner.Core.Charging;
using PackDesigner.Core.Evaluation;

namespace PackDesigner.Core.Energy;

/// <summary>
/// Energy and mass. Nominal energy = S·P·C·V_nom (the datasheet's rating). The window's energy at rest is
/// S·P·C·∫V dSOC over the window; the usable energy is the nominal energy times the window's share of the
/// whole curve's energy, ∫window V dSOC / ∫₀¹ V dSOC, so the at-rest curve sets the shape and the datasheet
/// rating the scale (usable ≤ nominal always). Worst case: with the weakest group, charging stops where the
/// chosen CV ends it; the energy the spread costs is the difference.
/// </summary>
public static class EnergyCalculator
{
    public static EnergyResult Compute(PackContext ctx, ChargeSetpoints charge)
    {
        var curve = ctx.Cell.OcvCurve;
        var cn = ctx.GroupCapacityAh;
        var nominal = ctx.S * cn * ctx.Cell.NominalVoltage;
        var scale = nominal / (ctx.S * cn * curve.MeanVoltage);
        var atRest = ctx.S * cn * curve.EnergyIntegral(ctx.SocLow, ctx.SocHigh);
        var usable = atRest * scale;

        // In series the string stops when any group is empty: top-balanced, the weakest group empties while the
        // others are still at TypicalSoc(0) = 1 − C_w/C_n, so they cannot go below that (bottom-balanced it is 0).
        var model = charge.Model;
        var sBottom = Math.Max(ctx.SocLow, model.TypicalSoc(0));
        var sTop = Math.Min(ctx.SocHigh, charge.EndOfCharge.TypicalSoc);
        double worstAtRest = 0;
        if (sTop > sBottom)
        {
            var wBottom = Math.Clamp(model.WeakestSoc(sBottom), 0, 1);
            var wTop = Math.Clamp(model.WeakestSoc(sTop), 0, 1);
            worstAtRest = (ctx.S - 1) * cn * curve.EnergyIntegral(sBottom, sTop)
                + ctx.WeakestGroupCapacityAh * curve.EnergyIntegral(wBottom, wTop);
        }

        var worst = Math.Min(usable, worstAtRest * scale);
        var mass = ctx.S * ctx.P * ctx.Cell.MassKg;
        var usableAh = cn * (ctx.SocHigh - ctx.SocLow);
        return new EnergyResult(
            NominalEnergyWh: nominal,
            UsableEnergyWh: usable,
            UsableEnergyAtRestWh: atRest,
            UsableEnergyWorstCaseWh: worst,
            LostToWeakestGroupWh: usable - worst,
            UsableFractionPercent: 100 * usable / nominal,
            CellMassKg: mass,
            SpecificEnergyWhPerKg: nominal / mass,
            RuntimeAtContinuousCurrentH: usableAh / ctx.Input.Controller.ContinuousCurrentA);
    }
}
