using MathNet.Numerics.Distributions;
using PackDesigner.Core.Spread;

namespace PackDesigner.Core.Tests.Spread;

/// <summary>The Monte Carlo's drawn groups against published order statistics and MathNet's distributions.</summary>
public class SpreadSamplingTests
{
    private const int Trials = 20_000;

    [Theory]
    [InlineData(8, 1.4236)]
    [InlineData(16, 1.7660)]
    [InlineData(96, 2.4930)]
    public void Analyze_SmallestOfSGroups_MatchesTheExpectedMinimumOfSNormals(int series, double expectedMaxOfStandardNormals)
    {
        // E[max of N standard normals] from the tables of normal order statistics (Harter, Biometrika 1961; Royston,
        // Applied Statistics AS 177, 1982): the smallest of S groups of one 280 Ah cell with σ = 2 Ah averages
        // 280 − 2·e_S Ah (e.g. 276.47 Ah for S = 16). Within 3 standard errors (sample σ / √N) plus half a bin.
        var design = SpreadDesigns.Lfp(series, 1, capacityAh: 280);
        var r = SpreadDesigns.Run(design, new SpreadSettings { Trials = Trials, Seed = 31, CapacitySigmaPercent = 100 * 2.0 / 280, ResistanceSigmaPercent = 0 });
        var smallest = r.SmallestGroupCapacityAh;
        var se = smallest.StandardDeviation / Math.Sqrt(Trials);
        Near.Absolute(280 - 2 * expectedMaxOfStandardNormals, smallest.Mean, 3 * se + smallest.Resolution / 2, "mean smallest group capacity");
    }

    [Fact]
    public void Analyze_GroupOfFourCells_HasSigmaTimesRootFour()
    {
        // The sum of P independent normal capacities has σ·√P (REFERENCES, statistics): one group of four 280 Ah cells
        // with σ = 2 Ah each has mean 1120 Ah and σ = 4 Ah. Standard error of a normal sample's σ: σ/√(2(N−1)).
        var r = SpreadDesigns.Run(SpreadDesigns.Lfp(1, 4, capacityAh: 280), new SpreadSettings { Trials = Trials, Seed = 32, CapacitySigmaPercent = 100 * 2.0 / 280, ResistanceSigmaPercent = 0 });
        var g = r.SmallestGroupCapacityAh;
        Near.Absolute(4, g.StandardDeviation, 3 * 4 / Math.Sqrt(2 * (Trials - 1)) + g.Resolution, "group σ");
        Near.Absolute(1120, g.Mean, 3 * 4 / Math.Sqrt(Trials) + g.Resolution / 2, "group mean");
    }

    [Fact]
    public void Analyze_OneCellGroups_PercentilesMatchMathNetNormalQuantiles()
    {
        // A 1S1P "pack" shows the cell capacity itself: its percentiles against MathNet's Normal inverse CDF, within
        // 4 standard errors of a sample quantile, √(q(1−q)/N) / pdf(x_q) (e.g. Kendall & Stuart; from memory).
        var r = SpreadDesigns.Run(SpreadDesigns.Lfp(1, 1), new SpreadSettings { Trials = Trials, Seed = 33, CapacitySigmaPercent = 1 });
        var normal = new Normal(100, 1);
        var p = r.SmallestGroupCapacityAh;
        foreach (var (q, value, ci) in new[] { (0.05, p.P5, p.Confidence95.P5), (0.5, p.P50, p.Confidence95.P50), (0.95, p.P95, p.Confidence95.P95) })
        {
            var x = normal.InverseCumulativeDistribution(q);
            var se = Math.Sqrt(q * (1 - q) / Trials) / normal.Density(x);
            Near.Absolute(x, value, 4 * se + p.Resolution, $"quantile {q}");
            Assert.InRange(value, ci.Low, ci.High);
            Near.Absolute(2 * 1.96 * se, ci.High - ci.Low, 0.25 * 2 * 1.96 * se + 2 * p.Resolution, $"width of the 95 % interval of quantile {q}");
        }
    }

    [Fact]
    public void Analyze_UniformWithinTolerance_PercentilesMatchMathNetUniformQuantiles()
    {
        // Uniform within ±3 %: capacity on [97, 103] Ah; MathNet ContinuousUniform inverse CDF, 4 SE (density 1/6 per Ah).
        var r = SpreadDesigns.Run(SpreadDesigns.Lfp(1, 1, tolerancePercent: 3), new SpreadSettings { Trials = Trials, Seed = 34, Distribution = SpreadDistribution.Uniform });
        var uniform = new ContinuousUniform(97, 103);
        var p = r.SmallestGroupCapacityAh;
        foreach (var (q, value) in new[] { (0.05, p.P5), (0.5, p.P50), (0.95, p.P95) })
        {
            var se = Math.Sqrt(q * (1 - q) / Trials) / uniform.Density(100);
            Near.Absolute(uniform.InverseCumulativeDistribution(q), value, 4 * se + p.Resolution, $"quantile {q}");
        }

        Assert.InRange(p.Min, 97, 103);
        Assert.InRange(p.Max, 97, 103);
    }

    [Fact]
    public void Analyze_MoreSpread_NeverLowersTheTripShareNorRaisesTheRecommendedCv()
    {
        // Metamorphic: the same seed draws the same standard variates, scaled by σ; at a fixed CV a wider spread can
        // only push the smallest group higher.
        var design = SpreadDesigns.Lfp(16, 2, targetCellVoltage: 3.42);
        SpreadResult? previous = null;
        foreach (var sigma in new[] { 0.5, 1.0, 1.5, 2.0, 3.0, 4.0 })
        {
            var r = SpreadDesigns.Run(design, new SpreadSettings { Trials = 4000, Seed = 5, CapacitySigmaPercent = sigma, ResistanceSigmaPercent = 1 });
            Assert.Equal(r.ConstantVoltage, design.Charger.TargetCellVoltage!.Value * 16, 6);
            if (previous is not null)
            {
                Assert.True(r.OverVoltageTripProbability >= previous.OverVoltageTripProbability, $"σ {sigma}: OV trip");
                Assert.True(r.OverVoltageReleaseProbability >= previous.OverVoltageReleaseProbability, $"σ {sigma}: OV release");
                Assert.True(r.RecommendedConstantVoltage <= previous.RecommendedConstantVoltage, $"σ {sigma}: recommended CV");
                Assert.True(r.HighestCellVoltageAtEndOfCharge.P95 >= previous.HighestCellVoltageAtEndOfCharge.P95, $"σ {sigma}: 95th percentile");
            }

            previous = r;
        }

        Assert.True(previous!.OverVoltageTripProbability > 0.5);
    }

    [Fact]
    public void Analyze_MoreCellsInSeries_NeverLowersTheTripShare()
    {
        // Metamorphic: at the same CV per cell, each trial's first S groups are the same draws for any longer
        // string (each trial has its own generator stream, groups drawn in order), so more groups can only add a smaller one.
        SpreadResult? previous = null;
        foreach (var series in new[] { 4, 8, 16, 32, 64 })
        {
            var r = SpreadDesigns.Run(SpreadDesigns.Lfp(series, 2, targetCellVoltage: 3.42), new SpreadSettings { Trials = 4000, Seed = 12, CapacitySigmaPercent = 2, ResistanceSigmaPercent = 1 });
            if (previous is not null)
            {
                Assert.True(r.OverVoltageTripProbability >= previous.OverVoltageTripProbability, $"S {series}");
                Assert.True(r.SmallestGroupCapacityAh.Mean <= previous.SmallestGroupCapacityAh.Mean, $"S {series}: smallest group");
            }

            previous = r;
        }
    }

    [Fact]
    public void Analyze_MoreSpreadAtAFixedSafeCv_NeverWidensTheAllowedBottomMatch()
    {
        var design = SpreadDesigns.Lfp(16, 2, targetCellVoltage: 3.40);
        var previous = double.PositiveInfinity;
        foreach (var sigma in new[] { 0.25, 0.5, 1.0, 1.5 })
        {
            var r = SpreadDesigns.Run(design, new SpreadSettings { Trials = 4000, Seed = 13, CapacitySigmaPercent = sigma });
            Assert.True(r.OverVoltageTripProbability <= r.TripRisk);
            Assert.True(r.BottomBalance!.RequiredMatchMillivolt <= previous, $"σ {sigma}");
            previous = r.BottomBalance.RequiredMatchMillivolt;
        }
    }
}
