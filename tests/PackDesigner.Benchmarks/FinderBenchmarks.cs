using BenchmarkDotNet.Attributes;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;
using PackDesigner.Core.Finder;

namespace PackDesigner.Benchmarks;

/// <summary>The configuration finder over S = 1…400 × P = 1…50 (20 000 combinations). Results in docs/performance.md.</summary>
[MemoryDiagnoser]
public class FinderBenchmarks
{
    private ConfigurationRequest _open = null!;
    private ConfigurationRequest _targets = null!;

    [GlobalSetup]
    public void Setup()
    {
        var cell = new CellInput { Chemistry = Chemistry.Lfp };
        var controller = new ControllerInput(250, 420, 200, 500, 10, 50, 1000, 1);

        // No targets: every S that fits the 250–420 V window with P from 3 to 50 is a candidate (about 2 000 of them,
        // each run through the full evaluator).
        _open = new ConfigurationRequest { Cell = cell, Controller = controller, Ambient = new AmbientInput(0, 35) };
        _targets = _open with { Targets = new ConfigurationTargets { MinUsableEnergyWh = 75_000, MaxCells = 500, CostPerCell = 40 } };
    }

    [Benchmark]
    public int FinderNoTargets() => ConfigurationFinder.Find(_open).Result!.Candidates.Count;

    [Benchmark]
    public int FinderWithTargets() => ConfigurationFinder.Find(_targets).Result!.Candidates.Count;
}
