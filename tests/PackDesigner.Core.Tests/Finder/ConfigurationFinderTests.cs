using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Finder;
using PackDesigner.Core.Findings;
using PackDesigner.Core.Tests.Spread;

namespace PackDesigner.Core.Tests.Finder;

public class ConfigurationFinderTests
{
    // A 100 Ah LFP cell on the preset's typical figures (common practice): 0.6 mΩ, 100 A continuous, 200 A peak,
    // 2 kg, termination C/20 = 5 A; tolerance 0 so the weakest group is nominal. A 48–60 V controller at 150 A
    // continuous, 400 A peak; 25 °C; window 10–90 % (the finder's default).
    private static readonly CellInput Cell = new() { Chemistry = Chemistry.Lfp, CapacityAh = 100, CapacityTolerancePercent = 0 };
    private static readonly ControllerInput Controller = new(48, 60, 150, 400, 10, 0, 0, 1);

    private static ConfigurationResult Find(ConfigurationRequest request)
    {
        var outcome = ConfigurationFinder.Find(request);
        Assert.True(outcome.IsValid, string.Join("; ", outcome.Errors.Select(e => $"{e.Field}: {e.Message}")));
        return outcome.Result!;
    }

    [Fact]
    public void Find_HandWorkedDesign_ListsExactlyTheCombinationsThatFit()
    {
        // By hand (Ohm's law and the LFP table: OCV(10 %) = 3.20 V, OCV(90 %) = 3.345 V):
        //  P = 1 carries 100 A < 150 A continuous → rejected; P ≥ 2 carries 200 A and 400 A peak.
        //  CV = S·(3.345 + 5 A·0.6 mΩ) rounded down to 0.1 V: S = 17 → 56.9 V ≤ 60 V; S = 18 → 60.2 V > 60 V.
        //  Loaded bottom = S·(3.20 − 400 A·0.6 mΩ / P): S = 15 reaches at most 15·(3.2 − 0.24/50) = 47.93 V < 48 V;
        //  S = 16, P = 2 → 49.28 V. With at most 40 cells only P = 2 is left for S = 16 and 17.
        var r = Find(new ConfigurationRequest { Cell = Cell, Controller = Controller, Targets = new ConfigurationTargets { MaxCells = 40 } });

        Assert.Equal(20_000, r.CombinationsChecked);
        Assert.Equal([(16, 2), (17, 2)], r.Candidates.Select(c => (c.Series, c.Parallel)).ToArray());
        var c16 = r.Candidates[0];
        Assert.Equal(32, c16.CellCount);
        Assert.Equal(16 * 3.65, c16.MaxVoltage, 9);
        Assert.Equal(53.5, c16.ConstantVoltage, 9);
        Assert.Equal(16 * (3.2 - 0.24 / 2), c16.LoadedLowVoltage, 9);
        Assert.Equal(200, c16.ContinuousCurrentA);
        Assert.Equal(400, c16.PeakCurrentA);
        Assert.Equal(64, c16.MassKg, 9);
        Assert.Equal(16 * 2 * 100 * 3.2, c16.NominalEnergyWh, 6);
        Assert.Equal(56.9, r.Candidates[1].ConstantVoltage, 9);

        // Usable (window) energy = nominal × ∫₀.₁^⁰.⁹ V dSOC / ∫₀¹ V dSOC, trapezoids over the LFP preset table.
        Near.Relative(c16.NominalEnergyWh * WindowShare(0.1, 0.9), c16.UsableEnergyWh, 1e-12, "window energy");

        Assert.Equal(
            [
                (null, null, 1, null, ConfigurationFinder.CodeContinuousCurrent),
                (1, 15, null, null, ConfigurationFinder.CodeLoadedBottom),
                (16, null, 3, 50, ConfigurationFinder.CodeCells),
                (17, null, 3, 50, ConfigurationFinder.CodeCells),
                (18, 400, null, null, ConfigurationFinder.CodeTopOfCharge),
            ],
            r.Rejected.Select(x => (x.Series, x.SeriesTo, x.Parallel, x.ParallelTo, x.Code)).ToArray());
        Assert.Contains("60.2 V", r.Rejected[^1].Reason);
        Assert.Contains("47.9 V", r.Rejected[1].Reason);
    }

    [Fact]
    public void Find_Candidates_CarryTheFullEvaluatorsFiguresAndFindingCounts()
    {
        var request = new ConfigurationRequest { Cell = Cell, Controller = Controller, Targets = new ConfigurationTargets { MaxCells = 60 } };
        var r = Find(request);
        Assert.NotEmpty(r.Candidates);
        foreach (var c in r.Candidates)
        {
            // The equivalent design with the charger the finder sizes (its CV unrounded, P × 50 A, 0.1 V step).
            var probe = Design(c.Series, c.Parallel, new ChargerInput(2000, 50 * c.Parallel, 0.1, false));
            var wanted = ChargeVoltageWanted(probe);
            var result = DesignEvaluator.Evaluate(probe with { Charger = new ChargerInput(wanted, 50 * c.Parallel, 0.1, false) }).Result!;
            Assert.Equal(result.Pack.LoadedLowVoltage, c.LoadedLowVoltage);
            Assert.Equal(result.Charger.ConstantVoltage, c.ConstantVoltage);
            Assert.Equal(result.Energy.UsableEnergyWorstCaseWh, c.UsableEnergyWorstCaseWh);
            Assert.Equal(result.Findings.Count(f => f.Severity == Severity.Error), c.Errors);
            Assert.Equal(result.Findings.Count(f => f.Severity == Severity.Warning), c.Warnings);
            Assert.Equal(result.Findings.Count(f => f.Severity == Severity.Info), c.Infos);
            Assert.DoesNotContain(result.Findings, f => f.Code is "pack.cv-above-controller-max" or "pack.loaded-low-below-controller-min"
                or "current.continuous-exceeds-cells" or "current.peak-exceeds-cells" or "charger.cannot-reach-cv");
        }
    }

    [Theory]
    [InlineData(18, 2, "pack.cv-above-controller-max")]
    [InlineData(15, 2, "pack.loaded-low-below-controller-min")]
    [InlineData(16, 1, "current.continuous-exceeds-cells")]
    public void Find_RejectedCombination_IsOneTheEvaluatorFlagsAsAnError(int series, int parallel, string code)
    {
        var r = Find(new ConfigurationRequest { Cell = Cell, Controller = Controller });
        Assert.DoesNotContain(r.Candidates, c => c.Series == series && c.Parallel == parallel);
        var result = DesignEvaluator.Evaluate(Design(series, parallel, new ChargerInput(70, 50 * parallel, 0.1, false))).Result!;
        Assert.Contains(result.Findings, f => f.Code == code && f.Severity == Severity.Error);
    }

    [Theory]
    [InlineData(ConfigurationSort.CellCount)]
    [InlineData(ConfigurationSort.UsableEnergy)]
    [InlineData(ConfigurationSort.Mass)]
    [InlineData(ConfigurationSort.ContinuousCurrent)]
    [InlineData(ConfigurationSort.Findings)]
    [InlineData(ConfigurationSort.Cost)]
    public void Find_EnergyTarget_KeepsOnlyConfigurationsThatMeetItSortedByTheCriterion(ConfigurationSort sort)
    {
        var controller = new ControllerInput(250, 420, 200, 500, 10, 50, 1000, 1);
        var r = Find(new ConfigurationRequest
        {
            Cell = Cell,
            Controller = controller,
            Targets = new ConfigurationTargets { MinUsableEnergyWh = 75_000, MaxCells = 500, CostPerCell = 40 },
            SortBy = sort,
        });
        Assert.True(r.Candidates.Count > 5);
        Assert.All(r.Candidates, c => Assert.True(c.UsableEnergyWorstCaseWh >= 75_000 && c.CellCount <= 500));
        Assert.Contains(r.Rejected, x => x.Code == ConfigurationFinder.CodeEnergy);
        var keys = r.Candidates.Select(c => sort switch
        {
            ConfigurationSort.UsableEnergy => -c.UsableEnergyWorstCaseWh,
            ConfigurationSort.Mass => c.MassKg,
            ConfigurationSort.ContinuousCurrent => -c.ContinuousCurrentA,
            ConfigurationSort.Findings => c.Errors * 1000.0 + c.Warnings,
            ConfigurationSort.Cost => c.Cost!.Value,
            _ => c.CellCount,
        }).ToArray();
        Assert.Equal(keys.Order().ToArray(), keys);
        Assert.All(r.Candidates, c => Assert.Equal(40.0 * c.CellCount, c.Cost));
    }

    [Fact]
    public void Find_CostTarget_RejectsTheDearerCombinations()
    {
        var r = Find(new ConfigurationRequest { Cell = Cell, Controller = Controller, Targets = new ConfigurationTargets { CostPerCell = 50, MaxCost = 1700 } });
        Assert.Equal([(16, 2), (17, 2)], r.Candidates.Select(c => (c.Series, c.Parallel)).ToArray());
        Assert.Contains(r.Rejected, x => x is { Series: 16, Parallel: 3, ParallelTo: 50, Code: ConfigurationFinder.CodeCost });
    }

    [Fact]
    public void Find_GivenChargerBelowTheWantedCv_ChargesToItsMaximumAndCountsTheWarning()
    {
        var r = Find(new ConfigurationRequest { Cell = Cell, Controller = Controller, Charger = new ChargerInput(55, 40, 0.1, false), Targets = new ConfigurationTargets { MaxCells = 40 } });
        var c17 = Assert.Single(r.Candidates, c => c.Series == 17);
        Assert.Equal(55, c17.ConstantVoltage, 9);
        var result = DesignEvaluator.Evaluate(Design(17, 2, new ChargerInput(55, 40, 0.1, false))).Result!;
        Assert.Contains(result.Findings, f => f.Code == "charger.cannot-reach-cv");
        Assert.Equal(result.Findings.Count(f => f.Severity == Severity.Warning), c17.Warnings);
    }

    [Fact]
    public void Find_BadInput_ReturnsErrorsKeyedByFieldNotAnException()
    {
        var outcome = ConfigurationFinder.Find(new ConfigurationRequest
        {
            Cell = Cell with { CapacityAh = -1 },
            Controller = Controller with { MinVoltage = double.NaN },
            Targets = new ConfigurationTargets { MaxCells = 0, MaxCost = 100, MinUsableEnergyWh = double.PositiveInfinity },
            SortBy = (ConfigurationSort)42,
        });
        Assert.False(outcome.IsValid);
        var fields = outcome.Errors.Select(e => e.Field).ToHashSet();
        Assert.Contains("cell.capacityAh", fields);
        Assert.Contains("targets.maxCells", fields);
        Assert.Contains("targets.maxCost", fields);
        Assert.Contains("targets.minUsableEnergyWh", fields);
        Assert.Contains("sortBy", fields);

        var controllerOutcome = ConfigurationFinder.Find(new ConfigurationRequest { Cell = Cell, Controller = Controller with { MinVoltage = double.NaN } });
        Assert.Contains(controllerOutcome.Errors, e => e.Field == "controller.minVoltage");
    }

    private static DesignInput Design(int s, int p, ChargerInput charger) => new()
    {
        Cell = Cell,
        Series = s,
        Parallel = p,
        SocWindow = FinderLimits.DefaultSocWindow,
        Controller = Controller,
        Charger = charger,
        Ambient = FinderLimits.DefaultAmbient,
    };

    private static double ChargeVoltageWanted(DesignInput design)
    {
        var cell = CellResolver.TryResolve(design.Cell, out _)!;
        var ctx = PackContext.Create(design, cell);
        var (cellT, _) = global::PackDesigner.Core.Protection.ThresholdCalculator.Compute(ctx);
        return global::PackDesigner.Core.Charging.ChargeSetpointCalculator.Compute(ctx, cellT).UnroundedConstantVoltage;
    }

    /// <summary>Share of ∫₀¹ V dSOC between two table rows of the LFP preset, by trapezoids on its rows.</summary>
    private static double WindowShare(double from, double to)
    {
        var rows = ChemistryPresets.Lfp.OcvCurve;
        double part = 0, whole = 0;
        for (var i = 1; i < rows.Count; i++)
        {
            var a = rows[i - 1];
            var b = rows[i];
            var area = 0.5 * (a.Voltage + b.Voltage) * (b.SocPercent - a.SocPercent) / 100;
            whole += area;
            if (a.SocPercent / 100 >= from - 1e-12 && b.SocPercent / 100 <= to + 1e-12)
            {
                part += area;
            }
        }

        return part / whole;
    }
}
