using PackDesigner.Core.Charging;
using PackDesigner.Core.Design;
using PackDesigner.Core.Protection;
using PackDesigner.Core.Standards;
using PackDesigner.Core.Tests.TestData;
using PackDesigner.Core.Voltages;

namespace PackDesigner.Core.Tests.Voltages;

/// <summary>Straight-line test cell V(s) = 3.0 + 0.6·s, 1 mΩ at 25 °C; 8S2P; window 10–90 %.</summary>
public sealed class PackVoltageCalculatorTests
{
    private static DesignBuilder LinearDesign() => DesignBuilder.Default()
        .WithCell(TestCells.CompleteCustom() with { ColdInternalResistanceMilliohm = 4, ColdResistanceTemperatureC = -10 })
        .WithSeries(8)
        .WithParallel(2)
        .WithLinks(0.2)
        .WithWindow(10, 90)
        .WithAmbient(-10, 30)
        .WithController(c => c with { PeakCurrentA = 300, RegenCurrentA = 60, MinVoltage = 23.5, MaxVoltage = 32 });

    private static PackVoltages Compute(DesignBuilder design)
    {
        var ctx = design.Context();
        var (cellT, _) = ThresholdCalculator.Compute(ctx);
        var charge = ChargeSetpointCalculator.Compute(ctx, cellT);
        return PackVoltageCalculator.Compute(ctx, charge.Model);
    }

    [Fact]
    public void Compute_Design_DatasheetAndWindowVoltagesAreSeriesTimesCell()
    {
        var v = Compute(LinearDesign());

        Assert.Equal(8 * 3.8, v.Max, 12);
        Assert.Equal(8 * 3.3, v.Nominal, 12);
        Assert.Equal(8 * 2.8, v.Min, 12);
        Assert.Equal(8 * (3.0 + 0.6 * 0.9), v.WindowHigh, 12);
        Assert.Equal(8 * (3.0 + 0.6 * 0.1), v.WindowLow, 12);
    }

    [Fact]
    public void Compute_PeakAndRegen_ApplyOhmsLawWithColdPackResistance()
    {
        // The datasheet's cold resistance (4 mΩ at −10 °C) is the coldest ambient's: R_pack = 8·4/2 + 7·0.2 mΩ = 17.4 mΩ.
        const double rPackCold = 8 * 4e-3 / 2 + 7 * 0.2e-3;

        var v = Compute(LinearDesign());

        Reference.AssertClose(8 * 3.06 - 300 * rPackCold, v.LoadedLow, 1e-12, "V = S·OCV − I·R (Ohm's law)");
        Reference.AssertClose(8 * 3.54 + 60 * rPackCold, v.RegenHigh, 1e-12, "V = S·OCV + I·R (Ohm's law)");
        // Bottom-balanced, the weakest group sits higher than the typical one at the bottom: the typical cell is lowest.
        Reference.AssertClose(3.06 - 300.0 / 2 * 4e-3, v.LowestCellUnderLoad, 1e-12, "cell OCV − (I/P)·R_cell");
    }

    [Fact]
    public void Compute_TopBalanced_LowestCellIsTheWeakestGroup()
    {
        // Top-balanced, the weakest group (r = 1/0.95) is at w = 1 − 0.9·r at the window bottom.
        const double w = 1 - 0.9 / 0.95;

        var v = Compute(LinearDesign().WithBalancing(BalancingMethod.Top));

        Reference.AssertClose(3.0 + 0.6 * w - 300.0 / 2 * 4e-3, v.LowestCellUnderLoad, 1e-12, "weakest group's OCV − (I/P)·R_cell");
    }

    [Fact]
    public void Compute_HugePeak_ClampsLoadedVoltagesAtZero()
    {
        var v = Compute(LinearDesign().WithController(c => c with { PeakCurrentA = 50_000 }));

        Assert.Equal(0, v.LoadedLow);
        Assert.Equal(0, v.LowestCellUnderLoad);
    }

    [Theory]
    [InlineData(16, VoltageClass.A)]
    [InlineData(17, VoltageClass.B)]
    public void Compute_PackMaximum_ClassifiesByIso6469(int series, VoltageClass expected)
    {
        // ISO 6469-3: class A ≤ 60 V DC. 16 × 3.65 V = 58.4 V; 17 × 3.65 V = 62.05 V.
        var v = Compute(DesignBuilder.Default().WithSeries(series));

        Assert.Equal(expected, v.VoltageClass);
    }
}
