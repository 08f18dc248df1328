using PackDesigner.Core.Cells;
using PackDesigner.Core.Demo;
using PackDesigner.Core.Design;

namespace PackDesigner.Web.Demo;

/// <summary>An invented customer of the demo shop, with the one job it came for.</summary>
public sealed record DemoCustomer(string Name, string Contact, string Notes, DemoJob Job);

public sealed record DemoJob(string Title, string VehicleOrSystem, string Notes);

/// <summary>An invented library cell; its figures are invented too (said in its notes).</summary>
public sealed record DemoCell(string Name, string Model, CellInput Figures, string Notes);

/// <summary>A later revision of a demo design: its input and the note saved with it.</summary>
public sealed record DemoRevision(DesignInput Input, string Note);

/// <summary>An invented design: its customer and library cell by name, revision 1's input and the later revisions in order.</summary>
public sealed record DemoDesign(string Name, string CustomerName, string CellName, DesignInput First, IReadOnlyList<DemoRevision> Later)
{
    public int RevisionCount => 1 + Later.Count;
}

/// <summary>
/// The demo scenario loaded by <see cref="DemoLoader"/>: the invented shop of <see cref="DemoScenario"/>, three
/// invented customers with a job each, three invented cells and three invented designs, one of them with two
/// revisions. No name, figure or contact here belongs to a real person, business or product; the contacts use
/// the reserved <c>.invalid</c> top-level domain. Never used as a reference value in tests.
/// </summary>
public static class DemoLibrary
{
    public const string InventedNote = "Invented for the PackDesigner demo: not a real person, business or product.";
    public const string InventedFiguresNote = "Invented figures for the PackDesigner demo; not any real product's datasheet.";

    public const string BoatCustomerName = "Tarnwick Harbour Launches (invented customer)";
    public const string CabinCustomerName = "Quillon Ridge Cabin Co-op (invented customer)";
    public const string BigCellName = "HPW-LF280 (invented figures)";
    public const string PouchCellName = "HPW-NM60 (invented figures)";
    public const string CabinDesignName = "Off-grid cabin storage, 16S1P (invented)";
    public const string BoatDesignName = "Harbour launch, 14S2P (invented)";

    public static IReadOnlyList<DemoCustomer> Customers { get; } =
    [
        new(DemoScenario.CustomerName, "odile.b@example.invalid",
            $"Client of {DemoScenario.ShopName}. {InventedNote}",
            new DemoJob("Pickup conversion", "Full-size pickup, combustion engine removed (invented)",
                "A 96 V drive with regenerative braking; the controller was changed after the first design (invented).")),
        new(BoatCustomerName, "workshop@tarnwick.invalid",
            InventedNote,
            new DemoJob("Harbour launch repower", "6 m aluminium harbour launch, electric inboard motor (invented)",
                "Kept afloat all year; charged from shore power overnight (invented).")),
        new(CabinCustomerName, "board@quillon-ridge.invalid",
            InventedNote,
            new DemoJob("Off-grid cabin storage", "48 V off-grid inverter-charger with solar (invented)",
                "Unheated cabin, used at weekends all year (invented).")),
    ];

    public static IReadOnlyList<DemoCell> Cells { get; } =
    [
        new(DemoScenario.CellName, "HPW-LF100", DemoScenario.Cell,
            "100 Ah LFP prismatic cell of the demo scenario. " + InventedFiguresNote),
        new(BigCellName, "HPW-LF280", new CellInput
        {
            Chemistry = Chemistry.Lfp,
            CapacityAh = 280,
            NominalVoltage = 3.2,
            MaxChargeVoltage = 3.65,
            MinDischargeVoltage = 2.5,
            MaxChargeCurrentA = 140,
            MaxDischargeCurrentA = 280,
            PeakDischargeCurrentA = 560,
            PeakDischargeDurationS = 10,
            InternalResistanceMilliohm = 0.25,
            MassKg = 5.4,
            CapacityTolerancePercent = 3,
            ChargeTemperatureMinC = 0,
            ChargeTemperatureMaxC = 45,
            DischargeTemperatureMinC = -20,
            DischargeTemperatureMaxC = 60,
        }, "280 Ah LFP prismatic cell for stationary storage. " + InventedFiguresNote),
        new(PouchCellName, "HPW-NM60", new CellInput
        {
            Chemistry = Chemistry.Nmc,
            CapacityAh = 60,
            NominalVoltage = 3.65,
            MaxChargeVoltage = 4.2,
            MinDischargeVoltage = 2.8,
            MaxChargeCurrentA = 60,
            MaxDischargeCurrentA = 180,
            PeakDischargeCurrentA = 300,
            PeakDischargeDurationS = 10,
            InternalResistanceMilliohm = 0.9,
            MassKg = 0.95,
            CapacityTolerancePercent = 2,
            ChargeTemperatureMinC = 0,
            ChargeTemperatureMaxC = 45,
            DischargeTemperatureMinC = -20,
            DischargeTemperatureMaxC = 55,
            // Its own invented rest-voltage table, since it stops at 2.8 V where the NMC preset's table starts at 2.5 V.
            OcvCurve =
            [
                new(0, 2.80), new(5, 3.30), new(10, 3.45), new(20, 3.56), new(30, 3.63), new(40, 3.68), new(50, 3.73),
                new(60, 3.80), new(70, 3.89), new(80, 3.98), new(90, 4.08), new(100, 4.19),
            ],
        }, "60 Ah NMC pouch cell with its own OCV table. " + InventedFiguresNote),
    ];

    /// <summary>Revision 2 of the pickup: the customer chose a smaller controller (invented).</summary>
    public static DesignInput PickupWithSmallerController { get; } = DemoScenario.PickupConversion with
    {
        Controller = DemoScenario.PickupConversion.Controller with { ContinuousCurrentA = 200, PeakCurrentA = 380, RegenCurrentA = 80 },
    };

    public static DesignInput CabinStorage { get; } = new()
    {
        Cell = Cells[1].Figures,
        Series = 16,
        Parallel = 1,
        LinkResistanceMilliohm = 0.1,
        Cable = new CableInput(50, 3),
        Balancing = BalancingMethod.Top,
        SocWindow = new SocWindowInput(10, 90),
        Controller = new ControllerInput(
            MinVoltage: 42,
            MaxVoltage: 64,
            ContinuousCurrentA: 100,
            PeakCurrentA: 200,
            PeakDurationS: 10,
            RegenCurrentA: 60,
            DcLinkCapacitanceMicrofarad: 3300,
            PrechargeTimeS: 1.0),
        Charger = new ChargerInput(MaxVoltage: 60, MaxCurrentA: 60, VoltageStepV: 0.1, FloatStage: false),
        Ambient = new AmbientInput(-10, 30),
    };

    public static DesignInput HarbourLaunch { get; } = new()
    {
        Cell = Cells[2].Figures,
        Series = 14,
        Parallel = 2,
        LinkResistanceMilliohm = 0.08,
        Cable = new CableInput(70, 4),
        Balancing = BalancingMethod.Top,
        SocWindow = new SocWindowInput(10, 90),
        Controller = new ControllerInput(
            MinVoltage: 40,
            MaxVoltage: 62,
            ContinuousCurrentA: 150,
            PeakCurrentA: 300,
            PeakDurationS: 30,
            RegenCurrentA: 0,
            DcLinkCapacitanceMicrofarad: 2000,
            PrechargeTimeS: 1.0),
        Charger = new ChargerInput(MaxVoltage: 60, MaxCurrentA: 30, VoltageStepV: 0.1, FloatStage: false),
        Ambient = new AmbientInput(0, 35),
    };

    public static IReadOnlyList<DemoDesign> Designs { get; } =
    [
        new(DemoScenario.DesignName, DemoScenario.CustomerName, DemoScenario.CellName, DemoScenario.PickupConversion,
            [new(PickupWithSmallerController, "The customer changed to a smaller controller: lower continuous, peak and regenerative currents (invented).")]),
        new(CabinDesignName, CabinCustomerName, BigCellName, CabinStorage, []),
        new(BoatDesignName, BoatCustomerName, PouchCellName, HarbourLaunch, []),
    ];
}
