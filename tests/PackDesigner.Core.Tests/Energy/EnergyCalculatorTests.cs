using PackDesigner.Core.Charging;
using PackDesigner.Core.Design;
using PackDesigner.Core.Energy;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Protection;
using PackDesigner.Core.Tests.TestData;

namespace PackDesigner.Core.Tests.Energy;

/// <summary>
/// Straight-line test cell V(s) = 3.0 + 0.6·s (mean 3.3 V), 50 Ah, 1 kg, nominal 3.3 V, 5 % tolerance; 8S2P.
/// ∫V ds over [s₁, s₂] = 3.0·(s₂ − s₁) + 0.3·(s₂² − s₁²).
/// </summary>
public sealed class EnergyCalculatorTests
{
    private const int S = 8, P = 2;
    private const double GroupAh = 100, NominalV = 3.3;

    private static double Integral(double s1, double s2) => 3.0 * (s2 - s1) + 0.3 * (s2 * s2 - s1 * s1);

    private const string ClosedForm = "∫(3.0 + 0.6·s) ds, closed form";

    private static DesignBuilder LinearDesign() => DesignBuilder.Default()
        .WithCell(TestCells.CompleteCustom())
        .WithSeries(S)
        .WithParallel(P)
        .WithController(c => c with { MinVoltage = 23.5, MaxVoltage = 32, ContinuousCurrentA = 40 })
        .WithCharger(c => c with { MaxVoltage = 31, VoltageStepV = 0.001 });

    private static (EnergyResult Energy, ChargeSetpoints Charge, PackContext Ctx) Compute(DesignBuilder design)
    {
        var ctx = design.Context();
        var (cellT, _) = ThresholdCalculator.Compute(ctx);
        var charge = ChargeSetpointCalculator.Compute(ctx, cellT);
        return (EnergyCalculator.Compute(ctx, charge), charge, ctx);
    }

    [Fact]
    public void Compute_Nominal_IsSeriesTimesGroupCapacityTimesNominalVoltage()
    {
        var (energy, _, _) = Compute(LinearDesign());

        Reference.AssertClose(S * GroupAh * NominalV, energy.NominalEnergyWh, 1e-14, "E = S·P·C·V_nom");
        Reference.AssertClose(S * P * 1.0, energy.CellMassKg, 1e-14, "S·P·m");
        Reference.AssertClose(S * GroupAh * NominalV / (S * P * 1.0), energy.SpecificEnergyWhPerKg, 1e-14, "Wh/kg");
    }

    [Fact]
    public void Compute_WindowTenToNinety_UsableIsNominalTimesWindowShareOfCurveEnergy()
    {
        var (energy, _, _) = Compute(LinearDesign().WithWindow(10, 90));
        var share = Integral(0.1, 0.9) / Integral(0, 1);

        Reference.AssertClose(S * GroupAh * Integral(0.1, 0.9), energy.UsableEnergyAtRestWh, 1e-12, ClosedForm);
        Reference.AssertClose(S * GroupAh * NominalV * share, energy.UsableEnergyWh, 1e-12, ClosedForm);
        Reference.AssertClose(100 * share, energy.UsableFractionPercent, 1e-12, ClosedForm);
        Reference.AssertClose(GroupAh * 0.8 / 40, energy.RuntimeAtContinuousCurrentH, 1e-12, "C·ΔSOC / I");
    }

    [Fact]
    public void Compute_WindowZeroToHundred_UsableEqualsNominal()
    {
        var (energy, _, _) = Compute(LinearDesign().WithWindow(0, 100));

        Reference.AssertClose(energy.NominalEnergyWh, energy.UsableEnergyWh, 1e-12, "the whole curve is the rating");
        Reference.AssertClose(100, energy.UsableFractionPercent, 1e-12, "the whole curve is the rating");
        Reference.AssertClose(S * GroupAh * 3.3, energy.UsableEnergyAtRestWh, 1e-12, ClosedForm);
    }

    [Fact]
    public void Compute_ZeroTolerance_WorstCaseLosesOnlyWhatTheRoundedCvLeavesUncharged()
    {
        // With a 0.1 V step the CV (8 × (3.54 + η) = 28.34 V) is rounded down to 28.3 V: the typical group stops short of 90 %.
        var (energy, charge, _) = Compute(LinearDesign().WithTolerance(0).WithWindow(10, 90).WithCharger(c => c with { VoltageStepV = 0.1 }));
        var top = charge.EndOfCharge.TypicalSoc;
        Assert.True(top < 0.9);

        Reference.AssertClose(S * GroupAh * NominalV * Integral(top, 0.9) / Integral(0, 1), energy.LostToWeakestGroupWh, 1e-6, ClosedForm);
        Assert.True(energy.LostToWeakestGroupWh >= 0);
    }

    [Fact]
    public void Compute_BottomBalanced_WorstCaseCountsWeakestGroupOverItsOwnRange()
    {
        // Bottom-balanced: the weakest group (C_w = 0.95·C_n) runs from r·s_bottom to r·s_top while the others
        // run from s_bottom to s_top; same charge Q passes through every group.
        var (energy, charge, ctx) = Compute(LinearDesign().WithWindow(20, 90).WithCell(c => c with { MaxChargeVoltage = 3.7 }));
        const double r = 1 / 0.95;
        var top = charge.EndOfCharge.TypicalSoc;
        var worstAtRest = (S - 1) * GroupAh * Integral(0.2, top) + 0.95 * GroupAh * Integral(r * 0.2, r * top);

        Assert.Equal(ChargeSetpointCalculator.LimitedByOverVoltageRelease, charge.Result.ConstantVoltageLimitedBy);
        Reference.AssertClose(worstAtRest * NominalV / 3.3, energy.UsableEnergyWorstCaseWh, 1e-12, ClosedForm);
        Reference.AssertClose(energy.UsableEnergyWh - energy.UsableEnergyWorstCaseWh, energy.LostToWeakestGroupWh, 1e-12, "difference");
        Assert.True(energy.LostToWeakestGroupWh > 0);
        Assert.Equal(0.95 * GroupAh, ctx.WeakestGroupCapacityAh, 12);
    }

    [Fact]
    public void Compute_TopBalancedWindowFromEmpty_StopsWhereTheWeakestGroupIsEmpty()
    {
        // Top-balanced, the weakest group is empty when the others are still at s₀ = 1 − 1/r = 5 %: in series the
        // string stops there, so the others cannot deliver their last 5 %.
        var (energy, charge, _) = Compute(LinearDesign().WithBalancing(BalancingMethod.Top).WithWindow(0, 100));
        const double r = 1 / 0.95;
        var s0 = 1 - 1 / r;
        var top = Math.Min(1, charge.EndOfCharge.TypicalSoc);
        var worstAtRest = (S - 1) * GroupAh * Integral(s0, top) + 0.95 * GroupAh * Integral(0, 1 - (1 - top) * r);

        Reference.AssertClose(worstAtRest * NominalV / 3.3, energy.UsableEnergyWorstCaseWh, 1e-12, ClosedForm);
    }

    [Fact]
    public void Compute_AnyDesign_WorstCaseNeverAboveUsableNeverAboveNominal()
    {
        foreach (var method in new[] { BalancingMethod.Bottom, BalancingMethod.Top })
        {
            foreach (var (lo, hi) in new[] { (0.0, 100.0), (10.0, 90.0), (30.0, 31.0) })
            {
                var (energy, _, _) = Compute(LinearDesign().WithBalancing(method).WithWindow(lo, hi));

                Assert.True(energy.UsableEnergyWorstCaseWh <= energy.UsableEnergyWh);
                Assert.True(energy.UsableEnergyWh <= energy.NominalEnergyWh * (1 + 1e-12));
                Assert.True(energy.UsableEnergyWorstCaseWh >= 0);
            }
        }
    }

    [Fact]
    public void Compute_ChargerCannotReachWindowBottom_HasNoWorstCaseEnergy()
    {
        // A charger limited to 24 V cannot lift a 8S string of this cell (8 × (3.0 V + η) = 24.02 V when empty) at all.
        var (energy, _, _) = Compute(LinearDesign().WithCharger(c => c with { MaxVoltage = 24 }));

        Assert.Equal(0, energy.UsableEnergyWorstCaseWh);
        Assert.Equal(energy.UsableEnergyWh, energy.LostToWeakestGroupWh);
    }
}
