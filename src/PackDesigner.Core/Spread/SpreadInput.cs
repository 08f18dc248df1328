using PackDesigner.Core.Design;

namespace PackDesigner.Core.Spread;

/// <summary>How each cell's capacity and DC resistance are drawn around the datasheet value.</summary>
public enum SpreadDistribution
{
    /// <summary>Normal: value × (1 + σ·z). σ entered, or the datasheet tolerance read as ±3σ.</summary>
    Normal,
    /// <summary>Uniform: value × (1 + h·u), u uniform on [−1, 1); h the datasheet tolerance, or σ·√3 when σ is entered.</summary>
    Uniform,
}

/// <summary>How a list of measured cell capacities is assigned to the parallel groups.</summary>
public enum MeasuredGrouping
{
    /// <summary>
    /// Matched: of the sorted list, the S·P consecutive cells with the smallest range are taken, then each cell,
    /// largest first, joins the unfilled group with the smallest total so far (the greedy "largest first" rule,
    /// R. L. Graham, SIAM J. Appl. Math. 17, 1969, with P cells to a group).
    /// </summary>
    Balanced,
    /// <summary>As listed: cells 1…P form group 1, cells P+1…2P group 2, and so on (the list must hold exactly S·P cells).</summary>
    AsListed,
}

/// <summary>
/// Settings of the cell-to-cell spread Monte Carlo. Percentages are % of the datasheet value (1 σ); probabilities
/// and risks are fractions (0.001 = 0.1 %).
/// </summary>
public sealed record SpreadSettings
{
    public SpreadDistribution Distribution { get; init; } = SpreadDistribution.Normal;

    /// <summary>1 σ of the cell capacity, % of the rated capacity; omitted: from the datasheet capacity tolerance (see <see cref="SpreadDistribution"/>).</summary>
    public double? CapacitySigmaPercent { get; init; }

    /// <summary>
    /// 1 σ of the cell DC resistance, % of the datasheet value; omitted: the datasheet gives no resistance
    /// tolerance, so the capacity tolerance is used for it too (an assumption the result states).
    /// </summary>
    public double? ResistanceSigmaPercent { get; init; }

    /// <summary>Number of simulated packs.</summary>
    public int Trials { get; init; } = SpreadLimits.DefaultTrials;

    /// <summary>Seed of the generator; the same seed gives the same result on any machine and thread count.</summary>
    public long Seed { get; init; } = 1;

    /// <summary>The share of packs allowed to trip the OV protection at the end of charge; default 0.001 (0.1 %).</summary>
    public double? TripRisk { get; init; }

    /// <summary>Measured capacities of the cells at hand, Ah; when given they replace the capacity distribution.</summary>
    public IReadOnlyList<double>? MeasuredCapacitiesAh { get; init; }

    /// <summary>How the measured cells are grouped.</summary>
    public MeasuredGrouping MeasuredGrouping { get; init; } = MeasuredGrouping.Balanced;
}

/// <summary>A spread analysis of one design: the design as the evaluator takes it, and the spread settings.</summary>
public sealed record SpreadRequest
{
    public required DesignInput Design { get; init; }
    public required SpreadSettings Spread { get; init; }
}

/// <summary>Bounds of the spread analysis.</summary>
public static class SpreadLimits
{
    public const int DefaultTrials = 10_000;
    public const int MinTrials = 100;
    public const int MaxTrials = 1_000_000;

    /// <summary>Upper bound of trials × S × P (cell draws) per request, so one request cannot occupy the server.</summary>
    public const long MaxCellDraws = 50_000_000;

    public const double DefaultTripRisk = 0.001;
    public const double MaxTripRisk = 0.5;
    public const double MaxSigmaPercent = 15;
    public const int MaxMeasuredCells = 100_000;

    /// <summary>A drawn factor (1 + σ·z) is clamped at this floor; with σ ≤ 15 % it needs z &lt; −6, about one draw in 10⁹.</summary>
    public const double MinDrawFactor = 0.1;

    /// <summary>Trials per unit of parallel work.</summary>
    public const int ChunkSize = 64;

    /// <summary>Width of a cell-voltage histogram bin: the percentile resolution of every cell voltage, V.</summary>
    public const double VoltageResolutionV = 1e-4;

    /// <summary>Bins of the histograms a result carries for drawing.</summary>
    public const int ChartBins = 40;

    /// <summary>Bins of the capacity, energy and state-of-charge histograms.</summary>
    public const int FineBins = 20_000;
}
