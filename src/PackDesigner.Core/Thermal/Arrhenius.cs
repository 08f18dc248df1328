namespace PackDesigner.Core.Thermal;

/// <summary>
/// Arrhenius temperature dependence k₂/k₁ = exp(−Eₐ/R·(1/T₂ − 1/T₁)), R = 8.314 J/(mol·K). Used here for the
/// cell's DC resistance, which rises as the cell cools: R(T) = R₂₅·exp(Eₐ/R·(1/T − 1/T₂₅)).
/// </summary>
public static class Arrhenius
{
    public const double GasConstant = 8.314462618;
    public const double ZeroCelsiusK = 273.15;
    public const double ReferenceC = 25.0;

    /// <summary>
    /// Activation energy assumed for the DC resistance when the datasheet gives no cold value, J/mol.
    /// An estimate (from memory, common practice): it makes a cell's resistance about 6× at −20 °C.
    /// </summary>
    public const double DefaultResistanceActivationEnergyJPerMol = 25_000;

    /// <summary>Rate ratio k(T₂)/k(T₁) for activation energy <paramref name="activationEnergyJPerMol"/>.</summary>
    public static double RateRatio(double activationEnergyJPerMol, double t1C, double t2C) =>
        Math.Exp(-activationEnergyJPerMol / GasConstant * (1 / (t2C + ZeroCelsiusK) - 1 / (t1C + ZeroCelsiusK)));

    /// <summary>Activation energy that makes the resistance go from <paramref name="r25"/> at 25 °C to <paramref name="rCold"/> at <paramref name="coldC"/>.</summary>
    public static double ActivationEnergyFromResistances(double r25, double rCold, double coldC) =>
        GasConstant * Math.Log(rCold / r25) / (1 / (coldC + ZeroCelsiusK) - 1 / (ReferenceC + ZeroCelsiusK));

    /// <summary>Resistance at <paramref name="temperatureC"/> from its 25 °C value.</summary>
    public static double ResistanceAt(double r25, double activationEnergyJPerMol, double temperatureC) =>
        r25 / RateRatio(activationEnergyJPerMol, ReferenceC, temperatureC);
}
