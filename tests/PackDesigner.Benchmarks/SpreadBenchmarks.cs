using BenchmarkDotNet.Attributes;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;
using PackDesigner.Core.Spread;

namespace PackDesigner.Benchmarks;

/// <summary>
/// The spread Monte Carlo on a 96S4P string, 10 000 trials (3.84 million cells, each drawing a capacity and a
/// resistance), against the bare cost of drawing the same random numbers with the same generator, per-trial streams
/// and parallel chunks (the baseline). Results in docs/performance.md.
/// </summary>
[MemoryDiagnoser]
public class SpreadBenchmarks
{
    private const int Trials = 10_000;
    private const int Cells = 96 * 4;
    private const long Seed = 42;

    private SpreadRequest _bottom = null!;
    private SpreadRequest _top = null!;
    private SpreadRequest _riskLimited = null!;

    [GlobalSetup]
    public void Setup()
    {
        // A generic LFP cell on the preset's typical figures; equipment chosen so the design has no window errors.
        var design = new DesignInput
        {
            Cell = new CellInput { Chemistry = Chemistry.Lfp },
            Series = 96,
            Parallel = 4,
            SocWindow = new SocWindowInput(10, 90),
            Controller = new ControllerInput(275, 360, 300, 400, 10, 100, 1000, 1),
            Charger = new ChargerInput(350, 60, 0.1, false),
            Ambient = new AmbientInput(10, 35),
        };
        var spread = new SpreadSettings { Trials = Trials, Seed = Seed };
        _bottom = new SpreadRequest { Design = design, Spread = spread };
        _top = new SpreadRequest { Design = design with { Balancing = BalancingMethod.Top }, Spread = spread };

        // CV 3.42 V per cell with σ = 2 %: more than 0.1 % of packs trip, so a second pass runs at the recommended CV.
        _riskLimited = new SpreadRequest
        {
            Design = design with { Charger = design.Charger with { TargetCellVoltage = 3.42, VoltageStepV = 0.01 } },
            Spread = spread with { CapacitySigmaPercent = 2 },
        };
    }

    /// <summary>Draws exactly the normals the Monte Carlo draws (two per cell) in the same streams and chunks, and nothing else.</summary>
    [Benchmark(Baseline = true)]
    public double DrawOnly() => Draw(2);

    /// <summary>One normal per cell: 3.84 million numbers.</summary>
    [Benchmark]
    public double DrawOnlyOnePerCell() => Draw(1);

    [Benchmark]
    public double MonteCarloBottomBalanced() => SpreadMonteCarlo.Analyze(_bottom).Result!.UsableEnergyWh.P50;

    [Benchmark]
    public double MonteCarloTopBalanced() => SpreadMonteCarlo.Analyze(_top).Result!.UsableEnergyWh.P50;

    [Benchmark]
    public double MonteCarloRiskLimitedTwoPasses() => SpreadMonteCarlo.Analyze(_riskLimited).Result!.RecommendedConstantVoltage;

    private static double Draw(int perCell)
    {
        var chunks = (Trials + SpreadLimits.ChunkSize - 1) / SpreadLimits.ChunkSize;
        double total = 0;
        var gate = new object();
        Parallel.For(
            0,
            chunks,
            () => 0.0,
            (chunk, _, sum) =>
            {
                var from = chunk * SpreadLimits.ChunkSize;
                var to = Math.Min(Trials, from + SpreadLimits.ChunkSize);
                for (var t = from; t < to; t++)
                {
                    var rng = Xoshiro256StarStar.ForStream(Seed, (ulong)t);
                    for (var k = 0; k < Cells * perCell; k++)
                    {
                        sum += NormalSampler.Next(ref rng);
                    }
                }

                return sum;
            },
            sum =>
            {
                lock (gate)
                {
                    total += sum;
                }
            });
        return total;
    }
}
