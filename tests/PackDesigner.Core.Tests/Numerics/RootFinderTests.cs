using PackDesigner.Core.Numerics;

namespace PackDesigner.Core.Tests.Numerics;

public sealed class RootFinderTests
{
    [Fact]
    public void Solve_SquareMinusTwo_ReturnsSquareRootOfTwo()
    {
        var root = RootFinder.Solve(x => x * x - 2, x => 2 * x, 0, 2, 1e-14);

        Reference.AssertClose(ReferenceValues.SquareRootOfTwo, root, 1e-13);
    }

    [Fact]
    public void Solve_CosMinusX_ReturnsDottieNumber()
    {
        var root = RootFinder.Solve(x => Math.Cos(x) - x, x => -Math.Sin(x) - 1, 0, 1, 1e-14);

        Reference.AssertClose(ReferenceValues.DottieNumber, root, 1e-13);
    }

    [Fact]
    public void Solve_CubicWherePlainNewtonCycles_ConvergesThroughBisectionSafeguard()
    {
        // Plain Newton on x³ − 2x + 2 from x = 0 cycles 0 → 1 → 0 (textbook example); the bracketed
        // solver (Numerical Recipes rtsafe) must still find the real root.
        var root = RootFinder.Solve(x => x * x * x - 2 * x + 2, x => 3 * x * x - 2, -2, 0, 1e-14);

        Reference.AssertClose(ReferenceValues.CubicRoot, root, 1e-13);
    }

    [Fact]
    public void Solve_DecreasingFunction_FindsRoot()
    {
        var root = RootFinder.Solve(x => 2 - x * x, x => -2 * x, 0, 2, 1e-14);

        Reference.AssertClose(ReferenceValues.SquareRootOfTwo, root, 1e-13);
    }

    [Fact]
    public void Solve_DerivativeAlwaysZero_FallsBackToBisection()
    {
        var root = RootFinder.Solve(x => x * x - 2, _ => 0, 0, 2, 1e-13);

        Reference.AssertClose(ReferenceValues.SquareRootOfTwo, root, 1e-12);
    }

    [Fact]
    public void Solve_DerivativeNotFinite_FallsBackToBisection()
    {
        var root = RootFinder.Solve(x => x * x - 2, _ => double.NaN, 0, 2, 1e-13);

        Reference.AssertClose(ReferenceValues.SquareRootOfTwo, root, 1e-12);
    }

    [Fact]
    public void Solve_StepFunction_ConvergesToTheJump()
    {
        var root = RootFinder.Solve(x => x < 0.3 ? -1 : 1, _ => 0, 0, 1, 1e-12);

        Assert.Equal(0.3, root, 10);
    }

    [Fact]
    public void Solve_RootAtEndOfBracket_ReturnsThatEnd()
    {
        Assert.Equal(1.0, RootFinder.Solve(x => x - 1, _ => 1, 1, 3));
        Assert.Equal(3.0, RootFinder.Solve(x => x - 3, _ => 1, 1, 3));
    }

    [Fact]
    public void TrySolve_NoSignChange_ReturnsFalse()
    {
        var found = RootFinder.TrySolve(x => x * x + 1, x => 2 * x, -1, 1, out var root);

        Assert.False(found);
        Assert.True(double.IsNaN(root));
    }

    [Fact]
    public void TrySolve_FunctionNotFiniteAtBracket_ReturnsFalse()
    {
        Assert.False(RootFinder.TrySolve(x => 1 / x, x => -1 / (x * x), 0, 1, out _));
        Assert.False(RootFinder.TrySolve(_ => double.NaN, _ => 1, 0, 1, out _));
    }

    [Fact]
    public void TrySolve_TooFewIterations_ReturnsFalse()
    {
        var found = RootFinder.TrySolve(x => x < 0.3 ? -1 : 1, _ => 0, 0, 1, out _, tolerance: 1e-15, maxIterations: 3);

        Assert.False(found);
    }

    [Fact]
    public void Solve_NoSignChange_ThrowsRootNotFoundException()
    {
        var ex = Assert.Throws<RootNotFoundException>(() => RootFinder.Solve(x => x * x + 1, x => 2 * x, -1, 1));

        Assert.Contains("[-1, 1]", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Solve_TooFewIterations_ThrowsRootNotFoundException()
    {
        Assert.Throws<RootNotFoundException>(() => RootFinder.Solve(x => x < 0.3 ? -1 : 1, _ => 0, 0, 1, 1e-15, 3));
    }
}
