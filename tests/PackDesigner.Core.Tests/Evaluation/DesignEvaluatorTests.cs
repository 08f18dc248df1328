using System.Text.Json;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Findings;
using PackDesigner.Core.Standards;
using PackDesigner.Core.Tests.TestData;

namespace PackDesigner.Core.Tests.Evaluation;

public sealed class DesignEvaluatorTests
{
    [Fact]
    public void Evaluate_ValidDesign_ReturnsResultWithoutErrors()
    {
        var outcome = DesignEvaluator.Evaluate(DesignBuilder.Default().WithParallel(2).Build());

        Assert.True(outcome.IsValid);
        Assert.Empty(outcome.Errors);
        var result = outcome.Result!;
        Assert.Equal(DesignEvaluator.CalculationVersion, result.CalculationVersion);
        Assert.Equal("16S2P", result.Pack.Configuration);
        Assert.Equal(32, result.Pack.CellCount);
        Assert.Equal(200, result.Pack.CapacityAh);
        Assert.Equal(16 * 3.65, result.Pack.MaxVoltage, 12);
        Assert.Equal(VoltageClass.A, result.Pack.VoltageClass);
        Assert.Equal(12, result.Ladder.Count);
        Assert.True(result.Pack.ColdResistanceEstimated);
    }

    [Fact]
    public void Evaluate_PackResistance_IsSeriesCellsOverParallelPlusLinksAndCable()
    {
        // R_pack = S·R_cell/P + (S − 1)·R_link + ρL/A: 16·0.6/2 + 15·0.1 + 2000/(58·35) mΩ.
        var result = DesignBuilder.Default().WithParallel(2).WithLinks(0.1).WithCable(35, 2).Evaluate();

        Reference.AssertClose(16 * 0.6 / 2 + 15 * 0.1 + 2.0 / (58 * 35) * 1000, result.Pack.ResistanceMilliohm, 1e-12, "series/parallel resistance with IEC 60028 copper");
        Assert.True(result.Pack.ColdResistanceMilliohm > result.Pack.ResistanceMilliohm);
    }

    [Fact]
    public void Evaluate_DatasheetColdResistance_IsUsedAtThatTemperature()
    {
        var result = DesignBuilder.Default()
            .WithCell(c => c with { ColdInternalResistanceMilliohm = 1.8, ColdResistanceTemperatureC = -10 })
            .WithAmbient(-10, 35)
            .Evaluate();

        Reference.AssertClose(1.8, result.Pack.CellResistanceColdMilliohm, 1e-12, "datasheet value at its own temperature");
        Assert.False(result.Pack.ColdResistanceEstimated);
        Assert.DoesNotContain(result.Findings, f => f.Code == "cell.cold-resistance-estimated");
    }

    [Fact]
    public void Evaluate_InvalidDesign_ReturnsErrorsAndNoResult()
    {
        var outcome = DesignEvaluator.Evaluate(DesignBuilder.Default().WithSeries(0).WithCell(c => c with { CapacityAh = -5 }).Build());

        Assert.False(outcome.IsValid);
        Assert.Null(outcome.Result);
        Assert.Contains(outcome.Errors, e => e.Field == "series");
        Assert.Contains(outcome.Errors, e => e.Field == "cell.capacityAh");
    }

    [Fact]
    public void Evaluate_CustomChemistryMissingFigures_ReturnsEveryRequiredField()
    {
        var outcome = DesignEvaluator.Evaluate(DesignBuilder.Default().WithCell(new CellInput { Chemistry = Chemistry.Custom }).Build());

        Assert.False(outcome.IsValid);
        Assert.Equal(16, outcome.Errors.Count(e => e.Field.StartsWith("cell.", StringComparison.Ordinal)));
        Assert.Equal(outcome.Errors.Count, outcome.Errors.Select(e => e.Field).Distinct().Count());
    }

    [Fact]
    public void Evaluate_SingleCell_ComputesEverythingFinite()
    {
        var result = DesignBuilder.Default().WithSeries(1).WithParallel(1)
            .WithController(c => c with { MinVoltage = 2.9, MaxVoltage = 3.8, ContinuousCurrentA = 20, PeakCurrentA = 40, RegenCurrentA = 5 })
            .WithCharger(c => c with { MaxVoltage = 3.65, VoltageStepV = 0.01 })
            .Evaluate();

        Assert.Equal("1S1P", result.Pack.Configuration);
        Assert.Empty(ResultWalker.NonFiniteNumbers(result));
        Assert.Equal(result.Charger.WeakestCellEndOfChargeVoltage, result.Charger.TypicalCellEndOfChargeVoltage);
        Assert.Equal(0, result.Protection.LinkResistanceTotalMilliohm);
    }

    [Fact]
    public void Evaluate_Findings_AreOrderedErrorsFirst()
    {
        var findings = DesignBuilder.Default().WithCharger(c => c with { FloatStage = true }).WithAmbient(-5, 35).Evaluate().Findings;

        Assert.Equal(findings.OrderBy(f => f.Severity).Select(f => f.Severity), findings.Select(f => f.Severity));
        Assert.Equal(Severity.Error, findings[0].Severity);
        Assert.Equal(Severity.Info, findings[^1].Severity);
    }

    [Fact]
    public void Evaluate_SameInputTwice_GivesIdenticalResults()
    {
        var input = DesignBuilder.Default().WithParallel(3).WithCable(50, 3).WithBalancing(BalancingMethod.Top).Build();

        var first = JsonSerializer.Serialize(DesignEvaluator.Evaluate(input));
        var second = JsonSerializer.Serialize(DesignEvaluator.Evaluate(input));

        Assert.Equal(first, second);
    }

    [Fact]
    public void Evaluate_Result_HasOnlyFiniteNumbers()
    {
        var result = DesignBuilder.Default().WithCable(50, 3).Evaluate();

        Assert.Empty(ResultWalker.NonFiniteNumbers(result));
        Assert.True(ResultWalker.CountNumbers(result) > 150);
    }

    [Fact]
    public void ResultWalker_NonFiniteNumberInGraph_IsReported()
    {
        // The walker that the property tests rely on must see into records, lists and nullable numbers.
        var result = DesignBuilder.Default().Evaluate();
        var broken = result with { Energy = result.Energy with { UsableEnergyWh = double.NaN }, Ladder = [result.Ladder[0] with { PackVoltage = double.PositiveInfinity }] };

        var found = ResultWalker.NonFiniteNumbers(broken);

        Assert.Equal(["result.Energy.UsableEnergyWh = NaN", "result.Ladder[0].PackVoltage = Infinity"], found);
    }
}
