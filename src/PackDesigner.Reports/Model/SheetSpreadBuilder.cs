using System.Globalization;
using PackDesigner.Core.Spread;
using F = PackDesigner.Reports.Formatting.SheetFormatter;

namespace PackDesigner.Reports.Model;

/// <summary>Maps a <see cref="SpreadResult"/> onto the formatted <see cref="SheetSpread"/>. No calculation happens here.</summary>
internal static class SheetSpreadBuilder
{
    public const string Title = "Cell spread";

    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static SheetSpread Build(SpreadResult s)
    {
        ArgumentNullException.ThrowIfNull(s);
        var probabilities = new List<SettingRow>
        {
            Probability("ov-trip", "OV trip at the end of charge", s.OverVoltageTripProbability, s.OverVoltageTripConfidence95),
            Probability("ov-release", "Above the OV release at end of charge", s.OverVoltageReleaseProbability, s.OverVoltageReleaseConfidence95),
            Probability("uv-trip", "UV trip at the controller's cut-off", s.UnderVoltageTripProbability, s.UnderVoltageTripConfidence95),
        };
        var recommendation = new List<SettingRow>
        {
            new("recommended-cv", "Recommended CV, pack", F.PackVoltage(s.RecommendedConstantVoltage), LimitedBy(s)),
            new("recommended-cv-per-cell", "Recommended CV per cell", F.CellVoltage(s.RecommendedConstantVoltagePerCell)),
            new("energy-cost", "Energy cost against the nominal pack", F.Energy(s.EnergyCostWh),
                $"{F.Percent(s.EnergyCostPercent).Text} of {F.Energy(s.NominalUsableEnergyWh).Text}: nominal usable energy less the median at the recommended CV."),
        };
        var percentiles = new List<SpreadPercentileRow>
        {
            Row("highest-cell-voltage", "Highest cell voltage at the end of charge", s.HighestCellVoltageAtEndOfCharge, F.CellVoltage),
            Row("usable-energy", "Usable energy", s.UsableEnergyWh, F.Energy),
        };
        return new SheetSpread(Title, RunLine(s), probabilities, recommendation, percentiles, Histogram(s));
    }

    private static string RunLine(SpreadResult s)
    {
        var capacity = s.CapacitySigmaPercent is { } sigma
            ? $"capacity σ {F.Trimmed(sigma, 2)} % ({Origin(s.CapacitySpreadOrigin)})"
            : "capacities as measured";
        var resistance = $"resistance σ {F.Trimmed(s.ResistanceSigmaPercent, 2)} % ({Origin(s.ResistanceSpreadOrigin)})";
        return string.Create(Inv, $"{s.Trials} trials · seed {s.Seed} · {capacity} · {resistance} · at the design's CV {F.PackVoltage(s.ConstantVoltage).Text}");
    }

    private static string Origin(string key) => key switch
    {
        "tolerance-as-3-sigma" => "datasheet tolerance as 3 σ",
        "tolerance-as-uniform-half-width" => "datasheet tolerance as the half-width of a uniform draw",
        "capacity-tolerance-assumed" => "the capacity tolerance assumed",
        "measured" => "measured",
        "entered" => "entered",
        _ => key,
    };

    private static string LimitedBy(SpreadResult s) => s.RecommendedLimitedBy switch
    {
        SpreadMonteCarlo.LimitedByTripRisk => $"Set by the trip risk: at most {F.Probability(s.TripRisk).Text} of the packs trip OV.",
        var key => "Set by " + DesignSheetModelBuilder.LimitedBy(key) + "; the trip risk allows more.",
    };

    private static SettingRow Probability(string key, string label, double p, SpreadInterval ci) =>
        new(key, label, F.Probability(p), "Share of the packs; 95 % interval " + F.ProbabilityInterval(ci.Low, ci.High));

    private static SpreadPercentileRow Row(string key, string label, SpreadPercentiles p, Func<double, Formatting.SheetValue> format) =>
        new(key, label, format(p.P5), format(p.P50), format(p.P95), format(p.P999));

    private static SpreadHistogramModel? Histogram(SpreadResult s)
    {
        if (s.HighestCellVoltageHistogram is not { } h)
        {
            return null;
        }

        return new SpreadHistogramModel(
            "Highest cell voltage at the end of charge",
            string.Create(Inv, $"How many of the {s.Trials} simulated packs end the charge with their highest group at each voltage; the lines are the BMS OV release and OV trip."),
            "Highest cell voltage at the end of charge (V)",
            "Packs",
            h.Low,
            h.BinWidth,
            h.Counts,
            [
                new("ov-release", "OV release " + F.CellVoltage(s.OverVoltageRelease).Text, s.OverVoltageRelease),
                new("ov-trip", "OV trip " + F.CellVoltage(s.OverVoltageTrip).Text, s.OverVoltageTrip),
            ]);
    }
}
