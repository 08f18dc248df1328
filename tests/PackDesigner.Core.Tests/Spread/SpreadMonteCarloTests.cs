using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Spread;

namespace PackDesigner.Core.Tests.Spread;

/// <summary>
/// The Monte Carlo against the foundation's deterministic calculation (DesignEvaluator and its StringChargeModel)
/// and against the string's own equations, recomputed from each group's reported figures with the foundation's
/// OcvCurve (not the Monte Carlo's internal tables).
/// </summary>
public class SpreadMonteCarloTests
{
    [Theory]
    [InlineData(BalancingMethod.Bottom)]
    [InlineData(BalancingMethod.Top)]
    public void Analyze_ZeroToleranceSoZeroSpread_EqualsTheDeterministicEvaluator(BalancingMethod balancing)
    {
        // With tolerance 0 the σ derived from it is 0 for capacity and resistance: every trial is the nominal pack,
        // which the foundation's DesignEvaluator computes deterministically (reference: the foundation, tolerance 0).
        var design = SpreadDesigns.Lfp(16, 2, balancing, tolerancePercent: 0, stepV: 0.1);
        var foundation = DesignEvaluator.Evaluate(design).Result!;
        var r = SpreadDesigns.Run(design, new SpreadSettings { Trials = 500, Seed = 3 });

        Assert.Equal(0, r.CapacitySigmaPercent);
        Assert.Equal(0, r.ResistanceSigmaPercent);
        Assert.Equal(foundation.Charger.ConstantVoltage, r.ConstantVoltage);
        var expectedHighest = foundation.Charger.TypicalCellEndOfChargeVoltage;
        foreach (var v in new[] { r.HighestCellVoltageAtEndOfCharge.Min, r.HighestCellVoltageAtEndOfCharge.P50, r.HighestCellVoltageAtEndOfCharge.P999, r.HighestCellVoltageAtEndOfCharge.Max })
        {
            Near.Relative(expectedHighest, v, 1e-9, "highest cell voltage at end of charge");
        }

        Near.Relative(foundation.Charger.TypicalGroupEndOfChargeSocPercent, r.HighestGroupSocAtEndOfChargePercent.P50, 1e-9, "group SOC at end of charge");
        Near.Relative(foundation.Energy.UsableEnergyWorstCaseWh, r.UsableEnergyWh.Min, 1e-9, "usable energy (min)");
        Near.Relative(foundation.Energy.UsableEnergyWorstCaseWh, r.UsableEnergyWh.Max, 1e-9, "usable energy (max)");
        Near.Relative(foundation.Energy.UsableEnergyWorstCaseWh, r.NominalUsableEnergyWh, 1e-9, "nominal usable energy");
        Near.Relative(200 * (foundation.Charger.TypicalGroupEndOfChargeSocPercent / 100 - 0.10), r.UsableCapacityAh.P50, 1e-9, "usable capacity");
        Near.Absolute(0, r.EnergyCostWh, 1e-6, "energy cost of no spread");
        Assert.Equal(200, r.SmallestGroupCapacityAh.Min, 9);
        Assert.Equal(0, r.OverVoltageTripProbability);
        Assert.Equal(0, r.OverVoltageReleaseProbability);
        Assert.Equal(0, r.UnderVoltageTripProbability);
        Assert.Equal(foundation.Charger.ConstantVoltage, r.RecommendedConstantVoltage);
    }

    [Theory]
    [InlineData(BalancingMethod.Bottom, null)]
    [InlineData(BalancingMethod.Top, null)]
    [InlineData(BalancingMethod.Bottom, 3.55)]
    [InlineData(BalancingMethod.Top, 3.55)]
    public void Trial_TheFoundationsWeakestGroupString_MatchesItsEndOfChargeAndWorstCaseEnergy(BalancingMethod balancing, double? target)
    {
        // The foundation models 15 nominal groups and one weakest group at the low end of the tolerance (97 % here).
        // The same string entered as measured cells, grouped as listed, without resistance spread, must give the
        // foundation's end of charge (at 3.55 V per cell the smallest group is forced above full when bottom-balanced)
        // and its worst-case usable energy. Reference: DesignEvaluator / StringChargeModel.
        var design = SpreadDesigns.Lfp(16, 1, balancing, tolerancePercent: 3, targetCellVoltage: target, stepV: 0.01);
        var foundation = DesignEvaluator.Evaluate(design).Result!;
        var cells = Enumerable.Repeat(100.0, 15).Append(97.0).ToArray();
        var settings = new SpreadSettings { Trials = 100, ResistanceSigmaPercent = 0, MeasuredCapacitiesAh = cells, MeasuredGrouping = MeasuredGrouping.AsListed };
        var trial = SpreadMonteCarlo.Trial(SpreadDesigns.Request(design, settings), 0).Result!;

        var weakest = trial.Groups[15];
        Near.Relative(foundation.Charger.WeakestCellEndOfChargeVoltage, weakest.VoltageAtEndOfCharge, 1e-9, "weakest group voltage");
        Near.Relative(foundation.Charger.WeakestGroupEndOfChargeSocPercent, weakest.SocAtEndOfChargePercent, 1e-9, "weakest group SOC");
        foreach (var g in trial.Groups.Take(15))
        {
            Near.Relative(foundation.Charger.TypicalCellEndOfChargeVoltage, g.VoltageAtEndOfCharge, 1e-9, "typical group voltage");
            Near.Relative(foundation.Charger.TypicalGroupEndOfChargeSocPercent, g.SocAtEndOfChargePercent, 1e-9, "typical group SOC");
        }

        // The foundation caps its worst case at the nominal window's energy: a smaller group that works higher on the
        // curve can deliver a little more than a nominal one, which the trial reports as it is.
        Near.Relative(foundation.Energy.UsableEnergyWorstCaseWh, Math.Min(foundation.Energy.UsableEnergyWh, trial.UsableEnergyWh), 1e-9, "worst-case usable energy");
        Assert.Equal(target is not null, trial.SmallestGroupForcedAboveFull);
    }

    [Theory]
    [InlineData(BalancingMethod.Bottom)]
    [InlineData(BalancingMethod.Top)]
    public void Trial_SpreadString_GroupFiguresSatisfyTheStringEquations(BalancingMethod balancing)
    {
        // 12S3P with 0.2 mΩ links: R_ext = 11 × 0.2 mΩ; termination current 3 × C/20 = 15 A; peak 200 A at 25 °C.
        // Kirchhoff's voltage law at the end of charge, Σ Vᵢ + I_term·R_ext = CV, and at the controller's cut-off,
        // Σ (OCVᵢ − I_peak·Rᵢ) − I_peak·R_ext = V_min; the same charge through every group; the energy as
        // Σ Cᵢ·∫ OCV dSOC over each group's range (foundation's OcvCurve) times V_nom / mean OCV.
        var design = SpreadDesigns.Lfp(12, 3, balancing, linkResistanceMilliohm: 0.2);
        var settings = new SpreadSettings { Trials = 200, Seed = 9, CapacitySigmaPercent = 2, ResistanceSigmaPercent = 5 };
        var request = SpreadDesigns.Request(design, settings);
        var curve = CellResolver.TryResolve(design.Cell, out _)!.OcvCurve;
        var external = 11 * 0.2e-3;
        var scale = 3.2 / curve.MeanVoltage;
        var summary = SpreadDesigns.Run(design, settings);

        foreach (var index in new[] { 0, 1, 2, 3, summary.WorstEndOfChargeTrial, summary.WorstCutoffTrial })
        {
            var t = SpreadMonteCarlo.Trial(request, index).Result!;
            var g = t.Groups;
            Near.Relative(t.ConstantVoltage, g.Sum(x => x.VoltageAtEndOfCharge) + 15 * external, 1e-9, "end-of-charge voltage sum");
            // Either the pack sags to the controller's cut-off, or a group empties first (top-balanced: the smallest).
            var loaded = g.Sum(x => x.LoadedVoltageAtCutoff) - 200 * external;
            if (g.All(x => x.SocAtCutoffPercent > 1e-9))
            {
                Near.Relative(design.Controller.MinVoltage, loaded, 1e-9, "cut-off voltage sum");
            }
            else
            {
                Assert.True(loaded > design.Controller.MinVoltage);
            }

            Near.Relative(g.Max(x => x.VoltageAtEndOfCharge), t.HighestCellVoltageAtEndOfCharge, 1e-12, "highest");
            Near.Relative(g.Min(x => x.LoadedVoltageAtCutoff), t.LowestCellVoltageAtCutoff, 1e-12, "lowest");

            // Common charge from the balance point: C·SOC (bottom) or C·(1 − SOC) (top) is the same for every group.
            var charge = g.Select(x => x.CapacityAh * (balancing == BalancingMethod.Bottom ? x.SocAtEndOfChargePercent : 100 - x.SocAtEndOfChargePercent) / 100).ToArray();
            Assert.All(charge, q => Near.Relative(charge[0], q, 1e-9, "common charge"));

            foreach (var x in g)
            {
                Near.Relative(t.UsableCapacityAh, x.CapacityAh * (x.SocAtTopPercent - x.SocAtBottomPercent) / 100, 1e-9, "charge through each group");
            }

            var energy = g.Sum(x => x.CapacityAh * curve.EnergyIntegral(x.SocAtBottomPercent / 100, x.SocAtTopPercent / 100)) * scale;
            Near.Relative(energy, t.UsableEnergyWh, 1e-9, "usable energy from the groups");
            Assert.Equal(t.OverVoltageTrip, t.HighestCellVoltageAtEndOfCharge >= summary.OverVoltageTrip);
            Assert.Equal(t.TripConstantVoltage <= t.ConstantVoltage, t.OverVoltageTrip);
        }
    }

    [Fact]
    public void Trial_TripConstantVoltage_IsWhereTheHighestGroupReachesTheOvTrip()
    {
        // Charging the same drawn string to its own trip CV must put its highest group exactly on the OV trip.
        var design = SpreadDesigns.Lfp(16, 2, targetCellVoltage: 3.42);
        var settings = new SpreadSettings { Trials = 100, Seed = 21, CapacitySigmaPercent = 3 };
        var first = SpreadMonteCarlo.Trial(SpreadDesigns.Request(design, settings), 5).Result!;
        var atTrip = SpreadMonteCarlo.Trial(SpreadDesigns.Request(design with { Charger = design.Charger with { VoltageStepV = 1e-9, TargetCellVoltage = first.TripConstantVoltage / 16 } }, settings), 5).Result!;
        Near.Absolute(3.60, atTrip.HighestCellVoltageAtEndOfCharge, 1e-6, "highest group at the trip CV");
    }

    [Fact]
    public void Analyze_SameSeed_GivesTheSameResultOnAnyThreadCount()
    {
        var design = SpreadDesigns.Lfp(24, 3);
        var settings = new SpreadSettings { Trials = 3000, Seed = 1234, CapacitySigmaPercent = 2 };
        var a = SpreadDesigns.ToJson(SpreadDesigns.Run(design, settings));
        var b = SpreadDesigns.ToJson(SpreadDesigns.Run(design, settings));
        var oneThread = SpreadDesigns.ToJson(SpreadDesigns.Run(design, settings, new SpreadRunOptions { MaxDegreeOfParallelism = 1 }));
        var twoThreads = SpreadDesigns.ToJson(SpreadDesigns.Run(design, settings, new SpreadRunOptions { MaxDegreeOfParallelism = 2 }));
        Assert.Equal(a, b);
        Assert.Equal(a, oneThread);
        Assert.Equal(a, twoThreads);
    }

    [Fact]
    public void Analyze_DifferentSeed_GivesADifferentSampleWithinTheStatedIntervals()
    {
        // Two independent runs estimate the same quantities: their difference must lie within the 95 % interval of
        // a difference, √(h₁² + h₂²) from the stated 95 % half-widths (Wilson for shares, order statistics for percentiles).
        var design = SpreadDesigns.Lfp(16, 2, targetCellVoltage: 3.42);
        var a = SpreadDesigns.Run(design, new SpreadSettings { Trials = 4000, Seed = 1, CapacitySigmaPercent = 2 });
        var b = SpreadDesigns.Run(design, new SpreadSettings { Trials = 4000, Seed = 2, CapacitySigmaPercent = 2 });
        Assert.NotEqual(a.OverVoltageTripCount, b.OverVoltageTripCount);

        static double Half(SpreadInterval i) => (i.High - i.Low) / 2;
        void Within(double x, SpreadInterval ix, double y, SpreadInterval iy, string what) =>
            Near.Absolute(x, y, Math.Sqrt(Half(ix) * Half(ix) + Half(iy) * Half(iy)), what);

        Within(a.OverVoltageTripProbability, a.OverVoltageTripConfidence95, b.OverVoltageTripProbability, b.OverVoltageTripConfidence95, "OV trip share");
        Within(a.OverVoltageReleaseProbability, a.OverVoltageReleaseConfidence95, b.OverVoltageReleaseProbability, b.OverVoltageReleaseConfidence95, "OV release share");
        Within(a.HighestCellVoltageAtEndOfCharge.P50, a.HighestCellVoltageAtEndOfCharge.Confidence95.P50, b.HighestCellVoltageAtEndOfCharge.P50, b.HighestCellVoltageAtEndOfCharge.Confidence95.P50, "median highest cell voltage");
        Within(a.UsableEnergyWh.P50, a.UsableEnergyWh.Confidence95.P50, b.UsableEnergyWh.P50, b.UsableEnergyWh.Confidence95.P50, "median usable energy");
        Within(a.UsableEnergyWh.P5, a.UsableEnergyWh.Confidence95.P5, b.UsableEnergyWh.P5, b.UsableEnergyWh.Confidence95.P5, "5th percentile usable energy");
    }

    [Fact]
    public void Analyze_RiskLimitedCv_MeetsTheRiskAndTwoStepsHigherDoesNot()
    {
        var design = SpreadDesigns.Lfp(16, 2, targetCellVoltage: 3.42);
        var settings = new SpreadSettings { Trials = 4000, Seed = 8, CapacitySigmaPercent = 2 };
        var r = SpreadDesigns.Run(design, settings);

        Assert.Equal(SpreadMonteCarlo.LimitedByTripRisk, r.RecommendedLimitedBy);
        Assert.Equal(SpreadLimits.DefaultTripRisk, r.TripRisk);
        Assert.True(r.OverVoltageTripProbability > r.TripRisk);
        Assert.True(r.RecommendedConstantVoltage < r.ConstantVoltage);
        Near.Absolute(Math.Round(r.RecommendedConstantVoltage / 0.001) * 0.001, r.RecommendedConstantVoltage, 1e-9, "on the charger's step");
        var atRecommended = r.AtRecommendedConstantVoltage!;
        Assert.Equal(r.RecommendedConstantVoltage, atRecommended.ConstantVoltage);
        Assert.True(atRecommended.OverVoltageTripProbability <= r.TripRisk);
        Assert.Equal(atRecommended.UsableEnergyWh.P50, r.RecommendedUsableEnergyWh);
        Near.Relative(r.NominalUsableEnergyWh - r.RecommendedUsableEnergyWh, r.EnergyCostWh, 1e-12, "energy cost");

        // The histogram places each pack's trip CV within a quarter step, so two steps up more packs than allowed trip.
        var higher = (r.RecommendedConstantVoltage + 0.002) / 16;
        var above = SpreadDesigns.Run(design with { Charger = design.Charger with { TargetCellVoltage = higher } }, settings);
        Assert.True(above.OverVoltageTripProbability > r.TripRisk, $"{above.OverVoltageTripProbability} at {above.ConstantVoltage} V");

        var looser = SpreadDesigns.Run(design, settings with { TripRisk = 0.05 });
        Assert.True(looser.RecommendedConstantVoltage > r.RecommendedConstantVoltage);
    }

    [Fact]
    public void Analyze_MeasuredCapacities_GroupsThemAndUsesTheirSmallestGroup()
    {
        var design = SpreadDesigns.Lfp(4, 2, tolerancePercent: 3);
        double[] cells = [101, 99, 100.5, 98, 102, 100, 99.5, 97, 120];
        var r = SpreadDesigns.Run(design, new SpreadSettings { Trials = 100, MeasuredCapacitiesAh = cells });
        var groups = r.MeasuredGroups!;
        Assert.Equal(4, groups.Count);
        Assert.DoesNotContain(groups, g => g.CellNumbers.Contains(9)); // the 120 Ah outlier widens any 8-cell window
        Assert.Equal(groups.Min(g => g.CapacityAh), r.SmallestGroupCapacityAh.Min, 9);
        Assert.Equal(r.SmallestGroupCapacityAh.Min, r.SmallestGroupCapacityAh.Max, 9);
        Assert.Equal(SpreadSetupOrigins.Measured, r.CapacitySpreadOrigin);
        Assert.Null(r.CapacitySigmaPercent);
    }

    [Fact]
    public void Compare_SameCells_BottomFailsAtTheTopAndTopFailsAtTheBottom()
    {
        // Bottom-balanced, the smallest group fills first and trips OV at a high CV; top-balanced, it empties first and
        // trips UV before the controller cuts off. The comparison draws the same cells for both.
        var design = SpreadDesigns.Lfp(16, 2, targetCellVoltage: 3.42);
        var outcome = SpreadMonteCarlo.Compare(SpreadDesigns.Request(design, new SpreadSettings { Trials = 2000, Seed = 4, CapacitySigmaPercent = 3 }));
        var c = outcome.Result!;
        Assert.Equal("top", c.BottomVerdict.FailsAt);
        Assert.Equal("bottom", c.TopVerdict.FailsAt);
        Assert.Equal(BalancingMethod.Bottom, c.Bottom.Balancing);
        Assert.Equal(BalancingMethod.Top, c.Top.Balancing);
        Assert.Equal(SpreadDesigns.ToJson(c.Bottom.SmallestGroupCapacityAh), SpreadDesigns.ToJson(c.Top.SmallestGroupCapacityAh));
        Assert.True(c.Top.OverVoltageTripProbability < c.Bottom.OverVoltageTripProbability);
        Assert.True(c.Top.UnderVoltageTripProbability > c.Bottom.UnderVoltageTripProbability);
        Assert.Contains("Bottom-balanced", c.Summary);
    }

    [Fact]
    public void Analyze_BottomBalanced_MatchFollowsFromTheHeadroomOnTheCurve()
    {
        // The allowed match is OCV(SOC_b + headroom) − V_b at the balance voltage V_b = the UV trip, read on the
        // foundation's curve; the balance voltage is BalancingAdvisor's bottom-balance target.
        var design = SpreadDesigns.Lfp(16, 2, targetCellVoltage: 3.40);
        var r = SpreadDesigns.Run(design, new SpreadSettings { Trials = 2000, Seed = 6, CapacitySigmaPercent = 1 });
        var m = r.BottomBalance!;
        var curve = CellResolver.TryResolve(design.Cell, out _)!.OcvCurve;
        var foundation = DesignEvaluator.Evaluate(design).Result!;
        Assert.Equal(foundation.Balancing.TargetCellVoltage, m.BalanceVoltage);
        Assert.True(m.Achievable);
        Near.Relative((curve.VoltageAt((m.SocAtBalancePercent + m.HeadroomSocPercent) / 100) - m.BalanceVoltage) * 1000, m.RequiredMatchMillivolt, 1e-9, "required match");
        Assert.True(m.HeadroomSocPercent > 0);
        Assert.Null(SpreadDesigns.Run(design with { Balancing = BalancingMethod.Top }, new SpreadSettings { Trials = 200, CapacitySigmaPercent = 1 }).BottomBalance);
    }

    [Fact]
    public void Analyze_CvAboveTheRisk_SaysNoBottomMatchIsCloseEnough()
    {
        var design = SpreadDesigns.Lfp(16, 2, targetCellVoltage: 3.44);
        var r = SpreadDesigns.Run(design, new SpreadSettings { Trials = 2000, Seed = 6, CapacitySigmaPercent = 2 });
        Assert.True(r.OverVoltageTripProbability > r.TripRisk);
        Assert.False(r.BottomBalance!.Achievable);
        Assert.Equal(0, r.BottomBalance.RequiredMatchMillivolt);
    }

    [Fact]
    public void Analyze_ToleranceOnly_ReadsItAsThreeSigmaOrAsTheUniformHalfWidth()
    {
        var design = SpreadDesigns.Lfp(8, 2, tolerancePercent: 4.5);
        var normal = SpreadDesigns.Run(design, new SpreadSettings { Trials = 100 });
        Assert.Equal(1.5, normal.CapacitySigmaPercent!.Value, 12);
        Assert.Equal(1.5, normal.ResistanceSigmaPercent, 12);
        Assert.Equal("tolerance-as-3-sigma", normal.CapacitySpreadOrigin);
        Assert.Equal("capacity-tolerance-assumed", normal.ResistanceSpreadOrigin);

        var uniform = SpreadDesigns.Run(design, new SpreadSettings { Trials = 100, Distribution = SpreadDistribution.Uniform });
        Assert.Equal(4.5, uniform.CapacityHalfWidthPercent!.Value, 12);
        Assert.Equal(4.5 / Math.Sqrt(3), uniform.CapacitySigmaPercent!.Value, 12);

        var entered = SpreadDesigns.Run(design, new SpreadSettings { Trials = 100, Distribution = SpreadDistribution.Uniform, CapacitySigmaPercent = 1 });
        Assert.Equal(Math.Sqrt(3), entered.CapacityHalfWidthPercent!.Value, 12);
        Assert.Equal("entered", entered.CapacitySpreadOrigin);
    }

    [Fact]
    public void Analyze_CancelledToken_StopsWithOperationCanceled()
    {
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        var request = SpreadDesigns.Request(SpreadDesigns.Lfp(16, 2), new SpreadSettings { Trials = 10_000 });
        Assert.ThrowsAny<OperationCanceledException>(() => SpreadMonteCarlo.Analyze(request, cts.Token));
    }
}

/// <summary>The spread origins as the API spells them.</summary>
internal static class SpreadSetupOrigins
{
    public const string Measured = "measured";
}
