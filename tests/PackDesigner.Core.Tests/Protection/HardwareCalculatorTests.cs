using PackDesigner.Core.Protection;
using PackDesigner.Core.Tests.TestData;
using PackDesigner.Core.Thermal;

namespace PackDesigner.Core.Tests.Protection;

public sealed class HardwareCalculatorTests
{
    /// <summary>A custom cell whose pack maximum is 3.7 V per cell and whose resistance is 1.5 mΩ, as in the 96S2P worked example.</summary>
    private static DesignBuilder WorkedExample96S2P() => DesignBuilder.Default()
        .WithCell(TestCells.CompleteCustom() with { MaxChargeVoltage = 3.7, NominalVoltage = 3.3, InternalResistanceMilliohm = 1.5 })
        .WithSeries(96)
        .WithParallel(2)
        .WithAmbient(-10, 25);

    [Fact]
    public void Compute_96S2PWorkedExample_ProspectiveShortCircuitIs4933A()
    {
        // REFERENCES.md: 96S2P, 3.7 V, 1.5 mΩ → 72 mΩ, 4 933 A. At a hottest ambient of 25 °C the resistance is the 25 °C value.
        var result = HardwareCalculator.Compute(WorkedExample96S2P().Context(), 10);

        Reference.AssertClose(ReferenceValues.ShortCircuit96S2P, result.ProspectiveShortCircuitA, 1e-12);
        Reference.AssertClose(ReferenceValues.ShortCircuit96S2PLoop.Value * 1000, result.ShortCircuitLoopResistanceMilliohm, 1e-12, ReferenceValues.ShortCircuit96S2PLoop.Source);
        Assert.Equal(result.ProspectiveShortCircuitA, result.FuseMinInterruptingRatingA);
        Reference.AssertClose(96 * 3.7, result.FuseMinVoltageRating, 1e-14, "fuse DC voltage rating ≥ pack maximum");
        Reference.AssertClose(96 * 3.7, result.ContactorMinVoltageRating, 1e-14, "contactor voltage rating ≥ pack maximum");
    }

    [Fact]
    public void Compute_96S2PWith10MilliohmCable_ProspectiveShortCircuitIs4332A()
    {
        // 10 mm² × 5.8 m of copper = 5.8/(58·10) = 10 mΩ (IEC 60028); REFERENCES.md: 4 332 A with 10 mΩ external.
        var result = HardwareCalculator.Compute(WorkedExample96S2P().WithCable(10, 5.8).Context(), 10);

        Reference.AssertClose(ReferenceValues.ShortCircuit96S2PWith10Milliohm, result.ProspectiveShortCircuitA, 1e-12);
        Reference.AssertClose(10, result.CableResistanceMilliohm!.Value, 1e-12, "IEC 60028: 5.8 m / (58 · 10 mm²)");
    }

    [Fact]
    public void Compute_96S2PWith10MilliohmOfLinks_ProspectiveShortCircuitIs4332A()
    {
        // 95 links of 10/95 mΩ each make the same 10 mΩ external resistance.
        var result = HardwareCalculator.Compute(WorkedExample96S2P().WithLinks(10.0 / 95).Context(), 10);

        Reference.AssertClose(ReferenceValues.ShortCircuit96S2PWith10Milliohm, result.ProspectiveShortCircuitA, 1e-12);
        Reference.AssertClose(10, result.LinkResistanceTotalMilliohm, 1e-12, "(S − 1) links");
        Assert.Null(result.CableResistanceMilliohm);
        Assert.Null(result.CableCurrentDensityAPerMm2);
    }

    [Fact]
    public void Compute_HotAmbient_UsesArrheniusResistanceAtHottestAmbient()
    {
        // R(45 °C) = R₂₅·exp(Eₐ/R·(1/T − 1/T₂₅)) with the default Eₐ of 25 kJ/mol, written out here.
        var ctx = WorkedExample96S2P().WithAmbient(0, 45).Context();
        var rHot = 1.5e-3 * Math.Exp(Arrhenius.DefaultResistanceActivationEnergyJPerMol / ReferenceValues.GasConstant.Value * (1 / 318.15 - 1 / 298.15));

        var result = HardwareCalculator.Compute(ctx, 10);

        // 1e-9: Core rounds R to 8.314462618, the reference uses N_A·k to 15 digits.
        Reference.AssertClose(96 * 3.7 / (96 * rHot / 2), result.ProspectiveShortCircuitA, 1e-9, "I_sc with the resistance at 45 °C");
        Assert.True(result.ProspectiveShortCircuitA > ReferenceValues.ShortCircuit96S2P.Value);
    }

    [Theory]
    [InlineData(50, 10, 50, 62.5, 70)]
    [InlineData(50, 60, 60, 75, 80)]
    [InlineData(80, 0.5, 80, 100, 100)]
    [InlineData(400, 10, 400, 500, 500)]
    [InlineData(480.1, 10, 480.1, 600.125, 601)]
    public void Compute_ContinuousCurrent_FuseIs125PercentRoundedUpToNecRating(double controllerA, double chargerCcA, double continuousA, double fuseMinA, double ratingA)
    {
        // NEC 210.20(A): 125 % of the continuous load; NEC 240.6(A): next standard rating (601 A is a standard fuse rating).
        var ctx = DesignBuilder.Default().WithParallel(5).WithController(c => c with { ContinuousCurrentA = controllerA, PeakCurrentA = 2 * controllerA }).Context();

        var result = HardwareCalculator.Compute(ctx, chargerCcA);

        Assert.Equal(continuousA, result.ContinuousCurrentA, 12);
        Reference.AssertClose(fuseMinA, result.FuseMinimumA, 1e-14, "NEC 210.20(A)");
        Assert.Equal(ratingA, result.FuseRatingA);
        Assert.Equal(result.FuseMinimumA, result.ContactorContinuousA);
    }

    [Fact]
    public void Compute_FuseAboveLargestStandardRating_HasNoRating()
    {
        var ctx = DesignBuilder.Default().WithParallel(50).WithController(c => c with { ContinuousCurrentA = 5000, PeakCurrentA = 8000 }).Context();

        var result = HardwareCalculator.Compute(ctx, 20);

        Assert.Equal(6250, result.FuseMinimumA, 12);
        Assert.Null(result.FuseRatingA);
    }

    [Theory]
    [InlineData(100, 20, 10, 100)]
    [InlineData(100, 150, 10, 150)]
    [InlineData(100, 20, 120, 120)]
    public void Compute_ContactorBreakingCurrent_IsLargestLoadCurrent(double peakA, double regenA, double chargerCcA, double expectedA)
    {
        var ctx = DesignBuilder.Default().WithController(c => c with { PeakCurrentA = peakA, RegenCurrentA = regenA }).Context();

        Assert.Equal(expectedA, HardwareCalculator.Compute(ctx, chargerCcA).ContactorBreakingCurrentA);
    }

    [Fact]
    public void Compute_DcLinkCapacitance_SizesPrechargeForPackMaximum()
    {
        // 16 × 3.65 V = 58.4 V; 1000 µF; 95 % in 0.5 s → τ = 0.5/3 s, R = τ/C; ½CV² (circuit theory).
        var result = HardwareCalculator.Compute(DesignBuilder.Default().Context(), 20);
        var expected = Precharge.Size(58.4, 1000e-6, 0.5);

        Reference.AssertClose(0.5 / 3 / 1000e-6, result.PrechargeResistanceOhm!.Value, 1e-12, "R = τ/C");
        Reference.AssertClose(0.5 * 1000e-6 * 58.4 * 58.4, result.PrechargeEnergyJ!.Value, 1e-12, "½CV²");
        Assert.Equal(expected.PeakCurrentA, result.PrechargePeakCurrentA);
        Assert.Equal(expected.PeakPowerW, result.PrechargePeakPowerW);
        Assert.Equal(expected.AveragePowerW, result.PrechargeAveragePowerW);
        Assert.Equal(expected.TimeTo95PercentS, result.PrechargeTimeS);
        Assert.Equal(expected.TimeTo99PercentS, result.PrechargeTimeTo99PercentS);
        Assert.Equal(0.95 * 58.4, result.PrechargeCloseVoltage!.Value, 12);
    }

    [Fact]
    public void Compute_ZeroDcLinkCapacitance_LeavesPrechargeUnsized()
    {
        var ctx = DesignBuilder.Default().WithController(c => c with { DcLinkCapacitanceMicrofarad = 0 }).Context();

        var result = HardwareCalculator.Compute(ctx, 20);

        Assert.Null(result.PrechargeResistanceOhm);
        Assert.Null(result.PrechargeTimeS);
        Assert.Null(result.PrechargeTimeTo99PercentS);
        Assert.Null(result.PrechargeEnergyJ);
        Assert.Null(result.PrechargePeakCurrentA);
        Assert.Null(result.PrechargePeakPowerW);
        Assert.Null(result.PrechargeAveragePowerW);
        Assert.Null(result.PrechargeCloseVoltage);
    }

    [Fact]
    public void Compute_Cable_ReportsResistanceAndCurrentDensity()
    {
        var result = HardwareCalculator.Compute(DesignBuilder.Default().WithCable(25, 3).Context(), 20);

        Reference.AssertClose(3.0 / (58 * 25) * 1000, result.CableResistanceMilliohm!.Value, 1e-12, "IEC 60028: R = L/(58·A)");
        Assert.Equal(50.0 / 25, result.CableCurrentDensityAPerMm2!.Value, 12);
    }

    [Fact]
    public void Compute_SingleCell_HasNoLinks()
    {
        var ctx = DesignBuilder.Default().WithSeries(1).WithLinks(0.5).WithController(c => c with { MinVoltage = 2.9, MaxVoltage = 3.8 }).Context();

        var result = HardwareCalculator.Compute(ctx, 20);

        Assert.Equal(0, result.LinkResistanceTotalMilliohm);
        Reference.AssertClose(3.65 / (ctx.CellResistanceHotOhm), result.ProspectiveShortCircuitA, 1e-12, "Ohm's law, one cell");
    }
}
