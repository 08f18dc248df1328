using System.Diagnostics;
using System.Globalization;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;
using PackDesigner.Core.Spread;

namespace PackDesigner.Benchmarks;

/// <summary>
/// <c>dotnet run -c Release --project tests/PackDesigner.Benchmarks -- cpu-time</c>: the processor time (not wall
/// time) of one thread running the 96S4P Monte Carlo against drawing the same random numbers, so the ratio holds on a
/// machine whose cores are shared with other work. Minimum and median of the repetitions.
/// </summary>
public static class CpuTime
{
    public static void Run(int repetitions = 15)
    {
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
        var request = new SpreadRequest { Design = design, Spread = new SpreadSettings { Trials = 10_000, Seed = 42 } };
        var oneThread = new SpreadRunOptions { MaxDegreeOfParallelism = 1 };
        var process = Process.GetCurrentProcess();
        double Cpu()
        {
            process.Refresh();
            return process.TotalProcessorTime.TotalMilliseconds;
        }

        var draw = new List<double>();
        var monteCarlo = new List<double>();
        double sink = 0;
        for (var i = 0; i < repetitions + 3; i++)
        {
            var c0 = Cpu();
            sink += DrawOneThread(2);
            var c1 = Cpu();
            sink += SpreadMonteCarlo.Analyze(request, oneThread).Result!.UsableEnergyWh.P50;
            var c2 = Cpu();
            if (i >= 3)
            {
                draw.Add(c1 - c0);
                monteCarlo.Add(c2 - c1);
            }
        }

        static double Median(List<double> x) => x.Order().ElementAt(x.Count / 2);
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"CPU time, one thread, {repetitions} repetitions: draw only min {draw.Min():0} ms / median {Median(draw):0} ms; Monte Carlo min {monteCarlo.Min():0} ms / median {Median(monteCarlo):0} ms; ratio of medians {Median(monteCarlo) / Median(draw):0.00} (check value {sink:0})"));
    }

    private static double DrawOneThread(int perCell)
    {
        double sum = 0;
        for (var t = 0; t < 10_000; t++)
        {
            var rng = Xoshiro256StarStar.ForStream(42, (ulong)t);
            for (var k = 0; k < 96 * 4 * perCell; k++)
            {
                sum += NormalSampler.Next(ref rng);
            }
        }

        return sum;
    }
}
