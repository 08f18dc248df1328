using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;

namespace PackDesigner.Core.Tests.TestData;

/// <summary>
/// Test designs with defaults and <c>With…</c> overrides. The default is a plain 16S1P pack of the LFP preset
/// cell (its figures are the preset's typical values, common practice) with equipment chosen so that the design
/// evaluates cleanly; it is test scaffolding, not a reference value.
/// </summary>
public sealed class DesignBuilder
{
    private DesignInput _input = new()
    {
        Cell = new CellInput { Chemistry = Chemistry.Lfp },
        Series = 16,
        Parallel = 1,
        Balancing = BalancingMethod.Bottom,
        SocWindow = new SocWindowInput(10, 90),
        Controller = new ControllerInput(
            MinVoltage: 46.4,
            MaxVoltage: 60,
            ContinuousCurrentA: 50,
            PeakCurrentA: 100,
            PeakDurationS: 10,
            RegenCurrentA: 20,
            DcLinkCapacitanceMicrofarad: 1000,
            PrechargeTimeS: 0.5),
        Charger = new ChargerInput(MaxVoltage: 58, MaxCurrentA: 20, VoltageStepV: 0.1, FloatStage: false),
        Ambient = new AmbientInput(5, 35),
    };

    public static DesignBuilder Default() => new();

    public DesignBuilder WithCell(Func<CellInput, CellInput> change) => Set(_input with { Cell = change(_input.Cell) });

    public DesignBuilder WithCell(CellInput cell) => Set(_input with { Cell = cell });

    public DesignBuilder WithChemistry(Chemistry chemistry) => WithCell(c => c with { Chemistry = chemistry });

    public DesignBuilder WithTolerance(double percent) => WithCell(c => c with { CapacityTolerancePercent = percent });

    public DesignBuilder WithSeries(int series) => Set(_input with { Series = series });

    public DesignBuilder WithParallel(int parallel) => Set(_input with { Parallel = parallel });

    public DesignBuilder WithLinks(double milliohm) => Set(_input with { LinkResistanceMilliohm = milliohm });

    public DesignBuilder WithCable(double crossSectionMm2, double lengthM) => Set(_input with { Cable = new CableInput(crossSectionMm2, lengthM) });

    public DesignBuilder WithBalancing(BalancingMethod method) => Set(_input with { Balancing = method });

    public DesignBuilder WithWindow(double minPercent, double maxPercent) => Set(_input with { SocWindow = new SocWindowInput(minPercent, maxPercent) });

    public DesignBuilder WithController(Func<ControllerInput, ControllerInput> change) => Set(_input with { Controller = change(_input.Controller) });

    public DesignBuilder WithCharger(Func<ChargerInput, ChargerInput> change) => Set(_input with { Charger = change(_input.Charger) });

    public DesignBuilder WithAmbient(double minC, double maxC) => Set(_input with { Ambient = new AmbientInput(minC, maxC) });

    public DesignBuilder WithMargins(Func<MarginsInput, MarginsInput> change) => Set(_input with { Margins = change(_input.Margins ?? new MarginsInput()) });

    public DesignInput Build() => _input;

    /// <summary>The resolved cell and context of a valid design (fails the test when the design is invalid).</summary>
    public PackContext Context()
    {
        var cell = CellResolver.TryResolve(_input.Cell, out var errors);
        Assert.Empty(errors);
        Assert.NotNull(cell);
        return PackContext.Create(_input, cell);
    }

    /// <summary>The result of a valid design (fails the test, listing the errors, when it is invalid).</summary>
    public EvaluationResult Evaluate()
    {
        var outcome = DesignEvaluator.Evaluate(_input);
        Assert.True(outcome.IsValid, string.Join("; ", outcome.Errors.Select(e => $"{e.Field}: {e.Message}")));
        return outcome.Result!;
    }

    private DesignBuilder Set(DesignInput input)
    {
        _input = input;
        return this;
    }
}
