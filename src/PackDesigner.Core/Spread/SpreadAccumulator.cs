namespace PackDesigner.Core.Spread;

/// <summary>
/// Streaming statistics of a run: one fixed-bin histogram per figure and integer counts, so memory does not grow
/// with the number of trials and merging per-thread accumulators gives the same result in any order.
/// </summary>
internal sealed class SpreadAccumulator
{
    public SpreadAccumulator(SpreadSetup setup, bool withTripVoltage)
    {
        var curve = setup.Curve;
        var vHigh = Math.Max(curve.Full, setup.Evaluation.Cell.MaxChargeVoltage) + 1;
        var vLow = Math.Max(0, Math.Min(curve.Empty, setup.UnderVoltageTrip) - 1);
        var voltageBins = (int)Math.Ceiling((vHigh - vLow) / SpreadLimits.VoltageResolutionV);
        HighestAtEndOfCharge = new Histogram(vLow, vLow + voltageBins * SpreadLimits.VoltageResolutionV, voltageBins);
        LowestAtCutoff = new Histogram(vLow, vLow + voltageBins * SpreadLimits.VoltageResolutionV, voltageBins);

        var window = setup.SocHigh - setup.SocLow;
        var maxAh = window * setup.NominalGroupAh * (1 + 1e-9);
        UsableAh = new Histogram(0, maxAh, SpreadLimits.FineBins);
        UsableWh = new Histogram(0, maxAh * setup.S * curve.Full * setup.EnergyScale, SpreadLimits.FineBins);

        var cn = setup.NominalGroupAh;
        double groupLow, groupHigh;
        if (setup.FixedGroupAh is { } fixedAh)
        {
            var min = fixedAh.Min();
            groupLow = min * (1 - 1e-6);
            groupHigh = min * (1 + 1e-6);
        }
        else
        {
            var relative = setup.Distribution == SpreadDistribution.Normal
                ? 8 * setup.CapacitySpread / Math.Sqrt(setup.P)
                : setup.CapacitySpread;
            relative = Math.Max(relative, 1e-6);
            groupLow = cn * (1 - relative);
            groupHigh = cn * (1 + relative);
        }

        SmallestGroupAh = new Histogram(groupLow, groupHigh, SpreadLimits.FineBins);
        HighestSocAtEndOfCharge = new Histogram(0, 1 + 1e-12, SpreadLimits.FineBins);
        LowestSocAtBottom = new Histogram(0, 1 + 1e-12, SpreadLimits.FineBins);
        TopHeadroom = setup.Top ? null : new Histogram(-1, 1, SpreadLimits.FineBins);

        if (withTripVoltage)
        {
            // Per cell; the bin is fine enough to place the CV within a quarter of the charger's step, at most 0.1 mV per cell.
            var low = Math.Max(0, curve.Empty - 0.5);
            var width = Math.Min(SpreadLimits.VoltageResolutionV, setup.VoltageStepV / (4.0 * setup.S));
            var bins = (int)Math.Min(200_000, Math.Ceiling((vHigh - low) / width));
            TripVoltagePerCell = new Histogram(low, vHigh, bins);
        }
    }

    public Histogram HighestAtEndOfCharge { get; }
    public Histogram LowestAtCutoff { get; }
    public Histogram UsableAh { get; }
    public Histogram UsableWh { get; }
    public Histogram SmallestGroupAh { get; }
    public Histogram HighestSocAtEndOfCharge { get; }
    public Histogram LowestSocAtBottom { get; }
    public Histogram? TopHeadroom { get; }
    public Histogram? TripVoltagePerCell { get; }
    public long OverVoltageTrips { get; private set; }
    public long OverVoltageReleases { get; private set; }
    public long UnderVoltageTrips { get; private set; }
    public long Trials { get; private set; }
    public int WorstEndOfChargeTrial { get; private set; } = -1;
    public double WorstEndOfChargeVoltage { get; private set; } = double.NegativeInfinity;
    public int WorstCutoffTrial { get; private set; } = -1;
    public double WorstCutoffVoltage { get; private set; } = double.PositiveInfinity;

    public void Add(int trial, in TrialOutcome o, int series)
    {
        Trials++;
        HighestAtEndOfCharge.Add(o.HighestAtEndOfCharge);
        LowestAtCutoff.Add(o.LowestAtCutoff);
        UsableAh.Add(o.UsableAh);
        UsableWh.Add(o.UsableWh);
        SmallestGroupAh.Add(o.SmallestGroupAh);
        HighestSocAtEndOfCharge.Add(o.HighestSocAtEndOfCharge);
        LowestSocAtBottom.Add(o.LowestSocAtBottom);
        TopHeadroom?.Add(o.TopHeadroom);
        TripVoltagePerCell?.Add(o.TripConstantVoltage / series);
        if (o.OverVoltageTrip)
        {
            OverVoltageTrips++;
        }

        if (o.OverVoltageRelease)
        {
            OverVoltageReleases++;
        }

        if (o.UnderVoltageTrip)
        {
            UnderVoltageTrips++;
        }

        NoteWorst(trial, o.HighestAtEndOfCharge, o.LowestAtCutoff);
    }

    public void Merge(SpreadAccumulator other)
    {
        HighestAtEndOfCharge.Merge(other.HighestAtEndOfCharge);
        LowestAtCutoff.Merge(other.LowestAtCutoff);
        UsableAh.Merge(other.UsableAh);
        UsableWh.Merge(other.UsableWh);
        SmallestGroupAh.Merge(other.SmallestGroupAh);
        HighestSocAtEndOfCharge.Merge(other.HighestSocAtEndOfCharge);
        LowestSocAtBottom.Merge(other.LowestSocAtBottom);
        if (TopHeadroom is not null && other.TopHeadroom is not null)
        {
            TopHeadroom.Merge(other.TopHeadroom);
        }

        if (TripVoltagePerCell is not null && other.TripVoltagePerCell is not null)
        {
            TripVoltagePerCell.Merge(other.TripVoltagePerCell);
        }

        OverVoltageTrips += other.OverVoltageTrips;
        OverVoltageReleases += other.OverVoltageReleases;
        UnderVoltageTrips += other.UnderVoltageTrips;
        Trials += other.Trials;
        if (other.WorstEndOfChargeTrial >= 0)
        {
            NoteWorst(other.WorstEndOfChargeTrial, other.WorstEndOfChargeVoltage, double.PositiveInfinity);
        }

        if (other.WorstCutoffTrial >= 0)
        {
            NoteWorstCutoff(other.WorstCutoffTrial, other.WorstCutoffVoltage);
        }
    }

    private void NoteWorst(int trial, double highest, double lowest)
    {
        if (highest > WorstEndOfChargeVoltage || (highest == WorstEndOfChargeVoltage && trial < WorstEndOfChargeTrial))
        {
            WorstEndOfChargeVoltage = highest;
            WorstEndOfChargeTrial = trial;
        }

        NoteWorstCutoff(trial, lowest);
    }

    private void NoteWorstCutoff(int trial, double lowest)
    {
        if (double.IsPositiveInfinity(lowest))
        {
            return;
        }

        if (lowest < WorstCutoffVoltage || (lowest == WorstCutoffVoltage && trial < WorstCutoffTrial))
        {
            WorstCutoffVoltage = lowest;
            WorstCutoffTrial = trial;
        }
    }
}
