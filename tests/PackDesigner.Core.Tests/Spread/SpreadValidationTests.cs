using PackDesigner.Core.Spread;

namespace PackDesigner.Core.Tests.Spread;

public class SpreadValidationTests
{
    public static TheoryData<string, SpreadSettings> BadSettings => new()
    {
        { "spread.trials", new SpreadSettings { Trials = 0 } },
        { "spread.trials", new SpreadSettings { Trials = 2_000_000 } },
        { "spread.capacitySigmaPercent", new SpreadSettings { CapacitySigmaPercent = -1 } },
        { "spread.capacitySigmaPercent", new SpreadSettings { CapacitySigmaPercent = double.NaN } },
        { "spread.capacitySigmaPercent", new SpreadSettings { CapacitySigmaPercent = 20 } },
        { "spread.resistanceSigmaPercent", new SpreadSettings { ResistanceSigmaPercent = double.PositiveInfinity } },
        { "spread.tripRisk", new SpreadSettings { TripRisk = 0 } },
        { "spread.tripRisk", new SpreadSettings { TripRisk = 0.9 } },
        { "spread.tripRisk", new SpreadSettings { TripRisk = double.NaN } },
        { "spread.distribution", new SpreadSettings { Distribution = (SpreadDistribution)7 } },
        { "spread.measuredGrouping", new SpreadSettings { MeasuredGrouping = (MeasuredGrouping)9 } },
        { "spread.measuredCapacitiesAh", new SpreadSettings { MeasuredCapacitiesAh = [100, 100, 100] } },
        { "spread.measuredCapacitiesAh[2]", new SpreadSettings { MeasuredCapacitiesAh = [100, 100, double.NaN, 100, 100, 100, 100, 100] } },
        { "spread.measuredCapacitiesAh[0]", new SpreadSettings { MeasuredCapacitiesAh = [-1, 100, 100, 100, 100, 100, 100, 100] } },
        { "spread.measuredCapacitiesAh", new SpreadSettings { MeasuredCapacitiesAh = Enumerable.Repeat(100.0, 9).ToArray(), MeasuredGrouping = MeasuredGrouping.AsListed } },
    };

    [Theory]
    [MemberData(nameof(BadSettings))]
    public void Analyze_BadSetting_ReturnsAnErrorKeyedByTheField(string field, SpreadSettings settings)
    {
        var outcome = SpreadMonteCarlo.Analyze(SpreadDesigns.Request(SpreadDesigns.Lfp(4, 2), settings));
        Assert.False(outcome.IsValid);
        Assert.Contains(outcome.Errors, e => e.Field == field && e.Message.Length > 0);
    }

    [Fact]
    public void Analyze_TooManyCellDraws_ReturnsATrialsErrorWithTheLimit()
    {
        // 96S4P × 200 000 trials = 76.8 million cell draws, above the 50 million bound.
        var outcome = SpreadMonteCarlo.Analyze(SpreadDesigns.Request(SpreadDesigns.Lfp(96, 4), new SpreadSettings { Trials = 200_000 }));
        var error = Assert.Single(outcome.Errors);
        Assert.Equal("spread.trials", error.Field);
        Assert.Contains("130208", error.Message);
    }

    [Fact]
    public void Analyze_InvalidDesign_ReturnsTheEvaluatorsErrorsUnderDesign()
    {
        var design = SpreadDesigns.Lfp(4, 2) with { Series = 0 };
        design = design with { Cell = design.Cell with { CapacityAh = -5 } };
        var outcome = SpreadMonteCarlo.Analyze(SpreadDesigns.Request(design, new SpreadSettings()));
        Assert.Contains(outcome.Errors, e => e.Field == "design.series");
        Assert.Contains(outcome.Errors, e => e.Field == "design.cell.capacityAh");
    }

    [Theory]
    [InlineData(-1)]
    [InlineData(100)]
    public void Trial_IndexOutsideTheTrials_ReturnsATrialError(int index)
    {
        var outcome = SpreadMonteCarlo.Trial(SpreadDesigns.Request(SpreadDesigns.Lfp(4, 2), new SpreadSettings { Trials = 100 }), index);
        Assert.Equal("trial", Assert.Single(outcome.Errors).Field);
    }

    [Fact]
    public void Compare_InvalidSettings_ReturnsErrorsNotAnException()
    {
        var outcome = SpreadMonteCarlo.Compare(SpreadDesigns.Request(SpreadDesigns.Lfp(4, 2), new SpreadSettings { Trials = -5 }));
        Assert.False(outcome.IsValid);
        Assert.Contains(outcome.Errors, e => e.Field == "spread.trials");
    }
}
