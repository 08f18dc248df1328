using PackDesigner.Core.Numerics;

namespace PackDesigner.Core.Spread;

/// <summary>The figures of one trial (see <see cref="TrialEvaluator"/>). Voltages per group, V; SOC fractions; pack CV, V.</summary>
internal struct TrialOutcome
{
    public double HighestAtEndOfCharge;
    public int HighestGroup;
    public bool Forced;
    public double HighestSocAtEndOfCharge;
    public bool OverVoltageTrip;
    public bool OverVoltageRelease;
    public double LowestAtCutoff;
    public int LowestGroup;
    public bool UnderVoltageTrip;
    public double UsableAh;
    public double UsableWh;
    public double SmallestGroupAh;
    public double LowestSocAtBottom;
    public double TopHeadroom;
    public double TripConstantVoltage;
    public double SEndOfCharge;
    public double SCutoff;
    public double SBottom;
    public double STop;
}

/// <summary>
/// One simulated string: S groups, each the sum of P drawn cell capacities and the parallel combination of P drawn
/// resistances. The state variable s is the common charge counted from the balance point in units of the nominal
/// group capacity C_n = P·C: bottom-balanced, group i holds SOCᵢ = s·rᵢ; top-balanced, SOCᵢ = 1 − (1 − s)·rᵢ,
/// with rᵢ = C_n/Cᵢ (the foundation's <c>StringChargeModel</c> with one ratio per group). The string's rest voltage
/// F(s) = Σ OCV(SOCᵢ) is monotone in s, and every operating point is a root of F(s) = target found by
/// <see cref="RootFinder"/> (Newton with bisection fallback) on a bracket known from the extreme groups.
/// One instance per thread; not thread-safe.
/// </summary>
internal sealed class TrialEvaluator
{
    private const double SolverTolerance = 1e-12;

    private readonly SpreadSetup _p;
    private readonly CurveTable _curve;
    private readonly int _n;
    private readonly int _cellsPerGroup;
    private readonly bool _top;
    private readonly double[] _ratio;
    private readonly double[] _cap;
    private readonly double[] _res;
    private readonly double[] _sorted;
    private readonly double[] _sortedCap;
    private readonly double[] _prefix;
    private readonly double[] _prefixInverse;
    private readonly int[] _bucketCounts;
    private readonly int[] _bucketOf;
    private readonly CurveTable.Piece[] _pieces;
    private readonly Func<double, double> _f;
    private readonly Func<double, double> _df;
    private readonly bool _normal;

    private double _sumRes;
    private double _rMin;
    private double _rMax;
    private int _iMax;
    private double _resMax;
    private int _iResMax;
    private double _target;
    private double _lastS = double.NaN;
    private double _lastSlope;

    public TrialEvaluator(SpreadSetup setup)
    {
        _p = setup;
        _curve = setup.Curve;
        _n = setup.S;
        _cellsPerGroup = setup.P;
        _top = setup.Top;
        _normal = setup.Distribution == SpreadDistribution.Normal;
        _ratio = new double[_n];
        _cap = new double[_n];
        _res = new double[_n];
        _sorted = new double[_n];
        _sortedCap = new double[_n];
        _prefix = new double[_n + 1];
        _prefixInverse = new double[_n + 1];
        _bucketCounts = new int[_n + 1];
        _bucketOf = new int[_n];
        _pieces = _curve.Pieces;
        _f = s =>
        {
            var v = Sum(s, out var slope);
            _lastS = s;
            _lastSlope = slope;
            return v - _target;
        };
        _df = s =>
        {
            if (s == _lastS)
            {
                return _lastSlope;
            }

            Sum(s, out var slope);
            return slope;
        };
    }

    private double SLow => _top ? 1 - 1 / _rMax : 0;

    private double SHigh => _top ? 1 : 1 / _rMax;

    /// <summary>Draws trial <paramref name="trial"/>'s cells from its own generator stream: per cell the capacity first, then the resistance, each only when it has a spread.</summary>
    public void Draw(int trial)
    {
        var rng = Xoshiro256StarStar.ForStream(_p.Seed, (ulong)trial);
        var fixedAh = _p.FixedGroupAh;
        var cellAh = _p.CellAh;
        var cellOhm = _p.CellOhm;
        var capSpread = _p.CapacitySpread;
        var resSpread = _p.ResistanceSpread;
        var drawCap = fixedAh is null && capSpread > 0;
        var drawRes = resSpread > 0;
        var cap = _cap;
        var res = _res;
        var p = _cellsPerGroup;
        for (var g = 0; g < cap.Length; g++)
        {
            // Σ 1/fₖ kept as the fraction num/den (num·f + den over den·f per cell), so the parallel combination
            // R/Σ(1/fₖ) costs one division per group instead of one per cell.
            double c = 0, num = 0, den = 1;
            for (var k = 0; k < p; k++)
            {
                c += drawCap ? cellAh * Factor(ref rng, capSpread) : cellAh;
                var f = drawRes ? Factor(ref rng, resSpread) : 1;
                num = num * f + den;
                den *= f;
            }

            cap[g] = fixedAh is null ? c : fixedAh[g];
            res[g] = drawRes ? cellOhm * den / num : cellOhm / p;
        }

        Prepare();
    }

    /// <summary>Uses the given group capacities (Ah) and resistances (Ω) instead of a draw.</summary>
    public void SetGroups(IReadOnlyList<double> capacitiesAh, IReadOnlyList<double> resistancesOhm)
    {
        for (var g = 0; g < _n; g++)
        {
            _cap[g] = capacitiesAh[g];
            _res[g] = resistancesOhm[g];
        }

        Prepare();
    }

    private void Prepare()
    {
        var cn = _p.NominalGroupAh;
        double rMin = double.PositiveInfinity, rMax = double.NegativeInfinity, resMax = double.NegativeInfinity, sumRes = 0;
        int iMax = 0, iResMax = 0;
        for (var g = 0; g < _n; g++)
        {
            var r = cn / _cap[g];
            _ratio[g] = r;
            if (r < rMin)
            {
                rMin = r;
            }

            if (r > rMax)
            {
                rMax = r;
                iMax = g;
            }

            if (_res[g] > resMax)
            {
                resMax = _res[g];
                iResMax = g;
            }

            sumRes += _res[g];
        }

        _rMin = rMin;
        _rMax = rMax;
        _iMax = iMax;
        _resMax = resMax;
        _iResMax = iResMax;
        _sumRes = sumRes;
        _lastS = double.NaN;

        // Sorted ratios with prefix sums of r and 1/r: F(s), dF/ds and the energy become sums over curve segments.
        SortRatios();
        var perAh = 1 / cn;
        for (var i = 0; i < _n; i++)
        {
            _prefix[i + 1] = _prefix[i] + _sorted[i];
            _prefixInverse[i + 1] = _prefixInverse[i] + _sortedCap[i] * perAh; // 1/r = C/C_n
        }
    }

    /// <summary>
    /// Sorts the ratios into <see cref="_sorted"/> (their capacities alongside in <see cref="_sortedCap"/>): a scatter into S equal-width buckets over [r_min, r_max] (counting
    /// sort of the bucket numbers) leaves only the order inside each bucket to fix, which an insertion sort does in
    /// about linear time for values this evenly spread. About 2.5× faster than Array.Sort for S = 96.
    /// </summary>
    private void SortRatios()
    {
        var n = _n;
        var src = _ratio;
        var dst = _sorted;
        var srcCap = _cap;
        var dstCap = _sortedCap;
        if (!(_rMax > _rMin))
        {
            Array.Copy(src, dst, n);
            Array.Copy(srcCap, dstCap, n);
            return;
        }

        var counts = _bucketCounts;
        var keys = _bucketOf;
        var scale = (n - 1) / (_rMax - _rMin);
        Array.Clear(counts);
        for (var i = 0; i < n; i++)
        {
            var b = Math.Clamp((int)((src[i] - _rMin) * scale), 0, n - 1);
            keys[i] = b;
            counts[b + 1]++;
        }

        for (var b = 0; b < n; b++)
        {
            counts[b + 1] += counts[b];
        }

        for (var i = 0; i < n; i++)
        {
            var at = counts[keys[i]]++;
            dst[at] = src[i];
            dstCap[at] = srcCap[i];
        }

        for (var i = 1; i < n; i++)
        {
            var v = dst[i];
            var vc = dstCap[i];
            var j = i - 1;
            while (j >= 0 && dst[j] > v)
            {
                dst[j + 1] = dst[j];
                dstCap[j + 1] = dstCap[j];
                j--;
            }

            dst[j + 1] = v;
            dstCap[j + 1] = vc;
        }
    }

    private double Factor(ref Xoshiro256StarStar rng, double spread)
    {
        var z = _normal ? NormalSampler.Next(ref rng) : NormalSampler.NextSignedUniform(ref rng);
        return Math.Max(SpreadLimits.MinDrawFactor, 1 + spread * z);
    }

    private double Soc(int g, double s) => _top ? 1 - (1 - s) * _ratio[g] : s * _ratio[g];

    /// <summary>
    /// Evaluates the drawn string at charger voltage <paramref name="cv"/> (pack, V). With <paramref name="detail"/>
    /// (length S) each group's state is written too.
    /// </summary>
    public TrialOutcome Evaluate(double cv, bool withTripVoltage, SpreadGroupState[]? detail = null)
    {
        var p = _p;
        var n = _n;
        var full = _curve.Full;
        var iTerm = p.TerminationA;
        var drop = iTerm * p.ExternalOhm;
        var sumEta = iTerm * _sumRes;
        var etaMax = iTerm * _resMax;
        var sHigh = SHigh;
        var o = new TrialOutcome { SmallestGroupAh = p.NominalGroupAh / _rMax };

        // End of charge: Σ (OCV(SOCᵢ) + I_term·Rᵢ) + I_term·R_ext = CV.
        var eocTarget = cv - sumEta - drop;
        var sEoc = SolveUp(eocTarget, out var regime, out var fHigh);
        double highest, forcedVoltage = double.NaN;
        int highestGroup;
        if (regime == Regime.AtHigh && _top)
        {
            // All groups full together: the charger shares the rest of the CV equally among them.
            highest = full + etaMax + (eocTarget - n * full) / n;
            highestGroup = _iResMax;
            o.Forced = eocTarget > n * full + 1e-12;
        }
        else
        {
            highest = MaxTerminal(sEoc, iTerm, out highestGroup);
            if (regime == Regime.AtHigh)
            {
                // Bottom-balanced: the smallest group is full first; the charger forces the rest of the CV onto it.
                var fAtHigh = double.IsNaN(fHigh) ? Sum(sHigh, out _) : fHigh;
                var forced = cv - drop - (fAtHigh - full) - (sumEta - iTerm * _res[_iMax]);
                o.Forced = forced > full + iTerm * _res[_iMax] + 1e-12;
                forcedVoltage = forced;
                if (forced > highest)
                {
                    highest = forced;
                    highestGroup = _iMax;
                }
            }
        }

        o.SEndOfCharge = sEoc;
        o.HighestAtEndOfCharge = highest;
        o.HighestGroup = highestGroup;
        o.HighestSocAtEndOfCharge = Math.Clamp(_top ? 1 - (1 - sEoc) * _rMin : sEoc * _rMax, 0, 1);
        o.OverVoltageTrip = highest >= p.OverVoltageTrip;
        o.OverVoltageRelease = highest > p.OverVoltageRelease + 1e-6;

        var sStar = double.NaN;
        var iStar = 0;
        if (withTripVoltage || o.OverVoltageTrip)
        {
            TripPoint(iTerm, etaMax, out sStar, out iStar);
        }

        if (withTripVoltage)
        {
            if (_top && sStar >= 1)
            {
                o.TripConstantVoltage = n * full + sumEta + drop + n * (p.OverVoltageTrip - full - etaMax);
            }
            else
            {
                var fStar = sStar == sHigh && !double.IsNaN(fHigh) ? fHigh : Sum(sStar, out _);
                o.TripConstantVoltage = fStar - _curve.Voltage(Soc(iStar, sStar)) - iTerm * _res[iStar] + sumEta + p.OverVoltageTrip + drop;
            }
        }

        if (!_top)
        {
            if (o.OverVoltageTrip)
            {
                o.TopHeadroom = Math.Min(0, Soc(iStar, sStar) - Math.Min(1, Soc(iStar, sEoc)));
            }
            else
            {
                var threshold = p.OverVoltageTrip - etaMax;
                var socAtTrip = threshold >= full ? 1 : _curve.SocAt(threshold);
                o.TopHeadroom = socAtTrip - o.HighestSocAtEndOfCharge;
            }
        }

        var sHardwareTop = o.OverVoltageTrip ? Math.Min(sEoc, sStar) : sEoc;
        var sTop = Math.Min(p.SocHigh, sHardwareTop);
        o.STop = sTop;

        // Controller cut-off: Σ (OCV(SOCᵢ) − I_peak·Rᵢ,cold) − I_peak·R_ext = V_min, solved for s.
        var perOhm = p.PeakA * p.ColdFactor;
        var cutTarget = p.ControllerMinV + p.PeakA * (p.ColdFactor * _sumRes + p.ExternalOhm);
        var sCut = SolveUp(cutTarget, out _, out _);
        var lowest = Math.Max(0, MinLoaded(sCut, perOhm, out var lowestGroup));
        o.SCutoff = sCut;
        o.LowestAtCutoff = lowest;
        o.LowestGroup = lowestGroup;
        o.UnderVoltageTrip = lowest <= p.UnderVoltageTrip;
        var sHardwareBottom = o.UnderVoltageTrip ? Math.Max(sCut, UnderVoltagePoint(perOhm)) : sCut;
        var sBottom = Math.Max(p.SocLow, sHardwareBottom);
        o.SBottom = sBottom;
        o.LowestSocAtBottom = Math.Clamp(_top ? 1 - (1 - sBottom) * _rMax : sBottom * _rMin, 0, 1);

        if (sTop > sBottom)
        {
            var eTop = Energy(sTop);
            var eBottom = Energy(sBottom);
            o.UsableAh = (sTop - sBottom) * p.NominalGroupAh;
            o.UsableWh = Math.Max(0, (eTop - eBottom) * p.EnergyScale);
        }

        if (detail is not null)
        {
            FillDetail(detail, o, perOhm, iTerm, highest, forcedVoltage);
        }

        return o;
    }

    private void FillDetail(SpreadGroupState[] detail, TrialOutcome o, double perOhm, double iTerm, double highest, double forcedVoltage)
    {
        for (var g = 0; g < _n; g++)
        {
            var socEoc = Math.Clamp(Soc(g, o.SEndOfCharge), 0, 1);
            var vEoc = _curve.Voltage(socEoc) + iTerm * _res[g];
            if (o.Forced && !_top && g == _iMax)
            {
                vEoc = forcedVoltage;
            }
            else if (o.Forced && _top)
            {
                vEoc = highest - iTerm * (_resMax - _res[g]);
            }

            var socCut = Math.Clamp(Soc(g, o.SCutoff), 0, 1);
            detail[g] = new SpreadGroupState(
                g + 1,
                _cap[g],
                _res[g] * 1000,
                socEoc * 100,
                vEoc,
                socCut * 100,
                Math.Max(0, _curve.Voltage(socCut) - perOhm * _res[g]),
                Math.Clamp(Soc(g, o.STop), 0, 1) * 100,
                Math.Clamp(Soc(g, o.SBottom), 0, 1) * 100);
        }
    }

    private enum Regime
    {
        Root,
        AtLow,
        AtHigh,
    }

    /// <summary>
    /// Solves F(s) = <paramref name="target"/> on [s_low, s_high] (every group between empty and full). When F stays
    /// below the target up to s_high the result is s_high (<see cref="Regime.AtHigh"/>: the smallest group is full);
    /// when it is above the target at s_low, s_low.
    /// </summary>
    private double SolveUp(double target, out Regime regime, out double fAtHigh)
    {
        fAtHigh = double.NaN;
        var sLow = SLow;
        var sHigh = SHigh;
        var perGroup = target / _n;

        // F(s_high) ≥ n·OCV(lowest SOC there): only when that bound does not clear the target is F(s_high) needed.
        if (_curve.Voltage(_top ? 1 : _rMin / _rMax) <= perGroup)
        {
            fAtHigh = _top ? _n * _curve.Full : Sum(sHigh, out _);
            if (fAtHigh <= target)
            {
                regime = Regime.AtHigh;
                return sHigh;
            }
        }

        if (_curve.Voltage(_top ? 1 - _rMin / _rMax : 0) >= perGroup)
        {
            var fLow = _top ? Sum(sLow, out _) : _n * _curve.Empty;
            if (fLow >= target)
            {
                regime = Regime.AtLow;
                return sLow;
            }
        }

        regime = Regime.Root;

        // Bracket from the extreme groups: where the fullest group is at u (F ≤ target) and the emptiest is at u (F ≥ target),
        // u being the SOC whose OCV is the mean group voltage target/S.
        var u = _curve.SocAt(perGroup);
        double lo, hi;
        if (_top)
        {
            lo = 1 - (1 - u) / _rMin;
            hi = 1 - (1 - u) / _rMax;
        }
        else
        {
            lo = u / _rMax;
            hi = u / _rMin;
        }

        lo = Math.Max(sLow, lo);
        hi = Math.Min(sHigh, hi);
        if (!(hi - lo > 1e-13))
        {
            return lo;
        }

        _target = target;
        if (RootFinder.TrySolve(_f, _df, lo, hi, out var root, SolverTolerance))
        {
            return root;
        }

        // Rounding can leave a bound a hair on the wrong side: widen to the whole feasible range.
        if (RootFinder.TrySolve(_f, _df, sLow, sHigh, out root, SolverTolerance))
        {
            return root;
        }

        return Math.Abs(_f(lo)) <= Math.Abs(_f(hi)) ? lo : hi;
    }

    /// <summary>
    /// F(s) = Σ OCV(SOCᵢ(s)), V, and dF/ds = Σ OCV′(SOCᵢ)·rᵢ. The groups are taken in runs that share a curve segment:
    /// with the ratios sorted, a run of m groups on a segment where V = B + K·x adds m·B + K·s·Σr (bottom-balanced,
    /// x = s·r) or m·(B + K) − K·(1 − s)·Σr (top-balanced, x = 1 − (1 − s)·r); runs are found by binary search.
    /// </summary>
    private double Sum(double s, out double slope)
    {
        var rs = _sorted;
        var pre = _prefix;
        var pieces = _pieces;
        var n = rs.Length;
        double sum = 0, sl = 0;
        if (_top)
        {
            var w = 1 - s;
            if (w <= 0)
            {
                slope = 0;
                return n * _curve.Full;
            }

            var j = n - 1;
            while (j >= 0)
            {
                var x = 1 - w * rs[j];
                if (x <= 0)
                {
                    var first = LowerBound(rs, 1 / w, 0, j);
                    sum += (j - first + 1) * _curve.Empty;
                    j = first - 1;
                    continue;
                }

                ref readonly var pc = ref pieces[_curve.SegmentIndex(x)];
                var start = UpperBound(rs, (1 - pc.End) / w, 0, j);
                var r = pre[j + 1] - pre[start];
                sum += (j - start + 1) * (pc.B + pc.K) - pc.K * w * r;
                sl += pc.K * r;
                j = start - 1;
            }
        }
        else
        {
            if (s <= 0)
            {
                slope = 0;
                return n * _curve.Empty;
            }

            var j = 0;
            while (j < n)
            {
                var x = s * rs[j];
                if (x >= 1)
                {
                    sum += (n - j) * _curve.Full;
                    break;
                }

                ref readonly var pc = ref pieces[_curve.SegmentIndex(x)];
                var end = LowerBound(rs, pc.End / s, j + 1, n);
                var r = pre[end] - pre[j];
                sum += (end - j) * pc.B + pc.K * s * r;
                sl += pc.K * r;
                j = end;
            }
        }

        slope = sl;
        return sum;
    }

    /// <summary>
    /// Σ Cᵢ·∫₀^SOCᵢ OCV dSOC, Wh at rest (before the rating scale), with Cᵢ = C_n/rᵢ. On a segment where the integral is
    /// A + B·x + ½·K·x², a run adds C_n·(A·Σ1/r + s·B·m + ½·K·s²·Σr) bottom-balanced, and
    /// C_n·((A + B + ½K)·Σ1/r − (1 − s)·(B + K)·m + ½·K·(1 − s)²·Σr) top-balanced.
    /// </summary>
    private double Energy(double s)
    {
        var rs = _sorted;
        var pre = _prefix;
        var inv = _prefixInverse;
        var pieces = _pieces;
        var n = rs.Length;
        double e = 0;
        if (_top)
        {
            var w = 1 - s;
            if (w <= 0)
            {
                return _curve.FullIntegral * inv[n] * _p.NominalGroupAh;
            }

            var j = n - 1;
            while (j >= 0)
            {
                var x = 1 - w * rs[j];
                if (x <= 0)
                {
                    j = LowerBound(rs, 1 / w, 0, j) - 1;
                    continue;
                }

                ref readonly var pc = ref pieces[_curve.SegmentIndex(x)];
                var start = UpperBound(rs, (1 - pc.End) / w, 0, j);
                e += (pc.A + pc.B + 0.5 * pc.K) * (inv[j + 1] - inv[start])
                    - w * (pc.B + pc.K) * (j - start + 1)
                    + 0.5 * pc.K * w * w * (pre[j + 1] - pre[start]);
                j = start - 1;
            }
        }
        else
        {
            if (s <= 0)
            {
                return 0;
            }

            var j = 0;
            while (j < n)
            {
                var x = s * rs[j];
                if (x >= 1)
                {
                    e += _curve.FullIntegral * (inv[n] - inv[j]);
                    break;
                }

                ref readonly var pc = ref pieces[_curve.SegmentIndex(x)];
                var end = LowerBound(rs, pc.End / s, j + 1, n);
                e += pc.A * (inv[end] - inv[j]) + s * pc.B * (end - j) + 0.5 * pc.K * s * s * (pre[end] - pre[j]);
                j = end;
            }
        }

        return e * _p.NominalGroupAh;
    }

    /// <summary>First index in [lo, hi) with a[i] ≥ value, or hi.</summary>
    private static int LowerBound(double[] a, double value, int lo, int hi)
    {
        while (lo < hi)
        {
            var mid = (lo + hi) >>> 1;
            if (a[mid] < value)
            {
                lo = mid + 1;
            }
            else
            {
                hi = mid;
            }
        }

        return lo;
    }

    /// <summary>First index in [lo, hi) with a[i] &gt; value, or hi.</summary>
    private static int UpperBound(double[] a, double value, int lo, int hi)
    {
        while (lo < hi)
        {
            var mid = (lo + hi) >>> 1;
            if (a[mid] <= value)
            {
                lo = mid + 1;
            }
            else
            {
                hi = mid;
            }
        }

        return lo;
    }

    /// <summary>max over groups of OCV(SOCᵢ) + I·Rᵢ (a full pass: the resistances are not sorted).</summary>
    private double MaxTerminal(double s, double current, out int arg)
    {
        var r = _ratio;
        var res = _res;
        var c = _curve;
        var best = double.NegativeInfinity;
        var bestI = 0;
        var w = 1 - s;
        for (var i = 0; i < r.Length; i++)
        {
            var x = _top ? 1 - w * r[i] : s * r[i];
            var v = c.Voltage(x) + current * res[i];
            if (v > best)
            {
                best = v;
                bestI = i;
            }
        }

        arg = bestI;
        return best;
    }

    /// <summary>min over groups of OCV(SOCᵢ) − perOhm·Rᵢ (a full pass).</summary>
    private double MinLoaded(double s, double perOhm, out int arg)
    {
        var r = _ratio;
        var res = _res;
        var c = _curve;
        var best = double.PositiveInfinity;
        var bestI = 0;
        var w = 1 - s;
        for (var i = 0; i < r.Length; i++)
        {
            var x = _top ? 1 - w * r[i] : s * r[i];
            var v = c.Voltage(x) - perOhm * res[i];
            if (v < best)
            {
                best = v;
                bestI = i;
            }
        }

        arg = bestI;
        return best;
    }

    /// <summary>
    /// The lowest s at which some group reaches the OV trip with the termination current flowing, and that group:
    /// on the curve where OV trip − I·Rᵢ is below the full voltage, else at full (where the charger starts to force it).
    /// </summary>
    private void TripPoint(double current, double etaMax, out double sStar, out int iStar)
    {
        var full = _curve.Full;
        if (_p.OverVoltageTrip - etaMax >= full)
        {
            sStar = SHigh;
            iStar = _top ? _iResMax : _iMax;
            return;
        }

        var best = double.PositiveInfinity;
        var bestI = 0;
        for (var i = 0; i < _n; i++)
        {
            var threshold = _p.OverVoltageTrip - current * _res[i];
            var soc = threshold >= full ? 1 : _curve.SocAt(threshold);
            var si = _top ? 1 - (1 - soc) / _ratio[i] : soc / _ratio[i];
            if (si < best)
            {
                best = si;
                bestI = i;
            }
        }

        sStar = best;
        iStar = bestI;
    }

    /// <summary>The highest s at which some group, under the peak load, falls to the UV trip while discharging.</summary>
    private double UnderVoltagePoint(double perOhm)
    {
        var best = double.NegativeInfinity;
        for (var i = 0; i < _n; i++)
        {
            var soc = _curve.SocAt(_p.UnderVoltageTrip + perOhm * _res[i]);
            var si = _top ? 1 - (1 - soc) / _ratio[i] : soc / _ratio[i];
            best = Math.Max(best, si);
        }

        return best;
    }
}
