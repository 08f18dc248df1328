using PackDesigner.Core.Design;
using PackDesigner.Core.Tests.TestData;

namespace PackDesigner.Core.Tests.Balancing;

public sealed class BalancingAdvisorTests
{
    [Fact]
    public void Recommend_BottomBalanced_MatchesAtUvTripWithTopBalancingOff()
    {
        var result = DesignBuilder.Default().WithBalancing(BalancingMethod.Bottom).Evaluate();

        Assert.Equal(BalancingMethod.Bottom, result.Balancing.Method);
        Assert.Equal(result.CellThresholds.UnderVoltageTrip, result.Balancing.TargetCellVoltage);
        Assert.False(result.Balancing.BmsTopBalancingEnabled);
        Assert.Null(result.Balancing.BmsBalanceStartVoltage);
        Assert.Equal(10, result.Balancing.AcceptanceSpreadMillivolt);
        Assert.Contains("2.700 V", result.Balancing.Advice, StringComparison.Ordinal);
    }

    [Fact]
    public void Recommend_TopBalanced_BalancesNearCvPerCell()
    {
        var result = DesignBuilder.Default().WithBalancing(BalancingMethod.Top).Evaluate();

        Assert.Equal(BalancingMethod.Top, result.Balancing.Method);
        Assert.Equal(result.Charger.ConstantVoltagePerCell, result.Balancing.TargetCellVoltage);
        Assert.True(result.Balancing.BmsTopBalancingEnabled);
        // Starts 20 mV below the CV per cell, or at the window top's rest voltage if that is higher.
        Assert.Equal(Math.Max(3.345, result.Charger.ConstantVoltagePerCell - 0.02), result.Balancing.BmsBalanceStartVoltage!.Value, 12);
    }
}
