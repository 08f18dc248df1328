using MathNet.Numerics;
using MathNet.Numerics.Integration;
using MathNet.Numerics.Interpolation;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Curves;
using PackDesigner.Core.Tests.TestData;

namespace PackDesigner.Core.Tests.Curves;

public sealed class OcvCurveTests
{
    public static TheoryData<Chemistry> PresetChemistries => [Chemistry.Lfp, Chemistry.Nmc, Chemistry.Nca, Chemistry.Lto];

    private static OcvCurve PresetCurve(Chemistry chemistry) => OcvCurve.Create(ChemistryPresets.For(chemistry)!.OcvCurve);

    [Fact]
    public void VoltageAt_LinearCurve_InterpolatesStraightLine()
    {
        var curve = TestCells.LinearCurve(3.0, 4.0);

        Reference.AssertClose(3.25, curve.VoltageAt(0.25), 1e-15, "straight line V = 3 + s");
        Reference.AssertClose(3.0, curve.EmptyVoltage, 0, "table row 0 %");
        Reference.AssertClose(4.0, curve.FullVoltage, 0, "table row 100 %");
        Reference.AssertClose(1.0, curve.SlopeAt(0.7), 1e-15, "slope of V = 3 + s");
    }

    [Fact]
    public void VoltageAt_OutsideZeroToOne_ClampsToTableEnds()
    {
        var curve = TestCells.LinearCurve(3.0, 4.0);

        Assert.Equal(3.0, curve.VoltageAt(-0.5));
        Assert.Equal(4.0, curve.VoltageAt(1.5));
        Assert.Equal(0.0, curve.SocAt(2.0));
        Assert.Equal(1.0, curve.SocAt(5.0));
    }

    [Theory]
    [MemberData(nameof(PresetChemistries))]
    public void VoltageAt_TableRows_ReturnsRowVoltages(Chemistry chemistry)
    {
        var table = ChemistryPresets.For(chemistry)!.OcvCurve;
        var curve = OcvCurve.Create(table);

        foreach (var row in table)
        {
            Assert.Equal(row.Voltage, curve.VoltageAt(row.SocPercent / 100), 12);
        }

        // The table comes back exactly as entered (no SOC/100·100 round trip).
        Assert.Equal(table, curve.Points);
    }

    [Theory]
    [MemberData(nameof(PresetChemistries))]
    public void SocAt_VoltageAtOfAnySoc_RoundTrips(Chemistry chemistry)
    {
        var curve = PresetCurve(chemistry);

        for (var soc = 0.0; soc <= 1.0; soc += 0.0137)
        {
            Assert.Equal(soc, curve.SocAt(curve.VoltageAt(soc)), 12);
        }
    }

    [Theory]
    [MemberData(nameof(PresetChemistries))]
    public void VoltageAt_AnySoc_EqualsMathNetLinearSpline(Chemistry chemistry)
    {
        var table = ChemistryPresets.For(chemistry)!.OcvCurve;
        var curve = OcvCurve.Create(table);
        // Independent interpolant: MathNet.Numerics LinearSpline over the same rows.
        var spline = LinearSpline.InterpolateSorted(table.Select(p => p.SocPercent / 100).ToArray(), table.Select(p => p.Voltage).ToArray());

        for (var soc = 0.0; soc <= 1.0; soc += 0.00731)
        {
            Reference.AssertClose(spline.Interpolate(soc), curve.VoltageAt(soc), 1e-13, "MathNet.Numerics LinearSpline.Interpolate");
            Reference.AssertClose(spline.Differentiate(soc + 1e-9), curve.SlopeAt(soc + 1e-9), 1e-9, "MathNet.Numerics LinearSpline.Differentiate");
        }
    }

    [Fact]
    public void EnergyIntegral_LinearCurve_MatchesClosedForm()
    {
        var curve = TestCells.LinearCurve(3.0, 4.0);

        // ∫ (3 + s) ds from 0.2 to 0.6 = 1.2 + (0.36 − 0.04)/2 = 1.36.
        Reference.AssertClose(1.36, curve.EnergyIntegral(0.2, 0.6), 1e-14, "∫(3 + s) ds, closed form");
        Reference.AssertClose(3.5, curve.MeanVoltage, 1e-15, "mean of a straight line = midpoint");
        Reference.AssertClose(-1.36, curve.EnergyIntegral(0.6, 0.2), 1e-14, "reversed bounds change the sign");
        Reference.AssertClose(3.5, curve.EnergyIntegral(-1, 2), 1e-15, "bounds clamp to 0–1");
        Assert.Equal(0.0, curve.EnergyIntegral(0.4, 0.4));
    }

    [Theory]
    [MemberData(nameof(PresetChemistries))]
    public void EnergyIntegral_PresetCurves_EqualsMathNetIntegration(Chemistry chemistry)
    {
        var table = ChemistryPresets.For(chemistry)!.OcvCurve;
        var curve = OcvCurve.Create(table);
        var spline = LinearSpline.InterpolateSorted(table.Select(p => p.SocPercent / 100).ToArray(), table.Select(p => p.Voltage).ToArray());
        (double From, double To)[] intervals = [(0, 1), (0.1, 0.9), (0.2, 0.8), (0.033, 0.517), (0.5, 1), (0.0, 0.05), (0.97, 1.0)];

        foreach (var (from, to) in intervals)
        {
            var energy = curve.EnergyIntegral(from, to);
            // MathNet.Numerics: exact integral of its own linear spline through the same rows.
            Reference.AssertClose(spline.Integrate(from, to), energy, 1e-12, "MathNet.Numerics LinearSpline.Integrate");
            // MathNet.Numerics: composite trapezium rule on Core's interpolant (error O(h²) at the kinks).
            Reference.AssertClose(NewtonCotesTrapeziumRule.IntegrateComposite(curve.VoltageAt, from, to, 200_000), energy, 1e-9,
                "MathNet.Numerics NewtonCotesTrapeziumRule.IntegrateComposite");
            // MathNet.Numerics: double-exponential quadrature of Core's interpolant.
            Reference.AssertClose(Integrate.OnClosedInterval(curve.VoltageAt, from, to, 1e-10), energy, 1e-5,
                "MathNet.Numerics Integrate.OnClosedInterval");
        }

        Reference.AssertClose(spline.Integrate(0, 1), curve.MeanVoltage, 1e-12, "MathNet.Numerics LinearSpline.Integrate over 0–1");
    }

    [Fact]
    public void EnergyIntegral_ChenNmc811Fit_MatchesTabulatedCellEnergies()
    {
        // Chen et al. 2020 NMC811 fit, tabulated in REFERENCES.md for a 5 Ah cell: 18.47 Wh over 0–100 %,
        // 14.90 Wh over 10–90 %, mean 3.694 V. A 1001-row table of the fit reproduces the smooth integral to
        // about 1e-6 (trapezoid error), well inside the 4-digit rounding of the published values.
        var curve = ChenNmc811.Curve(1001);
        var e0To100 = ReferenceValues.ChenEnergy0To100Wh;
        var e10To90 = ReferenceValues.ChenEnergy10To90Wh;

        Reference.AssertClose(e0To100, ReferenceValues.ChenCellCapacityAh * curve.EnergyIntegral(0, 1), Reference.RoundingTolerance(e0To100.Value, 4));
        Reference.AssertClose(e10To90, ReferenceValues.ChenCellCapacityAh * curve.EnergyIntegral(0.1, 0.9), Reference.RoundingTolerance(e10To90.Value, 4));
        Reference.AssertClose(ReferenceValues.ChenMeanVoltage, curve.MeanVoltage, Reference.RoundingTolerance(3.694, 4));
    }

    [Fact]
    public void EnergyIntegral_ChenNmc811Fit_ConvergesToMathNetQuadratureOfTheSmoothFit()
    {
        // The piecewise-linear integral of a fine table converges (O(h²)) to the integral of the smooth fit,
        // computed here by MathNet.Numerics' double-exponential quadrature directly on the formula.
        var smooth = Integrate.OnClosedInterval(ChenNmc811.CellVoltage, 0, 1, 1e-12);
        var coarse = Math.Abs(ChenNmc811.Curve(101).EnergyIntegral(0, 1) - smooth);
        var fine = Math.Abs(ChenNmc811.Curve(1001).EnergyIntegral(0, 1) - smooth);

        Reference.AssertClose(smooth, ChenNmc811.Curve(1001).EnergyIntegral(0, 1), 1e-6, "MathNet.Numerics Integrate.OnClosedInterval on the Chen fit");
        Assert.True(fine < coarse / 50, $"Ten times finer should be about a hundred times closer: {coarse:G3} → {fine:G3}.");
    }

    [Fact]
    public void ChenNmc811_FitFormula_ReproducesTabulatedVoltages()
    {
        // Guards the transcription of the fit formula in TestData against the values quoted in REFERENCES.md.
        foreach (var (soc, voltage) in ReferenceValues.ChenOcvPoints)
        {
            Reference.AssertClose(voltage, ChenNmc811.CellVoltage(soc), Reference.RoundingTolerance(voltage.Value, 4));
        }
    }

    [Fact]
    public void Validate_FewerThanTwoRows_NamesTheTable()
    {
        var errors = OcvCurve.Validate([new OcvPoint(0, 3.0)], 2.5, 3.65);

        var error = Assert.Single(errors);
        Assert.Equal("cell.ocvCurve", error.Field);
    }

    [Fact]
    public void Validate_GoodTable_ReturnsNoErrors()
    {
        Assert.Empty(OcvCurve.Validate(TestCells.Linear(3.0, 3.6), 2.5, 3.65));
        Assert.Empty(OcvCurve.Validate(TestCells.Linear(2.5, 3.65), 2.5, 3.65));
    }

    public static TheoryData<OcvPoint[], string> BadTables => new()
    {
        { [new(0, 3.0), new(50, 3.3), new(50, 3.4), new(100, 3.5)], "cell.ocvCurve[2].socPercent" },
        { [new(0, 3.0), new(40, 3.3), new(30, 3.4), new(100, 3.5)], "cell.ocvCurve[2].socPercent" },
        { [new(0, 3.0), new(40, 3.3), new(60, 3.3), new(100, 3.5)], "cell.ocvCurve[2].voltage" },
        { [new(0, 3.0), new(40, 3.3), new(60, 3.2), new(100, 3.5)], "cell.ocvCurve[2].voltage" },
        { [new(0, 3.0), new(40, 3.3), new(60, 3.9), new(100, 3.95)], "cell.ocvCurve[2].voltage" },
        { [new(0, 3.0), new(40, 3.3), new(60, double.NaN), new(100, 3.5)], "cell.ocvCurve[2].voltage" },
        { [new(0, 3.0), new(40, 3.3), new(60, -1), new(100, 3.5)], "cell.ocvCurve[2].voltage" },
        { [new(0, 2.0), new(100, 3.5)], "cell.ocvCurve[0].voltage" },
        { [new(0, 3.0), new(40, 3.3), new(double.NaN, 3.4), new(100, 3.5)], "cell.ocvCurve[2].socPercent" },
        { [new(0, 3.0), new(40, 3.3), new(120, 3.4), new(100, 3.5)], "cell.ocvCurve[2].socPercent" },
        { [new(5, 3.0), new(100, 3.5)], "cell.ocvCurve[0].socPercent" },
        { [new(0, 3.0), new(40, 3.3), new(95, 3.5)], "cell.ocvCurve[2].socPercent" },
    };

    [Theory]
    [MemberData(nameof(BadTables))]
    public void Validate_BadRow_NamesTheRowAndColumn(OcvPoint[] table, string expectedField)
    {
        var errors = OcvCurve.Validate(table, 2.5, 3.65);

        Assert.Contains(errors, e => e.Field == expectedField);
        Assert.All(errors, e => Assert.False(string.IsNullOrWhiteSpace(e.Message)));
    }

    [Fact]
    public void Validate_VoltageOutsideCellRange_MessageStatesValueAndRange()
    {
        var errors = OcvCurve.Validate([new(0, 3.0), new(40, 3.3), new(60, 3.9), new(100, 3.95)], 2.5, 3.65);

        var error = errors.First(e => e.Field == "cell.ocvCurve[2].voltage");
        Assert.Contains("Row 3", error.Message, StringComparison.Ordinal);
        Assert.Contains("3.9 V", error.Message, StringComparison.Ordinal);
        Assert.Contains("2.5–3.65 V", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Validate_OtherFieldName_PrefixesEveryKey()
    {
        var errors = OcvCurve.Validate([new(0, 3.0), new(50, 2.9), new(100, 3.5)], 2.5, 3.65, "cells[1].curve");

        Assert.Equal("cells[1].curve[1].voltage", Assert.Single(errors).Field);
    }

    [Fact]
    public void Create_InvalidTable_ThrowsArgumentException()
    {
        Assert.Throws<ArgumentException>(() => OcvCurve.Create([new(0, 3.0), new(50, 2.9), new(100, 3.5)]));
        Assert.Throws<ArgumentException>(() => OcvCurve.Create([new(0, 3.0)]));
    }
}
