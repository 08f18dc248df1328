namespace PackDesigner.Core.Tests;

/// <summary>
/// Outside reference values, in one place. Closed-form values are given to 15–16 significant digits (computed
/// from the stated formula, independently of Core); published or quoted values keep the digits they were
/// published with and are checked with <see cref="Reference.RoundingTolerance"/>.
/// </summary>
public static class ReferenceValues
{
    private const string RcCharging = "RC charging v(t) = V·(1 − e^(−t/τ)), textbook circuit theory";
    private const string PrechargeExample = "Worked example 400 V, 1000 µF, 100 Ω (circuit theory: τ = RC, E = ½CV², I = V/R, P = V²/R)";
    private const string ShortCircuitFormula = "I_sc = S·V / (S·R_cell/P + R_ext), Ohm's law worked example";
    private const string Chen2020 = "Chen et al., J. Electrochem. Soc. 167 (2020) 080534, NMC811 / graphite-SiOx OCV fit";

    // RC charging of a capacitor through a resistor.
    public static readonly RefValue ChargedAt3Tau = new(0.950212931632136, RcCharging + ": 1 − e^−3");
    public static readonly RefValue ChargedAt4Point6Tau = new(0.989948164255367, RcCharging + ": 1 − e^−4.6");
    public static readonly RefValue ChargedAt5Tau = new(0.993262053000915, RcCharging + ": 1 − e^−5");
    public static readonly RefValue ChargedAt3TauPublished = new(0.9502, RcCharging + ": 3τ → 95.02 %");
    public static readonly RefValue ChargedAt4Point6TauPublished = new(0.990, RcCharging + ": 4.6τ → 99.0 %");
    public static readonly RefValue ChargedAt5TauPublished = new(0.9933, RcCharging + ": 5τ → 99.33 %");
    public static readonly RefValue TimeTo99PercentInTau = new(4.605170185988091, RcCharging + ": t₉₉ = ln(100)·τ");
    public static readonly RefValue TimeTo95PercentInTau = new(2.995732273553991, RcCharging + ": t₉₅ = −ln(0.05)·τ = 2.996τ");

    // Precharge worked example.
    public static readonly RefValue PrechargeTau = new(0.1, PrechargeExample + ": τ = 0.1 s");
    public static readonly RefValue PrechargeEnergy = new(80, PrechargeExample + ": ½CV² = 80 J");
    public static readonly RefValue PrechargePeakCurrent = new(4, PrechargeExample + ": V/R = 4 A");
    public static readonly RefValue PrechargePeakPower = new(1600, PrechargeExample + ": V²/R = 1.6 kW");
    /// <summary>Energy dissipated up to 3τ, ½CV²(1 − e^−6), over 3τ = 0.3 s.</summary>
    public static readonly RefValue PrechargeAveragePowerTo95 = new(266.0056660862223, PrechargeExample + ": ½CV²(1 − e^−6)/(3τ)");

    // Prospective short-circuit current of a string.
    public static readonly RefValue ShortCircuit96S2PLoop = new(0.072, ShortCircuitFormula + ": 96S2P, 1.5 mΩ → 72 mΩ");
    public static readonly RefValue ShortCircuit96S2P = new(4933.333333333333, ShortCircuitFormula + ": 96S2P, 3.7 V, 1.5 mΩ → 4 933 A");
    public static readonly RefValue ShortCircuit96S2PWith10Milliohm = new(4331.707317073171, ShortCircuitFormula + ": 96S2P with 10 mΩ external → 4 332 A");
    public static readonly RefValue ShortCircuit16S1P = new(18333.33333333333, ShortCircuitFormula + ": 16S1P LFP, 3.3 V, 0.18 mΩ → 18.3 kA");
    public static readonly RefValue ShortCircuit96S2PPublished = new(4933, ShortCircuitFormula + ": 4 933 A as published");
    public static readonly RefValue ShortCircuit96S2PWith10MilliohmPublished = new(4332, ShortCircuitFormula + ": 4 332 A as published");
    public static readonly RefValue ShortCircuit16S1PPublished = new(18300, ShortCircuitFormula + ": 18.3 kA as published");

    // Arrhenius.
    /// <summary>Eₐ = R·ln 2 / (1/298.15 K − 1/308.15 K) with R = 8.314462618 J/(mol·K).</summary>
    public static readonly RefValue ActivationEnergyDoublingPer10K = new(52948.86216474418, "Arrhenius k₂/k₁ = exp(−Eₐ/R·(1/T₂ − 1/T₁)): doubling from 25 to 35 °C");
    public static readonly RefValue ActivationEnergyDoublingPublished = new(52.9e3, "Arrhenius: doubling per 10 K from 25 °C ⇔ Eₐ ≈ 52.9 kJ/mol");
    /// <summary>Molar gas constant R = N_A·k, exact since the 2019 SI redefinition (CODATA 2018).</summary>
    public static readonly RefValue GasConstant = new(6.02214076e23 * 1.380649e-23, "CODATA 2018 / SI 2019: R = N_A·k = 8.314462618… J/(mol·K)");

    // Conductors.
    /// <summary>International Annealed Copper Standard: 1/58 Ω·mm²/m at 20 °C.</summary>
    public static readonly RefValue CopperResistivity = new(0.01724137931034483, "IEC 60028 (IACS): ρ = 1/58 Ω·mm²/m at 20 °C");
    public static readonly RefValue CopperResistivityPublished = new(0.017241, "IEC 60028: 0.017241 Ω·mm²/m at 20 °C");

    // Chen et al. 2020 NMC811 OCV fit, values computed from the fit (REFERENCES.md).
    public static readonly RefValue ChenEnergy0To100Wh = new(18.47, Chen2020 + ": 5 Ah cell, 0–100 % → 18.47 Wh");
    public static readonly RefValue ChenEnergy10To90Wh = new(14.90, Chen2020 + ": 5 Ah cell, 10–90 % → 14.90 Wh");
    public static readonly RefValue ChenMeanVoltage = new(3.694, Chen2020 + ": mean OCV 3.694 V");
    public const double ChenCellCapacityAh = 5;

    /// <summary>Chen fit at SOC 0 / 0.1 / 0.2 / 0.5 / 0.8 / 1.0, V, as tabulated to 4 digits.</summary>
    public static readonly (double Soc, RefValue Voltage)[] ChenOcvPoints =
    [
        (0.0, new(2.498, Chen2020 + ": OCV(0) = 2.498 V")),
        (0.1, new(3.258, Chen2020 + ": OCV(0.1) = 3.258 V")),
        (0.2, new(3.449, Chen2020 + ": OCV(0.2) = 3.449 V")),
        (0.5, new(3.708, Chen2020 + ": OCV(0.5) = 3.708 V")),
        (0.8, new(4.022, Chen2020 + ": OCV(0.8) = 4.022 V")),
        (1.0, new(4.193, Chen2020 + ": OCV(1.0) = 4.193 V")),
    ];

    // Numerics.
    public static readonly RefValue SquareRootOfTwo = new(1.4142135623730951, "√2 (Pythagoras' constant)");
    /// <summary>The fixed point of cos, cos x = x (the Dottie number).</summary>
    public static readonly RefValue DottieNumber = new(0.7390851332151607, "solution of cos x = x (Dottie number)");
    /// <summary>The real root of x³ − 2x + 2, the textbook case where plain Newton from 0 cycles 0 → 1 → 0.</summary>
    public static readonly RefValue CubicRoot = new(-1.7692923542386314, "real root of x³ − 2x + 2 = 0 by Cardano's formula");
}
