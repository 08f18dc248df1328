using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;
using PackDesigner.Core.Findings;
using PackDesigner.Core.Standards;

namespace PackDesigner.Core.Evaluation;

/// <summary>Pack-level voltages (V), capacity (Ah), energy (Wh), mass (kg) and resistance (mΩ).</summary>
public sealed record PackResult(
    string Configuration,
    int Series,
    int Parallel,
    int CellCount,
    double MaxVoltage,
    double NominalVoltage,
    double MinVoltage,
    double WindowHighVoltage,
    double WindowLowVoltage,
    double LoadedLowVoltage,
    double RegenHighVoltage,
    double CapacityAh,
    double NominalEnergyWh,
    double UsableEnergyWh,
    double MassKg,
    VoltageClass VoltageClass,
    double ResistanceMilliohm,
    double ColdResistanceMilliohm,
    double CellResistanceColdMilliohm,
    bool ColdResistanceEstimated);

/// <summary>
/// BMS thresholds. Voltages in V, currents in A, temperatures in °C, delays in s (short-circuit delay in µs).
/// Per cell, or per pack (voltages × S, currents × P).
/// </summary>
public sealed record ThresholdSet(
    double OverVoltageTrip,
    double OverVoltageRelease,
    double OverVoltageDelayS,
    double UnderVoltageTrip,
    double UnderVoltageRelease,
    double UnderVoltageDelayS,
    double ChargeOverCurrentA,
    double ChargeOverCurrentDelayS,
    double DischargeOverCurrentA,
    double DischargeOverCurrentDelayS,
    double DischargePeakCurrentA,
    double DischargePeakDurationS,
    double ShortCircuitA,
    double ShortCircuitDelayMicroseconds,
    double ChargeTemperatureLowTripC,
    double ChargeTemperatureLowReleaseC,
    double ChargeTemperatureHighTripC,
    double ChargeTemperatureHighReleaseC,
    double DischargeTemperatureLowTripC,
    double DischargeTemperatureLowReleaseC,
    double DischargeTemperatureHighTripC,
    double DischargeTemperatureHighReleaseC);

/// <summary>How to balance the string, fitted to the balancing method. Voltages per cell, V; spread in mV.</summary>
public sealed record BalancingRecommendation(
    BalancingMethod Method,
    double TargetCellVoltage,
    double AcceptanceSpreadMillivolt,
    bool BmsTopBalancingEnabled,
    double? BmsBalanceStartVoltage,
    string Advice);

/// <summary>Charger setpoints: CV in V (pack) and V per cell, currents in A.</summary>
public sealed record ChargerResult(
    double ConstantVoltage,
    double ConstantVoltagePerCell,
    double ConstantCurrentA,
    double TerminationCurrentA,
    bool FloatCharge,
    double WeakestCellEndOfChargeVoltage,
    double TypicalCellEndOfChargeVoltage,
    double WeakestGroupEndOfChargeSocPercent,
    double TypicalGroupEndOfChargeSocPercent,
    double WeakestGroupCapacityAh,
    string ConstantVoltageLimitedBy,
    double ChargeTemperatureMinC,
    double ChargeTemperatureMaxC);

/// <summary>Fuse, contactor, precharge and cable. Currents in A, voltages in V, resistance in Ω or mΩ as named, energy J, power W.</summary>
public sealed record ProtectionResult(
    double ContinuousCurrentA,
    double FuseMinimumA,
    double? FuseRatingA,
    double FuseMinVoltageRating,
    double FuseMinInterruptingRatingA,
    double ProspectiveShortCircuitA,
    double ShortCircuitLoopResistanceMilliohm,
    double ContactorContinuousA,
    double ContactorMinVoltageRating,
    double ContactorBreakingCurrentA,
    double? PrechargeResistanceOhm,
    double? PrechargeTimeS,
    double? PrechargeTimeTo99PercentS,
    double? PrechargeEnergyJ,
    double? PrechargePeakCurrentA,
    double? PrechargePeakPowerW,
    double? PrechargeAveragePowerW,
    double? PrechargeCloseVoltage,
    double LinkResistanceTotalMilliohm,
    double? CableResistanceMilliohm,
    double? CableCurrentDensityAPerMm2);

/// <summary>Energy in Wh, mass in kg, specific energy in Wh/kg.</summary>
public sealed record EnergyResult(
    double NominalEnergyWh,
    double UsableEnergyWh,
    double UsableEnergyAtRestWh,
    double UsableEnergyWorstCaseWh,
    double LostToWeakestGroupWh,
    double UsableFractionPercent,
    double CellMassKg,
    double SpecificEnergyWhPerKg,
    double RuntimeAtContinuousCurrentH);

/// <summary>Thermal quick check: heat in W, temperature rises in K, temperatures in °C.</summary>
public sealed record ThermalResult(
    double CellHeatAtContinuousW,
    double PackHeatAtContinuousW,
    double SpecificHeatJPerKgK,
    double PeakTemperatureRiseK,
    double ContinuousTemperatureRisePerHourK,
    double CellTemperatureAfterPeakC,
    double MinutesToDischargeLimitAtContinuous,
    double DischargeTemperatureMaxC);

/// <summary>One rung of the protection ladder, per cell and per pack, V.</summary>
public sealed record LadderLayer(string Layer, string Label, double PerCellVoltage, double PackVoltage);

/// <summary>Everything a design computes to.</summary>
public sealed record EvaluationResult(
    string CalculationVersion,
    CellSpec Cell,
    PackResult Pack,
    ThresholdSet CellThresholds,
    ThresholdSet PackThresholds,
    BalancingRecommendation Balancing,
    ChargerResult Charger,
    ProtectionResult Protection,
    EnergyResult Energy,
    IReadOnlyList<LadderLayer> Ladder,
    ThermalResult Thermal,
    IReadOnlyList<Finding> Findings);

/// <summary>Either validation errors (keyed by field) or a result.</summary>
public sealed record EvaluationOutcome(EvaluationResult? Result, IReadOnlyList<Validation.ValidationError> Errors)
{
    public bool IsValid => Result is not null;
}
