using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;
using PackDesigner.Core.Tests.TestData;
using PackDesigner.Core.Validation;

namespace PackDesigner.Core.Tests.Validation;

public sealed class DesignValidatorTests
{
    private static IReadOnlyList<ValidationError> Validate(DesignInput input)
    {
        var cell = CellResolver.TryResolve(input.Cell, out _);
        return DesignValidator.Validate(input, cell);
    }

    private static IReadOnlyList<ValidationError> ValidateAll(DesignInput input)
    {
        var cell = CellResolver.TryResolve(input.Cell, out var cellErrors);
        return [.. cellErrors, .. DesignValidator.Validate(input, cell)];
    }

    [Fact]
    public void Validate_DefaultDesign_HasNoErrors()
    {
        Assert.Empty(Validate(DesignBuilder.Default().Build()));
    }

    [Theory]
    [InlineData(1, 1)]
    [InlineData(1000, 200)]
    public void Validate_SeriesAndParallelAtBounds_HasNoErrors(int series, int parallel)
    {
        Assert.Empty(Validate(DesignBuilder.Default().WithSeries(series).WithParallel(parallel).Build()));
    }

    [Fact]
    public void Validate_WindowZeroToHundred_HasNoErrors()
    {
        Assert.Empty(Validate(DesignBuilder.Default().WithWindow(0, 100).Build()));
    }

    /// <summary>Out-of-range value for every range rule: (field key, bad value).</summary>
    public static TheoryData<string, double> OutOfRange => new()
    {
        { "series", 0 }, { "series", 1001 },
        { "parallel", 0 }, { "parallel", 201 },
        { "linkResistanceMilliohm", -0.1 }, { "linkResistanceMilliohm", 100.1 },
        { "cable.crossSectionMm2", 0.4 }, { "cable.crossSectionMm2", 1001 },
        { "cable.lengthM", 0.009 }, { "cable.lengthM", 101 },
        { "socWindow.minPercent", -1 }, { "socWindow.maxPercent", 101 },
        { "controller.minVoltage", 0 }, { "controller.maxVoltage", 2001 },
        { "controller.continuousCurrentA", 0 }, { "controller.peakCurrentA", 200_001 },
        { "controller.peakDurationS", 0 }, { "controller.peakDurationS", 3601 },
        { "controller.regenCurrentA", -1 }, { "controller.regenCurrentA", 100_001 },
        { "controller.dcLinkCapacitanceMicrofarad", -1 }, { "controller.dcLinkCapacitanceMicrofarad", 1_000_001 },
        { "controller.prechargeTimeS", 0 }, { "controller.prechargeTimeS", 61 },
        { "charger.maxVoltage", 0 }, { "charger.maxVoltage", 2001 },
        { "charger.maxCurrentA", 0 }, { "charger.maxCurrentA", 10_001 },
        { "charger.voltageStepV", 0 }, { "charger.voltageStepV", 10.1 },
        { "charger.targetCellVoltage", 3.66 }, { "charger.targetCellVoltage", 2.5 },
        { "ambient.minC", -61 }, { "ambient.maxC", 81 },
        { "margins.overVoltageTripBelowMaxV", -0.01 }, { "margins.overVoltageTripBelowMaxV", 1.01 },
        { "margins.overVoltageHysteresisV", 0 }, { "margins.overVoltageHysteresisV", 1.01 },
        { "margins.underVoltageTripAboveMinV", -0.01 }, { "margins.underVoltageTripAboveMinV", 1.01 },
        { "margins.underVoltageHysteresisV", 0 }, { "margins.underVoltageHysteresisV", 1.01 },
        { "margins.temperatureMarginC", -1 }, { "margins.temperatureMarginC", 21 },
        { "margins.temperatureHysteresisC", 0 }, { "margins.temperatureHysteresisC", 31 },
        { "margins.chargeCurrentMarginPercent", -1 }, { "margins.chargeCurrentMarginPercent", 91 },
        { "margins.shortCircuitTripFactor", 0.9 }, { "margins.shortCircuitTripFactor", 21 },
        { "margins.overVoltageDelayS", -1 }, { "margins.overVoltageDelayS", 601 },
        { "margins.underVoltageDelayS", -1 }, { "margins.underVoltageDelayS", 601 },
        { "margins.chargeOverCurrentDelayS", -1 }, { "margins.chargeOverCurrentDelayS", 601 },
        { "margins.shortCircuitDelayMicroseconds", -1 }, { "margins.shortCircuitDelayMicroseconds", 100_001 },
    };

    [Theory]
    [MemberData(nameof(OutOfRange))]
    public void Validate_ValueOutOfRange_ReturnsErrorKeyedByField(string field, double value)
    {
        var set = InvalidFields.All.Single(f => f.Key == field).Set;

        var errors = Validate(set(DesignBuilder.Default().Build(), value));

        var error = Assert.Single(errors);
        Assert.Equal(field, error.Field);
        Assert.StartsWith("Must be ", error.Message, StringComparison.Ordinal);
        Assert.Contains("(got ", error.Message, StringComparison.Ordinal);
    }

    public static TheoryData<string> EveryField => [.. InvalidFields.All.Select(f => f.Key)];

    [Theory]
    [MemberData(nameof(EveryField))]
    public void Validate_NotANumberInAnyField_ReturnsErrorKeyedByThatField(string field)
    {
        var set = InvalidFields.All.Single(f => f.Key == field).Set;

        var errors = ValidateAll(set(DesignBuilder.Default().Build(), double.NaN));

        Assert.Contains(errors, e => e.Field == field);
    }

    [Theory]
    [MemberData(nameof(EveryField))]
    public void Validate_InfinityInAnyField_ReturnsErrorKeyedByThatField(string field)
    {
        var set = InvalidFields.All.Single(f => f.Key == field).Set;

        Assert.Contains(ValidateAll(set(DesignBuilder.Default().Build(), double.PositiveInfinity)), e => e.Field == field);
        Assert.Contains(ValidateAll(set(DesignBuilder.Default().Build(), double.NegativeInfinity)), e => e.Field == field);
    }

    [Fact]
    public void Validate_WindowMinAtOrAboveMax_NamesTheMaximum()
    {
        var error = Assert.Single(Validate(DesignBuilder.Default().WithWindow(50, 50).Build()));

        Assert.Equal("socWindow.maxPercent", error.Field);
    }

    [Fact]
    public void Validate_ControllerMinAtOrAboveMax_NamesTheMaximum()
    {
        var error = Assert.Single(Validate(DesignBuilder.Default().WithController(c => c with { MinVoltage = 60, MaxVoltage = 60 }).Build()));

        Assert.Equal("controller.maxVoltage", error.Field);
    }

    [Fact]
    public void Validate_PeakBelowContinuous_NamesThePeak()
    {
        var error = Assert.Single(Validate(DesignBuilder.Default().WithController(c => c with { ContinuousCurrentA = 100, PeakCurrentA = 99 }).Build()));

        Assert.Equal("controller.peakCurrentA", error.Field);
    }

    [Fact]
    public void Validate_AmbientMinAboveMax_NamesTheMaximum()
    {
        var error = Assert.Single(Validate(DesignBuilder.Default().WithAmbient(30, 20).Build()));

        Assert.Equal("ambient.maxC", error.Field);
    }

    [Fact]
    public void Validate_MarginsLeaveNoRoom_NamesOverVoltageHysteresis()
    {
        // LFP: 3.65 − 0.5 − 0.2 = 2.95 V ≤ 2.5 + 0.3 + 0.2 = 3.0 V.
        var error = Assert.Single(Validate(DesignBuilder.Default()
            .WithMargins(m => m with { OverVoltageTripBelowMaxV = 0.5, OverVoltageHysteresisV = 0.2, UnderVoltageTripAboveMinV = 0.3, UnderVoltageHysteresisV = 0.2 })
            .Build()));

        Assert.Equal("margins.overVoltageHysteresisV", error.Field);
        Assert.Contains("no room", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Validate_TargetCellVoltageAtDatasheetMaximum_IsAccepted()
    {
        Assert.Empty(Validate(DesignBuilder.Default().WithCharger(c => c with { TargetCellVoltage = 3.65 }).Build()));
    }

    [Fact]
    public void Validate_TargetCellVoltageNotFiniteWithoutCell_NamesTheTarget()
    {
        var input = DesignBuilder.Default().WithCharger(c => c with { TargetCellVoltage = double.NaN }).Build();

        var error = Assert.Single(DesignValidator.Validate(input, null));

        Assert.Equal("charger.targetCellVoltage", error.Field);
    }

    [Fact]
    public void Validate_ManyProblems_ReturnsEveryOneAtOnce()
    {
        var input = DesignBuilder.Default().WithSeries(0).WithParallel(0).WithWindow(-5, 120).WithAmbient(-70, 90).Build();

        var fields = Validate(input).Select(e => e.Field).ToHashSet();

        Assert.Superset(new HashSet<string> { "series", "parallel", "socWindow.minPercent", "socWindow.maxPercent", "ambient.minC", "ambient.maxC" }, fields);
    }

    [Theory]
    [InlineData(BalancingMethod.Bottom)]
    [InlineData(BalancingMethod.Top)]
    public void Validate_EitherBalancingMethod_HasNoErrors(BalancingMethod method)
    {
        Assert.Empty(Validate(DesignBuilder.Default().WithBalancing(method).Build()));
    }
}
