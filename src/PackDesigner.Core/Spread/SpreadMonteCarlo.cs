using System.Globalization;
using PackDesigner.Core.Balancing;
using PackDesigner.Core.Charging;
using PackDesigner.Core.Design;
using PackDesigner.Core.Validation;

namespace PackDesigner.Core.Spread;

/// <summary>Run options that change how, not what, the Monte Carlo computes: the result is the same for every value.</summary>
public sealed record SpreadRunOptions
{
    /// <summary>Threads to use; null for one per core.</summary>
    public int? MaxDegreeOfParallelism { get; init; }
}

/// <summary>
/// Cell-to-cell spread Monte Carlo of a bottom- or top-balanced string (formulas and assumptions in
/// docs/calculations/spread-monte-carlo.md). Each trial draws every cell's capacity and DC resistance, forms the S
/// parallel groups, charges the string to the design's CV with the termination current flowing, discharges it to
/// the controller's cut-off under the peak current at the coldest ambient, and records where the charger,
/// controller and BMS would stop it. Trials run in parallel, each from its own generator stream, so the result
/// depends only on the request and the seed. Statistics are streamed into fixed histograms.
/// </summary>
public static class SpreadMonteCarlo
{
    public const string LimitedByTripRisk = "trip-risk";

    public static SpreadOutcome Analyze(SpreadRequest request, CancellationToken cancellationToken = default) =>
        Analyze(request, new SpreadRunOptions(), cancellationToken);

    public static SpreadOutcome Analyze(SpreadRequest request, SpreadRunOptions options, CancellationToken cancellationToken = default)
    {
        var setup = SpreadSetup.Create(request, out var errors);
        return setup is null ? new SpreadOutcome(null, errors) : new SpreadOutcome(Analyze(setup, options, cancellationToken), []);
    }

    /// <summary>The same cells bottom-balanced and top-balanced (same seed, so the same draws), and where each fails.</summary>
    public static SpreadComparisonOutcome Compare(SpreadRequest request, CancellationToken cancellationToken = default) =>
        Compare(request, new SpreadRunOptions(), cancellationToken);

    public static SpreadComparisonOutcome Compare(SpreadRequest request, SpreadRunOptions options, CancellationToken cancellationToken = default)
    {
        var bottomSetup = SpreadSetup.Create(request with { Design = request.Design with { Balancing = BalancingMethod.Bottom } }, out var errors);
        if (bottomSetup is null)
        {
            return new SpreadComparisonOutcome(null, errors);
        }

        var topSetup = SpreadSetup.Create(request with { Design = request.Design with { Balancing = BalancingMethod.Top } }, out errors);
        if (topSetup is null)
        {
            return new SpreadComparisonOutcome(null, errors);
        }

        var bottom = Analyze(bottomSetup, options, cancellationToken);
        var top = Analyze(topSetup, options, cancellationToken);
        var bottomVerdict = Verdict(bottom);
        var topVerdict = Verdict(top);
        var summary = string.Create(CultureInfo.InvariantCulture,
            $"Bottom-balanced: {bottomVerdict.Explanation} Top-balanced: {topVerdict.Explanation} The same {bottom.Trials} drawn packs were used for both.");
        return new SpreadComparisonOutcome(new SpreadComparison(bottom, top, bottomVerdict, topVerdict, summary), []);
    }

    /// <summary>One trial in full: every group's capacity, resistance, states of charge and voltages at the design's CV.</summary>
    public static SpreadTrialOutcome Trial(SpreadRequest request, int trialIndex)
    {
        var setup = SpreadSetup.Create(request, out var errors);
        if (setup is null)
        {
            return new SpreadTrialOutcome(null, errors);
        }

        if (trialIndex < 0 || trialIndex >= setup.Trials)
        {
            return new SpreadTrialOutcome(null, [new ValidationError("trial", string.Create(CultureInfo.InvariantCulture, $"Must be a trial number from 0 to {setup.Trials - 1}."))]);
        }

        var evaluator = new TrialEvaluator(setup);
        evaluator.Draw(trialIndex);
        var detail = new SpreadGroupState[setup.S];
        var o = evaluator.Evaluate(setup.DesignConstantVoltage, true, detail);
        return new SpreadTrialOutcome(
            new SpreadTrial(
                trialIndex,
                setup.DesignConstantVoltage,
                o.HighestAtEndOfCharge,
                o.LowestAtCutoff,
                o.OverVoltageTrip,
                o.OverVoltageRelease,
                o.UnderVoltageTrip,
                o.Forced,
                o.TripConstantVoltage,
                o.UsableAh,
                o.UsableWh,
                detail),
            []);
    }

    private static SpreadResult Analyze(SpreadSetup setup, SpreadRunOptions options, CancellationToken ct)
    {
        var design = Run(setup, setup.DesignConstantVoltage, true, options, ct);
        var trips = design.TripVoltagePerCell!;
        var allowed = AllowedCount(setup.TripRisk, design.Trials);
        var bin = trips.FirstBinExceeding(allowed);
        double? riskLimited = bin >= trips.Bins ? null : trips.LowerEdge(Math.Max(0, bin)) * setup.S;

        double recommended;
        string limitedBy;
        if (riskLimited is { } r && r < setup.WantedConstantVoltage)
        {
            recommended = Math.Max(0, ChargeSetpointCalculator.RoundDown(r - 1e-6, setup.VoltageStepV));
            limitedBy = LimitedByTripRisk;
        }
        else
        {
            recommended = setup.DesignConstantVoltage;
            limitedBy = setup.DesignLimitedBy;
        }

        SpreadAccumulator? atRecommended = null;
        if (recommended < setup.DesignConstantVoltage - 1e-9)
        {
            atRecommended = Run(setup, recommended, false, options, ct);
        }

        var designMetrics = Metrics(setup, design, setup.DesignConstantVoltage);
        var recommendedMetrics = atRecommended is null ? null : Metrics(setup, atRecommended, recommended);
        var usableAtRecommended = (recommendedMetrics ?? designMetrics).UsableEnergyWh.P50;
        var nominalUsable = NominalUsableEnergy(setup);
        var cost = nominalUsable - usableAtRecommended;
        var uniform = setup.Distribution == SpreadDistribution.Uniform;
        var measured = setup.FixedGroupAh is not null;

        return new SpreadResult
        {
            Trials = designMetrics.Trials,
            ConstantVoltage = designMetrics.ConstantVoltage,
            OverVoltageTripProbability = designMetrics.OverVoltageTripProbability,
            OverVoltageTripCount = designMetrics.OverVoltageTripCount,
            OverVoltageTripConfidence95 = designMetrics.OverVoltageTripConfidence95,
            OverVoltageReleaseProbability = designMetrics.OverVoltageReleaseProbability,
            OverVoltageReleaseCount = designMetrics.OverVoltageReleaseCount,
            OverVoltageReleaseConfidence95 = designMetrics.OverVoltageReleaseConfidence95,
            UnderVoltageTripProbability = designMetrics.UnderVoltageTripProbability,
            UnderVoltageTripCount = designMetrics.UnderVoltageTripCount,
            UnderVoltageTripConfidence95 = designMetrics.UnderVoltageTripConfidence95,
            HighestCellVoltageAtEndOfCharge = designMetrics.HighestCellVoltageAtEndOfCharge,
            HighestCellVoltageHistogram = designMetrics.HighestCellVoltageHistogram,
            LowestCellVoltageAtCutoff = designMetrics.LowestCellVoltageAtCutoff,
            UsableCapacityAh = designMetrics.UsableCapacityAh,
            UsableEnergyWh = designMetrics.UsableEnergyWh,
            SmallestGroupCapacityAh = designMetrics.SmallestGroupCapacityAh,
            HighestGroupSocAtEndOfChargePercent = designMetrics.HighestGroupSocAtEndOfChargePercent,
            LowestGroupSocAtBottomPercent = designMetrics.LowestGroupSocAtBottomPercent,
            TopHeadroomSocPercent = designMetrics.TopHeadroomSocPercent,
            WorstEndOfChargeTrial = designMetrics.WorstEndOfChargeTrial,
            WorstCutoffTrial = designMetrics.WorstCutoffTrial,
            Balancing = setup.Balancing,
            Distribution = setup.Distribution,
            Seed = setup.Request.Spread.Seed,
            Series = setup.S,
            Parallel = setup.P,
            CapacitySigmaPercent = measured ? null : 100 * setup.CapacitySpread / (uniform ? Math.Sqrt(3) : 1),
            CapacityHalfWidthPercent = uniform && !measured ? 100 * setup.CapacitySpread : null,
            ResistanceSigmaPercent = 100 * setup.ResistanceSpread / (uniform ? Math.Sqrt(3) : 1),
            ResistanceHalfWidthPercent = uniform ? 100 * setup.ResistanceSpread : null,
            CapacitySpreadOrigin = setup.CapacityOrigin,
            ResistanceSpreadOrigin = setup.ResistanceOrigin,
            OverVoltageTrip = setup.OverVoltageTrip,
            OverVoltageRelease = setup.OverVoltageRelease,
            UnderVoltageTrip = setup.UnderVoltageTrip,
            TripRisk = setup.TripRisk,
            RiskLimitedConstantVoltage = riskLimited,
            RecommendedConstantVoltage = recommended,
            RecommendedConstantVoltagePerCell = recommended / setup.S,
            RecommendedLimitedBy = limitedBy,
            NominalEnergyWh = setup.Evaluation.Energy.NominalEnergyWh,
            NominalUsableEnergyWh = nominalUsable,
            RecommendedUsableEnergyWh = usableAtRecommended,
            EnergyCostWh = cost,
            EnergyCostPercent = nominalUsable > 0 ? 100 * cost / nominalUsable : 0,
            AtRecommendedConstantVoltage = recommendedMetrics,
            BottomBalance = setup.Top ? null : Match(setup, design, setup.DesignConstantVoltage, recommended),
            MeasuredGroups = setup.MeasuredGroups,
            Notes = Notes(setup),
        };
    }

    /// <summary>The same pack of identical nominal cells, charged to the design's CV and stopped by the same rules, Wh.</summary>
    private static double NominalUsableEnergy(SpreadSetup setup)
    {
        var evaluator = new TrialEvaluator(setup);
        evaluator.SetGroups(Enumerable.Repeat(setup.NominalGroupAh, setup.S).ToArray(), Enumerable.Repeat(setup.CellOhm / setup.P, setup.S).ToArray());
        return evaluator.Evaluate(setup.DesignConstantVoltage, false).UsableWh;
    }

    /// <summary>Largest number of tripping packs the risk allows among <paramref name="trials"/>.</summary>
    private static long AllowedCount(double risk, long trials) => (long)Math.Floor(risk * trials + 1e-9);

    /// <summary>
    /// Runs the trials on a fixed number of workers (one per thread, each with one evaluator and one accumulator) that
    /// take chunks of trials from a shared counter, so the memory allocated does not grow with the number of trials.
    /// Which worker runs a chunk does not matter: each trial has its own generator stream and the accumulators merge
    /// by adding counts.
    /// </summary>
    private static SpreadAccumulator Run(SpreadSetup setup, double cv, bool withTripVoltage, SpreadRunOptions options, CancellationToken ct)
    {
        var trials = setup.Trials;
        var chunks = (trials + SpreadLimits.ChunkSize - 1) / SpreadLimits.ChunkSize;
        var workers = Math.Clamp(options.MaxDegreeOfParallelism ?? Environment.ProcessorCount, 1, chunks);
        var accumulators = new SpreadAccumulator[workers];
        var next = -1;
        Parallel.For(0, workers, new ParallelOptions { CancellationToken = ct, MaxDegreeOfParallelism = workers }, w =>
        {
            var evaluator = new TrialEvaluator(setup);
            var acc = new SpreadAccumulator(setup, withTripVoltage);
            int chunk;
            while ((chunk = Interlocked.Increment(ref next)) < chunks)
            {
                ct.ThrowIfCancellationRequested();
                var from = chunk * SpreadLimits.ChunkSize;
                var to = Math.Min(trials, from + SpreadLimits.ChunkSize);
                for (var t = from; t < to; t++)
                {
                    evaluator.Draw(t);
                    var o = evaluator.Evaluate(cv, withTripVoltage);
                    acc.Add(t, o, setup.S);
                }
            }

            accumulators[w] = acc;
        });
        ct.ThrowIfCancellationRequested();
        var merged = accumulators[0];
        for (var w = 1; w < workers; w++)
        {
            merged.Merge(accumulators[w]);
        }

        return merged;
    }

    private static SpreadMetrics Metrics(SpreadSetup setup, SpreadAccumulator a, double cv)
    {
        var n = (int)a.Trials;
        return new SpreadMetrics
        {
            Trials = n,
            ConstantVoltage = cv,
            OverVoltageTripProbability = (double)a.OverVoltageTrips / n,
            OverVoltageTripCount = a.OverVoltageTrips,
            OverVoltageTripConfidence95 = Wilson(a.OverVoltageTrips, n),
            OverVoltageReleaseProbability = (double)a.OverVoltageReleases / n,
            OverVoltageReleaseCount = a.OverVoltageReleases,
            OverVoltageReleaseConfidence95 = Wilson(a.OverVoltageReleases, n),
            UnderVoltageTripProbability = (double)a.UnderVoltageTrips / n,
            UnderVoltageTripCount = a.UnderVoltageTrips,
            UnderVoltageTripConfidence95 = Wilson(a.UnderVoltageTrips, n),
            HighestCellVoltageAtEndOfCharge = a.HighestAtEndOfCharge.Summary(),
            HighestCellVoltageHistogram = a.HighestAtEndOfCharge.Coarse(SpreadLimits.ChartBins),
            LowestCellVoltageAtCutoff = a.LowestAtCutoff.Summary(),
            UsableCapacityAh = a.UsableAh.Summary(),
            UsableEnergyWh = a.UsableWh.Summary(),
            SmallestGroupCapacityAh = a.SmallestGroupAh.Summary(),
            HighestGroupSocAtEndOfChargePercent = a.HighestSocAtEndOfCharge.Summary(100),
            LowestGroupSocAtBottomPercent = a.LowestSocAtBottom.Summary(100),
            TopHeadroomSocPercent = a.TopHeadroom?.Summary(100),
            WorstEndOfChargeTrial = a.WorstEndOfChargeTrial,
            WorstCutoffTrial = a.WorstCutoffTrial,
        };
    }

    /// <summary>
    /// Wilson score interval at 95 % (E. B. Wilson, "Probable inference, the law of succession, and statistical
    /// inference", J. Am. Stat. Assoc. 22, 1927, 209–212): (p̂ + z²/2n ± z·√(p̂(1−p̂)/n + z²/4n²)) / (1 + z²/n).
    /// </summary>
    public static SpreadInterval Wilson(long successes, long trials, double z = 1.959964)
    {
        if (trials <= 0)
        {
            return new SpreadInterval(0, 1);
        }

        var n = (double)trials;
        var p = successes / n;
        var z2 = z * z;
        var centre = p + z2 / (2 * n);
        var half = z * Math.Sqrt(p * (1 - p) / n + z2 / (4 * n * n));
        var denominator = 1 + z2 / n;
        return new SpreadInterval(Math.Max(0, (centre - half) / denominator), Math.Min(1, (centre + half) / denominator));
    }

    private static BottomBalanceMatch Match(SpreadSetup setup, SpreadAccumulator a, double cv, double recommended)
    {
        var curve = setup.Evaluation.Cell.OcvCurve;
        var balance = setup.UnderVoltageTrip;
        var socAtBalance = curve.SocAt(balance);
        var slope = curve.SlopeAt(socAtBalance); // V per unit SOC
        var headroomHistogram = a.TopHeadroom!;
        var bin = headroomHistogram.FirstBinExceeding(AllowedCount(setup.TripRisk, a.Trials));
        var headroom = bin < 0 ? headroomHistogram.Min : bin >= headroomHistogram.Bins ? headroomHistogram.Max : headroomHistogram.LowerEdge(bin);
        // A group matched ΔV above the balance voltage at rest holds SOC(V_b + ΔV) − SOC(V_b) more: the largest
        // allowed ΔV is OCV(SOC_b + headroom) − V_b, read on the curve (not the local slope, which only holds inside one segment).
        var required = headroom > 0 ? (curve.VoltageAt(socAtBalance + headroom) - balance) * 1000 : 0;
        var achievable = headroom > 0;
        var practice = BalancingAdvisor.AcceptanceSpreadMillivolt;
        var riskPercent = setup.TripRisk * 100;
        var inv = CultureInfo.InvariantCulture;
        string advice;
        if (achievable)
        {
            var verdict = required >= practice
                ? string.Create(inv, $"The usual {practice:0} mV acceptance is enough.")
                : string.Create(inv, $"The usual {practice:0} mV acceptance is not enough for this spread.");
            advice = string.Create(inv,
                $"Discharge every group at rest to {balance:0.000} V and match them within {Math.Floor(required * 10) / 10:0.0} mV: at {cv:0.00} V a group may hold {headroom * 100:0.###} % more state of charge than the others before more than {riskPercent:0.###} % of packs trip OV at the end of charge, and near {balance:0.000} V 1 mV is {0.1 / slope:0.####} % of state of charge. {verdict}");
        }
        else
        {
            advice = string.Create(inv,
                $"At {cv:0.00} V more than {riskPercent:0.###} % of packs trip OV at the end of charge even with a perfect bottom match: lower the charge voltage below the recommended {recommended:0.00} V first (at the recommended CV itself a perfect match is needed).");
        }

        return new BottomBalanceMatch(balance, socAtBalance * 100, slope * 10, headroom * 100, required, practice, achievable, advice);
    }

    private static BalancingVerdict Verdict(SpreadResult r)
    {
        var risk = r.TripRisk;
        var top = r.OverVoltageTripProbability > risk;
        var bottom = r.UnderVoltageTripProbability > risk;
        var failsAt = top && bottom ? "both" : top ? "top" : bottom ? "bottom" : "none";
        var inv = CultureInfo.InvariantCulture;
        var text = failsAt switch
        {
            "top" => string.Create(inv, $"{r.OverVoltageTripProbability * 100:0.###} % of packs trip OV at the end of charge at {r.ConstantVoltage:0.00} V (the smallest group fills first)."),
            "bottom" => string.Create(inv, $"{r.UnderVoltageTripProbability * 100:0.###} % of packs trip UV before the controller cuts off under the peak current (the smallest group empties first)."),
            "both" => string.Create(inv, $"{r.OverVoltageTripProbability * 100:0.###} % of packs trip OV at the top and {r.UnderVoltageTripProbability * 100:0.###} % trip UV at the bottom."),
            _ => string.Create(inv, $"no more than {risk * 100:0.###} % of packs trip at either end."),
        };
        // Within half a watt-hour the two are the same as printed; never "-0 Wh below".
        var cost = r.EnergyCostWh >= 0.5
            ? string.Create(inv, $"{r.EnergyCostWh:0} Wh ({r.EnergyCostPercent:0.#} %) below")
            : r.EnergyCostWh <= -0.5
                ? string.Create(inv, $"{-r.EnergyCostWh:0} Wh above")
                : "the same as";
        text += string.Create(inv,
            $" Recommended CV {r.RecommendedConstantVoltage:0.00} V; median usable energy {r.RecommendedUsableEnergyWh:0} Wh, {cost} the nominal pack's {r.NominalUsableEnergyWh:0} Wh.");
        return new BalancingVerdict(r.Balancing, failsAt, r.OverVoltageTripProbability, r.UnderVoltageTripProbability, r.RecommendedConstantVoltage, r.RecommendedUsableEnergyWh, r.EnergyCostWh, text);
    }

    private static IReadOnlyList<string> Notes(SpreadSetup s)
    {
        var inv = CultureInfo.InvariantCulture;
        var notes = new List<string>();
        notes.Add(s.CapacityOrigin switch
        {
            SpreadSetup.OriginMeasured => "Cell capacities: the measured list, grouped as shown; only the resistance is drawn.",
            SpreadSetup.OriginToleranceAs3Sigma => string.Create(inv, $"Cell capacity: normal, the datasheet tolerance ±{s.Evaluation.Cell.CapacityTolerancePercent:0.##} % read as ±3σ."),
            SpreadSetup.OriginToleranceUniform => string.Create(inv, $"Cell capacity: uniform within the datasheet tolerance ±{s.Evaluation.Cell.CapacityTolerancePercent:0.##} %."),
            _ => "Cell capacity: the entered σ.",
        });
        notes.Add(s.ResistanceOrigin == SpreadSetup.OriginCapacityToleranceAssumed
            ? "Cell resistance: the datasheet gives no resistance tolerance, so the capacity tolerance is assumed for it too."
            : "Cell resistance: the entered σ.");
        notes.Add("The window's ends are counted as charge on a nominal group from the balance point (what a gauge set to the rated capacity shows); the usable range also stops where the charger's CV, the OV trip, the controller's cut-off under the peak current at the coldest ambient, or the UV trip stop the pack, whichever comes first.");
        notes.Add("Each trial uses its own generator stream (xoshiro256** seeded by SplitMix64 from the seed and the trial number), so the same seed gives the same result on any machine and thread count.");
        return notes;
    }
}
