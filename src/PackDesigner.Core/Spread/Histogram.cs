namespace PackDesigner.Core.Spread;

/// <summary>
/// Fixed-bin histogram of one figure over the trials: memory independent of the number of trials, and merging
/// two histograms only adds integer counts, so the result does not depend on how the trials were split between
/// threads. Values below or above the range are counted apart; exact minimum and maximum are kept.
/// </summary>
internal sealed class Histogram
{
    private readonly int[] _counts;
    private long _under;
    private long _over;

    public Histogram(double low, double high, int bins)
    {
        if (!(high > low) || bins < 1)
        {
            high = low + 1e-9 * Math.Max(1, Math.Abs(low)) + 1e-12;
            bins = 1;
        }

        Low = low;
        Bins = bins;
        Width = (high - low) / bins;
        _counts = new int[bins];
        Min = double.PositiveInfinity;
        Max = double.NegativeInfinity;
    }

    public double Low { get; }

    public double Width { get; }

    public int Bins { get; }

    public long Count { get; private set; }

    public double Min { get; private set; }

    public double Max { get; private set; }

    public void Add(double value)
    {
        Count++;
        if (value < Min)
        {
            Min = value;
        }

        if (value > Max)
        {
            Max = value;
        }

        var p = (value - Low) / Width;
        if (p < 0)
        {
            _under++;
        }
        else if (p >= Bins)
        {
            _over++;
        }
        else
        {
            _counts[(int)p]++;
        }
    }

    public void Merge(Histogram other)
    {
        for (var i = 0; i < _counts.Length; i++)
        {
            _counts[i] += other._counts[i];
        }

        _under += other._under;
        _over += other._over;
        Count += other.Count;
        Min = Math.Min(Min, other.Min);
        Max = Math.Max(Max, other.Max);
    }

    public double LowerEdge(int bin) => Low + bin * Width;

    /// <summary>
    /// The smallest bin whose cumulative count (underflow included) exceeds <paramref name="allowed"/>: −1 when the
    /// underflow alone does, <see cref="Bins"/> when even the whole range does not (the rest is overflow or nothing).
    /// </summary>
    public int FirstBinExceeding(long allowed)
    {
        var c = _under;
        if (c > allowed)
        {
            return -1;
        }

        for (var i = 0; i < Bins; i++)
        {
            c += _counts[i];
            if (c > allowed)
            {
                return i;
            }
        }

        return Bins;
    }

    /// <summary>
    /// The counts regrouped into <paramref name="bins"/> equal bins over [min, max] for drawing: each fine bin goes
    /// to the coarse bin holding its centre (kept inside [min, max]); values below or above the fine range go to the
    /// first or last bin, where the exact minimum and maximum lie.
    /// </summary>
    public SpreadHistogram Coarse(int bins)
    {
        if (Count == 0)
        {
            return new SpreadHistogram(0, 0, []);
        }

        var width = Max > Min ? (Max - Min) / bins : 0;
        var n = width > 0 ? bins : 1;
        var counts = new long[n];
        int Index(double value) => width > 0 ? Math.Clamp((int)((value - Min) / width), 0, n - 1) : 0;
        counts[0] += _under;
        counts[n - 1] += _over;
        for (var i = 0; i < Bins; i++)
        {
            if (_counts[i] != 0)
            {
                counts[Index(Math.Clamp(Low + (i + 0.5) * Width, Min, Max))] += _counts[i];
            }
        }

        return new SpreadHistogram(Min, width, counts);
    }

    /// <summary>Empirical quantile: the bin holding the ⌈q·N⌉-th smallest value, as its centre kept inside [min, max].</summary>
    public double Quantile(double q) => ValueAtRank(RankOf(q), 0.5);

    public SpreadPercentiles Summary(double scale = 1)
    {
        if (Count == 0)
        {
            var nan = new SpreadInterval(0, 0);
            return new SpreadPercentiles(0, 0, 0, 0, 0, 0, 0, 0, Width * scale, new SpreadPercentileConfidence(nan, nan, nan, nan));
        }

        double sum = 0, sumSq = 0;
        for (var i = 0; i < Bins; i++)
        {
            if (_counts[i] == 0)
            {
                continue;
            }

            var centre = Math.Clamp(Low + (i + 0.5) * Width, Min, Max);
            sum += _counts[i] * centre;
            sumSq += _counts[i] * centre * centre;
        }

        sum += _under * Min + _over * Max;
        sumSq += _under * Min * Min + _over * Max * Max;
        var mean = sum / Count;
        var variance = Count > 1 ? Math.Max(0, (sumSq - Count * mean * mean) / (Count - 1)) : 0;

        return new SpreadPercentiles(
            Quantile(0.05) * scale,
            Quantile(0.50) * scale,
            Quantile(0.95) * scale,
            Quantile(0.999) * scale,
            Min * scale,
            Max * scale,
            mean * scale,
            Math.Sqrt(variance) * scale,
            Width * scale,
            new SpreadPercentileConfidence(Interval(0.05, scale), Interval(0.50, scale), Interval(0.95, scale), Interval(0.999, scale)));
    }

    /// <summary>
    /// Distribution-free 95 % interval of the q-quantile: the order statistics of ranks N·q ∓ 1.96·√(N·q·(1−q)) (normal
    /// approximation to the binomial count of values below the quantile; e.g. W. J. Conover, Practical Nonparametric
    /// Statistics, 3rd ed., 1999, §3.2, from memory), widened outwards to whole bins.
    /// </summary>
    private SpreadInterval Interval(double q, double scale)
    {
        var half = 1.959964 * Math.Sqrt(Count * q * (1 - q));
        var lowRank = (long)Math.Max(1, Math.Floor(Count * q - half));
        var highRank = (long)Math.Min(Count, Math.Ceiling(Count * q + half) + 1);
        return new SpreadInterval(ValueAtRank(lowRank, 0) * scale, ValueAtRank(highRank, 1) * scale);
    }

    private long RankOf(double q) => Math.Clamp((long)Math.Ceiling(q * Count - 1e-9), 1, Count);

    /// <summary>The value of rank <paramref name="rank"/> (1-based) as a point <paramref name="within"/> its bin (0 lower edge, ½ centre, 1 upper edge), kept inside [min, max].</summary>
    private double ValueAtRank(long rank, double within)
    {
        var c = _under;
        if (rank <= c)
        {
            return Min;
        }

        for (var i = 0; i < Bins; i++)
        {
            c += _counts[i];
            if (rank <= c)
            {
                return Math.Clamp(Low + (i + within) * Width, Min, Max);
            }
        }

        return Max;
    }
}
