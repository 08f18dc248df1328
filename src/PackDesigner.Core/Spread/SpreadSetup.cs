using System.Globalization;
using PackDesigner.Core.Charging;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Protection;
using PackDesigner.Core.Validation;

namespace PackDesigner.Core.Spread;

/// <summary>
/// A validated spread request with every constant the trials need, taken from the same calculators the design
/// sheet uses (context, thresholds, charge setpoints, energy). SI units: V, A, Ω, Ah; SOC as fractions.
/// </summary>
internal sealed class SpreadSetup
{
    public const string OriginEntered = "entered";
    public const string OriginToleranceAs3Sigma = "tolerance-as-3-sigma";
    public const string OriginToleranceUniform = "tolerance-as-uniform-half-width";
    public const string OriginMeasured = "measured";
    public const string OriginCapacityToleranceAssumed = "capacity-tolerance-assumed";

    private SpreadSetup()
    {
    }

    public required SpreadRequest Request { get; init; }
    public required EvaluationResult Evaluation { get; init; }
    public required CurveTable Curve { get; init; }
    public required BalancingMethod Balancing { get; init; }
    public required int S { get; init; }
    public required int P { get; init; }
    public required int Trials { get; init; }
    public required ulong Seed { get; init; }
    public required double CellAh { get; init; }
    public required double NominalGroupAh { get; init; }
    public required double CellOhm { get; init; }
    public required double ColdFactor { get; init; }
    public required double TerminationA { get; init; }
    public required double ExternalOhm { get; init; }
    public required double PeakA { get; init; }
    public required double ControllerMinV { get; init; }
    public required double OverVoltageTrip { get; init; }
    public required double OverVoltageRelease { get; init; }
    public required double UnderVoltageTrip { get; init; }
    public required double SocLow { get; init; }
    public required double SocHigh { get; init; }
    public required double EnergyScale { get; init; }
    public required double DesignConstantVoltage { get; init; }
    public required double WantedConstantVoltage { get; init; }
    public required string DesignLimitedBy { get; init; }
    public required double VoltageStepV { get; init; }
    public required double TripRisk { get; init; }
    public required SpreadDistribution Distribution { get; init; }

    /// <summary>Relative spread of a capacity draw: σ for normal, half-width for uniform; 0 when measured.</summary>
    public required double CapacitySpread { get; init; }
    public required double ResistanceSpread { get; init; }
    public required string CapacityOrigin { get; init; }
    public required string ResistanceOrigin { get; init; }

    /// <summary>Group capacities from the measured list (Ah), or null when drawn.</summary>
    public double[]? FixedGroupAh { get; init; }
    public IReadOnlyList<MeasuredGroup>? MeasuredGroups { get; init; }

    public bool Top => Balancing == BalancingMethod.Top;

    public static SpreadSetup? Create(SpreadRequest request, out IReadOnlyList<ValidationError> errors)
    {
        var list = new List<ValidationError>();
        var spread = request.Spread;
        ValidateShape(spread, list);

        var outcome = DesignEvaluator.Evaluate(request.Design);
        list.AddRange(outcome.Errors.Select(e => e with { Field = "design." + e.Field }));
        if (list.Count > 0 || outcome.Result is not { } evaluation)
        {
            errors = list;
            return null;
        }

        var design = request.Design;
        var cell = evaluation.Cell;
        var s = design.Series;
        var p = design.Parallel;
        var draws = (long)spread.Trials * s * p;
        if (draws > SpreadLimits.MaxCellDraws)
        {
            list.Add(new ValidationError("spread.trials", string.Create(CultureInfo.InvariantCulture,
                $"Trials × cells may be at most {SpreadLimits.MaxCellDraws:N0} cell draws; {spread.Trials} trials of {s}S{p}P make {draws:N0}. At most {SpreadLimits.MaxCellDraws / (s * p)} trials for this pack.")));
        }

        double[]? fixedGroups = null;
        IReadOnlyList<MeasuredGroup>? groups = null;
        if (spread.MeasuredCapacitiesAh is { } measured)
        {
            var needed = s * p;
            if (measured.Count < needed || (spread.MeasuredGrouping == MeasuredGrouping.AsListed && measured.Count != needed))
            {
                list.Add(new ValidationError("spread.measuredCapacitiesAh", string.Create(CultureInfo.InvariantCulture,
                    $"{s}S{p}P needs {(spread.MeasuredGrouping == MeasuredGrouping.AsListed ? "exactly" : "at least")} {needed} measured cells; the list has {measured.Count}.")));
            }
            else
            {
                groups = MeasuredGrouper.Assign(measured, s, p, spread.MeasuredGrouping);
                fixedGroups = groups.Select(g => g.CapacityAh).ToArray();
            }
        }

        if (list.Count > 0)
        {
            errors = list;
            return null;
        }

        var ctx = PackContext.Create(design, cell);
        var (cellT, _) = ThresholdCalculator.Compute(ctx);
        var charge = ChargeSetpointCalculator.Compute(ctx, cellT);
        var tolerance = cell.CapacityTolerancePercent / 100.0;
        var uniform = spread.Distribution == SpreadDistribution.Uniform;

        double capacitySpread;
        string capacityOrigin;
        if (fixedGroups is not null)
        {
            capacitySpread = 0;
            capacityOrigin = OriginMeasured;
        }
        else if (spread.CapacitySigmaPercent is { } cs)
        {
            capacitySpread = (uniform ? Math.Sqrt(3) : 1) * cs / 100.0;
            capacityOrigin = OriginEntered;
        }
        else
        {
            capacitySpread = uniform ? tolerance : tolerance / 3;
            capacityOrigin = uniform ? OriginToleranceUniform : OriginToleranceAs3Sigma;
        }

        double resistanceSpread;
        string resistanceOrigin;
        if (spread.ResistanceSigmaPercent is { } rs)
        {
            resistanceSpread = (uniform ? Math.Sqrt(3) : 1) * rs / 100.0;
            resistanceOrigin = OriginEntered;
        }
        else
        {
            resistanceSpread = uniform ? tolerance : tolerance / 3;
            resistanceOrigin = OriginCapacityToleranceAssumed;
        }

        errors = [];
        return new SpreadSetup
        {
            Request = request,
            Evaluation = evaluation,
            Curve = new CurveTable(cell.OcvCurve),
            Balancing = design.Balancing,
            S = s,
            P = p,
            Trials = spread.Trials,
            Seed = unchecked((ulong)spread.Seed),
            CellAh = cell.CapacityAh,
            NominalGroupAh = ctx.GroupCapacityAh,
            CellOhm = ctx.CellResistanceOhm,
            ColdFactor = ctx.CellResistanceColdOhm / ctx.CellResistanceOhm,
            TerminationA = charge.Result.TerminationCurrentA,
            ExternalOhm = ctx.ExternalOhm,
            PeakA = design.Controller.PeakCurrentA,
            ControllerMinV = design.Controller.MinVoltage,
            OverVoltageTrip = cellT.OverVoltageTrip,
            OverVoltageRelease = cellT.OverVoltageRelease,
            UnderVoltageTrip = cellT.UnderVoltageTrip,
            SocLow = ctx.SocLow,
            SocHigh = ctx.SocHigh,
            EnergyScale = cell.NominalVoltage / cell.OcvCurve.MeanVoltage,
            DesignConstantVoltage = charge.Result.ConstantVoltage,
            WantedConstantVoltage = charge.UnroundedConstantVoltage,
            DesignLimitedBy = charge.Result.ConstantVoltageLimitedBy,
            VoltageStepV = design.Charger.VoltageStepV,
            TripRisk = spread.TripRisk ?? SpreadLimits.DefaultTripRisk,
            Distribution = spread.Distribution,
            CapacitySpread = capacitySpread,
            ResistanceSpread = resistanceSpread,
            CapacityOrigin = capacityOrigin,
            ResistanceOrigin = resistanceOrigin,
            FixedGroupAh = fixedGroups,
            MeasuredGroups = groups,
        };
    }

    private static void ValidateShape(SpreadSettings spread, List<ValidationError> list)
    {
        void Add(string field, FormattableString message) => list.Add(new ValidationError(field, message.ToString(CultureInfo.InvariantCulture)));

        if (!Enum.IsDefined(spread.Distribution))
        {
            Add("spread.distribution", $"Must be normal or uniform.");
        }

        if (!Enum.IsDefined(spread.MeasuredGrouping))
        {
            Add("spread.measuredGrouping", $"Must be balanced or asListed.");
        }

        if (spread.Trials < SpreadLimits.MinTrials || spread.Trials > SpreadLimits.MaxTrials)
        {
            Add("spread.trials", $"Must be at least {SpreadLimits.MinTrials} and at most {SpreadLimits.MaxTrials} trials (got {spread.Trials}).");
        }

        Sigma("spread.capacitySigmaPercent", spread.CapacitySigmaPercent);
        Sigma("spread.resistanceSigmaPercent", spread.ResistanceSigmaPercent);

        if (spread.TripRisk is { } risk && !(risk > 0 && risk <= SpreadLimits.MaxTripRisk))
        {
            Add("spread.tripRisk", $"Must be a fraction above 0 and at most {SpreadLimits.MaxTripRisk} (0.001 = 0.1 % of packs).");
        }

        if (spread.MeasuredCapacitiesAh is { } measured)
        {
            if (measured.Count > SpreadLimits.MaxMeasuredCells)
            {
                Add("spread.measuredCapacitiesAh", $"At most {SpreadLimits.MaxMeasuredCells} measured cells (got {measured.Count}).");
                return;
            }

            for (var i = 0; i < measured.Count; i++)
            {
                var v = measured[i];
                if (!double.IsFinite(v) || v <= 0 || v > 10_000)
                {
                    Add($"spread.measuredCapacitiesAh[{i}]", $"Cell {i + 1}: a measured capacity must be above 0 Ah and at most 10000 Ah.");
                }
            }
        }

        void Sigma(string field, double? value)
        {
            if (value is { } v && !(double.IsFinite(v) && v >= 0 && v <= SpreadLimits.MaxSigmaPercent))
            {
                Add(field, $"Must be at least 0 % and at most {SpreadLimits.MaxSigmaPercent} % (1 σ of the datasheet value).");
            }
        }
    }
}
