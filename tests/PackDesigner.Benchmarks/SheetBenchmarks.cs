using BenchmarkDotNet.Attributes;
using PackDesigner.Core.Demo;
using PackDesigner.Core.Evaluation;
using PackDesigner.Reports;
using PackDesigner.Reports.Model;
using PackDesigner.Reports.Pdf;

namespace PackDesigner.Benchmarks;

/// <summary>
/// Design sheet rendering, charts included, for the demo design. Targets: one sheet ≤ 150 ms median on one core;
/// with both cores busy (two sheets rendered in parallel) ≥ 10 sheets/s, that is ≤ 100 ms per sheet in
/// <see cref="TwoSheetsInParallel"/>, which reports the time per sheet.
/// </summary>
[MemoryDiagnoser]
[MedianColumn]
public class SheetBenchmarks
{
    private DesignSheetModel _model = null!;

    [GlobalSetup]
    public void Setup()
    {
        var input = DemoScenario.PickupConversion;
        var result = DesignEvaluator.Evaluate(input).Result ?? throw new InvalidOperationException("The demo design does not evaluate.");
        var header = new SheetHeader(
            DemoScenario.DesignName, DemoScenario.CustomerName, "Benchmark job", 1,
            new DateTime(2026, 1, 1, 12, 0, 0, DateTimeKind.Utc), DesignEvaluator.CalculationVersion,
            "0123456789abcdef0123456789abcdef", "draft");
        _model = DesignSheetModel.Create(header, input, result);
        // Fonts, the font resolver and the chart fonts are installed on the first render, once per process.
        DesignSheetRenderer.RenderPdf(_model, PaperSize.A4);
    }

    [Benchmark(Baseline = true)]
    public byte[] OneSheet() => DesignSheetRenderer.RenderPdf(_model, PaperSize.A4);

    [Benchmark(OperationsPerInvoke = 2)]
    public int TwoSheetsInParallel()
    {
        byte[]? a = null, b = null;
        Parallel.Invoke(
            () => a = DesignSheetRenderer.RenderPdf(_model, PaperSize.A4),
            () => b = DesignSheetRenderer.RenderPdf(_model, PaperSize.A4));
        return a!.Length + b!.Length;
    }
}
