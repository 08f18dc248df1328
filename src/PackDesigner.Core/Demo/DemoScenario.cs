using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;

namespace PackDesigner.Core.Demo;

/// <summary>
/// The demo scenario, entirely invented: the shop "Harrowfield Pack Works", its customers and the cell
/// "HPW-LF100 (invented figures)". None of these figures comes from a real product; they are for the demo only
/// and are never used as a reference in tests.
/// </summary>
public static class DemoScenario
{
    public const string ShopName = "Harrowfield Pack Works (invented)";
    public const string CellName = "HPW-LF100 (invented figures)";
    public const string DesignName = "Pickup conversion, 32S2P";
    public const string CustomerName = "Odile Brandvold (invented customer)";

    /// <summary>An invented 100 Ah LFP prismatic cell; its OCV curve is the LFP preset's typical curve.</summary>
    public static CellInput Cell { get; } = new()
    {
        Chemistry = Chemistry.Lfp,
        CapacityAh = 100,
        NominalVoltage = 3.2,
        MaxChargeVoltage = 3.65,
        MinDischargeVoltage = 2.5,
        MaxChargeCurrentA = 100,
        MaxDischargeCurrentA = 200,
        PeakDischargeCurrentA = 300,
        PeakDischargeDurationS = 10,
        InternalResistanceMilliohm = 0.55,
        ColdInternalResistanceMilliohm = 1.8,
        ColdResistanceTemperatureC = -10,
        MassKg = 1.98,
        CapacityTolerancePercent = 3,
        ChargeTemperatureMinC = 0,
        ChargeTemperatureMaxC = 45,
        DischargeTemperatureMinC = -20,
        DischargeTemperatureMaxC = 60,
    };

    /// <summary>A 32S2P pack for an invented pickup conversion with an invented 96 V controller and charger.</summary>
    public static DesignInput PickupConversion { get; } = new()
    {
        Cell = Cell,
        Series = 32,
        Parallel = 2,
        LinkResistanceMilliohm = 0.05,
        Cable = new CableInput(70, 2),
        Balancing = BalancingMethod.Bottom,
        SocWindow = new SocWindowInput(20, 90),
        Controller = new ControllerInput(
            MinVoltage: 92,
            MaxVoltage: 130,
            ContinuousCurrentA: 250,
            PeakCurrentA: 450,
            PeakDurationS: 10,
            RegenCurrentA: 100,
            DcLinkCapacitanceMicrofarad: 2000,
            PrechargeTimeS: 1.0),
        Charger = new ChargerInput(MaxVoltage: 120, MaxCurrentA: 40, VoltageStepV: 0.1, FloatStage: false),
        Ambient = new AmbientInput(-5, 40),
    };
}
