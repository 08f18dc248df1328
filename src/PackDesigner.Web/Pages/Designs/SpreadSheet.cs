using System.Globalization;
using PackDesigner.Core.Design;
using PackDesigner.Core.Spread;
using PackDesigner.Web.Formatting;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>One probability with its 95 % interval, as text.</summary>
public sealed record SpreadProbabilityRow(string Label, string TestId, string Probability, string Interval, string Count);

/// <summary>One figure's percentiles, as text.</summary>
public sealed record SpreadPercentileRow(string Label, string Unit, string P5, string P50, string P95, string P999, string Min, string Max);

/// <summary>One balancing method of the comparison, as text.</summary>
public sealed record SpreadVerdictRow(string Method, string FailsAt, string OverVoltageTrip, string UnderVoltageTrip, string RecommendedCv, string MedianUsable, string EnergyCost, string Explanation);

/// <summary>
/// The spread page's figures as display text, from Core's comparison of the same cells bottom- and top-balanced:
/// the design's own balancing is shown in full, the other one in the comparison. No arithmetic beyond unit scaling.
/// </summary>
public sealed class SpreadSheet
{
    private SpreadSheet(SpreadResult result, SpreadComparison comparison)
    {
        Result = result;
        Comparison = comparison;
    }

    public SpreadResult Result { get; }

    public SpreadComparison Comparison { get; }

    public static SpreadSheet From(SpreadComparison comparison, BalancingMethod balancing)
    {
        ArgumentNullException.ThrowIfNull(comparison);
        return new SpreadSheet(balancing == BalancingMethod.Top ? comparison.Top : comparison.Bottom, comparison);
    }

    public string Configuration => string.Create(CultureInfo.InvariantCulture,
        $"{Result.Series}S{Result.Parallel}P, {(Result.Balancing == BalancingMethod.Top ? "top" : "bottom")}-balanced, {Numbers.Fixed(Result.Trials, 0)} trials, seed {Result.Seed}");

    public string Spread => string.Create(CultureInfo.InvariantCulture,
        $"Capacity σ {(Result.CapacitySigmaPercent is { } c ? Numbers.Quantity(c, 2, "%") : "from the measured cells")} ({Result.CapacitySpreadOrigin}), resistance σ {Numbers.Quantity(Result.ResistanceSigmaPercent, 2, "%")} ({Result.ResistanceSpreadOrigin}), {Result.Distribution.ToString().ToLowerInvariant()} draw.");

    public string DesignCv => Numbers.Quantity(Result.ConstantVoltage, 2, "V");

    public string RecommendedCv => Numbers.Quantity(Result.RecommendedConstantVoltage, 2, "V");

    public string RecommendedCvPerCell => Numbers.Quantity(Result.RecommendedConstantVoltagePerCell, 3, "V");

    public string RecommendedLimitedBy => Result.RecommendedLimitedBy switch
    {
        SpreadMonteCarlo.LimitedByTripRisk => string.Create(CultureInfo.InvariantCulture, $"the allowed trip risk of {Percent(Result.TripRisk)}"),
        "window-top" => "the top of the state-of-charge window",
        "ov-release" => "the OV release",
        "charger-max" => "the charger's maximum voltage",
        "target-cell-voltage" => "the target cell voltage",
        var other => other,
    };

    public string EnergyCost => string.Create(CultureInfo.InvariantCulture,
        $"{Numbers.Quantity(Result.EnergyCostWh, 0, "Wh")} ({Numbers.Quantity(Result.EnergyCostPercent, 1, "%")})");

    public string NominalUsable => Numbers.Quantity(Result.NominalUsableEnergyWh, 0, "Wh");

    public string RecommendedUsable => Numbers.Quantity(Result.RecommendedUsableEnergyWh, 0, "Wh");

    public string OverVoltageTrip => Numbers.Quantity(Result.OverVoltageTrip, 3, "V");

    public string OverVoltageRelease => Numbers.Quantity(Result.OverVoltageRelease, 3, "V");

    public IReadOnlyList<SpreadProbabilityRow> Probabilities =>
    [
        Probability("OV trip at the end of charge", "p-ov-trip", Result.OverVoltageTripProbability, Result.OverVoltageTripConfidence95, Result.OverVoltageTripCount),
        Probability("Above the OV release at the end of charge", "p-ov-release", Result.OverVoltageReleaseProbability, Result.OverVoltageReleaseConfidence95, Result.OverVoltageReleaseCount),
        Probability("UV trip at the controller's cut-off (peak load, coldest)", "p-uv-trip", Result.UnderVoltageTripProbability, Result.UnderVoltageTripConfidence95, Result.UnderVoltageTripCount),
    ];

    public IReadOnlyList<SpreadPercentileRow> Percentiles => PercentileRows(Result);

    public IReadOnlyList<SpreadPercentileRow>? PercentilesAtRecommended =>
        Result.AtRecommendedConstantVoltage is { } m ? PercentileRows(m) : null;

    public IReadOnlyList<SpreadVerdictRow> Verdicts => [Verdict(Comparison.BottomVerdict), Verdict(Comparison.TopVerdict)];

    public BottomBalanceMatch? BottomBalance => Comparison.Bottom.BottomBalance;

    public string? RequiredMatch => BottomBalance is { } b ? Numbers.Quantity(b.RequiredMatchMillivolt, 1, "mV") : null;

    public string? CommonPracticeMatch => BottomBalance is { } b ? Numbers.Quantity(b.CommonPracticeMatchMillivolt, 0, "mV") : null;

    public string? BalanceVoltage => BottomBalance is { } b ? Numbers.Quantity(b.BalanceVoltage, 3, "V") : null;

    /// <summary>The histogram of the end-of-charge highest cell voltage with the OV release and trip marked (inline SVG markup).</summary>
    public string HistogramSvg => SpreadHistogramSvg.Render(Result.HighestCellVoltageHistogram, Result.OverVoltageRelease, Result.OverVoltageTrip);

    public static string Percent(double fraction) => Numbers.Quantity(100 * fraction, fraction < 0.01 ? 3 : 2, "%");

    private static SpreadProbabilityRow Probability(string label, string testId, double p, SpreadInterval ci, long count) =>
        new(label, testId, Percent(p), string.Create(CultureInfo.InvariantCulture, $"{Percent(ci.Low)} – {Percent(ci.High)}"), Numbers.Fixed(count, 0));

    private static List<SpreadPercentileRow> PercentileRows(SpreadMetrics m) =>
    [
        Row("Highest cell at the end of charge", "V", m.HighestCellVoltageAtEndOfCharge, 3),
        Row("Lowest cell at the controller's cut-off", "V", m.LowestCellVoltageAtCutoff, 3),
        Row("Usable capacity", "Ah", m.UsableCapacityAh, 1),
        Row("Usable energy", "Wh", m.UsableEnergyWh, 0),
        Row("Smallest group", "Ah", m.SmallestGroupCapacityAh, 2),
        Row("Fullest group's SOC at the end of charge", "%", m.HighestGroupSocAtEndOfChargePercent, 1),
        Row("Emptiest group's SOC at the bottom", "%", m.LowestGroupSocAtBottomPercent, 1),
    ];

    private static SpreadPercentileRow Row(string label, string unit, SpreadPercentiles p, int decimals) => new(
        label, unit,
        Numbers.Fixed(p.P5, decimals), Numbers.Fixed(p.P50, decimals), Numbers.Fixed(p.P95, decimals), Numbers.Fixed(p.P999, decimals),
        Numbers.Fixed(p.Min, decimals), Numbers.Fixed(p.Max, decimals));

    private static SpreadVerdictRow Verdict(BalancingVerdict v) => new(
        v.Method == BalancingMethod.Top ? "Top-balanced" : "Bottom-balanced",
        v.FailsAt switch { "top" => "at the top", "bottom" => "at the bottom", "both" => "at both ends", _ => "nowhere" },
        Percent(v.OverVoltageTripProbability),
        Percent(v.UnderVoltageTripProbability),
        Numbers.Quantity(v.RecommendedConstantVoltage, 2, "V"),
        Numbers.Quantity(v.MedianUsableEnergyWh, 0, "Wh"),
        Numbers.Quantity(v.EnergyCostWh, 0, "Wh"),
        v.Explanation);
}
