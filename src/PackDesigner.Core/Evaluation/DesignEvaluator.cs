using PackDesigner.Core.Balancing;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Charging;
using PackDesigner.Core.Design;
using PackDesigner.Core.Energy;
using PackDesigner.Core.Findings;
using PackDesigner.Core.Protection;
using PackDesigner.Core.Thermal;
using PackDesigner.Core.Validation;
using PackDesigner.Core.Voltages;

namespace PackDesigner.Core.Evaluation;

/// <summary>Validates a design and runs every calculator on it. Pure: the same input gives the same result.</summary>
public static class DesignEvaluator
{
    /// <summary>Version of the calculation rules; stored with every saved result.</summary>
    public const string CalculationVersion = "1.0.0";

    public static EvaluationOutcome Evaluate(DesignInput input)
    {
        var cell = CellResolver.TryResolve(input.Cell, out var cellErrors);
        var errors = cellErrors.Concat(DesignValidator.Validate(input, cell)).ToList();
        if (errors.Count > 0 || cell is null)
        {
            return new EvaluationOutcome(null, errors);
        }

        var ctx = PackContext.Create(input, cell);
        var (cellT, packT) = ThresholdCalculator.Compute(ctx);
        var charge = ChargeSetpointCalculator.Compute(ctx, cellT);
        var voltages = PackVoltageCalculator.Compute(ctx, charge.Model);
        var protection = HardwareCalculator.Compute(ctx, charge.Result.ConstantCurrentA);
        var energy = EnergyCalculator.Compute(ctx, charge);
        var thermal = ThermalCalculator.Compute(ctx);
        var ladder = LadderBuilder.Build(ctx, cellT, charge, voltages);
        var findings = FindingRules.Check(ctx, voltages, cellT, packT, charge, protection, thermal, ladder)
            .OrderBy(f => f.Severity)
            .ToList();

        var pack = new PackResult(
            Configuration: $"{ctx.S}S{ctx.P}P",
            Series: ctx.S,
            Parallel: ctx.P,
            CellCount: ctx.S * ctx.P,
            MaxVoltage: voltages.Max,
            NominalVoltage: voltages.Nominal,
            MinVoltage: voltages.Min,
            WindowHighVoltage: voltages.WindowHigh,
            WindowLowVoltage: voltages.WindowLow,
            LoadedLowVoltage: voltages.LoadedLow,
            RegenHighVoltage: voltages.RegenHigh,
            CapacityAh: ctx.GroupCapacityAh,
            NominalEnergyWh: energy.NominalEnergyWh,
            UsableEnergyWh: energy.UsableEnergyWh,
            MassKg: energy.CellMassKg,
            VoltageClass: voltages.VoltageClass,
            ResistanceMilliohm: ctx.PackResistanceOhm * 1000,
            ColdResistanceMilliohm: ctx.PackResistanceColdOhm * 1000,
            CellResistanceColdMilliohm: ctx.CellResistanceColdOhm * 1000,
            ColdResistanceEstimated: ctx.ColdResistanceEstimated);

        var result = new EvaluationResult(
            CalculationVersion,
            cell,
            pack,
            cellT,
            packT,
            BalancingAdvisor.Recommend(ctx, cellT, charge.Result),
            charge.Result,
            protection,
            energy,
            ladder,
            thermal,
            findings);
        return new EvaluationOutcome(result, []);
    }
}
