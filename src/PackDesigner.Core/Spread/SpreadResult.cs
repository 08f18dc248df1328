using PackDesigner.Core.Design;
using PackDesigner.Core.Validation;

namespace PackDesigner.Core.Spread;

/// <summary>A closed interval, in the unit of the figure it belongs to.</summary>
public sealed record SpreadInterval(double Low, double High);

/// <summary>
/// Counts of one figure over the trials in equal bins from <see cref="Low"/> (the exact minimum), each
/// <see cref="BinWidth"/> wide, for drawing; a width of 0 means every trial gave the same value.
/// </summary>
public sealed record SpreadHistogram(double Low, double BinWidth, IReadOnlyList<long> Counts);

/// <summary>95 % confidence intervals of the four percentiles (distribution-free, from order statistics).</summary>
public sealed record SpreadPercentileConfidence(SpreadInterval P5, SpreadInterval P50, SpreadInterval P95, SpreadInterval P999);

/// <summary>
/// The distribution of one figure over the trials, in the figure's unit. Percentiles are the empirical ones
/// (the k-th smallest value, k = ⌈q·N⌉) read from a fixed-bin histogram: each is the centre of its bin, kept
/// inside [<see cref="Min"/>, <see cref="Max"/>], so it is exact to ± half the <see cref="Resolution"/> (the bin
/// width). Min and max are exact; mean and standard deviation are computed from the bins.
/// </summary>
public sealed record SpreadPercentiles(
    double P5,
    double P50,
    double P95,
    double P999,
    double Min,
    double Max,
    double Mean,
    double StandardDeviation,
    double Resolution,
    SpreadPercentileConfidence Confidence95);

/// <summary>
/// What the trials show at one charge voltage. Voltages per cell (V) unless named pack; capacities Ah; energies
/// Wh; states of charge %; probabilities are fractions of the trials, each with a 95 % Wilson score interval.
/// </summary>
public record SpreadMetrics
{
    /// <summary>Number of simulated packs.</summary>
    public required int Trials { get; init; }

    /// <summary>The charger's constant voltage the trials were charged to, V at the charger's terminals.</summary>
    public required double ConstantVoltage { get; init; }

    /// <summary>Share of packs in which some group reaches the OV trip at the end of charge.</summary>
    public required double OverVoltageTripProbability { get; init; }
    public required long OverVoltageTripCount { get; init; }
    public required SpreadInterval OverVoltageTripConfidence95 { get; init; }

    /// <summary>Share of packs in which some group ends the charge above the OV release.</summary>
    public required double OverVoltageReleaseProbability { get; init; }
    public required long OverVoltageReleaseCount { get; init; }
    public required SpreadInterval OverVoltageReleaseConfidence95 { get; init; }

    /// <summary>Share of packs in which some group, under the peak current at the coldest ambient, is at or below the UV trip when the controller cuts off (the BMS trips first).</summary>
    public required double UnderVoltageTripProbability { get; init; }
    public required long UnderVoltageTripCount { get; init; }
    public required SpreadInterval UnderVoltageTripConfidence95 { get; init; }

    /// <summary>The highest group voltage at the end of charge (termination current flowing), V.</summary>
    public required SpreadPercentiles HighestCellVoltageAtEndOfCharge { get; init; }

    /// <summary>The highest group voltage at the end of charge in <see cref="SpreadLimits.ChartBins"/> bins, V; null where not kept.</summary>
    public SpreadHistogram? HighestCellVoltageHistogram { get; init; }

    /// <summary>The lowest group voltage under the peak current, coldest ambient, when the pack sags to the controller's cut-off, V.</summary>
    public required SpreadPercentiles LowestCellVoltageAtCutoff { get; init; }

    /// <summary>Charge the string delivers between the window's limits as the charger, controller and BMS stop it, Ah.</summary>
    public required SpreadPercentiles UsableCapacityAh { get; init; }

    /// <summary>Energy over the same range, Wh (at rest, scaled to the datasheet rating as the design sheet does).</summary>
    public required SpreadPercentiles UsableEnergyWh { get; init; }

    /// <summary>Capacity of the smallest parallel group, Ah.</summary>
    public required SpreadPercentiles SmallestGroupCapacityAh { get; init; }

    /// <summary>The fullest group's state of charge at the end of charge, %.</summary>
    public required SpreadPercentiles HighestGroupSocAtEndOfChargePercent { get; init; }

    /// <summary>The emptiest group's state of charge where the discharge stops, %.</summary>
    public required SpreadPercentiles LowestGroupSocAtBottomPercent { get; init; }

    /// <summary>
    /// Bottom-balanced only: how much more state of charge the fullest group could take at the end of charge before
    /// it reached the OV trip, %; negative where the pack trips. Sets how closely the groups must be matched at the bottom.
    /// </summary>
    public SpreadPercentiles? TopHeadroomSocPercent { get; init; }

    /// <summary>The trial with the highest end-of-charge cell voltage (lowest index on ties); <see cref="SpreadMonteCarlo.Trial"/> shows its groups.</summary>
    public required int WorstEndOfChargeTrial { get; init; }

    /// <summary>The trial with the lowest cell voltage at the controller's cut-off.</summary>
    public required int WorstCutoffTrial { get; init; }
}

/// <summary>A group of measured cells as the analysis assigned them. Cell numbers are 1-based positions in the measured list.</summary>
public sealed record MeasuredGroup(int Group, IReadOnlyList<int> CellNumbers, double CapacityAh);

/// <summary>
/// How closely the groups must be matched when bottom-balancing. A group left ΔV above the balance voltage V_b at rest
/// holds SOC(V_b + ΔV) − SOC(V_b) more charge than the others; that offset must fit in the fullest group's headroom at
/// the end of charge (<see cref="SpreadMetrics.TopHeadroomSocPercent"/>, read at the chosen risk), so the allowed
/// match is OCV(SOC_b + headroom) − V_b. The slope at V_b tells how much state of charge one millivolt is there.
/// Voltages V, spreads mV, states of charge %.
/// </summary>
public sealed record BottomBalanceMatch(
    double BalanceVoltage,
    double SocAtBalancePercent,
    double SlopeMillivoltPerPercent,
    double HeadroomSocPercent,
    double RequiredMatchMillivolt,
    double CommonPracticeMatchMillivolt,
    bool Achievable,
    string Advice);

/// <summary>
/// The spread analysis of a design: the metrics at the design's charge voltage (the inherited members), the
/// charge voltage recommended for the chosen trip risk, and what it costs.
/// </summary>
public sealed record SpreadResult : SpreadMetrics
{
    public required BalancingMethod Balancing { get; init; }
    public required SpreadDistribution Distribution { get; init; }
    public required long Seed { get; init; }
    public required int Series { get; init; }
    public required int Parallel { get; init; }

    /// <summary>1 σ of the cell capacity used, % (for a uniform draw, half-width / √3); null with measured capacities.</summary>
    public required double? CapacitySigmaPercent { get; init; }

    /// <summary>Half-width of the uniform capacity draw, %; null for a normal draw.</summary>
    public required double? CapacityHalfWidthPercent { get; init; }
    public required double ResistanceSigmaPercent { get; init; }
    public required double? ResistanceHalfWidthPercent { get; init; }

    /// <summary>Where each spread came from: <c>entered</c>, <c>tolerance-as-3-sigma</c>, <c>tolerance-as-uniform-half-width</c>, <c>measured</c>, or for the resistance <c>capacity-tolerance-assumed</c>.</summary>
    public required string CapacitySpreadOrigin { get; init; }
    public required string ResistanceSpreadOrigin { get; init; }

    /// <summary>Per-cell thresholds the trials were judged by, V.</summary>
    public required double OverVoltageTrip { get; init; }
    public required double OverVoltageRelease { get; init; }
    public required double UnderVoltageTrip { get; init; }

    /// <summary>The share of packs allowed to trip OV at the end of charge.</summary>
    public required double TripRisk { get; init; }

    /// <summary>The highest CV at which at most <see cref="TripRisk"/> of the trials trip OV, V (pack); null when no trial trips below 1 V per cell above the datasheet maximum.</summary>
    public required double? RiskLimitedConstantVoltage { get; init; }

    /// <summary>The recommended CV: the lower of the risk-limited CV and the design's own CV limit, rounded down to the charger's step, V.</summary>
    public required double RecommendedConstantVoltage { get; init; }
    public required double RecommendedConstantVoltagePerCell { get; init; }

    /// <summary><c>trip-risk</c>, or the design's own limit (<c>window-top</c>, <c>ov-release</c>, <c>charger-max</c>, <c>target-cell-voltage</c>).</summary>
    public required string RecommendedLimitedBy { get; init; }

    /// <summary>The datasheet rating S·P·C·V_nom, Wh.</summary>
    public required double NominalEnergyWh { get; init; }

    /// <summary>
    /// The usable energy of the same pack built from identical nominal cells, charged to the design's CV and stopped by
    /// the same rules, Wh (the design sheet's worst-case figure for a pack without spread).
    /// </summary>
    public required double NominalUsableEnergyWh { get; init; }

    /// <summary>Median usable energy at the recommended CV, Wh.</summary>
    public required double RecommendedUsableEnergyWh { get; init; }

    /// <summary>What the spread and the recommended CV cost against the nominal pack: nominal usable − median usable at the recommended CV, Wh and %.</summary>
    public required double EnergyCostWh { get; init; }
    public required double EnergyCostPercent { get; init; }

    /// <summary>The metrics at the recommended CV; null when it equals the design's CV.</summary>
    public SpreadMetrics? AtRecommendedConstantVoltage { get; init; }

    /// <summary>Bottom-balanced designs: how closely to match the groups at the bottom for the chosen risk, at the design's CV.</summary>
    public BottomBalanceMatch? BottomBalance { get; init; }

    /// <summary>With measured capacities: the groups the analysis formed.</summary>
    public IReadOnlyList<MeasuredGroup>? MeasuredGroups { get; init; }

    /// <summary>The assumptions the result rests on, in words.</summary>
    public required IReadOnlyList<string> Notes { get; init; }
}

/// <summary>Either validation errors keyed by request field (<c>spread.trials</c>, <c>design.cell.capacityAh</c>…) or a result.</summary>
public sealed record SpreadOutcome(SpreadResult? Result, IReadOnlyList<ValidationError> Errors)
{
    public bool IsValid => Result is not null;
}

/// <summary>How one balancing method fares: where it fails (<c>top</c>, <c>bottom</c>, <c>both</c> or <c>none</c>) and what it costs.</summary>
public sealed record BalancingVerdict(
    BalancingMethod Method,
    string FailsAt,
    double OverVoltageTripProbability,
    double UnderVoltageTripProbability,
    double RecommendedConstantVoltage,
    double MedianUsableEnergyWh,
    double EnergyCostWh,
    string Explanation);

/// <summary>The same cells (same seed, so the same draws) bottom-balanced and top-balanced.</summary>
public sealed record SpreadComparison(SpreadResult Bottom, SpreadResult Top, BalancingVerdict BottomVerdict, BalancingVerdict TopVerdict, string Summary);

public sealed record SpreadComparisonOutcome(SpreadComparison? Result, IReadOnlyList<ValidationError> Errors)
{
    public bool IsValid => Result is not null;
}

/// <summary>
/// One group of one trial. Capacity Ah, resistance mΩ (25 °C), states of charge %, voltages V: at the end of
/// charge with the termination current, at the controller's cut-off under the peak current (coldest ambient),
/// and the states of charge where the usable range starts (top) and stops (bottom).
/// </summary>
public sealed record SpreadGroupState(
    int Group,
    double CapacityAh,
    double ResistanceMilliohm,
    double SocAtEndOfChargePercent,
    double VoltageAtEndOfCharge,
    double SocAtCutoffPercent,
    double LoadedVoltageAtCutoff,
    double SocAtTopPercent,
    double SocAtBottomPercent);

/// <summary>One trial in full, reproducible from the seed and its index. Voltages V, capacity Ah, energy Wh.</summary>
public sealed record SpreadTrial(
    int Trial,
    double ConstantVoltage,
    double HighestCellVoltageAtEndOfCharge,
    double LowestCellVoltageAtCutoff,
    bool OverVoltageTrip,
    bool OverVoltageRelease,
    bool UnderVoltageTrip,
    bool SmallestGroupForcedAboveFull,
    double TripConstantVoltage,
    double UsableCapacityAh,
    double UsableEnergyWh,
    IReadOnlyList<SpreadGroupState> Groups);

public sealed record SpreadTrialOutcome(SpreadTrial? Result, IReadOnlyList<ValidationError> Errors)
{
    public bool IsValid => Result is not null;
}
