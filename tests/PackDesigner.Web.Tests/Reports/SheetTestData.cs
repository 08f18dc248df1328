using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;
using PackDesigner.Reports;
using PackDesigner.Reports.Model;

namespace PackDesigner.Web.Tests.Reports;

/// <summary>
/// Designs and headers for the sheet tests, with defaults and With… overrides. The figures are test data of our
/// own (not the demo scenario); where a test compares against an outside value it says so beside the check.
/// </summary>
internal sealed record SheetTestDesign
{
    public static readonly DateTime RevisionTime = new(2026, 3, 14, 15, 9, 26, DateTimeKind.Utc);
    public const string Hash = "9c1e5a7f3b2d4e6f8a0b1c2d3e4f5a6b7c8d9e0f";

    public DesignInput Input { get; init; } = new()
    {
        Cell = new CellInput
        {
            Chemistry = Chemistry.Lfp,
            CapacityAh = 105,
            NominalVoltage = 3.2,
            MaxChargeVoltage = 3.65,
            MinDischargeVoltage = 2.5,
            MaxChargeCurrentA = 52.5,
            MaxDischargeCurrentA = 105,
            PeakDischargeCurrentA = 210,
            PeakDischargeDurationS = 10,
            InternalResistanceMilliohm = 0.45,
            MassKg = 2.1,
            CapacityTolerancePercent = 2,
            ChargeTemperatureMinC = 0,
            ChargeTemperatureMaxC = 50,
            DischargeTemperatureMinC = -20,
            DischargeTemperatureMaxC = 55,
        },
        Series = 24,
        Parallel = 2,
        LinkResistanceMilliohm = 0.08,
        Cable = new CableInput(50, 3),
        Balancing = BalancingMethod.Bottom,
        SocWindow = new SocWindowInput(15, 85),
        // The controller's 64 V cut-off (2.667 V per cell) sits below the BMS under-voltage release on purpose, so the
        // sheet has an error finding to print.
        Controller = new ControllerInput(64, 90, 180, 320, 15, 60, 1500, 0.8),
        Charger = new ChargerInput(88, 30, 0.1, FloatStage: false),
        Ambient = new AmbientInput(5, 35),
    };

    public SheetHeader Header { get; init; } = new(
        "Test trailer, 24S2P", "Test customer", "Test job 17", 4, RevisionTime, DesignEvaluator.CalculationVersion, Hash, "draft");

    public SheetTestDesign WithInput(Func<DesignInput, DesignInput> change) => this with { Input = change(Input) };

    public SheetTestDesign WithCell(Func<CellInput, CellInput> change) => this with { Input = Input with { Cell = change(Input.Cell) } };

    public SheetTestDesign WithHeader(Func<SheetHeader, SheetHeader> change) => this with { Header = change(Header) };

    public SheetTestDesign WithName(string name) => WithHeader(h => h with { DesignName = name });

    public SheetTestDesign Approved() => WithHeader(h => h with
    {
        SignOff = new SheetSignOff(
            new SignOffEntry("Test designer", RevisionTime.AddHours(1)),
            new SignOffEntry("Test checker", RevisionTime.AddDays(1)),
            new SignOffEntry("Test approver", RevisionTime.AddDays(2))),
    });

    /// <summary>A 400S×20P pack on a 1500 V-class controller and charger.</summary>
    public SheetTestDesign Large() => WithInput(i => i with
    {
        Series = 400,
        Parallel = 20,
        Controller = i.Controller with { MinVoltage = 1100, MaxVoltage = 1500 },
        Charger = i.Charger with { MaxVoltage = 1450, MaxCurrentA = 200 },
    });

    public EvaluationResult Evaluate()
    {
        var outcome = DesignEvaluator.Evaluate(Input);
        Assert.True(outcome.IsValid, string.Join("; ", outcome.Errors.Select(e => $"{e.Field}: {e.Message}")));
        return outcome.Result!;
    }

    public DesignSheetModel Model() => DesignSheetModel.Create(Header, Input, Evaluate());
}
