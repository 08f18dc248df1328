using System.Globalization;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;

namespace PackDesigner.Core.Balancing;

/// <summary>
/// Balancing recommendation fitted to the method (common practice). Bottom: match every group at rest at the
/// UV trip voltage, within 10 mV, and keep the BMS from balancing at the top (it would undo the bottom match).
/// Top: balance at the end of charge, starting a little below the charge voltage per cell.
/// </summary>
public static class BalancingAdvisor
{
    /// <summary>Matching spread accepted between groups at the balance point, mV (common practice).</summary>
    public const double AcceptanceSpreadMillivolt = 10;

    public static BalancingRecommendation Recommend(PackContext ctx, ThresholdSet cell, ChargerResult charger)
    {
        if (ctx.Input.Balancing == BalancingMethod.Bottom)
        {
            var target = cell.UnderVoltageTrip;
            return new BalancingRecommendation(
                BalancingMethod.Bottom,
                target,
                AcceptanceSpreadMillivolt,
                BmsTopBalancingEnabled: false,
                BmsBalanceStartVoltage: null,
                string.Create(CultureInfo.InvariantCulture,
                    $"Bottom-balance: discharge each group at rest to {target:0.000} V, finishing at a low current (about C/20), let it rest and re-measure until every group is within {AcceptanceSpreadMillivolt:0} mV. Turn off top balancing in the BMS; the charge voltage of {charger.ConstantVoltagePerCell:0.000} V per cell is set so the smallest group stays below the OV release."));
        }

        var start = Math.Max(ctx.Cell.OcvCurve.VoltageAt(ctx.SocHigh), charger.ConstantVoltagePerCell - 0.02);
        return new BalancingRecommendation(
            BalancingMethod.Top,
            charger.ConstantVoltagePerCell,
            AcceptanceSpreadMillivolt,
            BmsTopBalancingEnabled: true,
            BmsBalanceStartVoltage: start,
            string.Create(CultureInfo.InvariantCulture,
                $"Top-balance: let the BMS bleed any cell above {start:0.000} V until the groups agree within {AcceptanceSpreadMillivolt:0} mV at the end of charge. The smallest group empties first: the controller's cut-off and the UV trip guard the bottom."));
    }
}
