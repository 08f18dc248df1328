using MathNet.Numerics.Distributions;
using MathNet.Numerics.Statistics;
using PackDesigner.Core.Spread;

namespace PackDesigner.Core.Tests.Spread;

public class NormalSamplerTests
{
    private const int Draws = 1_000_000;

    [Fact]
    public void LayerEdges_EveryLayer_HasTheAreaV()
    {
        // Marsaglia & Tsang (2000): every layer of the ziggurat has area V under f(x) = exp(−x²/2); the base layer is
        // r·f(r) plus the tail ∫_r^∞ f = √(π/2)·erfc(r/√2); the top layer x₁₂₇·(1 − f(x₁₂₇)). Tail area from MathNet's erfc.
        var x = NormalSampler.LayerEdges;
        static double F(double v) => Math.Exp(-0.5 * v * v);
        var r = NormalSampler.TailStart;
        var baseArea = r * F(r) + Math.Sqrt(Math.PI / 2) * MathNet.Numerics.SpecialFunctions.Erfc(r / Math.Sqrt(2));
        Near.Relative(NormalSampler.LayerArea, baseArea, 1e-9, "base layer area");
        Near.Relative(NormalSampler.LayerArea, x[0] * F(r), 1e-12, "x₀·f(r)");
        // r and V are published to 13 significant digits; the recursion carries their rounding up the layers, to about
        // 1e-9 relative at the top layer, which is closed by x₁₂₈ = 0 rather than by the recursion.
        for (var i = 1; i < NormalSampler.Layers; i++)
        {
            Near.Relative(NormalSampler.LayerArea, x[i] * (F(x[i + 1]) - F(x[i])), 1e-8, $"layer {i}");
        }
    }

    [Fact]
    public void Next_OneMillionDraws_PassesKolmogorovSmirnovAgainstMathNetNormalCdf()
    {
        var z = Draw(2024, NormalSampler.Next);
        var d = KolmogorovSmirnov(z, v => Normal.CDF(0, 1, v));
        Assert.True(d < KolmogorovCritical(0.999) / Math.Sqrt(Draws), $"D = {d}");
    }

    [Fact]
    public void Next_OneMillionDraws_HasTheMomentsOfAStandardNormal()
    {
        // Sample moments by MathNet; standard errors of the sample mean, variance, skewness and excess kurtosis of a
        // normal sample: 1/√n, √(2/n), √(6/n), √(24/n) (large-sample theory, e.g. Kendall & Stuart; from memory). 4 SE.
        var z = Draw(77, NormalSampler.Next);
        var stats = new DescriptiveStatistics(z);
        Near.Absolute(0, stats.Mean, 4 / Math.Sqrt(Draws), "mean");
        Near.Absolute(1, stats.Variance, 4 * Math.Sqrt(2.0 / Draws), "variance");
        Near.Absolute(0, stats.Skewness, 4 * Math.Sqrt(6.0 / Draws), "skewness");
        Near.Absolute(0, stats.Kurtosis, 4 * Math.Sqrt(24.0 / Draws), "excess kurtosis");
    }

    [Theory]
    [InlineData(NormalSampler.TailStart)]
    [InlineData(2.0)]
    [InlineData(4.0)]
    public void Next_OneMillionDraws_TailShareMatchesMathNet(double beyond)
    {
        // Share of |z| > a against 2·(1 − Φ(a)) from MathNet; a = r exercises the tail sampler. Binomial 4 SE.
        var z = Draw(5, NormalSampler.Next);
        var share = z.Count(v => Math.Abs(v) > beyond) / (double)Draws;
        var p = 2 * (1 - Normal.CDF(0, 1, beyond));
        Near.Absolute(p, share, 4 * Math.Sqrt(p * (1 - p) / Draws), $"P(|z| > {beyond})");
    }

    [Fact]
    public void NextSignedUniform_OneMillionDraws_PassesKolmogorovSmirnovAgainstMathNetUniformCdf()
    {
        var u = Draw(11, NormalSampler.NextSignedUniform);
        var d = KolmogorovSmirnov(u, v => ContinuousUniform.CDF(-1, 1, v));
        Assert.True(d < KolmogorovCritical(0.999) / Math.Sqrt(Draws), $"D = {d}");
        Assert.All(u, v => Assert.InRange(v, -1, 1));
    }

    private delegate double Sampler(ref Xoshiro256StarStar rng);

    private static double[] Draw(ulong seed, Sampler next)
    {
        var rng = Xoshiro256StarStar.FromSeed(seed);
        var values = new double[Draws];
        for (var i = 0; i < values.Length; i++)
        {
            values[i] = next(ref rng);
        }

        return values;
    }

    /// <summary>Kolmogorov–Smirnov statistic D = sup |F_n(x) − F(x)| of a sample against a CDF.</summary>
    private static double KolmogorovSmirnov(double[] sample, Func<double, double> cdf)
    {
        var sorted = sample.Order().ToArray();
        var n = (double)sorted.Length;
        double d = 0;
        for (var i = 0; i < sorted.Length; i++)
        {
            var f = cdf(sorted[i]);
            d = Math.Max(d, Math.Max((i + 1) / n - f, f - i / n));
        }

        return d;
    }

    /// <summary>
    /// Quantile of the Kolmogorov distribution, P(K ≤ x) = 1 − 2·Σ (−1)^(k−1)·exp(−2k²x²) (Kolmogorov 1933), solved by
    /// bisection; the limit of √n·D for a sample of n from the stated CDF.
    /// </summary>
    private static double KolmogorovCritical(double probability)
    {
        static double Cdf(double x)
        {
            double sum = 0;
            for (var k = 1; k <= 100; k++)
            {
                sum += (k % 2 == 1 ? 1 : -1) * Math.Exp(-2.0 * k * k * x * x);
            }

            return 1 - 2 * sum;
        }

        double lo = 0.3, hi = 3;
        for (var i = 0; i < 100; i++)
        {
            var mid = 0.5 * (lo + hi);
            if (Cdf(mid) < probability)
            {
                lo = mid;
            }
            else
            {
                hi = mid;
            }
        }

        return 0.5 * (lo + hi);
    }
}
