using PackDesigner.Core.Curves;

namespace PackDesigner.Core.Cells;

/// <summary>
/// The chemistry presets. Voltages and temperature windows are the usual datasheet values of each family
/// (common practice, no single published source); capacity, currents, resistance and mass describe a
/// generic mid-size cell of the family and are there only so that a design computes before the datasheet
/// is entered. The NMC open-circuit-voltage table is sampled from the published fit of Chen et al.,
/// J. Electrochem. Soc. 167 (2020) 080534; the others are typical shapes (common practice).
/// </summary>
public static class ChemistryPresets
{
    private const string CommonPractice = "typical, common practice";

    private static readonly Dictionary<string, string> TypicalSources = new()
    {
        ["*"] = CommonPractice,
        ["ocvCurve"] = CommonPractice,
    };

    public static ChemistryPreset Lfp { get; } = new(
        Chemistry.Lfp,
        "Lithium iron phosphate / graphite, large prismatic cell",
        CapacityAh: 100,
        NominalVoltage: 3.2,
        MaxChargeVoltage: 3.65,
        MinDischargeVoltage: 2.5,
        MaxChargeCurrentA: 50,
        MaxDischargeCurrentA: 100,
        PeakDischargeCurrentA: 200,
        PeakDischargeDurationS: 10,
        InternalResistanceMilliohm: 0.6,
        MassKg: 2.0,
        CapacityTolerancePercent: 3,
        ChargeTemperatureMinC: 0,
        ChargeTemperatureMaxC: 45,
        DischargeTemperatureMinC: -20,
        DischargeTemperatureMaxC: 60,
        OcvCurve: Table(
            (0, 2.50), (2, 2.90), (5, 3.10), (10, 3.20), (20, 3.26), (30, 3.285), (40, 3.295), (50, 3.305),
            (60, 3.315), (70, 3.325), (80, 3.335), (90, 3.345), (95, 3.37), (98, 3.42), (100, 3.50)),
        TypicalSources);

    public static ChemistryPreset Nmc { get; } = new(
        Chemistry.Nmc,
        "Nickel manganese cobalt oxide / graphite, pouch or prismatic cell",
        CapacityAh: 50,
        NominalVoltage: 3.65,
        MaxChargeVoltage: 4.2,
        MinDischargeVoltage: 2.5,
        MaxChargeCurrentA: 25,
        MaxDischargeCurrentA: 100,
        PeakDischargeCurrentA: 150,
        PeakDischargeDurationS: 10,
        InternalResistanceMilliohm: 1.2,
        MassKg: 0.9,
        CapacityTolerancePercent: 3,
        ChargeTemperatureMinC: 0,
        ChargeTemperatureMaxC: 45,
        DischargeTemperatureMinC: -20,
        DischargeTemperatureMaxC: 60,
        // Chen et al. 2020 NMC811 / graphite-SiOx fit, sampled every 5 % (3 decimals); the 0 % row is
        // 2.498 V in the fit and is entered as 2.500 V so that it sits at the preset's minimum.
        OcvCurve: Table(
            (0, 2.500), (5, 3.073), (10, 3.258), (15, 3.396), (20, 3.449), (25, 3.494), (30, 3.548),
            (35, 3.597), (40, 3.634), (45, 3.668), (50, 3.708), (55, 3.757), (60, 3.809), (65, 3.862),
            (70, 3.924), (75, 3.971), (80, 4.022), (85, 4.070), (90, 4.094), (95, 4.116), (100, 4.193)),
        new Dictionary<string, string>
        {
            ["*"] = CommonPractice,
            ["ocvCurve"] = "Chen et al., J. Electrochem. Soc. 167 (2020) 080534, published OCV fit sampled every 5 %",
        });

    public static ChemistryPreset Nca { get; } = new(
        Chemistry.Nca,
        "Nickel cobalt aluminium oxide / graphite, cylindrical cell",
        CapacityAh: 5,
        NominalVoltage: 3.6,
        MaxChargeVoltage: 4.2,
        MinDischargeVoltage: 2.5,
        MaxChargeCurrentA: 2.5,
        MaxDischargeCurrentA: 10,
        PeakDischargeCurrentA: 15,
        PeakDischargeDurationS: 10,
        InternalResistanceMilliohm: 20,
        MassKg: 0.07,
        CapacityTolerancePercent: 3,
        ChargeTemperatureMinC: 0,
        ChargeTemperatureMaxC: 45,
        DischargeTemperatureMinC: -20,
        DischargeTemperatureMaxC: 60,
        OcvCurve: Table(
            (0, 2.60), (5, 3.30), (10, 3.42), (20, 3.52), (30, 3.58), (40, 3.63), (50, 3.68), (60, 3.76),
            (70, 3.85), (80, 3.94), (90, 4.05), (100, 4.18)),
        TypicalSources);

    public static ChemistryPreset Lto { get; } = new(
        Chemistry.Lto,
        "Lithium titanate anode, cylindrical or prismatic cell",
        CapacityAh: 40,
        NominalVoltage: 2.3,
        MaxChargeVoltage: 2.8,
        MinDischargeVoltage: 1.5,
        MaxChargeCurrentA: 160,
        MaxDischargeCurrentA: 160,
        PeakDischargeCurrentA: 400,
        PeakDischargeDurationS: 10,
        InternalResistanceMilliohm: 1.0,
        MassKg: 1.1,
        CapacityTolerancePercent: 3,
        ChargeTemperatureMinC: -20,
        ChargeTemperatureMaxC: 55,
        DischargeTemperatureMinC: -30,
        DischargeTemperatureMaxC: 60,
        OcvCurve: Table(
            (0, 1.70), (5, 2.05), (10, 2.15), (20, 2.22), (30, 2.25), (40, 2.27), (50, 2.29), (60, 2.31),
            (70, 2.34), (80, 2.38), (90, 2.45), (95, 2.52), (100, 2.70)),
        TypicalSources);

    /// <summary>Every preset, in the order of <see cref="Chemistry"/>.</summary>
    public static IReadOnlyList<ChemistryPreset> All { get; } = [Lfp, Nmc, Nca, Lto];

    /// <summary>The preset of a chemistry, or null for <see cref="Chemistry.Custom"/>.</summary>
    public static ChemistryPreset? For(Chemistry chemistry) => chemistry switch
    {
        Chemistry.Lfp => Lfp,
        Chemistry.Nmc => Nmc,
        Chemistry.Nca => Nca,
        Chemistry.Lto => Lto,
        _ => null,
    };

    private static OcvPoint[] Table(params (double Soc, double Volts)[] rows) =>
        rows.Select(r => new OcvPoint(r.Soc, r.Volts)).ToArray();
}
