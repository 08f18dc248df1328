using PackDesigner.Core.Spread;

namespace PackDesigner.Core.Tests.Spread;

/// <summary>The drawing histogram a spread result carries: every trial counted once, over the exact range.</summary>
public class SpreadHistogramTests
{
    [Fact]
    public void Analyze_Histogram_CountsEveryTrialOnceFromTheMinimumToTheMaximum()
    {
        var result = SpreadDesigns.Run(SpreadDesigns.Lfp(24, 3), new SpreadSettings { Trials = 3000, Seed = 11, CapacitySigmaPercent = 2 });

        var h = result.HighestCellVoltageHistogram!;
        var p = result.HighestCellVoltageAtEndOfCharge;
        Assert.Equal(3000, h.Counts.Sum());
        Assert.Equal(SpreadLimits.ChartBins, h.Counts.Count);
        Assert.Equal(p.Min, h.Low, 12);
        Assert.Equal(p.Max, h.Low + h.BinWidth * h.Counts.Count, 9);
    }

    [Fact]
    public void Analyze_NoSpread_HistogramIsOneBarOfAllTrials()
    {
        var result = SpreadDesigns.Run(SpreadDesigns.Lfp(16, 1), new SpreadSettings { Trials = 200, Seed = 3, CapacitySigmaPercent = 0, ResistanceSigmaPercent = 0 });

        var h = result.HighestCellVoltageHistogram!;
        Assert.Equal(200, h.Counts.Sum());
        Assert.Equal(200, h.Counts.Max());
    }
}
