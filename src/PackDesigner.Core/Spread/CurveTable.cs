using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using PackDesigner.Core.Curves;

namespace PackDesigner.Core.Spread;

/// <summary>
/// The same piecewise-linear OCV curve as <see cref="OcvCurve"/>, laid out for the Monte Carlo's inner loops:
/// one array of segments (start SOC, start voltage, slope, energy integral up to the start), found in O(1) through
/// a uniform index of 1024 buckets over 0–1 followed by a short forward scan instead of a binary search, and the
/// same segments as <see cref="Pieces"/> with the coefficients for sums over runs of groups. Values agree with
/// <see cref="OcvCurve"/> to rounding. SOC as a fraction.
/// </summary>
internal sealed class CurveTable
{
    private const int Buckets = 1024;

    private readonly Segment[] _segments;
    private readonly int[] _bucket;
    private readonly double _fullIntegral;

    public CurveTable(OcvCurve curve)
    {
        Curve = curve;
        var n = curve.Points.Count;
        var x = curve.Points.Select(p => p.SocPercent / 100.0).ToArray();
        var v = curve.Points.Select(p => p.Voltage).ToArray();

        // One sentinel segment past the end (start SOC +∞) stops the forward scan without a bounds test.
        _segments = new Segment[n];
        double cumulative = 0;
        for (var i = 0; i < n - 1; i++)
        {
            var slope = (v[i + 1] - v[i]) / (x[i + 1] - x[i]);
            _segments[i] = new Segment(x[i], v[i], slope, cumulative);
            cumulative += 0.5 * (v[i] + v[i + 1]) * (x[i + 1] - x[i]);
        }

        _segments[n - 1] = new Segment(double.PositiveInfinity, v[n - 1], 0, cumulative);
        _fullIntegral = cumulative;

        _bucket = new int[Buckets];
        var seg = 0;
        for (var b = 0; b < Buckets; b++)
        {
            var at = (double)b / Buckets;
            while (seg < n - 2 && at >= x[seg + 1])
            {
                seg++;
            }

            _bucket[b] = seg;
        }

        Empty = v[0];
        Full = v[n - 1];
        Pieces = new Piece[n - 1];
        for (var k = 0; k < n - 1; k++)
        {
            var g = _segments[k];
            Pieces[k] = new Piece(g.X, x[k + 1], g.E - g.X * g.V + 0.5 * g.K * g.X * g.X, g.V - g.K * g.X, g.K);
        }
    }

    public OcvCurve Curve { get; }

    public double Empty { get; }

    public double Full { get; }

    /// <summary>Rest voltage at <paramref name="x"/> (clamped to 0–1), V.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public double Voltage(double x)
    {
        if (x <= 0)
        {
            return Empty;
        }

        if (x >= 1)
        {
            return Full;
        }

        ref readonly var s = ref Find(x);
        return s.V + s.K * (x - s.X);
    }

    /// <summary>Index of the segment holding x, for 0 &lt; x &lt; 1.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public int SegmentIndex(double x)
    {
        var i = Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(_bucket), (int)(x * Buckets));
        while (x >= _segments[i + 1].X)
        {
            i++;
        }

        return i;
    }

    /// <summary>
    /// The segments as pieces for sums over many groups: on piece k, V(x) = B + K·x and ∫₀ˣ V dSOC = A + B·x + ½·K·x²
    /// for Start ≤ x &lt; End (A = E − X·V + ½·K·X², B = V − K·X, expanding E + (x − X)·V + ½·K·(x − X)²).
    /// </summary>
    public Piece[] Pieces { get; }

    public double FullIntegral => _fullIntegral;

    /// <summary>State of charge at rest voltage <paramref name="voltage"/>, clamped to 0–1 (delegates to <see cref="OcvCurve.SocAt"/>).</summary>
    public double SocAt(double voltage) => Curve.SocAt(voltage);

    /// <summary>The segment holding x, for 0 &lt; x &lt; 1 (callers test the ends). The bucket index is within the array since x·1024 &lt; 1024.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private ref readonly Segment Find(double x)
    {
        var i = Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(_bucket), (int)(x * Buckets));
        ref var s = ref Unsafe.Add(ref MemoryMarshal.GetArrayDataReference(_segments), i);
        while (x >= Unsafe.Add(ref s, 1).X)
        {
            s = ref Unsafe.Add(ref s, 1);
        }

        return ref s;
    }

    private readonly record struct Segment(double X, double V, double K, double E);

    internal readonly record struct Piece(double Start, double End, double A, double B, double K);
}
