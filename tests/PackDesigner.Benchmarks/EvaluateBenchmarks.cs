using BenchmarkDotNet.Attributes;
using PackDesigner.Core.Demo;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;

namespace PackDesigner.Benchmarks;

/// <summary>
/// Evaluation cost: the demo design (target ≤ 20 µs median on one core), and a 400S×20P design against a 4S×1P
/// one (target ≤ 1.5×: the cost must not grow with the cell count). The 4S×1P case is the baseline.
/// </summary>
[MemoryDiagnoser]
[MedianColumn]
public class EvaluateBenchmarks
{
    private readonly DesignInput _demo = DemoScenario.PickupConversion;

    private readonly DesignInput _small = DemoScenario.PickupConversion with
    {
        Series = 4,
        Parallel = 1,
        Controller = DemoScenario.PickupConversion.Controller with { MinVoltage = 10, MaxVoltage = 16, ContinuousCurrentA = 100, PeakCurrentA = 200 },
        Charger = DemoScenario.PickupConversion.Charger with { MaxVoltage = 15 },
    };

    private readonly DesignInput _large = DemoScenario.PickupConversion with
    {
        Series = 400,
        Parallel = 20,
        Controller = DemoScenario.PickupConversion.Controller with { MinVoltage = 1100, MaxVoltage = 1500 },
        Charger = DemoScenario.PickupConversion.Charger with { MaxVoltage = 1450 },
    };

    [Benchmark(Baseline = true)]
    public EvaluationOutcome Small4S1P() => DesignEvaluator.Evaluate(_small);

    [Benchmark]
    public EvaluationOutcome Demo32S2P() => DesignEvaluator.Evaluate(_demo);

    [Benchmark]
    public EvaluationOutcome Large400S20P() => DesignEvaluator.Evaluate(_large);
}
