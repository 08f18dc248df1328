using PackDesigner.Core.Cells;
using PackDesigner.Core.Curves;
using PackDesigner.Core.Tests.TestData;

namespace PackDesigner.Core.Tests.Cells;

public sealed class CellResolverTests
{
    /// <summary>Every figure of a cell datasheet a custom chemistry must give, by field key.</summary>
    private static readonly string[] FigureKeyNames =
    [
        "capacityAh", "nominalVoltage", "maxChargeVoltage", "minDischargeVoltage", "maxChargeCurrentA",
        "maxDischargeCurrentA", "peakDischargeCurrentA", "peakDischargeDurationS", "internalResistanceMilliohm",
        "massKg", "capacityTolerancePercent", "chargeTemperatureMinC", "chargeTemperatureMaxC",
        "dischargeTemperatureMinC", "dischargeTemperatureMaxC",
    ];

    public static TheoryData<string> FigureKeys => [.. FigureKeyNames];

    private static CellInput Without(CellInput cell, string key) => key switch
    {
        "capacityAh" => cell with { CapacityAh = null },
        "nominalVoltage" => cell with { NominalVoltage = null },
        "maxChargeVoltage" => cell with { MaxChargeVoltage = null },
        "minDischargeVoltage" => cell with { MinDischargeVoltage = null },
        "maxChargeCurrentA" => cell with { MaxChargeCurrentA = null },
        "maxDischargeCurrentA" => cell with { MaxDischargeCurrentA = null },
        "peakDischargeCurrentA" => cell with { PeakDischargeCurrentA = null },
        "peakDischargeDurationS" => cell with { PeakDischargeDurationS = null },
        "internalResistanceMilliohm" => cell with { InternalResistanceMilliohm = null },
        "massKg" => cell with { MassKg = null },
        "capacityTolerancePercent" => cell with { CapacityTolerancePercent = null },
        "chargeTemperatureMinC" => cell with { ChargeTemperatureMinC = null },
        "chargeTemperatureMaxC" => cell with { ChargeTemperatureMaxC = null },
        "dischargeTemperatureMinC" => cell with { DischargeTemperatureMinC = null },
        "dischargeTemperatureMaxC" => cell with { DischargeTemperatureMaxC = null },
        _ => throw new ArgumentOutOfRangeException(nameof(key), key, null),
    };

    [Theory]
    [InlineData(Chemistry.Lfp)]
    [InlineData(Chemistry.Nmc)]
    [InlineData(Chemistry.Nca)]
    [InlineData(Chemistry.Lto)]
    public void TryResolve_PresetWithNoFigures_TakesEveryPresetValue(Chemistry chemistry)
    {
        var preset = ChemistryPresets.For(chemistry)!;

        var cell = CellResolver.TryResolve(new CellInput { Chemistry = chemistry }, out var errors);

        Assert.Empty(errors);
        Assert.NotNull(cell);
        Assert.Equal(preset.CapacityAh, cell.CapacityAh);
        Assert.Equal(preset.NominalVoltage, cell.NominalVoltage);
        Assert.Equal(preset.MaxChargeVoltage, cell.MaxChargeVoltage);
        Assert.Equal(preset.MinDischargeVoltage, cell.MinDischargeVoltage);
        Assert.Equal(preset.MaxChargeCurrentA, cell.MaxChargeCurrentA);
        Assert.Equal(preset.MaxDischargeCurrentA, cell.MaxDischargeCurrentA);
        Assert.Equal(preset.PeakDischargeCurrentA, cell.PeakDischargeCurrentA);
        Assert.Equal(preset.PeakDischargeDurationS, cell.PeakDischargeDurationS);
        Assert.Equal(preset.InternalResistanceMilliohm, cell.InternalResistanceMilliohm);
        Assert.Equal(preset.MassKg, cell.MassKg);
        Assert.Equal(preset.CapacityTolerancePercent, cell.CapacityTolerancePercent);
        Assert.Equal(preset.ChargeTemperatureMinC, cell.ChargeTemperatureMinC);
        Assert.Equal(preset.ChargeTemperatureMaxC, cell.ChargeTemperatureMaxC);
        Assert.Equal(preset.DischargeTemperatureMinC, cell.DischargeTemperatureMinC);
        Assert.Equal(preset.DischargeTemperatureMaxC, cell.DischargeTemperatureMaxC);
        Assert.Equal(preset.OcvCurve, cell.OcvCurve.Points);
        Assert.Equal(FigureOrigin.Preset, cell.Origins["capacityAh"]);
        Assert.Equal(FigureOrigin.Preset, cell.Origins["ocvCurve"]);
        // Termination C/20 (common practice) when the datasheet gives none.
        Assert.Equal(preset.CapacityAh / 20, cell.TerminationCurrentA, 12);
        Assert.Equal(FigureOrigin.Derived, cell.Origins["terminationCurrentA"]);
    }

    [Fact]
    public void TryResolve_DatasheetFigures_OverridePresetAndAreMarkedDatasheet()
    {
        var cell = CellResolver.TryResolve(new CellInput { Chemistry = Chemistry.Lfp, CapacityAh = 280, MaxChargeVoltage = 3.6, TerminationCurrentA = 5.6 }, out var errors);

        Assert.Empty(errors);
        Assert.Equal(280, cell!.CapacityAh);
        Assert.Equal(3.6, cell.MaxChargeVoltage);
        Assert.Equal(5.6, cell.TerminationCurrentA);
        Assert.Equal(FigureOrigin.Datasheet, cell.Origins["capacityAh"]);
        Assert.Equal(FigureOrigin.Datasheet, cell.Origins["maxChargeVoltage"]);
        Assert.Equal(FigureOrigin.Datasheet, cell.Origins["terminationCurrentA"]);
        Assert.Equal(FigureOrigin.Preset, cell.Origins["nominalVoltage"]);
    }

    [Fact]
    public void TryResolve_CustomWithEveryFigure_Resolves()
    {
        var cell = CellResolver.TryResolve(TestCells.CompleteCustom(), out var errors);

        Assert.Empty(errors);
        Assert.NotNull(cell);
        Assert.Equal(FigureOrigin.Datasheet, cell.Origins["ocvCurve"]);
    }

    [Fact]
    public void TryResolve_CustomWithNoFigures_RequiresEachFigureOnceByName()
    {
        var cell = CellResolver.TryResolve(new CellInput { Chemistry = Chemistry.Custom }, out var errors);

        Assert.Null(cell);
        var expected = FigureKeyNames.Select(key => "cell." + key).Append("cell.ocvCurve").Order(StringComparer.Ordinal);
        Assert.Equal(expected, errors.Select(e => e.Field).Order(StringComparer.Ordinal));
        Assert.All(errors, e => Assert.StartsWith("Required for a custom chemistry", e.Message, StringComparison.Ordinal));
    }

    [Theory]
    [MemberData(nameof(FigureKeys))]
    public void TryResolve_CustomMissingOneFigure_NamesThatFigureOnly(string key)
    {
        var cell = CellResolver.TryResolve(Without(TestCells.CompleteCustom(), key), out var errors);

        Assert.Null(cell);
        var error = Assert.Single(errors);
        Assert.Equal("cell." + key, error.Field);
        Assert.StartsWith("Required for a custom chemistry", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void TryResolve_CustomWithoutCurve_RequiresTheCurve()
    {
        var cell = CellResolver.TryResolve(TestCells.CompleteCustom() with { OcvCurve = null }, out var errors);

        Assert.Null(cell);
        Assert.Equal("cell.ocvCurve", Assert.Single(errors).Field);
    }

    public static TheoryData<CellInput, string> BadCells => new()
    {
        { TestCells.CompleteCustom() with { CapacityAh = 0 }, "cell.capacityAh" },
        { TestCells.CompleteCustom() with { CapacityAh = double.NaN }, "cell.capacityAh" },
        { TestCells.CompleteCustom() with { NominalVoltage = 6 }, "cell.nominalVoltage" },
        { TestCells.CompleteCustom() with { MaxChargeVoltage = 3.3 }, "cell.maxChargeVoltage" },
        { TestCells.CompleteCustom() with { MinDischargeVoltage = 3.3 }, "cell.minDischargeVoltage" },
        { TestCells.CompleteCustom() with { MinDischargeVoltage = 0.4 }, "cell.minDischargeVoltage" },
        { TestCells.CompleteCustom() with { MaxChargeCurrentA = 0 }, "cell.maxChargeCurrentA" },
        { TestCells.CompleteCustom() with { MaxDischargeCurrentA = -1 }, "cell.maxDischargeCurrentA" },
        { TestCells.CompleteCustom() with { PeakDischargeCurrentA = 99 }, "cell.peakDischargeCurrentA" },
        { TestCells.CompleteCustom() with { PeakDischargeDurationS = 0 }, "cell.peakDischargeDurationS" },
        { TestCells.CompleteCustom() with { InternalResistanceMilliohm = 0 }, "cell.internalResistanceMilliohm" },
        { TestCells.CompleteCustom() with { MassKg = 201 }, "cell.massKg" },
        { TestCells.CompleteCustom() with { CapacityTolerancePercent = -1 }, "cell.capacityTolerancePercent" },
        { TestCells.CompleteCustom() with { CapacityTolerancePercent = 51 }, "cell.capacityTolerancePercent" },
        { TestCells.CompleteCustom() with { ChargeTemperatureMinC = 50 }, "cell.chargeTemperatureMaxC" },
        { TestCells.CompleteCustom() with { ChargeTemperatureMinC = -61 }, "cell.chargeTemperatureMinC" },
        { TestCells.CompleteCustom() with { DischargeTemperatureMaxC = -30 }, "cell.dischargeTemperatureMaxC" },
        { TestCells.CompleteCustom() with { DischargeTemperatureMaxC = 101 }, "cell.dischargeTemperatureMaxC" },
        { TestCells.CompleteCustom() with { TerminationCurrentA = 0 }, "cell.terminationCurrentA" },
        { TestCells.CompleteCustom() with { TerminationCurrentA = 51 }, "cell.terminationCurrentA" },
        { TestCells.CompleteCustom() with { ColdInternalResistanceMilliohm = 3 }, "cell.coldResistanceTemperatureC" },
        { TestCells.CompleteCustom() with { ColdResistanceTemperatureC = -10 }, "cell.coldInternalResistanceMilliohm" },
        { TestCells.CompleteCustom() with { ColdInternalResistanceMilliohm = 0.5, ColdResistanceTemperatureC = -10 }, "cell.coldInternalResistanceMilliohm" },
        { TestCells.CompleteCustom() with { ColdInternalResistanceMilliohm = 3, ColdResistanceTemperatureC = 20 }, "cell.coldResistanceTemperatureC" },
        { TestCells.CompleteCustom([new(0, 3.0), new(50, 3.3), new(50, 3.4), new(100, 3.5)]), "cell.ocvCurve[2].socPercent" },
        { TestCells.CompleteCustom([new(0, 3.0), new(40, 3.3), new(60, 3.2), new(100, 3.5)]), "cell.ocvCurve[2].voltage" },
        { TestCells.CompleteCustom([new(0, 3.0), new(40, 3.3), new(60, 3.9), new(100, 3.95)]), "cell.ocvCurve[2].voltage" },
        { TestCells.CompleteCustom([new(0, 2.7), new(100, 3.5)]), "cell.ocvCurve[0].voltage" },
        { TestCells.CompleteCustom([new(0, 3.0)]), "cell.ocvCurve" },
        { new CellInput { Chemistry = Chemistry.Lfp, MaxChargeVoltage = 3.45 }, "cell.ocvCurve[14].voltage" },
    };

    [Theory]
    [MemberData(nameof(BadCells))]
    public void TryResolve_BadFigure_ReturnsErrorKeyedByThatField(CellInput input, string expectedField)
    {
        var cell = CellResolver.TryResolve(input, out var errors);

        Assert.Null(cell);
        Assert.Contains(errors, e => e.Field == expectedField);
        Assert.All(errors, e => Assert.StartsWith("cell.", e.Field, StringComparison.Ordinal));
        Assert.All(errors, e => Assert.DoesNotContain("Exception", e.Message, StringComparison.Ordinal));
    }

    [Fact]
    public void TryResolve_RangeError_StatesBoundsAndUnit()
    {
        CellResolver.TryResolve(TestCells.CompleteCustom() with { MassKg = 201 }, out var errors);

        Assert.Equal("Must be above 0 kg and at most 200 kg (got 201).", Assert.Single(errors).Message);
    }

    [Fact]
    public void TryResolve_ColdResistancePair_IsKeptOnTheCell()
    {
        var cell = CellResolver.TryResolve(TestCells.CompleteCustom() with { ColdInternalResistanceMilliohm = 3, ColdResistanceTemperatureC = -10 }, out var errors);

        Assert.Empty(errors);
        Assert.Equal(3, cell!.ColdInternalResistanceMilliohm);
        Assert.Equal(-10, cell.ColdResistanceTemperatureC);
    }

    [Fact]
    public void TryResolve_CurveRowErrors_NameTheRowInTheMessage()
    {
        CellResolver.TryResolve(TestCells.CompleteCustom([new OcvPoint(0, 3.0), new(40, 3.3), new(60, 3.2), new(100, 3.5)]), out var errors);

        var error = Assert.Single(errors);
        Assert.Equal("cell.ocvCurve[2].voltage", error.Field);
        Assert.StartsWith("Row 3:", error.Message, StringComparison.Ordinal);
    }
}
