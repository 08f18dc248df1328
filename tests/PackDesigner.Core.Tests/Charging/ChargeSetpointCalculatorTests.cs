using PackDesigner.Core.Charging;
using PackDesigner.Core.Design;
using PackDesigner.Core.Protection;
using PackDesigner.Core.Tests.TestData;

namespace PackDesigner.Core.Tests.Charging;

/// <summary>
/// The custom test cell has a straight-line curve V(s) = 3.0 + 0.6·s, 50 Ah, 1 mΩ, 5 % capacity tolerance,
/// 3.8 V maximum; 8S2P with 0.2 mΩ links. Termination C/20 per cell → I_t = 5 A for the pack, so η = I_t·R/P =
/// 2.5 mV per group and the series drop is I_t·7·0.2 mΩ = 7 mV; r = 1/0.95. Closed forms as in StringChargeModelTests.
/// </summary>
public sealed class ChargeSetpointCalculatorTests
{
    private const double A = 3.0, B = 0.6, Eta = 0.0025, Drop = 0.007, R = 1 / 0.95;
    private const int S = 8;

    private static DesignBuilder LinearDesign() => DesignBuilder.Default()
        .WithCell(TestCells.CompleteCustom())
        .WithSeries(S)
        .WithParallel(2)
        .WithLinks(0.2)
        .WithWindow(10, 90)
        .WithController(c => c with { MinVoltage = 23.5, MaxVoltage = 32 })
        .WithCharger(c => c with { MaxVoltage = 31, VoltageStepV = 0.1 });

    private static ChargeSetpoints Compute(DesignBuilder design)
    {
        var ctx = design.Context();
        var (cellT, _) = ThresholdCalculator.Compute(ctx);
        return ChargeSetpointCalculator.Compute(ctx, cellT);
    }

    /// <summary>Typical group's SOC at the end of charge for a CV, bottom-balanced, hand-derived for the straight line.</summary>
    private static double BottomSoc(double cv) => (cv - S * A - S * Eta - Drop) / (B * (S - 1 + R));

    private const string ClosedForm = "hand-derived closed form for a straight-line OCV curve";

    [Fact]
    public void Compute_BottomBalancedWindowTopBinding_MatchesClosedForm()
    {
        // Window top 90 %, bottom-balanced: the CV of a string of typical groups at the top,
        // CV = S·(a + 0.9·b + η) + drop = 28.347 V; the OV release (3.65 V) would allow more (the weakest group
        // is full at 95 % typical, CV = 7·(a + 0.57 + η) + 3.65 + drop = 28.6645 V).
        var byTop = S * (A + B * 0.9 + Eta) + Drop;

        var result = Compute(LinearDesign());

        Reference.AssertClose(byTop, result.UnroundedConstantVoltage, 1e-12, ClosedForm);
        Assert.Equal(ChargeSetpointCalculator.LimitedByWindowTop, result.Result.ConstantVoltageLimitedBy);
        Assert.Equal(Math.Floor(byTop * 10) / 10, result.Result.ConstantVoltage, 9);
        var s = BottomSoc(result.Result.ConstantVoltage);
        Reference.AssertClose(100 * s, result.Result.TypicalGroupEndOfChargeSocPercent, 1e-9, ClosedForm);
        Reference.AssertClose(100 * R * s, result.Result.WeakestGroupEndOfChargeSocPercent, 1e-9, ClosedForm);
        Reference.AssertClose(A + B * R * s + Eta, result.Result.WeakestCellEndOfChargeVoltage, 1e-12, ClosedForm);
        Reference.AssertClose(A + B * s + Eta, result.Result.TypicalCellEndOfChargeVoltage, 1e-12, ClosedForm);
        Reference.AssertClose(100 * 0.95, result.Result.WeakestGroupCapacityAh, 1e-14, "P × C × (1 − tolerance)");
    }

    [Fact]
    public void Compute_BottomBalancedOverVoltageReleaseBinding_MatchesClosedForm()
    {
        // Maximum 3.7 V → OV release 3.55 V. Weakest group there: w = (3.55 − η − a)/b = 0.9125, s = w/r,
        // CV = (S − 1)(a + b·s + η) + 3.55 + drop = 28.21538 V, below the window top's 28.37542 V.
        var w = (3.55 - Eta - A) / B;
        var byRelease = (S - 1) * (A + B * w / R + Eta) + 3.55 + Drop;

        var result = Compute(LinearDesign().WithCell(c => c with { MaxChargeVoltage = 3.7 }));

        Reference.AssertClose(byRelease, result.UnroundedConstantVoltage, 1e-12, ClosedForm);
        Assert.Equal(ChargeSetpointCalculator.LimitedByOverVoltageRelease, result.Result.ConstantVoltageLimitedBy);
        var s = BottomSoc(result.Result.ConstantVoltage);
        Reference.AssertClose(A + B * R * s + Eta, result.Result.WeakestCellEndOfChargeVoltage, 1e-12, ClosedForm);
        Assert.True(result.Result.WeakestCellEndOfChargeVoltage <= 3.55);
    }

    [Fact]
    public void Compute_BottomBalancedWindowTopBinding_WiderToleranceKeepsCvAndRaisesWeakest()
    {
        // The window-top limit is that of a string of typical groups, S·(a + 0.9·b + η) + drop, whatever the
        // tolerance; a smaller weakest group then ends higher on the curve and the typical one a little lower.
        var narrow = Compute(LinearDesign().WithTolerance(1));
        var wide = Compute(LinearDesign().WithTolerance(5));

        Assert.Equal(ChargeSetpointCalculator.LimitedByWindowTop, narrow.Result.ConstantVoltageLimitedBy);
        Assert.Equal(ChargeSetpointCalculator.LimitedByWindowTop, wide.Result.ConstantVoltageLimitedBy);
        Reference.AssertClose(narrow.UnroundedConstantVoltage, wide.UnroundedConstantVoltage, 1e-12, ClosedForm);
        Assert.True(wide.Result.WeakestCellEndOfChargeVoltage > narrow.Result.WeakestCellEndOfChargeVoltage);
        Assert.True(wide.Result.TypicalGroupEndOfChargeSocPercent < narrow.Result.TypicalGroupEndOfChargeSocPercent);
        Assert.True(wide.Result.TypicalGroupEndOfChargeSocPercent <= 90);
        Assert.True(wide.Result.WeakestCellEndOfChargeVoltage <= 3.65);
    }

    [Fact]
    public void Compute_TopBalanced_TypicalGroupIsHighest()
    {
        var result = Compute(LinearDesign().WithBalancing(BalancingMethod.Top));

        Assert.True(result.Result.TypicalCellEndOfChargeVoltage > result.Result.WeakestCellEndOfChargeVoltage);
        Assert.True(result.Result.TypicalGroupEndOfChargeSocPercent > result.Result.WeakestGroupEndOfChargeSocPercent);
        // Top-balanced, the window top binds on the typical group: U(0.9) = S·a + S·η + drop + b·(1 − r) + b·0.9·(S − 1 + r).
        Reference.AssertClose(S * A + S * Eta + Drop + B * (1 - R) + B * 0.9 * (S - 1 + R), result.UnroundedConstantVoltage, 1e-12, ClosedForm);
    }

    [Fact]
    public void Compute_BottomBalanced_WeakestGroupIsHighest()
    {
        var result = Compute(LinearDesign());

        Assert.True(result.Result.WeakestCellEndOfChargeVoltage > result.Result.TypicalCellEndOfChargeVoltage);
        Assert.Equal(result.EndOfCharge.WeakestVoltage, result.EndOfCharge.HighestVoltage);
    }

    [Theory]
    [InlineData(BalancingMethod.Bottom)]
    [InlineData(BalancingMethod.Top)]
    public void Compute_ZeroCapacityTolerance_AllGroupsEndAlike(BalancingMethod method)
    {
        var result = Compute(LinearDesign().WithTolerance(0).WithBalancing(method));

        Assert.Equal(100, result.Result.WeakestGroupCapacityAh);
        Assert.Equal(result.Result.TypicalCellEndOfChargeVoltage, result.Result.WeakestCellEndOfChargeVoltage, 12);
        Reference.AssertClose(S * (A + 0.9 * B + Eta) + Drop, result.UnroundedConstantVoltage, 1e-12, "equal groups: S·(V(0.9) + η) + drop");
    }

    [Fact]
    public void Compute_TargetCellVoltage_SetsCvToSeriesTimesTargetRoundedDown()
    {
        var result = Compute(LinearDesign().WithCharger(c => c with { TargetCellVoltage = 3.456 }));

        Assert.Equal(ChargeSetpointCalculator.LimitedByTarget, result.Result.ConstantVoltageLimitedBy);
        Assert.Equal(S * 3.456, result.UnroundedConstantVoltage, 12);
        Assert.Equal(27.6, result.Result.ConstantVoltage, 9);
        Assert.Equal(27.6 / S, result.Result.ConstantVoltagePerCell, 12);
        Reference.AssertClose(100 * BottomSoc(27.6), result.Result.TypicalGroupEndOfChargeSocPercent, 1e-9, ClosedForm);
    }

    [Fact]
    public void Compute_ChargerMaximumBelowWantedCv_IsLimitedByCharger()
    {
        var result = Compute(LinearDesign().WithCharger(c => c with { MaxVoltage = 27.05 }));

        Assert.Equal(ChargeSetpointCalculator.LimitedByCharger, result.Result.ConstantVoltageLimitedBy);
        Assert.Equal(27.05, result.UnroundedConstantVoltage);
        Assert.Equal(27.0, result.Result.ConstantVoltage, 9);
        var s = BottomSoc(27.0);
        Reference.AssertClose(100 * s, result.Result.TypicalGroupEndOfChargeSocPercent, 1e-9, ClosedForm);
        Assert.True(result.Result.TypicalGroupEndOfChargeSocPercent < 90);
    }

    [Fact]
    public void Compute_ChargerMaximumBelowTarget_IsLimitedByCharger()
    {
        var result = Compute(LinearDesign().WithCharger(c => c with { MaxVoltage = 27.05, TargetCellVoltage = 3.5 }));

        Assert.Equal(ChargeSetpointCalculator.LimitedByCharger, result.Result.ConstantVoltageLimitedBy);
        Assert.Equal(27.0, result.Result.ConstantVoltage, 9);
    }

    [Fact]
    public void Compute_SingleGroup_CvIsWindowTopVoltagePlusOverpotential()
    {
        // S = 1, P = 1: no links, I_t = 2.5 A, η = 2.5 mV: CV = V(0.9) + η = 3.5425 V, rounded down to 3.54 V.
        var result = Compute(LinearDesign().WithSeries(1).WithParallel(1)
            .WithController(c => c with { MinVoltage = 2.9, MaxVoltage = 4 })
            .WithCharger(c => c with { MaxVoltage = 4, VoltageStepV = 0.01 }));

        Reference.AssertClose(A + 0.9 * B + 0.0025, result.UnroundedConstantVoltage, 1e-12, ClosedForm);
        Assert.Equal(3.54, result.Result.ConstantVoltage, 9);
        Assert.Equal(50, result.Result.WeakestGroupCapacityAh);
    }

    [Theory]
    [InlineData(20, 100, 10, 20)]
    [InlineData(200, 100, 10, 90)]
    [InlineData(200, 100, 0, 100)]
    [InlineData(200, 40, 50, 20)]
    public void Compute_ConstantCurrent_IsLeastOfChargerCellsAndBmsTripLessMargin(double chargerA, double cellChargeA, double marginPercent, double expectedA)
    {
        // P = 2: cells allow 2 × the cell's maximum; the BMS trip is the same figure, kept the margin below.
        var result = Compute(LinearDesign()
            .WithCell(c => c with { MaxChargeCurrentA = cellChargeA / 2 })
            .WithCharger(c => c with { MaxCurrentA = chargerA })
            .WithMargins(m => m with { ChargeCurrentMarginPercent = marginPercent }));

        Assert.Equal(expectedA, result.Result.ConstantCurrentA, 12);
    }

    [Fact]
    public void Compute_Termination_IsCellFigureTimesParallel()
    {
        Assert.Equal(5.0, Compute(LinearDesign()).Result.TerminationCurrentA, 12);
        Assert.Equal(3.0, Compute(LinearDesign().WithCell(c => c with { TerminationCurrentA = 1.5 })).Result.TerminationCurrentA, 12);
    }

    [Fact]
    public void Compute_ChargerWithFloatStage_NeverFloats()
    {
        var result = Compute(LinearDesign().WithCharger(c => c with { FloatStage = true }));

        Assert.False(result.Result.FloatCharge);
    }

    [Fact]
    public void Compute_ChargeTemperatures_AreBmsChargeTrips()
    {
        var result = Compute(LinearDesign());

        Assert.Equal(2, result.Result.ChargeTemperatureMinC, 12);
        Assert.Equal(43, result.Result.ChargeTemperatureMaxC, 12);
    }

    [Theory]
    [InlineData(57.64, 0.1, 57.6)]
    [InlineData(57.6, 0.1, 57.6)]
    [InlineData(57.69999, 0.1, 57.6)]
    [InlineData(3.0, 0.5, 3.0)]
    [InlineData(0.3, 0.1, 0.3)]
    [InlineData(0.9, 0.3, 0.9)]
    [InlineData(107.162, 0.05, 107.15)]
    [InlineData(0.04, 0.1, 0)]
    public void RoundDown_Voltage_IsLargestStepMultipleAtOrBelow(double volts, double step, double expected)
    {
        Assert.Equal(expected, ChargeSetpointCalculator.RoundDown(volts, step), 9);
    }
}
