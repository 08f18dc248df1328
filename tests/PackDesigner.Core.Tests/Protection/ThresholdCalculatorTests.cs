using PackDesigner.Core.Protection;
using PackDesigner.Core.Tests.TestData;

namespace PackDesigner.Core.Tests.Protection;

public sealed class ThresholdCalculatorTests
{
    [Fact]
    public void Compute_DefaultMargins_PlacesTripsInsideDatasheetAndReleasesFurtherIn()
    {
        // LFP preset 3.65 / 2.5 V, charge 0–45 °C, discharge −20–60 °C; default margins (common practice):
        // OV trip 50 mV below max, release 100 mV below trip; UV trip 200 mV above min, release 150 mV above;
        // temperature trips 2 K inside the windows, releases 5 K further in.
        var (cell, _) = ThresholdCalculator.Compute(DesignBuilder.Default().Context());

        Assert.Equal(3.60, cell.OverVoltageTrip, 12);
        Assert.Equal(3.50, cell.OverVoltageRelease, 12);
        Assert.Equal(2.70, cell.UnderVoltageTrip, 12);
        Assert.Equal(2.85, cell.UnderVoltageRelease, 12);
        Assert.Equal(2, cell.ChargeTemperatureLowTripC, 12);
        Assert.Equal(7, cell.ChargeTemperatureLowReleaseC, 12);
        Assert.Equal(43, cell.ChargeTemperatureHighTripC, 12);
        Assert.Equal(38, cell.ChargeTemperatureHighReleaseC, 12);
        Assert.Equal(-18, cell.DischargeTemperatureLowTripC, 12);
        Assert.Equal(-13, cell.DischargeTemperatureLowReleaseC, 12);
        Assert.Equal(58, cell.DischargeTemperatureHighTripC, 12);
        Assert.Equal(53, cell.DischargeTemperatureHighReleaseC, 12);
    }

    [Fact]
    public void Compute_Currents_FollowDatasheetAndShortCircuitFactor()
    {
        // LFP preset: 50 A charge, 100 A continuous, 200 A for 10 s; short-circuit trip 1.5 × peak by default.
        var (cell, _) = ThresholdCalculator.Compute(DesignBuilder.Default().Context());

        Assert.Equal(50, cell.ChargeOverCurrentA);
        Assert.Equal(100, cell.DischargeOverCurrentA);
        Assert.Equal(200, cell.DischargePeakCurrentA);
        Assert.Equal(10, cell.DischargePeakDurationS);
        Assert.Equal(10, cell.DischargeOverCurrentDelayS);
        Assert.Equal(300, cell.ShortCircuitA, 12);
        Assert.Equal(300, cell.ShortCircuitDelayMicroseconds);
        Assert.Equal(1, cell.OverVoltageDelayS);
        Assert.Equal(2, cell.UnderVoltageDelayS);
        Assert.Equal(10, cell.ChargeOverCurrentDelayS);
    }

    [Fact]
    public void Compute_PackSet_ScalesVoltagesBySeriesAndCurrentsByParallel()
    {
        var (cell, pack) = ThresholdCalculator.Compute(DesignBuilder.Default().WithSeries(24).WithParallel(3).Context());

        Assert.Equal(cell.OverVoltageTrip * 24, pack.OverVoltageTrip, 12);
        Assert.Equal(cell.OverVoltageRelease * 24, pack.OverVoltageRelease, 12);
        Assert.Equal(cell.UnderVoltageTrip * 24, pack.UnderVoltageTrip, 12);
        Assert.Equal(cell.UnderVoltageRelease * 24, pack.UnderVoltageRelease, 12);
        Assert.Equal(cell.ChargeOverCurrentA * 3, pack.ChargeOverCurrentA, 12);
        Assert.Equal(cell.DischargeOverCurrentA * 3, pack.DischargeOverCurrentA, 12);
        Assert.Equal(cell.DischargePeakCurrentA * 3, pack.DischargePeakCurrentA, 12);
        Assert.Equal(cell.ShortCircuitA * 3, pack.ShortCircuitA, 12);
        // Temperatures and delays do not scale.
        Assert.Equal(cell with
        {
            OverVoltageTrip = pack.OverVoltageTrip,
            OverVoltageRelease = pack.OverVoltageRelease,
            UnderVoltageTrip = pack.UnderVoltageTrip,
            UnderVoltageRelease = pack.UnderVoltageRelease,
            ChargeOverCurrentA = pack.ChargeOverCurrentA,
            DischargeOverCurrentA = pack.DischargeOverCurrentA,
            DischargePeakCurrentA = pack.DischargePeakCurrentA,
            ShortCircuitA = pack.ShortCircuitA,
        }, pack);
    }

    [Fact]
    public void Compute_SingleCell_PackSetEqualsCellSet()
    {
        var (cell, pack) = ThresholdCalculator.Compute(DesignBuilder.Default().WithSeries(1).WithParallel(1).Context());

        Assert.Equal(cell, pack);
    }

    [Fact]
    public void Compute_CustomMargins_AreApplied()
    {
        var ctx = DesignBuilder.Default()
            .WithMargins(m => m with
            {
                OverVoltageTripBelowMaxV = 0,
                OverVoltageHysteresisV = 0.2,
                UnderVoltageTripAboveMinV = 0,
                UnderVoltageHysteresisV = 0.4,
                TemperatureMarginC = 0,
                TemperatureHysteresisC = 10,
                ShortCircuitTripFactor = 3,
            })
            .Context();

        var (cell, _) = ThresholdCalculator.Compute(ctx);

        Assert.Equal(3.65, cell.OverVoltageTrip, 12);
        Assert.Equal(3.45, cell.OverVoltageRelease, 12);
        Assert.Equal(2.5, cell.UnderVoltageTrip, 12);
        Assert.Equal(2.9, cell.UnderVoltageRelease, 12);
        Assert.Equal(0, cell.ChargeTemperatureLowTripC, 12);
        Assert.Equal(10, cell.ChargeTemperatureLowReleaseC, 12);
        Assert.Equal(600, cell.ShortCircuitA, 12);
    }
}
