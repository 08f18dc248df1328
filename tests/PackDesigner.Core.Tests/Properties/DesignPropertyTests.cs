using System.Text.Json;
using CsCheck;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Charging;
using PackDesigner.Core.Curves;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Protection;
using PackDesigner.Core.Tests.TestData;

namespace PackDesigner.Core.Tests.Properties;

/// <summary>Properties every valid design keeps, checked on random designs (CsCheck; a failure prints its seed and the shrunk design).</summary>
public sealed class DesignPropertyTests
{
    private const long Iterations = 400;

    private static EvaluationResult EvaluateValid(DesignInput input)
    {
        var outcome = DesignEvaluator.Evaluate(input);
        Assert.True(outcome.IsValid, "Generated design is invalid: " + string.Join("; ", outcome.Errors.Select(e => $"{e.Field}: {e.Message}")));
        return outcome.Result!;
    }

    [Fact]
    public void Evaluate_ValidDesigns_AreAcceptedByTheValidator()
    {
        DesignGenerators.ValidDesigns.Sample(input => Assert.True(DesignEvaluator.Evaluate(input).IsValid), iter: Iterations);
    }

    [Fact]
    public void Evaluate_AnyValidDesign_LadderInOrderOrFindingNamesBothLayers()
    {
        int brokenPairs = 0, orderedPairs = 0;
        DesignGenerators.ValidDesigns.Sample(input =>
        {
            var result = EvaluateValid(input);
            var ladderFindings = result.Findings.Where(f => f.Code == "ladder.out-of-order").ToList();
            var stepPerCell = input.Charger.VoltageStepV / input.Series;
            var broken = 0;
            for (var i = 1; i < result.Ladder.Count; i++)
            {
                var upper = result.Ladder[i - 1];
                var lower = result.Ladder[i];
                // Order rule as documented in docs/calculations/protection-ladder.md, restated independently.
                var strict = upper.Layer is LadderBuilder.OverVoltageTrip or LadderBuilder.UnderVoltageRelease;
                var slack = upper.Layer == LadderBuilder.ChargeVoltage ? Math.Max(1e-4, stepPerCell) : 1e-4;
                var inOrder = strict ? lower.PerCellVoltage < upper.PerCellVoltage : lower.PerCellVoltage <= upper.PerCellVoltage + slack;
                if (!inOrder)
                {
                    broken++;
                    Assert.Contains(ladderFindings, f =>
                        f.Message.Contains($"\"{upper.Label}\"", StringComparison.Ordinal) && f.Message.Contains($"\"{lower.Label}\"", StringComparison.Ordinal));
                }
            }

            Assert.Equal(broken, ladderFindings.Count);
            Interlocked.Add(ref brokenPairs, broken);
            Interlocked.Add(ref orderedPairs, result.Ladder.Count - 1 - broken);
        }, iter: Iterations);

        // The generator must reach both branches: pairs in order and pairs out of order.
        Assert.True(brokenPairs > 0 && orderedPairs > 0, $"{brokenPairs} broken and {orderedPairs} ordered pairs.");
    }

    [Fact]
    public void Evaluate_AnyValidDesign_UsableEnergyNeverAboveNominal()
    {
        DesignGenerators.ValidDesigns.Sample(input =>
        {
            var energy = EvaluateValid(input).Energy;

            Assert.True(energy.UsableEnergyWh <= energy.NominalEnergyWh * (1 + 1e-12), $"usable {energy.UsableEnergyWh} > nominal {energy.NominalEnergyWh}");
            Assert.True(energy.UsableEnergyWorstCaseWh <= energy.UsableEnergyWh);
            Assert.True(energy.UsableEnergyWorstCaseWh >= 0);
            Assert.True(energy.UsableEnergyAtRestWh > 0);
        }, iter: Iterations);
    }

    [Fact]
    public void Evaluate_AnyValidDesign_EveryNumberIsFinite()
    {
        DesignGenerators.ValidDesigns.Sample(input =>
        {
            var result = EvaluateValid(input);

            Assert.Empty(ResultWalker.NonFiniteNumbers(result));
            // System.Text.Json refuses NaN and infinities by default: the result must also serialise.
            Assert.False(string.IsNullOrEmpty(JsonSerializer.Serialize(result)));
        }, iter: Iterations);
    }

    [Fact]
    public void Evaluate_AnyValidDesignTwice_GivesEqualResults()
    {
        DesignGenerators.ValidDesigns.Sample(input =>
            Assert.Equal(JsonSerializer.Serialize(DesignEvaluator.Evaluate(input)), JsonSerializer.Serialize(DesignEvaluator.Evaluate(input))),
            iter: Iterations / 2);
    }

    [Fact]
    public void Evaluate_AnyFieldMadeInvalid_ReturnsErrorForThatFieldAndNeverThrows()
    {
        var gen = Gen.Select(DesignGenerators.ValidDesigns, Gen.Int[0, InvalidFields.All.Count - 1], DesignGenerators.InvalidValues);

        gen.Sample((input, fieldIndex, value) =>
        {
            var (key, set) = InvalidFields.All[fieldIndex];

            var outcome = DesignEvaluator.Evaluate(set(input, value));

            Assert.False(outcome.IsValid);
            Assert.Null(outcome.Result);
            Assert.Contains(outcome.Errors, e => e.Field == key);
            Assert.All(outcome.Errors, e => Assert.False(string.IsNullOrWhiteSpace(e.Message)));
        }, iter: Iterations);
    }

    [Fact]
    public void Evaluate_RandomCurveTables_ReturnErrorsNamingTheTableOrAResultNeverThrow()
    {
        // Custom cell with a random table (0–8 rows, values anywhere, NaN and infinities included).
        var value = Gen.Frequency((6, Gen.Double[-10, 120]), (1, DesignGenerators.InvalidValues));
        var table = Gen.Select(value, value).Select((soc, v) => new OcvPoint(soc, v)).Array[0, 8];

        table.Sample(rows =>
        {
            var input = DesignBuilder.Default().WithCell(TestCells.CompleteCustom(rows)).Build();

            var outcome = DesignEvaluator.Evaluate(input);

            if (outcome.IsValid)
            {
                Assert.Empty(ResultWalker.NonFiniteNumbers(outcome.Result!));
            }
            else
            {
                Assert.Contains(outcome.Errors, e => e.Field.StartsWith("cell.ocvCurve", StringComparison.Ordinal));
            }
        }, iter: Iterations);
    }

    [Fact]
    public void Compute_WiderCapacityTolerance_NeverRaisesTheOverVoltageReleaseLimitOfCv()
    {
        // Bottom-balanced: the smaller the weakest group, the sooner it reaches the OV release, so the CV that
        // puts it exactly there can only fall as the tolerance widens.
        var gen = Gen.Select(DesignGenerators.ValidDesigns, Gen.Double[0, 10], Gen.Double[0, 10]);

        gen.Sample((input, t1, t2) =>
        {
            var (narrow, wide) = (Math.Min(t1, t2), Math.Max(t1, t2));
            var bottom = input with { Balancing = BalancingMethod.Bottom, Charger = input.Charger with { TargetCellVoltage = null } };

            Assert.True(ReleaseLimit(bottom, wide) <= ReleaseLimit(bottom, narrow) + 1e-9);
        }, iter: Iterations);
    }

    [Fact]
    public void Evaluate_WiderCapacityTolerance_NeverRaisesCv()
    {
        // Bottom-balanced, no target cell voltage: widening the capacity tolerance never raises the CV, whichever
        // limit (window top, OV release or the charger) sets it.
        var gen = Gen.Select(DesignGenerators.ValidDesigns, Gen.Double[0, 10], Gen.Double[0, 10]);

        gen.Sample((input, t1, t2) =>
        {
            var (narrow, wide) = (Math.Min(t1, t2), Math.Max(t1, t2));
            var bottom = input with { Balancing = BalancingMethod.Bottom, Charger = input.Charger with { TargetCellVoltage = null } };
            var a = EvaluateValid(WithTolerance(bottom, narrow)).Charger;
            var b = EvaluateValid(WithTolerance(bottom, wide)).Charger;

            Assert.True(b.ConstantVoltage <= a.ConstantVoltage + 1e-9, $"CV {a.ConstantVoltage} V at {narrow:0.###} % → {b.ConstantVoltage} V at {wide:0.###} %");
        }, iter: Iterations);
    }

    [Fact]
    public void Evaluate_AnyValidDesignWithoutTarget_WeakestGroupEndsAtOrBelowOverVoltageRelease()
    {
        DesignGenerators.ValidDesigns.Sample(input =>
        {
            var result = EvaluateValid(input with { Charger = input.Charger with { TargetCellVoltage = null } });

            Assert.True(result.Charger.WeakestCellEndOfChargeVoltage <= result.CellThresholds.OverVoltageRelease + 1e-9);
            Assert.True(result.Charger.TypicalCellEndOfChargeVoltage <= result.CellThresholds.OverVoltageRelease + 1e-9);
            Assert.DoesNotContain(result.Findings, f => f.Code == "charge.weakest-above-ov-release");
        }, iter: Iterations);
    }

    private static DesignInput WithTolerance(DesignInput input, double percent) =>
        input with { Cell = input.Cell with { CapacityTolerancePercent = percent } };

    private static double ReleaseLimit(DesignInput input, double tolerancePercent)
    {
        var design = WithTolerance(input, tolerancePercent);
        var cell = CellResolver.TryResolve(design.Cell, out _)!;
        var ctx = PackContext.Create(design, cell);
        var (cellT, _) = ThresholdCalculator.Compute(ctx);
        return ChargeSetpointCalculator.Compute(ctx, cellT).Model.ConstantVoltageForHighestGroup(cellT.OverVoltageRelease);
    }
}
