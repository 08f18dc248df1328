using PackDesigner.Core.Charging;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Findings;
using PackDesigner.Core.Protection;
using PackDesigner.Core.Tests.TestData;
using PackDesigner.Core.Voltages;

namespace PackDesigner.Core.Tests.Protection;

public sealed class LadderBuilderTests
{
    private static readonly string[] Order =
    [
        LadderBuilder.DatasheetMax, LadderBuilder.OverVoltageTrip, LadderBuilder.OverVoltageRelease,
        LadderBuilder.HighestCellEndOfCharge, LadderBuilder.ChargeVoltage, LadderBuilder.WindowTop,
        LadderBuilder.WindowBottom, LadderBuilder.LowestCellUnderLoad, LadderBuilder.ControllerCutoff,
        LadderBuilder.UnderVoltageRelease, LadderBuilder.UnderVoltageTrip, LadderBuilder.DatasheetMin,
    ];

    /// <summary>A ladder in the documented order with the given per-cell voltages (S = 1).</summary>
    private static List<LadderLayer> Ladder(params double[] perCell) =>
        Order.Select((key, i) => new LadderLayer(key, "Layer " + key, perCell[i], perCell[i])).ToList();

    private static readonly double[] Healthy = [3.65, 3.60, 3.50, 3.40, 3.39, 3.35, 3.20, 3.05, 2.95, 2.85, 2.70, 2.50];

    private static IReadOnlyList<LadderLayer> BuildFor(DesignBuilder design)
    {
        var ctx = design.Context();
        var (cellT, _) = ThresholdCalculator.Compute(ctx);
        var charge = ChargeSetpointCalculator.Compute(ctx, cellT);
        var voltages = PackVoltageCalculator.Compute(ctx, charge.Model);
        return LadderBuilder.Build(ctx, cellT, charge, voltages);
    }

    [Fact]
    public void Build_Design_ListsEveryLayerInOrderPerCellAndPerPack()
    {
        var ladder = BuildFor(DesignBuilder.Default());

        Assert.Equal(Order, ladder.Select(l => l.Layer));
        Assert.All(ladder, l => Assert.Equal(l.PerCellVoltage * 16, l.PackVoltage, 10));
        Assert.All(ladder, l => Assert.False(string.IsNullOrWhiteSpace(l.Label)));
    }

    [Fact]
    public void Build_Design_TakesEachLayerFromItsSource()
    {
        // LFP preset (3.65 / 2.5 V), default margins, window 10–90 % (preset curve 3.20 / 3.345 V), controller 46.4 V / 16.
        var ladder = BuildFor(DesignBuilder.Default()).ToDictionary(l => l.Layer, l => l.PerCellVoltage);

        Assert.Equal(3.65, ladder[LadderBuilder.DatasheetMax], 12);
        Assert.Equal(3.60, ladder[LadderBuilder.OverVoltageTrip], 12);
        Assert.Equal(3.50, ladder[LadderBuilder.OverVoltageRelease], 12);
        Assert.Equal(3.345, ladder[LadderBuilder.WindowTop], 12);
        Assert.Equal(3.20, ladder[LadderBuilder.WindowBottom], 12);
        Assert.Equal(2.9, ladder[LadderBuilder.ControllerCutoff], 12);
        Assert.Equal(2.85, ladder[LadderBuilder.UnderVoltageRelease], 12);
        Assert.Equal(2.70, ladder[LadderBuilder.UnderVoltageTrip], 12);
        Assert.Equal(2.50, ladder[LadderBuilder.DatasheetMin], 12);
    }

    [Fact]
    public void Build_WithExternalResistance_ChargeVoltageLayerIsCvLessTerminationDropPerCell()
    {
        var design = DesignBuilder.Default().WithLinks(1).WithCable(16, 2);
        var ctx = design.Context();
        var (cellT, _) = ThresholdCalculator.Compute(ctx);
        var charge = ChargeSetpointCalculator.Compute(ctx, cellT);

        var layer = BuildFor(design).Single(l => l.Layer == LadderBuilder.ChargeVoltage);

        var drop = charge.Result.TerminationCurrentA * (15 * 1e-3 + 2.0 / (58 * 16));
        Assert.Equal((charge.Result.ConstantVoltage - drop) / 16, layer.PerCellVoltage, 12);
    }

    [Fact]
    public void Check_HealthyLadder_ReturnsNoFinding()
    {
        Assert.Empty(LadderBuilder.Check(Ladder(Healthy)));
    }

    [Fact]
    public void Check_LayerAboveTheOneAbove_ReportsErrorNamingBothLayersAndTheirFields()
    {
        var values = (double[])Healthy.Clone();
        values[8] = 3.10; // controller cut-off above the lowest cell under load

        var finding = Assert.Single(LadderBuilder.Check(Ladder(values)));

        Assert.Equal(Severity.Error, finding.Severity);
        Assert.Equal("ladder.out-of-order", finding.Code);
        Assert.Contains("\"Layer controller-cutoff\"", finding.Message, StringComparison.Ordinal);
        Assert.Contains("\"Layer lowest-cell-under-load\"", finding.Message, StringComparison.Ordinal);
        Assert.Contains("3.100 V", finding.Message, StringComparison.Ordinal);
        Assert.Contains("controller.minVoltage", finding.Fields);
        Assert.Contains("controller.peakCurrentA", finding.Fields);
    }

    [Fact]
    public void Check_TwoBrokenPairs_ReportsEach()
    {
        var values = (double[])Healthy.Clone();
        values[3] = 3.55; // highest cell above the OV release
        values[10] = 2.40; // UV trip below the datasheet minimum

        var findings = LadderBuilder.Check(Ladder(values)).ToList();

        Assert.Equal(2, findings.Count);
        Assert.Contains(findings, f => f.Message.Contains("highest-cell-end-of-charge", StringComparison.Ordinal) && f.Message.Contains("ov-release", StringComparison.Ordinal));
        Assert.Contains(findings, f => f.Message.Contains("datasheet-min", StringComparison.Ordinal) && f.Message.Contains("uv-trip", StringComparison.Ordinal));
    }

    [Theory]
    [InlineData(1, 2)]
    [InlineData(9, 10)]
    public void Check_TripEqualToRelease_IsOutOfOrder(int tripIndex, int releaseIndex)
    {
        var values = (double[])Healthy.Clone();
        values[releaseIndex] = values[tripIndex];

        var finding = Assert.Single(LadderBuilder.Check(Ladder(values)));

        Assert.Contains("must be below", finding.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_EqualNonStrictLayers_AreInOrder()
    {
        var values = (double[])Healthy.Clone();
        values[1] = values[0]; // OV trip at the datasheet maximum
        values[11] = values[10]; // UV trip at the datasheet minimum

        Assert.Empty(LadderBuilder.Check(Ladder(values)));
    }

    [Theory]
    [InlineData(0.00009, false)]
    [InlineData(0.0002, true)]
    public void Check_LayerAboveByLessThanTenthOfMillivolt_IsTolerated(double excessV, bool broken)
    {
        var values = (double[])Healthy.Clone();
        values[7] = values[6] + excessV;

        Assert.Equal(broken, LadderBuilder.Check(Ladder(values)).Any());
    }

    [Theory]
    [InlineData(0.004, 0.00625, false)]
    [InlineData(0.007, 0.00625, true)]
    [InlineData(0.004, 0, true)]
    public void Check_ChargeVoltageBelowWindowTopByLessThanChargerStep_IsTolerated(double shortfallV, double stepPerCellV, bool broken)
    {
        // The CV is rounded down to the charger's step: it may end up to one step (per cell) below the window top.
        var values = (double[])Healthy.Clone();
        values[4] = values[5] - shortfallV;

        Assert.Equal(broken, LadderBuilder.Check(Ladder(values), stepPerCellV).Any());
    }

    [Fact]
    public void FieldsOf_EveryLayer_NamesInputFields()
    {
        Assert.All(Order, key => Assert.NotEmpty(LadderBuilder.FieldsOf(key)));
        Assert.Empty(LadderBuilder.FieldsOf("no-such-layer"));
    }
}
