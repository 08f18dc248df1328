using PackDesigner.Core.Cells;
using PackDesigner.Core.Charging;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Findings;
using PackDesigner.Core.Standards;
using static PackDesigner.Web.Formatting.Numbers;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>One labelled value of a result section, already formatted with its unit.</summary>
public sealed record SheetRow(string Label, string Value, string? Note = null);

/// <summary>A group of results; <see cref="TestId"/> is the section's <c>data-testid</c>.</summary>
public sealed record SheetSection(string TestId, string Title, IReadOnlyList<SheetRow> Rows, string? Intro = null);

/// <summary>One BMS threshold, per cell and per pack.</summary>
public sealed record ThresholdRow(string Label, string PerCell, string PerPack);

/// <summary>One resolved cell figure and where it came from.</summary>
public sealed record CellFigureRow(string Label, string Value, string Origin);

/// <summary>One rung of the protection ladder.</summary>
public sealed record LadderRow(string Layer, string Label, string PerCell, string Pack);

/// <summary>An input field a finding concerns, with the anchor of its form field when the form has one.</summary>
public sealed record FieldLink(string Label, string? Anchor);

/// <summary>A finding as shown: the severity as a word and as a style.</summary>
public sealed record FindingView(string Severity, string SeverityText, string Code, string Message, IReadOnlyList<FieldLink> Fields);

/// <summary>
/// The evaluation result laid out for the page: every number formatted with the invariant culture, sensible
/// decimals and its unit. The view only loops over it; no arithmetic happens there.
/// </summary>
public sealed record ResultSheet(
    string Configuration,
    string Headline,
    IReadOnlyList<FindingView> Findings,
    int ErrorCount,
    int WarningCount,
    int InfoCount,
    SheetSection Pack,
    IReadOnlyList<ThresholdRow> Thresholds,
    SheetSection Charger,
    SheetSection Balancing,
    SheetSection Protection,
    SheetSection Energy,
    SheetSection Thermal,
    IReadOnlyList<LadderRow> Ladder,
    IReadOnlyList<CellFigureRow> CellFigures)
{
    public static ResultSheet From(EvaluationResult r)
    {
        var findings = r.Findings.Select(ToView).ToList();
        var p = r.Pack;
        return new ResultSheet(
            p.Configuration,
            $"{p.Configuration}, {p.CellCount} cells: {Quantity(p.NominalVoltage, 1, "V")} nominal, {Quantity(p.CapacityAh, 0, "Ah")}, {Quantity(p.NominalEnergyWh / 1000, 2, "kWh")}",
            findings,
            r.Findings.Count(f => f.Severity == Severity.Error),
            r.Findings.Count(f => f.Severity == Severity.Warning),
            r.Findings.Count(f => f.Severity == Severity.Info),
            PackSection(p),
            ThresholdRows(r.CellThresholds, r.PackThresholds),
            ChargerSection(r.Charger),
            BalancingSection(r.Balancing),
            ProtectionSection(r.Protection),
            EnergySection(r.Energy),
            ThermalSection(r.Thermal),
            r.Ladder.Select(l => new LadderRow(l.Layer, l.Label, Quantity(l.PerCellVoltage, 3, "V"), Quantity(l.PackVoltage, 2, "V"))).ToList(),
            CellRows(r.Cell));
    }

    private static FindingView ToView(Finding f) => new(
        f.Severity.ToString().ToLowerInvariant(),
        f.Severity.ToString(),
        f.Code,
        f.Message,
        f.Fields.Select(path => FormFieldPaths.ForApiPath(path) is { } field
            ? new FieldLink($"{field.Section}: {field.Label}", IdOf(field.FormKey))
            : new FieldLink(path, null)).ToList());

    /// <summary>The HTML id the form gives a field (dots become underscores, as ASP.NET Core's tag helpers do).</summary>
    public static string IdOf(string formKey) => formKey.Replace('.', '_');

    private static SheetSection PackSection(PackResult p) => new("result-pack", "Pack",
    [
        new("Configuration", p.Configuration, $"{p.Series} in series × {p.Parallel} in parallel, {p.CellCount} cells"),
        new("Maximum voltage (datasheet maximum × S)", Quantity(p.MaxVoltage, 1, "V")),
        new("Nominal voltage", Quantity(p.NominalVoltage, 1, "V")),
        new("Minimum voltage (datasheet minimum × S)", Quantity(p.MinVoltage, 1, "V")),
        new("Window top at rest", Quantity(p.WindowHighVoltage, 1, "V")),
        new("Window bottom at rest", Quantity(p.WindowLowVoltage, 1, "V")),
        new("Lowest under peak load, cold, at the window bottom", Quantity(p.LoadedLowVoltage, 1, "V")),
        new("Highest under regenerative braking at the window top", Quantity(p.RegenHighVoltage, 1, "V")),
        new("Capacity", Quantity(p.CapacityAh, 1, "Ah")),
        new("Nominal energy", Quantity(p.NominalEnergyWh, 0, "Wh")),
        new("Usable energy in the window", Quantity(p.UsableEnergyWh, 0, "Wh")),
        new("Cell mass", Quantity(p.MassKg, 1, "kg")),
        new("Voltage class (ISO 6469-3)", VoltageClassName(p.VoltageClass), VoltageClassText(p.VoltageClass)),
        new("Resistance at 25 °C (cells, links, cable)", Quantity(p.ResistanceMilliohm, 2, "mΩ")),
        new("Resistance at the coldest ambient", Quantity(p.ColdResistanceMilliohm, 2, "mΩ")),
        new("Cell resistance at the coldest ambient", Quantity(p.CellResistanceColdMilliohm, 3, "mΩ"),
            p.ColdResistanceEstimated ? "estimated from the 25 °C value (Arrhenius)" : "from the datasheet's cold figure"),
    ]);

    private static string VoltageClassName(VoltageClass c) => c switch
    {
        VoltageClass.A => "A",
        VoltageClass.B => "B",
        _ => "above B",
    };

    private static string VoltageClassText(VoltageClass c) => c switch
    {
        VoltageClass.A => "up to 60 V DC",
        VoltageClass.B => "above 60 V DC up to 1500 V DC: hazardous voltage",
        _ => "over 1500 V DC, outside class B",
    };

    private static List<ThresholdRow> ThresholdRows(ThresholdSet c, ThresholdSet p) =>
    [
        new("Over-voltage trip", Quantity(c.OverVoltageTrip, 3, "V"), Quantity(p.OverVoltageTrip, 2, "V")),
        new("Over-voltage release", Quantity(c.OverVoltageRelease, 3, "V"), Quantity(p.OverVoltageRelease, 2, "V")),
        new("Over-voltage delay", Quantity(c.OverVoltageDelayS, 1, "s"), Quantity(p.OverVoltageDelayS, 1, "s")),
        new("Under-voltage trip", Quantity(c.UnderVoltageTrip, 3, "V"), Quantity(p.UnderVoltageTrip, 2, "V")),
        new("Under-voltage release", Quantity(c.UnderVoltageRelease, 3, "V"), Quantity(p.UnderVoltageRelease, 2, "V")),
        new("Under-voltage delay", Quantity(c.UnderVoltageDelayS, 1, "s"), Quantity(p.UnderVoltageDelayS, 1, "s")),
        new("Charge over-current trip", Quantity(c.ChargeOverCurrentA, 1, "A"), Quantity(p.ChargeOverCurrentA, 1, "A")),
        new("Charge over-current delay", Quantity(c.ChargeOverCurrentDelayS, 1, "s"), Quantity(p.ChargeOverCurrentDelayS, 1, "s")),
        new("Discharge over-current trip", Quantity(c.DischargeOverCurrentA, 1, "A"), Quantity(p.DischargeOverCurrentA, 1, "A")),
        new("Discharge over-current delay", Quantity(c.DischargeOverCurrentDelayS, 1, "s"), Quantity(p.DischargeOverCurrentDelayS, 1, "s")),
        new("Peak discharge current", Quantity(c.DischargePeakCurrentA, 1, "A"), Quantity(p.DischargePeakCurrentA, 1, "A")),
        new("Peak discharge duration", Quantity(c.DischargePeakDurationS, 1, "s"), Quantity(p.DischargePeakDurationS, 1, "s")),
        new("Short-circuit trip", Quantity(c.ShortCircuitA, 0, "A"), Quantity(p.ShortCircuitA, 0, "A")),
        new("Short-circuit delay", Quantity(c.ShortCircuitDelayMicroseconds, 0, "µs"), Quantity(p.ShortCircuitDelayMicroseconds, 0, "µs")),
        new("Charge low-temperature trip / release", Temperatures(c.ChargeTemperatureLowTripC, c.ChargeTemperatureLowReleaseC), Temperatures(p.ChargeTemperatureLowTripC, p.ChargeTemperatureLowReleaseC)),
        new("Charge high-temperature trip / release", Temperatures(c.ChargeTemperatureHighTripC, c.ChargeTemperatureHighReleaseC), Temperatures(p.ChargeTemperatureHighTripC, p.ChargeTemperatureHighReleaseC)),
        new("Discharge low-temperature trip / release", Temperatures(c.DischargeTemperatureLowTripC, c.DischargeTemperatureLowReleaseC), Temperatures(p.DischargeTemperatureLowTripC, p.DischargeTemperatureLowReleaseC)),
        new("Discharge high-temperature trip / release", Temperatures(c.DischargeTemperatureHighTripC, c.DischargeTemperatureHighReleaseC), Temperatures(p.DischargeTemperatureHighTripC, p.DischargeTemperatureHighReleaseC)),
    ];

    private static string Temperatures(double trip, double release) => $"{Quantity(trip, 1, "°C")} / {Quantity(release, 1, "°C")}";

    private static SheetSection ChargerSection(ChargerResult c) => new("result-charger", "Charger", [
        new("Constant voltage (CV) setpoint", Quantity(c.ConstantVoltage, 2, "V"), $"{Quantity(c.ConstantVoltagePerCell, 3, "V")} per cell; limited by {LimitText(c.ConstantVoltageLimitedBy)}"),
        new("Constant current (CC)", Quantity(c.ConstantCurrentA, 1, "A")),
        new("Termination current", Quantity(c.TerminationCurrentA, 2, "A")),
        new("Float charge", c.FloatCharge ? "On" : "Off", "lithium cells take no float charge"),
        new("Typical cell at end of charge", Quantity(c.TypicalCellEndOfChargeVoltage, 3, "V"), $"its group at {Quantity(c.TypicalGroupEndOfChargeSocPercent, 1, "%")} state of charge"),
        new("Weakest cell at end of charge", Quantity(c.WeakestCellEndOfChargeVoltage, 3, "V"), $"its group at {Quantity(c.WeakestGroupEndOfChargeSocPercent, 1, "%")} state of charge"),
        new("Weakest group capacity (low end of the tolerance)", Quantity(c.WeakestGroupCapacityAh, 1, "Ah")),
        new("Charging allowed between", $"{Quantity(c.ChargeTemperatureMinC, 1, "°C")} and {Quantity(c.ChargeTemperatureMaxC, 1, "°C")}", "cell temperature, BMS trips"),
    ]);

    private static string LimitText(string limitedBy) => limitedBy switch
    {
        ChargeSetpointCalculator.LimitedByWindowTop => "the window's top",
        ChargeSetpointCalculator.LimitedByOverVoltageRelease => "the over-voltage release of the highest group",
        ChargeSetpointCalculator.LimitedByCharger => "the charger's maximum voltage",
        ChargeSetpointCalculator.LimitedByTarget => "the target cell voltage",
        _ => limitedBy,
    };

    private static SheetSection BalancingSection(BalancingRecommendation b) => new("result-balancing", "Balancing",
    [
        new("Method", b.Method.ToString()),
        new("Balance to", Quantity(b.TargetCellVoltage, 3, "V"), "per cell, at rest"),
        new("Accepted spread", Quantity(b.AcceptanceSpreadMillivolt, 0, "mV")),
        new("BMS top balancing", b.BmsTopBalancingEnabled ? $"On, from {Quantity(b.BmsBalanceStartVoltage, 3, "V")}" : "Off"),
    ], b.Advice);

    private static SheetSection ProtectionSection(ProtectionResult p) => new("result-protection", "Protection",
    [
        new("Design continuous current", Quantity(p.ContinuousCurrentA, 0, "A"), "the larger of the controller's continuous current and the charger's CC"),
        new("Fuse, at least", Quantity(p.FuseMinimumA, 0, "A"), "125 % of the continuous current (NEC 210.20(A))"),
        new("Fuse rating", p.FuseRatingA is { } fuse ? Quantity(fuse, 0, "A") : "none up to 6000 A", "next standard rating (NEC 240.6(A))"),
        new("Fuse voltage rating, at least", Quantity(p.FuseMinVoltageRating, 1, "V DC")),
        new("Fuse interrupting rating, at least", Quantity(p.FuseMinInterruptingRatingA, 0, "A"), "NEC 110.9"),
        new("Prospective short-circuit current", Quantity(p.ProspectiveShortCircuitA, 0, "A"), $"loop resistance {Quantity(p.ShortCircuitLoopResistanceMilliohm, 2, "mΩ")}, cells warm"),
        new("Contactor continuous current, at least", Quantity(p.ContactorContinuousA, 0, "A")),
        new("Contactor voltage rating, at least", Quantity(p.ContactorMinVoltageRating, 1, "V DC")),
        new("Contactor breaking current, at least", Quantity(p.ContactorBreakingCurrentA, 0, "A")),
        new("Precharge resistor", Quantity(p.PrechargeResistanceOhm, 1, "Ω"), p.PrechargeResistanceOhm is null ? "not sized: no DC-link capacitance entered" : null),
        new("Precharge time to 95 % / 99 %", p.PrechargeTimeS is null ? Missing : $"{Quantity(p.PrechargeTimeS, 2, "s")} / {Quantity(p.PrechargeTimeTo99PercentS, 2, "s")}"),
        new("Close the contactor at", Quantity(p.PrechargeCloseVoltage, 1, "V"), "95 % of the pack maximum"),
        new("Precharge energy in the resistor", Quantity(p.PrechargeEnergyJ, 0, "J")),
        new("Precharge peak current / peak power", p.PrechargePeakCurrentA is null ? Missing : $"{Quantity(p.PrechargePeakCurrentA, 1, "A")} / {Quantity(p.PrechargePeakPowerW, 0, "W")}"),
        new("Precharge average power", Quantity(p.PrechargeAveragePowerW, 0, "W")),
        new("Series links, total", Quantity(p.LinkResistanceTotalMilliohm, 3, "mΩ")),
        new("Main cable resistance", Quantity(p.CableResistanceMilliohm, 3, "mΩ"), p.CableCurrentDensityAPerMm2 is { } j ? $"{Quantity(j, 1, "A/mm²")} at the continuous current" : "no cable entered"),
    ]);

    private static SheetSection EnergySection(EnergyResult e) => new("result-energy", "Energy",
    [
        new("Nominal energy", Quantity(e.NominalEnergyWh, 0, "Wh")),
        new("Usable energy in the window", Quantity(e.UsableEnergyWh, 0, "Wh"), $"{Quantity(e.UsableFractionPercent, 1, "%")} of nominal"),
        new("Usable energy, at-rest curve", Quantity(e.UsableEnergyAtRestWh, 0, "Wh")),
        new("Usable energy, worst case (weakest group)", Quantity(e.UsableEnergyWorstCaseWh, 0, "Wh"), $"{Quantity(e.LostToWeakestGroupWh, 0, "Wh")} lost to the weakest group"),
        new("Cell mass", Quantity(e.CellMassKg, 1, "kg")),
        new("Specific energy (cells only)", Quantity(e.SpecificEnergyWhPerKg, 0, "Wh/kg")),
        new("Runtime at the continuous current", Quantity(e.RuntimeAtContinuousCurrentH, 2, "h")),
    ]);

    private static SheetSection ThermalSection(ThermalResult t) => new("result-thermal", "Thermal (adiabatic quick check)",
    [
        new("Heat per cell at the continuous current", Quantity(t.CellHeatAtContinuousW, 1, "W")),
        new("Heat of the pack at the continuous current", Quantity(t.PackHeatAtContinuousW, 0, "W"), "cells, links and cable"),
        new("Temperature rise over one peak", Quantity(t.PeakTemperatureRiseK, 1, "K")),
        new("Cell temperature after a peak from the hottest ambient", Quantity(t.CellTemperatureAfterPeakC, 1, "°C"), $"discharge limit {Quantity(t.DischargeTemperatureMaxC, 0, "°C")}"),
        new("Temperature rise per hour at the continuous current", Quantity(t.ContinuousTemperatureRisePerHourK, 1, "K/h")),
        new("Time to the discharge limit at the continuous current", MinutesText(t.MinutesToDischargeLimitAtContinuous)),
        new("Specific heat assumed", Quantity(t.SpecificHeatJPerKgK, 0, "J/(kg·K)"), "typical of lithium-ion cells"),
    ], "No heat leaves the cells in this check (the worst case); real packs shed some heat, so cooling is judged from here.");

    private static string MinutesText(double minutes) =>
        minutes >= 1e6 ? "not reached" : minutes <= 0 ? "0 min: the hottest ambient is at or above the limit" : Quantity(minutes, 0, "min");

    private static List<CellFigureRow> CellRows(CellSpec c)
    {
        string O(string name) => c.Origins.TryGetValue(name, out var o) ? o switch
        {
            FigureOrigin.Datasheet => "datasheet",
            FigureOrigin.Preset => "preset (typical)",
            _ => "derived (C/20)",
        } : "datasheet";

        return
        [
            new("Chemistry", c.Chemistry.ToString().ToUpperInvariant(), string.Empty),
            new("Capacity", Quantity(c.CapacityAh, 2, "Ah"), O("capacityAh")),
            new("Nominal voltage", Quantity(c.NominalVoltage, 3, "V"), O("nominalVoltage")),
            new("Maximum charge voltage", Quantity(c.MaxChargeVoltage, 3, "V"), O("maxChargeVoltage")),
            new("Minimum discharge voltage", Quantity(c.MinDischargeVoltage, 3, "V"), O("minDischargeVoltage")),
            new("Maximum charge current", Quantity(c.MaxChargeCurrentA, 1, "A"), O("maxChargeCurrentA")),
            new("Maximum discharge current", Quantity(c.MaxDischargeCurrentA, 1, "A"), O("maxDischargeCurrentA")),
            new("Peak discharge current", $"{Quantity(c.PeakDischargeCurrentA, 1, "A")} for {Quantity(c.PeakDischargeDurationS, 0, "s")}", O("peakDischargeCurrentA")),
            new("Internal resistance at 25 °C", Quantity(c.InternalResistanceMilliohm, 3, "mΩ"), O("internalResistanceMilliohm")),
            new("Mass", Quantity(c.MassKg, 3, "kg"), O("massKg")),
            new("Capacity tolerance", "± " + Quantity(c.CapacityTolerancePercent, 1, "%"), O("capacityTolerancePercent")),
            new("Charge temperature", $"{Quantity(c.ChargeTemperatureMinC, 0, "°C")} to {Quantity(c.ChargeTemperatureMaxC, 0, "°C")}", O("chargeTemperatureMinC")),
            new("Discharge temperature", $"{Quantity(c.DischargeTemperatureMinC, 0, "°C")} to {Quantity(c.DischargeTemperatureMaxC, 0, "°C")}", O("dischargeTemperatureMinC")),
            new("Termination current", Quantity(c.TerminationCurrentA, 2, "A"), O("terminationCurrentA")),
            new("Open-circuit voltage table", $"{c.OcvCurve.Points.Count} rows, {Quantity(c.OcvCurve.EmptyVoltage, 3, "V")} to {Quantity(c.OcvCurve.FullVoltage, 3, "V")}", O("ocvCurve")),
        ];
    }
}
