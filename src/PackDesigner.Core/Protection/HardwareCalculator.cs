using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Standards;

namespace PackDesigner.Core.Protection;

/// <summary>
/// Fuse, contactor, precharge and cable. The design continuous current is the larger of the controller's
/// continuous current and the charger's CC. Fuse ≥ 125 % of it, rounded up to the next NEC 240.6(A) rating;
/// DC voltage rating ≥ pack maximum; interrupting rating ≥ I_sc (NEC 110.9) with I_sc = S·V_max / (S·R_cell,min/P
/// + links + cable), R_cell,min at the hottest ambient. Contactor: continuous as the fuse minimum, breaking the
/// largest load current. Precharge: R for the wanted time to 95 % (3RC), peak current and power, ½CV².
/// </summary>
public static class HardwareCalculator
{
    public static ProtectionResult Compute(PackContext ctx, double chargerConstantCurrentA)
    {
        var controller = ctx.Input.Controller;
        var packMax = ctx.S * ctx.Cell.MaxChargeVoltage;
        var continuous = Math.Max(controller.ContinuousCurrentA, chargerConstantCurrentA);
        var fuseMin = StandardRatings.MinimumRatingForContinuousLoad(continuous);
        var loopOhm = ShortCircuit.LoopResistanceOhm(ctx.S, ctx.P, ctx.CellResistanceHotOhm, ctx.ExternalOhm);
        var isc = packMax / loopOhm;

        PrechargeSizing? pre = controller.DcLinkCapacitanceMicrofarad > 0
            ? Precharge.Size(packMax, controller.DcLinkCapacitanceMicrofarad * 1e-6, controller.PrechargeTimeS)
            : null;

        double? cableDensity = ctx.Input.Cable is { } cable ? continuous / cable.CrossSectionMm2 : null;
        return new ProtectionResult(
            ContinuousCurrentA: continuous,
            FuseMinimumA: fuseMin,
            FuseRatingA: StandardRatings.NextStandardFuseRating(fuseMin),
            FuseMinVoltageRating: packMax,
            FuseMinInterruptingRatingA: isc,
            ProspectiveShortCircuitA: isc,
            ShortCircuitLoopResistanceMilliohm: loopOhm * 1000,
            ContactorContinuousA: fuseMin,
            ContactorMinVoltageRating: packMax,
            ContactorBreakingCurrentA: Math.Max(controller.PeakCurrentA, Math.Max(controller.RegenCurrentA, chargerConstantCurrentA)),
            PrechargeResistanceOhm: pre?.ResistanceOhm,
            PrechargeTimeS: pre?.TimeTo95PercentS,
            PrechargeTimeTo99PercentS: pre?.TimeTo99PercentS,
            PrechargeEnergyJ: pre?.EnergyJ,
            PrechargePeakCurrentA: pre?.PeakCurrentA,
            PrechargePeakPowerW: pre?.PeakPowerW,
            PrechargeAveragePowerW: pre?.AveragePowerW,
            PrechargeCloseVoltage: pre?.CloseVoltage,
            LinkResistanceTotalMilliohm: ctx.LinksOhm * 1000,
            CableResistanceMilliohm: ctx.CableOhm * 1000,
            CableCurrentDensityAPerMm2: cableDensity);
    }
}
