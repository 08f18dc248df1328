using BenchmarkDotNet.Attributes;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;
using PackDesigner.Core.Spread;

namespace PackDesigner.Benchmarks;

/// <summary>
/// How the Monte Carlo scales: time should grow with trials × cells, allocated memory not with the trials
/// (fixed histograms, nothing kept per trial). A short job, to keep the sweep quick.
/// </summary>
[MemoryDiagnoser]
[ShortRunJob]
public class SpreadScalingBenchmarks
{
    private SpreadRequest _request = null!;

    [Params(2_000, 10_000, 50_000)]
    public int Trials { get; set; }

    [Params(24, 96)]
    public int Series { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        var design = new DesignInput
        {
            Cell = new CellInput { Chemistry = Chemistry.Lfp },
            Series = Series,
            Parallel = 4,
            SocWindow = new SocWindowInput(10, 90),
            Controller = new ControllerInput(Series * 2.86, Series * 3.75, 300, 400, 10, 100, 1000, 1),
            Charger = new ChargerInput(Series * 3.65, 60, 0.1, false),
            Ambient = new AmbientInput(10, 35),
        };
        _request = new SpreadRequest { Design = design, Spread = new SpreadSettings { Trials = Trials, Seed = 42 } };
    }

    [Benchmark]
    public double MonteCarlo() => SpreadMonteCarlo.Analyze(_request).Result!.UsableEnergyWh.P50;
}
