using System.Runtime.CompilerServices;

namespace PackDesigner.Core.Spread;

/// <summary>
/// The xoshiro256** 1.0 pseudo-random generator: 256 bits of state, period 2²⁵⁶ − 1, 64-bit outputs.
/// Source: D. Blackman and S. Vigna, "Scrambled linear pseudorandom number generators", ACM Transactions on
/// Mathematical Software 47(4), 2021, and the authors' reference C code (xoshiro256starstar.c). The state is
/// filled from SplitMix64 outputs, as the authors recommend (G. L. Steele, D. Lea, C. H. Flood, "Fast splittable
/// pseudorandom number generators", OOPSLA 2014). A mutable struct: pass it by <c>ref</c>.
/// </summary>
public struct Xoshiro256StarStar
{
    /// <summary>The SplitMix64 state increment (the golden-ratio constant 2⁶⁴/φ, odd).</summary>
    public const ulong SplitMixGamma = 0x9E3779B97F4A7C15UL;

    private const double UnitOf53Bits = 1.0 / (1UL << 53);

    private ulong _s0;
    private ulong _s1;
    private ulong _s2;
    private ulong _s3;

    /// <summary>A generator with the given state words; they must not all be zero.</summary>
    /// <exception cref="ArgumentException">All four words are zero.</exception>
    public Xoshiro256StarStar(ulong s0, ulong s1, ulong s2, ulong s3)
    {
        if ((s0 | s1 | s2 | s3) == 0)
        {
            throw new ArgumentException("The xoshiro256** state must not be all zero.", nameof(s0));
        }

        _s0 = s0;
        _s1 = s1;
        _s2 = s2;
        _s3 = s3;
    }

    /// <summary>Seeds the state with the first four outputs of SplitMix64 started at <paramref name="seed"/>.</summary>
    public static Xoshiro256StarStar FromSeed(ulong seed) => FromSplitMixState(seed);

    /// <summary>
    /// The generator of stream k = <paramref name="stream"/>: the seed is first mixed by one SplitMix64 step into a
    /// key, and the stream's state is outputs 4k+1 … 4k+4 of the SplitMix64 sequence started at that key. Every stream
    /// starts from its own well-mixed state, and nearby seeds (1, 2, …) give unrelated sets of streams rather than
    /// shifted copies of one sequence. The Monte Carlo gives each trial its own stream, so a trial's draws do not
    /// depend on how the trials are split between threads.
    /// </summary>
    public static Xoshiro256StarStar ForStream(ulong seed, ulong stream)
    {
        var key = SplitMix64(ref seed);
        return FromSplitMixState(unchecked(key + stream * 4 * SplitMixGamma));
    }

    private static Xoshiro256StarStar FromSplitMixState(ulong x)
    {
        var s0 = SplitMix64(ref x);
        var s1 = SplitMix64(ref x);
        var s2 = SplitMix64(ref x);
        var s3 = SplitMix64(ref x);
        if ((s0 | s1 | s2 | s3) == 0)
        {
            s0 = SplitMixGamma; // never seen in practice; keeps the state valid
        }

        return new Xoshiro256StarStar(s0, s1, s2, s3);
    }

    /// <summary>One SplitMix64 step (Steele, Lea and Flood 2014): advances <paramref name="state"/> and returns the mixed output.</summary>
    public static ulong SplitMix64(ref ulong state)
    {
        unchecked
        {
            var z = state += SplitMixGamma;
            z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
            z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
            return z ^ (z >> 31);
        }
    }

    /// <summary>The next 64-bit output.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public ulong NextUInt64()
    {
        unchecked
        {
            var s1 = _s1;
            var result = RotateLeft(s1 * 5, 7) * 9;
            var t = s1 << 17;
            _s2 ^= _s0;
            _s3 ^= s1;
            _s1 = s1 ^ _s2;
            _s0 ^= _s3;
            _s2 ^= t;
            _s3 = RotateLeft(_s3, 45);
            return result;
        }
    }

    /// <summary>A uniform double in [0, 1): the top 53 bits of the next output × 2⁻⁵³.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public double NextDouble() => (NextUInt64() >> 11) * UnitOf53Bits;

    /// <summary>A uniform double in (0, 1): (top 53 bits + ½) × 2⁻⁵³, safe to take the logarithm of.</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public double NextOpenDouble() => ((NextUInt64() >> 11) + 0.5) * UnitOf53Bits;

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static ulong RotateLeft(ulong x, int k) => (x << k) | (x >> (64 - k));
}
