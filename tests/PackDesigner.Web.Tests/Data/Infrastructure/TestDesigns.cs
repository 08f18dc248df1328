using PackDesigner.Core.Cells;
using PackDesigner.Core.Curves;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;

namespace PackDesigner.Web.Tests.Data.Infrastructure;

/// <summary>
/// Test-data builder of design inputs. The default is a plain 16S2P LFP pack with figures typical of a 50 Ah
/// prismatic LFP cell (common practice, not a product's datasheet) that Core evaluates without errors.
/// </summary>
public sealed class TestDesigns
{
    private DesignInput _input = new()
    {
        Cell = new CellInput
        {
            Chemistry = Chemistry.Lfp,
            CapacityAh = 50,
            NominalVoltage = 3.2,
            MaxChargeVoltage = 3.65,
            MinDischargeVoltage = 2.5,
            MaxChargeCurrentA = 50,
            MaxDischargeCurrentA = 100,
            PeakDischargeCurrentA = 150,
            PeakDischargeDurationS = 10,
            InternalResistanceMilliohm = 1.0,
            MassKg = 1.1,
            CapacityTolerancePercent = 3,
            ChargeTemperatureMinC = 0,
            ChargeTemperatureMaxC = 45,
            DischargeTemperatureMinC = -20,
            DischargeTemperatureMaxC = 60,
        },
        Series = 16,
        Parallel = 2,
        LinkResistanceMilliohm = 0.1,
        SocWindow = new SocWindowInput(10, 90),
        Controller = new ControllerInput(
            MinVoltage: 40,
            MaxVoltage: 60,
            ContinuousCurrentA: 100,
            PeakCurrentA: 200,
            PeakDurationS: 10,
            RegenCurrentA: 30,
            DcLinkCapacitanceMicrofarad: 1000,
            PrechargeTimeS: 1),
        Charger = new ChargerInput(MaxVoltage: 60, MaxCurrentA: 20, VoltageStepV: 0.1, FloatStage: false),
        Ambient = new AmbientInput(-5, 35),
    };

    public static TestDesigns Default() => new();

    /// <summary>The default input.</summary>
    public static DesignInput Valid() => new TestDesigns().Build();

    public TestDesigns WithSeries(int series)
    {
        _input = _input with { Series = series };
        return this;
    }

    public TestDesigns WithParallel(int parallel)
    {
        _input = _input with { Parallel = parallel };
        return this;
    }

    public TestDesigns WithCapacityAh(double? capacityAh)
    {
        _input = _input with { Cell = _input.Cell with { CapacityAh = capacityAh } };
        return this;
    }

    /// <summary>Every optional figure set: cold resistance, termination current, an OCV table, cable, margins, charge target.</summary>
    public TestDesigns WithEveryOptionalFigure()
    {
        _input = _input with
        {
            Cell = _input.Cell with
            {
                ColdInternalResistanceMilliohm = 3.1,
                ColdResistanceTemperatureC = -10,
                TerminationCurrentA = 2.5,
                OcvCurve = [new OcvPoint(0, 2.5), new OcvPoint(10, 3.2), new OcvPoint(50, 3.29), new OcvPoint(90, 3.34), new OcvPoint(100, 3.6)],
            },
            Cable = new CableInput(35, 1.5),
            Balancing = BalancingMethod.Top,
            Margins = new MarginsInput { OverVoltageHysteresisV = 0.12, TemperatureMarginC = 3 },
            Charger = _input.Charger with { TargetCellVoltage = 3.45, FloatStage = true },
        };
        return this;
    }

    public DesignInput Build()
    {
        var outcome = DesignEvaluator.Evaluate(_input);
        if (!outcome.IsValid)
        {
            throw new InvalidOperationException("The test design is invalid: " + string.Join("; ", outcome.Errors.Select(e => e.Field + ": " + e.Message)));
        }

        return _input;
    }

    /// <summary>An input Core refuses (negative capacity and zero series count).</summary>
    public static DesignInput Invalid() => Valid() with { Series = 0, Cell = Valid().Cell with { CapacityAh = -5 } };
}
