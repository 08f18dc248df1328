namespace PackDesigner.Core.Numerics;

/// <summary>
/// Root of a monotone function on a bracket [lo, hi] by Newton's method safeguarded with bisection
/// (a Newton step that leaves the current bracket is replaced by a bisection step; see Press et al.,
/// Numerical Recipes, 3rd ed., §9.4, "rtsafe").
/// </summary>
public static class RootFinder
{
    /// <summary>Tries to find x in [lo, hi] with f(x) = 0. Returns false when f(lo) and f(hi) have the same sign or after <paramref name="maxIterations"/>.</summary>
    public static bool TrySolve(
        Func<double, double> f,
        Func<double, double> derivative,
        double lo,
        double hi,
        out double root,
        double tolerance = 1e-10,
        int maxIterations = 100)
    {
        root = double.NaN;
        var flo = f(lo);
        var fhi = f(hi);
        if (!double.IsFinite(flo) || !double.IsFinite(fhi))
        {
            return false;
        }

        if (flo == 0)
        {
            root = lo;
            return true;
        }

        if (fhi == 0)
        {
            root = hi;
            return true;
        }

        if (Math.Sign(flo) == Math.Sign(fhi))
        {
            return false;
        }

        // Orient so that f(a) < 0 < f(b).
        double a = flo < 0 ? lo : hi, b = flo < 0 ? hi : lo;
        var x = 0.5 * (lo + hi);
        for (var i = 0; i < maxIterations; i++)
        {
            var fx = f(x);
            if (fx == 0)
            {
                root = x;
                return true;
            }

            if (fx < 0)
            {
                a = x;
            }
            else
            {
                b = x;
            }

            var d = derivative(x);
            var next = d != 0 && double.IsFinite(d) ? x - fx / d : double.NaN;
            var low = Math.Min(a, b);
            var high = Math.Max(a, b);
            if (!(next > low && next < high))
            {
                next = 0.5 * (a + b);
            }

            if (Math.Abs(next - x) <= tolerance * Math.Max(1.0, Math.Abs(x)) || high - low <= tolerance)
            {
                root = next;
                return true;
            }

            x = next;
        }

        return false;
    }

    /// <summary>As <see cref="TrySolve"/>, but throws <see cref="RootNotFoundException"/> on failure.</summary>
    public static double Solve(Func<double, double> f, Func<double, double> derivative, double lo, double hi, double tolerance = 1e-10, int maxIterations = 100)
    {
        return TrySolve(f, derivative, lo, hi, out var root, tolerance, maxIterations)
            ? root
            : throw new RootNotFoundException($"No root of the function in [{lo}, {hi}] within {maxIterations} iterations.");
    }
}
