using System.Globalization;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Charging;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Energy;
using PackDesigner.Core.Findings;
using PackDesigner.Core.Protection;
using PackDesigner.Core.Thermal;
using PackDesigner.Core.Validation;
using PackDesigner.Core.Voltages;

namespace PackDesigner.Core.Finder;

/// <summary>
/// Lists every S×P (S = 1…400, P = 1…50) of a cell that fits the equipment and the targets, and says why the others
/// do not (docs/calculations/configuration-finder.md). P first: P cells in parallel must carry the controller's
/// continuous and peak currents and the current targets (independent of S). Then each remaining S×P is screened
/// with the design sheet's own calculators (context, thresholds, charge setpoints, pack voltages, energy; no findings,
/// hardware or thermal): the CV must not exceed the controller's maximum, the pack under the peak current at the
/// window's bottom and the coldest ambient must not sag below the controller's minimum, and the worst-case usable
/// energy, cell count, mass and cost must meet the targets. Only the configurations that pass get the full design
/// sheet (every calculator and finding of <see cref="DesignEvaluator"/>), for their figures and finding counts.
/// </summary>
public static class ConfigurationFinder
{
    public const string CodeTopOfCharge = "top-of-charge";
    public const string CodeLoadedBottom = "loaded-bottom";
    public const string CodeContinuousCurrent = "continuous-current";
    public const string CodePeakCurrent = "peak-current";
    public const string CodeEnergy = "energy";
    public const string CodeCells = "cells";
    public const string CodeMass = "mass";
    public const string CodeCost = "cost";
    public const string CodeMixed = "mixed";

    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static ConfigurationOutcome Find(ConfigurationRequest request, CancellationToken cancellationToken = default)
    {
        var cell = CellResolver.TryResolve(request.Cell, out var cellErrors);
        var errors = new List<ValidationError>(cellErrors);
        ValidateTargets(request, errors);
        if (cell is not null)
        {
            var probe = Input(request, 1, 1, request.Charger ?? ScreenCharger(cell, 1));
            errors.AddRange(DesignValidator.Validate(probe, cell).Where(e => e.Field is not ("series" or "parallel")));
        }

        if (errors.Count > 0 || cell is null)
        {
            return new ConfigurationOutcome(null, errors);
        }

        var t = request.Targets ?? new ConfigurationTargets();
        var maxS = FinderLimits.MaxSeries;
        var maxP = FinderLimits.MaxParallel;

        var parallelCode = new string?[maxP + 1];
        for (var p = 1; p <= maxP; p++)
        {
            parallelCode[p] = ParallelCheck(request, cell, p);
        }

        var screens = new Screen[maxS + 1, maxP + 1];
        Parallel.For(1, maxS + 1, new ParallelOptions { CancellationToken = cancellationToken }, s =>
        {
            for (var p = 1; p <= maxP; p++)
            {
                if (parallelCode[p] is null)
                {
                    screens[s, p] = ScreenOne(request, cell, t, s, p);
                }
            }
        });

        var fits = new List<(int S, int P)>();
        for (var s = 1; s <= maxS; s++)
        {
            for (var p = 1; p <= maxP; p++)
            {
                if (parallelCode[p] is null && screens[s, p].Code is null)
                {
                    fits.Add((s, p));
                }
            }
        }

        var candidates = new ConfigurationCandidate[fits.Count];
        Parallel.For(0, fits.Count, new ParallelOptions { CancellationToken = cancellationToken }, i =>
        {
            var (s, p) = fits[i];
            candidates[i] = Evaluate(request, cell, s, p, screens[s, p]);
        });

        var rejected = new List<ConfigurationRejection>();
        RejectParallel(request, cell, t, parallelCode, rejected);
        RejectSeries(request, t, screens, parallelCode, rejected);

        var notes = new List<string>();
        if (request.Charger is null)
        {
            notes.Add("No charger given: each configuration gets a charger sized to it (its maximum voltage the configuration's CV, P × the cell's maximum charge current, 0.1 V step, no float stage).");
        }

        if (request.SocWindow is null)
        {
            notes.Add(string.Create(Inv, $"No window given: {FinderLimits.DefaultSocWindow.MinPercent:0}–{FinderLimits.DefaultSocWindow.MaxPercent:0} % is used."));
        }

        if (request.Ambient is null)
        {
            notes.Add(string.Create(Inv, $"No ambient given: {FinderLimits.DefaultAmbient.MinC:0} °C is used (the cell's resistance at its 25 °C value)."));
        }

        notes.Add("The energy target is checked against the worst-case usable energy (the weakest group at the low end of the capacity tolerance, charged to the CV).");
        var sorted = Sort(candidates, request.SortBy);
        return new ConfigurationOutcome(new ConfigurationResult(sorted, rejected, maxS * maxP, request.SortBy, notes), []);
    }

    /// <summary>Screen figures of one S×P: the failing check's code (null when it fits) and the figures the messages quote.</summary>
    private readonly record struct Screen(string? Code, double ConstantVoltage, double LoadedLow, double WorstEnergyWh, double MassKg, double? Cost);

    private static DesignInput Input(ConfigurationRequest r, int s, int p, ChargerInput charger) => new()
    {
        Cell = r.Cell,
        Series = s,
        Parallel = p,
        LinkResistanceMilliohm = r.LinkResistanceMilliohm,
        Cable = r.Cable,
        Balancing = r.Balancing,
        SocWindow = r.SocWindow ?? FinderLimits.DefaultSocWindow,
        Controller = r.Controller,
        Charger = charger,
        Ambient = r.Ambient ?? FinderLimits.DefaultAmbient,
        Margins = r.Margins,
    };

    /// <summary>The stand-in charger for the screen: as high as the validator allows, so the CV is the design's own.</summary>
    private static ChargerInput ScreenCharger(CellSpec cell, int p) =>
        new(2000, Math.Min(10_000, cell.MaxChargeCurrentA * p), FinderLimits.DefaultChargerStepV, false);

    private static string? ParallelCheck(ConfigurationRequest r, CellSpec cell, int p)
    {
        var t = r.Targets;
        var continuous = Math.Max(r.Controller.ContinuousCurrentA, t?.MinContinuousCurrentA ?? 0);
        var peak = Math.Max(r.Controller.PeakCurrentA, t?.MinPeakCurrentA ?? 0);
        if (continuous > cell.MaxDischargeCurrentA * p)
        {
            return CodeContinuousCurrent;
        }

        return peak > cell.PeakDischargeCurrentA * p ? CodePeakCurrent : null;
    }

    private static Screen ScreenOne(ConfigurationRequest r, CellSpec cell, ConfigurationTargets t, int s, int p)
    {
        var input = Input(r, s, p, r.Charger ?? ScreenCharger(cell, p));
        var ctx = PackContext.Create(input, cell);
        var (cellT, _) = ThresholdCalculator.Compute(ctx);
        var charge = ChargeSetpointCalculator.Compute(ctx, cellT);
        var v = PackVoltageCalculator.Compute(ctx, charge.Model);
        var energy = EnergyCalculator.Compute(ctx, charge);
        var cv = charge.Result.ConstantVoltage;
        var cells = s * p;
        var mass = cells * cell.MassKg;
        double? cost = t.CostPerCell is { } c ? c * cells : null;

        string? code = null;
        if (cv > r.Controller.MaxVoltage)
        {
            code = CodeTopOfCharge;
        }
        else if (v.LoadedLow < r.Controller.MinVoltage)
        {
            code = CodeLoadedBottom;
        }
        else if (t.MinUsableEnergyWh is { } e && energy.UsableEnergyWorstCaseWh < e)
        {
            code = CodeEnergy;
        }
        else if (t.MaxCells is { } mc && cells > mc)
        {
            code = CodeCells;
        }
        else if (t.MaxMassKg is { } mm && mass > mm)
        {
            code = CodeMass;
        }
        else if (t.MaxCost is { } mx && cost > mx)
        {
            code = CodeCost;
        }

        return new Screen(code, cv, v.LoadedLow, energy.UsableEnergyWorstCaseWh, mass, cost);
    }

    /// <summary>
    /// The design sheet of one fitting configuration: the same calculators and findings, in the same order, as
    /// <see cref="DesignEvaluator.Evaluate"/>, with the cell resolved once for the whole search and without the
    /// balancing advice (which yields no findings). Tests hold the counts and figures equal to the evaluator's.
    /// </summary>
    private static ConfigurationCandidate Evaluate(ConfigurationRequest r, CellSpec cell, int s, int p, Screen screen)
    {
        var screenInput = Input(r, s, p, r.Charger ?? ScreenCharger(cell, p));
        var ctx = PackContext.Create(screenInput, cell);
        var (cellT, packT) = ThresholdCalculator.Compute(ctx);
        var charge = ChargeSetpointCalculator.Compute(ctx, cellT);
        if (r.Charger is null)
        {
            // The sized charger reaches the configuration's own unrounded CV, so it never limits the charge.
            var sized = new ChargerInput(Math.Min(2000, charge.UnroundedConstantVoltage), Math.Min(10_000, cell.MaxChargeCurrentA * p), FinderLimits.DefaultChargerStepV, false);
            ctx = ctx with { Input = screenInput with { Charger = sized } };
            charge = ChargeSetpointCalculator.Compute(ctx, cellT);
        }

        var invalid = DesignValidator.Validate(ctx.Input, cell);
        if (invalid.Count > 0)
        {
            throw new InvalidOperationException(string.Create(Inv, $"The finder built an invalid design {s}S{p}P: {invalid[0].Field}: {invalid[0].Message}"));
        }

        var voltages = PackVoltageCalculator.Compute(ctx, charge.Model);
        var protection = HardwareCalculator.Compute(ctx, charge.Result.ConstantCurrentA);
        var energy = EnergyCalculator.Compute(ctx, charge);
        var thermal = ThermalCalculator.Compute(ctx);
        var ladder = LadderBuilder.Build(ctx, cellT, charge, voltages);
        var findings = FindingRules.Check(ctx, voltages, cellT, packT, charge, protection, thermal, ladder);
        return new ConfigurationCandidate(
            s,
            p,
            s * p,
            voltages.Max,
            charge.Result.ConstantVoltage,
            voltages.LoadedLow,
            energy.NominalEnergyWh,
            energy.UsableEnergyWh,
            energy.UsableEnergyWorstCaseWh,
            cell.MaxDischargeCurrentA * p,
            cell.PeakDischargeCurrentA * p,
            energy.CellMassKg,
            screen.Cost,
            findings.Count(f => f.Severity == Severity.Error),
            findings.Count(f => f.Severity == Severity.Warning),
            findings.Count(f => f.Severity == Severity.Info));
    }

    private static IReadOnlyList<ConfigurationCandidate> Sort(ConfigurationCandidate[] c, ConfigurationSort by)
    {
        IOrderedEnumerable<ConfigurationCandidate> q = by switch
        {
            ConfigurationSort.UsableEnergy => c.OrderByDescending(x => x.UsableEnergyWorstCaseWh),
            ConfigurationSort.Mass => c.OrderBy(x => x.MassKg),
            ConfigurationSort.Cost => c.OrderBy(x => x.Cost ?? x.CellCount),
            ConfigurationSort.ContinuousCurrent => c.OrderByDescending(x => x.ContinuousCurrentA),
            ConfigurationSort.Findings => c.OrderBy(x => x.Errors).ThenBy(x => x.Warnings),
            _ => c.OrderBy(x => x.CellCount),
        };
        return q.ThenBy(x => x.CellCount).ThenBy(x => x.Series).ThenBy(x => x.Parallel).ToArray();
    }

    private static void RejectParallel(ConfigurationRequest r, CellSpec cell, ConfigurationTargets t, string?[] codes, List<ConfigurationRejection> rejected)
    {
        var continuous = Math.Max(r.Controller.ContinuousCurrentA, t.MinContinuousCurrentA ?? 0);
        var peak = Math.Max(r.Controller.PeakCurrentA, t.MinPeakCurrentA ?? 0);
        foreach (var (code, from, to) in Runs(codes, 1, codes.Length - 1))
        {
            if (code is null)
            {
                continue;
            }

            var range = Range("P", from, to);
            var reason = code == CodeContinuousCurrent
                ? string.Create(Inv, $"{range}: {to} cell(s) in parallel carry at most {cell.MaxDischargeCurrentA * to:0.#} A continuous ({cell.MaxDischargeCurrentA:0.#} A each), below the {continuous:0.#} A needed.")
                : string.Create(Inv, $"{range}: {to} cell(s) in parallel carry at most {cell.PeakDischargeCurrentA * to:0.#} A peak ({cell.PeakDischargeCurrentA:0.#} A each), below the {peak:0.#} A needed.");
            rejected.Add(new ConfigurationRejection(null, null, from, to == from ? null : to, code, reason));
        }
    }

    private static void RejectSeries(ConfigurationRequest r, ConfigurationTargets t, Screen[,] screens, string?[] parallelCodes, List<ConfigurationRejection> rejected)
    {
        var maxS = screens.GetLength(0) - 1;
        var maxP = screens.GetLength(1) - 1;
        var open = Enumerable.Range(1, maxP).Where(p => parallelCodes[p] is null).ToArray();
        if (open.Length == 0)
        {
            return;
        }

        // Series counts for which no P fits, grouped into runs with the same reason.
        var seriesCode = new string?[maxS + 1];
        var signature = new string?[maxS + 1];
        for (var s = 1; s <= maxS; s++)
        {
            if (open.Any(p => screens[s, p].Code is null))
            {
                continue;
            }

            var runs = Runs(open.Select(p => screens[s, p].Code).ToArray(), 0, open.Length - 1).ToArray();
            seriesCode[s] = runs.Length == 1 ? runs[0].Code : CodeMixed;
            signature[s] = string.Join(";", runs.Select(x => string.Create(Inv, $"{x.Code}:{open[x.From]}-{open[x.To]}")));
        }

        var s0 = 1;
        while (s0 <= maxS)
        {
            if (seriesCode[s0] is null)
            {
                AddCombinationRejections(r, t, screens, open, s0, rejected);
                s0++;
                continue;
            }

            var s1 = s0;
            while (s1 + 1 <= maxS && seriesCode[s1 + 1] == seriesCode[s0] && (seriesCode[s0] != CodeMixed || signature[s1 + 1] == signature[s0]))
            {
                s1++;
            }

            rejected.Add(new ConfigurationRejection(s0, s1 == s0 ? null : s1, null, null, seriesCode[s0]!, SeriesReason(r, t, screens, open, seriesCode[s0]!, s0, s1)));
            s0 = s1 + 1;
        }
    }

    private static string SeriesReason(ConfigurationRequest r, ConfigurationTargets t, Screen[,] screens, int[] open, string code, int s0, int s1)
    {
        var range = Range("S", s0, s1);
        var pMin = open[0];
        var pMax = open[^1];
        var c = r.Controller;
        return code switch
        {
            CodeTopOfCharge => string.Create(Inv,
                $"{range}: the charge voltage ({screens[s0, pMin].ConstantVoltage:0.0} V at S = {s0}) is above the controller's maximum {c.MaxVoltage:0.0} V for every P."),
            CodeLoadedBottom => string.Create(Inv,
                $"{range}: under the peak current {c.PeakCurrentA:0} A at the window's bottom and the coldest ambient the pack sags below the controller's minimum {c.MinVoltage:0.0} V even with P = {pMax} ({screens[s1, pMax].LoadedLow:0.0} V at S = {s1})."),
            CodeEnergy => string.Create(Inv,
                $"{range}: even with P = {pMax} the worst-case usable energy ({screens[s1, pMax].WorstEnergyWh:0} Wh at S = {s1}) is below the target {t.MinUsableEnergyWh:0} Wh."),
            CodeCells => string.Create(Inv,
                $"{range}: even with P = {pMin}, {s0 * pMin} cells at S = {s0} exceed the maximum {t.MaxCells} cells."),
            CodeMass => string.Create(Inv,
                $"{range}: even with P = {pMin} the cells weigh {screens[s0, pMin].MassKg:0.0} kg at S = {s0}, above the maximum {t.MaxMassKg:0.0} kg."),
            CodeCost => string.Create(Inv,
                $"{range}: even with P = {pMin} the cells cost {screens[s0, pMin].Cost:0.##} at S = {s0}, above the maximum {t.MaxCost:0.##}."),
            _ => string.Create(Inv, $"{range}: no P fits: ") + string.Join("; ",
                Runs(open.Select(p => screens[s0, p].Code).ToArray(), 0, open.Length - 1)
                    .Select(x => string.Create(Inv, $"{Range("P", open[x.From], open[x.To])} {Describe(x.Code!)}"))) + ".",
        };
    }

    private static void AddCombinationRejections(ConfigurationRequest r, ConfigurationTargets t, Screen[,] screens, int[] open, int s, List<ConfigurationRejection> rejected)
    {
        var c = r.Controller;
        foreach (var (code, from, to) in Runs(open.Select(p => screens[s, p].Code).ToArray(), 0, open.Length - 1))
        {
            if (code is null)
            {
                continue;
            }

            var pFrom = open[from];
            var pTo = open[to];
            var range = string.Create(Inv, $"{s}S × {Range("P", pFrom, pTo)}");
            var reason = code switch
            {
                CodeTopOfCharge => string.Create(Inv, $"{range}: the charge voltage {screens[s, pFrom].ConstantVoltage:0.0} V is above the controller's maximum {c.MaxVoltage:0.0} V."),
                CodeLoadedBottom => string.Create(Inv, $"{range}: under the peak current the pack sags to {screens[s, pTo].LoadedLow:0.0} V at best, below the controller's minimum {c.MinVoltage:0.0} V."),
                CodeEnergy => string.Create(Inv, $"{range}: the worst-case usable energy ({screens[s, pTo].WorstEnergyWh:0} Wh at most) is below the target {t.MinUsableEnergyWh:0} Wh."),
                CodeCells => string.Create(Inv, $"{range}: {s * pFrom} cells or more exceed the maximum {t.MaxCells} cells."),
                CodeMass => string.Create(Inv, $"{range}: {screens[s, pFrom].MassKg:0.0} kg or more exceeds the maximum {t.MaxMassKg:0.0} kg."),
                _ => string.Create(Inv, $"{range}: a cost of {screens[s, pFrom].Cost:0.##} or more exceeds the maximum {t.MaxCost:0.##}."),
            };
            rejected.Add(new ConfigurationRejection(s, null, pFrom, pTo == pFrom ? null : pTo, code, reason));
        }
    }

    private static string Describe(string code) => code switch
    {
        CodeTopOfCharge => "put the charge voltage above the controller's maximum",
        CodeLoadedBottom => "sag below the controller's minimum under the peak current",
        CodeEnergy => "fall short of the energy target",
        CodeCells => "exceed the maximum cell count",
        CodeMass => "exceed the maximum mass",
        _ => "exceed the maximum cost",
    };

    private static string Range(string name, int from, int to) =>
        from == to ? string.Create(Inv, $"{name} = {from}") : string.Create(Inv, $"{name} = {from}–{to}");

    /// <summary>Consecutive runs of equal codes in codes[from…to].</summary>
    private static IEnumerable<(string? Code, int From, int To)> Runs(string?[] codes, int from, int to)
    {
        var start = from;
        for (var i = from + 1; i <= to + 1; i++)
        {
            if (i > to || codes[i] != codes[start])
            {
                yield return (codes[start], start, i - 1);
                start = i;
            }
        }
    }

    private static void ValidateTargets(ConfigurationRequest r, List<ValidationError> errors)
    {
        void Range(string field, double? value, double lo, double hi, string unit, bool exclusiveLow = true)
        {
            if (value is not { } v)
            {
                return;
            }

            var lowOk = exclusiveLow ? v > lo : v >= lo;
            if (!double.IsFinite(v) || !lowOk || v > hi)
            {
                errors.Add(new ValidationError(field, string.Create(Inv,
                    $"Must be {(exclusiveLow ? "above" : "at least")} {lo:0.###} {unit} and at most {hi:0.###} {unit}.")));
            }
        }

        if (!Enum.IsDefined(r.SortBy))
        {
            errors.Add(new ValidationError("sortBy", "Must be cellCount, usableEnergy, mass, cost, continuousCurrent or findings."));
        }

        if (!Enum.IsDefined(r.Balancing))
        {
            errors.Add(new ValidationError("balancing", "Must be bottom or top."));
        }

        if (r.Targets is not { } t)
        {
            return;
        }

        Range("targets.minUsableEnergyWh", t.MinUsableEnergyWh, 0, 1e9, "Wh");
        Range("targets.maxCells", t.MaxCells, 1, FinderLimits.MaxSeries * FinderLimits.MaxParallel, "cells", exclusiveLow: false);
        Range("targets.maxMassKg", t.MaxMassKg, 0, 1e6, "kg");
        Range("targets.minContinuousCurrentA", t.MinContinuousCurrentA, 0, 100_000, "A");
        Range("targets.minPeakCurrentA", t.MinPeakCurrentA, 0, 200_000, "A");
        Range("targets.costPerCell", t.CostPerCell, 0, 1e6, string.Empty, exclusiveLow: false);
        Range("targets.maxCost", t.MaxCost, 0, 1e12, string.Empty);
        if (t.MaxCost is not null && t.CostPerCell is null)
        {
            errors.Add(new ValidationError("targets.maxCost", "Give the cost per cell too, or the maximum cost cannot be checked."));
        }
    }
}
