namespace PackDesigner.Core.Protection;

/// <summary>Sizing of a precharge resistor for the DC-link capacitance.</summary>
/// <param name="ResistanceOhm">R = t₉₅ / (3·C).</param>
/// <param name="TimeTo95PercentS">3·R·C (v(3τ) = 95.02 % of V).</param>
/// <param name="TimeTo99PercentS">ln(100)·R·C = 4.605·R·C.</param>
/// <param name="PeakCurrentA">V / R at the moment of closing.</param>
/// <param name="PeakPowerW">V² / R at the moment of closing.</param>
/// <param name="EnergyJ">½·C·V²: the energy the resistor dissipates over a full charge, independent of R.</param>
/// <param name="AveragePowerW">Energy dissipated up to 95 % divided by the time to 95 %.</param>
/// <param name="CloseVoltage">Contactor may close once the DC-link reaches this (95 % of V).</param>
public sealed record PrechargeSizing(
    double ResistanceOhm,
    double TimeTo95PercentS,
    double TimeTo99PercentS,
    double PeakCurrentA,
    double PeakPowerW,
    double EnergyJ,
    double AveragePowerW,
    double CloseVoltage);

/// <summary>RC charging of the DC-link through the precharge resistor: v(t) = V·(1 − e^(−t/τ)), τ = R·C (circuit theory).</summary>
public static class Precharge
{
    /// <summary>Fraction of the final voltage the capacitor has after <paramref name="timeConstants"/> τ.</summary>
    public static double ChargedFraction(double timeConstants) => 1 - Math.Exp(-timeConstants);

    /// <summary>Sizes the resistor so the DC-link reaches 95 % in <paramref name="timeTo95PercentS"/>.</summary>
    public static PrechargeSizing Size(double packVoltage, double capacitanceFarad, double timeTo95PercentS)
    {
        var tau = timeTo95PercentS / 3.0;
        var r = tau / capacitanceFarad;
        var energy = 0.5 * capacitanceFarad * packVoltage * packVoltage;
        // Energy in R up to time t: ½CV²(1 − e^(−2t/τ)).
        var energyTo95 = energy * (1 - Math.Exp(-2 * timeTo95PercentS / tau));
        return new PrechargeSizing(
            r,
            3 * r * capacitanceFarad,
            Math.Log(100) * r * capacitanceFarad,
            packVoltage / r,
            packVoltage * packVoltage / r,
            energy,
            energyTo95 / timeTo95PercentS,
            0.95 * packVoltage);
    }
}
