using PackDesigner.Core.Tests.TestData;
using PackDesigner.Core.Thermal;

namespace PackDesigner.Core.Tests.Thermal;

/// <summary>Adiabatic Joule heating: P = I²R, ΔT = I²·R·t/(m·c) (textbook heat balance with no heat loss).</summary>
public sealed class ThermalCalculatorTests
{
    private const string Joule = "Joule heating I²R, adiabatic ΔT = E/(m·c)";

    [Fact]
    public void Compute_Design_HeatsEachCellByCurrentSquaredTimesResistance()
    {
        // LFP preset: 0.6 mΩ, 2 kg; 16S2P; controller 50 A continuous, 100 A peak for 10 s; c = 1000 J/(kg·K).
        var ctx = DesignBuilder.Default().WithParallel(2).WithLinks(0.1).Context();

        var result = ThermalCalculator.Compute(ctx);

        Reference.AssertClose(25.0 * 25.0 * 0.6e-3, result.CellHeatAtContinuousW, 1e-12, Joule);
        Reference.AssertClose(32 * 25.0 * 25.0 * 0.6e-3 + 50.0 * 50.0 * 15 * 0.1e-3, result.PackHeatAtContinuousW, 1e-12, Joule + ", cells plus links");
        Reference.AssertClose(50.0 * 50.0 * 0.6e-3 * 10 / (2.0 * 1000), result.PeakTemperatureRiseK, 1e-12, Joule);
        Reference.AssertClose(25.0 * 25.0 * 0.6e-3 * 3600 / (2.0 * 1000), result.ContinuousTemperatureRisePerHourK, 1e-12, Joule);
        Reference.AssertClose(35 + result.PeakTemperatureRiseK, result.CellTemperatureAfterPeakC, 1e-14, "hottest ambient + rise");
        Assert.Equal(60, result.DischargeTemperatureMaxC);
        Assert.Equal(ThermalCalculator.TypicalSpecificHeatJPerKgK, result.SpecificHeatJPerKgK);
    }

    [Fact]
    public void Compute_Headroom_MinutesToLimitAreHeadroomOverRise()
    {
        var ctx = DesignBuilder.Default().Context();

        var result = ThermalCalculator.Compute(ctx);

        Reference.AssertClose((60 - 35) / result.ContinuousTemperatureRisePerHourK * 60, result.MinutesToDischargeLimitAtContinuous, 1e-12, "(T_max − T_ambient)/(dT/dt)");
    }

    [Fact]
    public void Compute_AmbientAtOrAboveLimit_HasNoMinutesLeft()
    {
        var result = ThermalCalculator.Compute(DesignBuilder.Default().WithAmbient(5, 60).Context());

        Assert.Equal(0, result.MinutesToDischargeLimitAtContinuous);
    }

    [Fact]
    public void Compute_TinyCurrent_CapsMinutesAtOneMillion()
    {
        var ctx = DesignBuilder.Default().WithController(c => c with { ContinuousCurrentA = 0.001, PeakCurrentA = 0.001 }).Context();

        Assert.Equal(1e6, ThermalCalculator.Compute(ctx).MinutesToDischargeLimitAtContinuous);
    }

    [Fact]
    public void SpecificHeat_Value_IsInsideMeasuredRangeOfLithiumIonCells()
    {
        // Common practice: lithium-ion cells measure roughly 0.9–1.3 kJ/(kg·K).
        Assert.InRange(ThermalCalculator.TypicalSpecificHeatJPerKgK, 900, 1300);
    }
}
