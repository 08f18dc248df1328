using System.Globalization;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Charging;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Findings;
using PackDesigner.Core.Thermal;
using PackDesigner.Reports.Formatting;
using F = PackDesigner.Reports.Formatting.SheetFormatter;

namespace PackDesigner.Reports.Model;

/// <summary>Maps a header, an input and a result onto the formatted <see cref="DesignSheetModel"/>. No calculation happens here.</summary>
internal static class DesignSheetModelBuilder
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    public static DesignSheetModel Build(SheetHeader header, DesignInput input, EvaluationResult result, SheetSpread? spread = null)
    {
        var approved = header.SignOff?.ApprovedBy;
        var date = F.DateTimeUtc(header.CreatedAtUtc);
        var calculation = "Calculation " + header.CalculationVersion;
        var shortHash = F.ShortHash(header.InputHash);
        return new DesignSheetModel(header, input, result)
        {
            DesignName = header.DesignName.Trim(),
            CustomerLine = CustomerLine(header),
            RevisionText = F.Revision(header.RevisionNumber),
            DateText = date,
            CalculationText = calculation,
            ShortInputHash = shortHash,
            MetaLine = $"{date} · {calculation} · Input {shortHash}",
            IsDraft = approved is null,
            SignOffMarking = approved is null
                ? DesignSheetModel.DraftMarkingText
                : $"Approved by {approved.Name.Trim()} on {F.DateUtc(approved.SignedAtUtc)}",
            Identity =
            [
                new("design", "Design", header.DesignName.Trim()),
                new("customer", "Customer", Blank(header.CustomerName)),
                new("job", "Job", Blank(header.JobTitle)),
                new("status", "Status", Blank(header.Status)),
            ],
            Summary = Summary(input, result),
            Inputs = Inputs(input, result),
            InputsNote = "Cell figures marked \"Preset (typical)\" are the chemistry preset's typical values, used where no datasheet figure was entered: check them against the cell maker's datasheet.",
            BmsSettings = Bms(result),
            BmsNote = string.Create(Inv,
                $"Per cell: one cell, or one parallel group of {result.Pack.Parallel} for voltages. Per pack: voltages × {result.Pack.Series} (series), currents × {result.Pack.Parallel} (parallel). Delays and temperatures are the same for both."),
            ChargerSettings = Charger(result),
            EndOfCharge = EndOfCharge(result),
            Protection = Protection(result),
            OcvChart = OcvChart(input, result),
            LadderChart = Ladder(result),
            Findings = result.Findings.Select(f => new FindingRow(F.SeverityName(f.Severity), f.Code, f.Message)).ToList(),
            FindingCounts = Counts(result.Findings),
            BuildNotes = SheetTexts.BuildNotes(input, result),
            Cautions = SheetTexts.Cautions(result),
            SignOff = SignOff(header.SignOff),
            Spread = spread,
        };
    }

    private static string CustomerLine(SheetHeader header)
    {
        var parts = new List<string>();
        if (!string.IsNullOrWhiteSpace(header.CustomerName))
        {
            parts.Add("Customer: " + header.CustomerName.Trim());
        }

        if (!string.IsNullOrWhiteSpace(header.JobTitle))
        {
            parts.Add("Job: " + header.JobTitle.Trim());
        }

        return parts.Count == 0 ? "No customer or job recorded" : string.Join(" · ", parts);
    }

    private static string Counts(IReadOnlyList<Finding> findings) => F.FindingCounts(
        findings.Count(f => f.Severity == Severity.Error),
        findings.Count(f => f.Severity == Severity.Warning),
        findings.Count(f => f.Severity == Severity.Info));

    private static List<SheetField> Summary(DesignInput input, EvaluationResult r)
    {
        var p = r.Pack;
        var e = r.Energy;
        var window = string.Create(Inv, $"{F.Trimmed(input.SocWindow.MinPercent, 2)}–{F.Trimmed(input.SocWindow.MaxPercent, 2)} %");
        // In reading order for two columns: the descriptive figures first, then the numbers.
        return
        [
            new("configuration", "Configuration", string.Create(Inv, $"{p.Configuration} ({p.CellCount} cells)")),
            new("chemistry", "Chemistry", F.ChemistryName(r.Cell.Chemistry)),
            new("balancing", "Balancing", F.BalancingName(input.Balancing)),
            new("voltage-class", "Voltage class", F.VoltageClassName(p.VoltageClass)),
            new("findings", "Findings", Counts(r.Findings)),
            new("nominal-energy", "Nominal energy", F.Energy(e.NominalEnergyWh).Text),
            new("usable-energy", "Usable energy", $"{F.Energy(e.UsableEnergyWh).Text} (window {window})"),
            new("nominal-voltage", "Pack nominal voltage", F.PackVoltage(p.NominalVoltage).Text),
            new("max-voltage", "Pack maximum voltage", F.PackVoltage(p.MaxVoltage).Text),
            new("min-voltage", "Pack minimum voltage", F.PackVoltage(p.MinVoltage).Text),
            new("capacity", "Capacity", F.Capacity(p.CapacityAh).Text),
            new("mass", "Cell mass", F.Mass(e.CellMassKg).Text),
            new("specific-energy", "Specific energy (cells)", F.SpecificEnergy(e.SpecificEnergyWhPerKg).Text),
        ];
    }

    private static string Blank(string? text) => string.IsNullOrWhiteSpace(text) ? "—" : text.Trim();

    private static List<InputGroup> Inputs(DesignInput input, EvaluationResult r)
    {
        var cell = r.Cell;
        string Origin(string key) => cell.Origins.TryGetValue(key, out var o) ? F.OriginName(o) : "Entered";
        InputRow CellRow(string key, string label, double value, string unit) => new(key, label, F.Entered(value, unit).Text, Origin(key));

        var cellRows = new List<InputRow>
        {
            new("chemistry", "Chemistry", F.ChemistryName(cell.Chemistry), "Entered"),
            CellRow("capacityAh", "Capacity", cell.CapacityAh, "Ah"),
            CellRow("nominalVoltage", "Nominal voltage", cell.NominalVoltage, "V"),
            CellRow("maxChargeVoltage", "Maximum charge voltage", cell.MaxChargeVoltage, "V"),
            CellRow("minDischargeVoltage", "Minimum discharge voltage", cell.MinDischargeVoltage, "V"),
            CellRow("maxChargeCurrentA", "Maximum charge current", cell.MaxChargeCurrentA, "A"),
            CellRow("maxDischargeCurrentA", "Maximum continuous discharge current", cell.MaxDischargeCurrentA, "A"),
            CellRow("peakDischargeCurrentA", "Peak discharge current", cell.PeakDischargeCurrentA, "A"),
            CellRow("peakDischargeDurationS", "Peak discharge duration", cell.PeakDischargeDurationS, "s"),
            CellRow("internalResistanceMilliohm", "DC internal resistance at 25 °C", cell.InternalResistanceMilliohm, "mΩ"),
        };
        if (cell.ColdInternalResistanceMilliohm is { } cold && cell.ColdResistanceTemperatureC is { } coldT)
        {
            cellRows.Add(new("coldInternalResistanceMilliohm", "DC internal resistance, cold",
                $"{F.Entered(cold, "mΩ").Text} at {F.Entered(coldT, "°C").Text}", "Datasheet"));
        }
        else
        {
            cellRows.Add(new("coldInternalResistanceMilliohm", "DC internal resistance, cold",
                $"{F.Milliohm(r.Pack.CellResistanceColdMilliohm).Text} at {F.Entered(Math.Min(input.Ambient.MinC, Arrhenius.ReferenceC), "°C").Text}",
                "Estimated (Arrhenius)"));
        }

        cellRows.AddRange(
        [
            CellRow("massKg", "Mass", cell.MassKg, "kg"),
            new("capacityTolerancePercent", "Capacity tolerance", "± " + F.Entered(cell.CapacityTolerancePercent, "%").Text, Origin("capacityTolerancePercent")),
            new("chargeTemperature", "Charge temperature window",
                $"{F.Entered(cell.ChargeTemperatureMinC, "°C").Text} to {F.Entered(cell.ChargeTemperatureMaxC, "°C").Text}",
                Origin2("chargeTemperatureMinC", "chargeTemperatureMaxC")),
            new("dischargeTemperature", "Discharge temperature window",
                $"{F.Entered(cell.DischargeTemperatureMinC, "°C").Text} to {F.Entered(cell.DischargeTemperatureMaxC, "°C").Text}",
                Origin2("dischargeTemperatureMinC", "dischargeTemperatureMaxC")),
            new("terminationCurrentA", "Charge termination current", F.Entered(cell.TerminationCurrentA, "A").Text,
                cell.Origins.TryGetValue("terminationCurrentA", out var t) && t == FigureOrigin.Derived ? "Derived (C/20)" : Origin("terminationCurrentA")),
            new("ocvCurve", "Open-circuit voltage table",
                string.Create(Inv, $"{cell.OcvCurve.Points.Count} points, {F.CellVoltage(cell.OcvCurve.EmptyVoltage).Text} to {F.CellVoltage(cell.OcvCurve.FullVoltage).Text}"),
                Origin("ocvCurve")),
        ]);

        string Origin2(string a, string b)
        {
            var oa = Origin(a);
            var ob = Origin(b);
            return oa == ob ? oa : $"{oa} / {ob}";
        }

        var cable = input.Cable is { } c
            ? $"{F.Entered(c.CrossSectionMm2, "mm²").Text} copper, {F.Entered(c.LengthM, "m").Text} of conductor"
            : "none entered";
        var configuration = new List<InputRow>
        {
            new("series", "Cells in series (S)", input.Series.ToString(Inv), "Entered"),
            new("parallel", "Cells in parallel (P)", input.Parallel.ToString(Inv), "Entered"),
            new("linkResistanceMilliohm", "Resistance of each series link", F.Entered(input.LinkResistanceMilliohm, "mΩ").Text, "Entered"),
            new("cable", "Main cable", cable, "Entered"),
            new("balancing", "Balancing method", F.BalancingName(input.Balancing), "Entered"),
            new("socWindow", "State-of-charge window",
                $"{F.Entered(input.SocWindow.MinPercent, "%").Text} to {F.Entered(input.SocWindow.MaxPercent, "%").Text}", "Entered"),
            new("ambient", "Ambient temperature", $"{F.Entered(input.Ambient.MinC, "°C").Text} to {F.Entered(input.Ambient.MaxC, "°C").Text}", "Entered"),
        };

        var k = input.Controller;
        var controller = new List<InputRow>
        {
            new("controller.voltage", "Input voltage range", $"{F.Entered(k.MinVoltage, "V").Text} to {F.Entered(k.MaxVoltage, "V").Text}", "Entered"),
            new("controller.continuousCurrentA", "Continuous current", F.Entered(k.ContinuousCurrentA, "A").Text, "Entered"),
            new("controller.peakCurrentA", "Peak current", $"{F.Entered(k.PeakCurrentA, "A").Text} for {F.Entered(k.PeakDurationS, "s").Text}", "Entered"),
            new("controller.regenCurrentA", "Regenerative current", F.Entered(k.RegenCurrentA, "A").Text, "Entered"),
            new("controller.dcLinkCapacitanceMicrofarad", "DC-link capacitance", F.Entered(k.DcLinkCapacitanceMicrofarad, "µF").Text, "Entered"),
            new("controller.prechargeTimeS", "Wanted precharge time (to 95 %)", F.Entered(k.PrechargeTimeS, "s").Text, "Entered"),
        };

        var ch = input.Charger;
        var charger = new List<InputRow>
        {
            new("charger.maxVoltage", "Maximum output voltage", F.Entered(ch.MaxVoltage, "V").Text, "Entered"),
            new("charger.maxCurrentA", "Maximum output current", F.Entered(ch.MaxCurrentA, "A").Text, "Entered"),
            new("charger.voltageStepV", "Voltage setting step", F.Entered(ch.VoltageStepV, "V").Text, "Entered"),
            new("charger.floatStage", "Float stage available", ch.FloatStage ? "yes (must be turned off)" : "no", "Entered"),
            new("charger.targetCellVoltage", "Target cell voltage",
                ch.TargetCellVoltage is { } target ? F.Entered(target, "V").Text : "none (set from the window and the OV release)", "Entered"),
        };

        var m = input.Margins ?? new MarginsInput();
        var d = new MarginsInput();
        InputRow Margin(string key, string label, double value, double defaultValue, string unit) =>
            new("margins." + key, label, F.Entered(value, unit).Text, value == defaultValue ? "Default (common practice)" : "Entered");
        var margins = new List<InputRow>
        {
            Margin("overVoltageTripBelowMaxV", "OV trip below the maximum charge voltage", m.OverVoltageTripBelowMaxV, d.OverVoltageTripBelowMaxV, "V"),
            Margin("overVoltageHysteresisV", "OV release below the OV trip", m.OverVoltageHysteresisV, d.OverVoltageHysteresisV, "V"),
            Margin("underVoltageTripAboveMinV", "UV trip above the minimum discharge voltage", m.UnderVoltageTripAboveMinV, d.UnderVoltageTripAboveMinV, "V"),
            Margin("underVoltageHysteresisV", "UV release above the UV trip", m.UnderVoltageHysteresisV, d.UnderVoltageHysteresisV, "V"),
            Margin("temperatureMarginC", "Temperature trips inside the datasheet windows", m.TemperatureMarginC, d.TemperatureMarginC, "K"),
            Margin("temperatureHysteresisC", "Temperature release hysteresis", m.TemperatureHysteresisC, d.TemperatureHysteresisC, "K"),
            Margin("chargeCurrentMarginPercent", "Charger CC below the charge over-current trip", m.ChargeCurrentMarginPercent, d.ChargeCurrentMarginPercent, "%"),
            Margin("shortCircuitTripFactor", "Short-circuit trip, multiple of the peak current", m.ShortCircuitTripFactor, d.ShortCircuitTripFactor, "×"),
        };

        return
        [
            new("cell", "Cell", cellRows, ShowsSource: true),
            new("configuration", "Configuration, window and ambient", configuration, ShowsSource: false),
            new("controller", "Motor controller or inverter", controller, ShowsSource: false),
            new("charger", "Charger", charger, ShowsSource: false),
            new("margins", "Protection margins", margins, ShowsSource: true),
        ];
    }

    private static List<BmsSetting> Bms(EvaluationResult r)
    {
        var c = r.CellThresholds;
        var p = r.PackThresholds;
        const string V = "Voltage";
        const string I = "Current";
        const string T = "Temperature";
        BmsSetting Same(string key, string group, string label, SheetValue value) => new(key, group, label, value, value);
        var rows = new List<BmsSetting>
        {
            new("ov-trip", V, "Over-voltage trip", F.CellVoltage(c.OverVoltageTrip), F.PackVoltage(p.OverVoltageTrip)),
            new("ov-release", V, "Over-voltage release", F.CellVoltage(c.OverVoltageRelease), F.PackVoltage(p.OverVoltageRelease)),
            Same("ov-delay", V, "Over-voltage delay", F.Seconds(c.OverVoltageDelayS)),
            new("uv-trip", V, "Under-voltage trip", F.CellVoltage(c.UnderVoltageTrip), F.PackVoltage(p.UnderVoltageTrip)),
            new("uv-release", V, "Under-voltage release", F.CellVoltage(c.UnderVoltageRelease), F.PackVoltage(p.UnderVoltageRelease)),
            Same("uv-delay", V, "Under-voltage delay", F.Seconds(c.UnderVoltageDelayS)),
            new("charge-oc-trip", I, "Charge over-current trip", F.Current(c.ChargeOverCurrentA), F.Current(p.ChargeOverCurrentA)),
            Same("charge-oc-delay", I, "Charge over-current delay", F.Seconds(c.ChargeOverCurrentDelayS)),
            new("discharge-oc-trip", I, "Discharge over-current trip", F.Current(c.DischargeOverCurrentA), F.Current(p.DischargeOverCurrentA)),
            Same("discharge-oc-delay", I, "Discharge over-current delay", F.Seconds(c.DischargeOverCurrentDelayS)),
            new("discharge-peak", I, "Discharge peak current", F.Current(c.DischargePeakCurrentA), F.Current(p.DischargePeakCurrentA)),
            Same("discharge-peak-duration", I, "Discharge peak duration", F.Seconds(c.DischargePeakDurationS)),
            new("short-circuit-trip", I, "Short-circuit trip", F.Current(c.ShortCircuitA), F.Current(p.ShortCircuitA)),
            Same("short-circuit-delay", I, "Short-circuit delay", F.Microseconds(c.ShortCircuitDelayMicroseconds)),
            Same("charge-low-temp-trip", T, "Charge low-temperature trip", F.Temperature(c.ChargeTemperatureLowTripC)),
            Same("charge-low-temp-release", T, "Charge low-temperature release", F.Temperature(c.ChargeTemperatureLowReleaseC)),
            Same("charge-high-temp-trip", T, "Charge high-temperature trip", F.Temperature(c.ChargeTemperatureHighTripC)),
            Same("charge-high-temp-release", T, "Charge high-temperature release", F.Temperature(c.ChargeTemperatureHighReleaseC)),
            Same("discharge-low-temp-trip", T, "Discharge low-temperature trip", F.Temperature(c.DischargeTemperatureLowTripC)),
            Same("discharge-low-temp-release", T, "Discharge low-temperature release", F.Temperature(c.DischargeTemperatureLowReleaseC)),
            Same("discharge-high-temp-trip", T, "Discharge high-temperature trip", F.Temperature(c.DischargeTemperatureHighTripC)),
            Same("discharge-high-temp-release", T, "Discharge high-temperature release", F.Temperature(c.DischargeTemperatureHighReleaseC)),
            Same("top-balancing", "Balancing", "Top balancing in the BMS", F.OnOff(r.Balancing.BmsTopBalancingEnabled)),
        };
        if (r.Balancing.BmsBalanceStartVoltage is { } start)
        {
            rows.Add(new("balance-start", "Balancing", "Balancing starts above", F.CellVoltage(start), null));
        }

        return rows;
    }

    internal static string LimitedBy(string key) => key switch
    {
        ChargeSetpointCalculator.LimitedByWindowTop => "the window's top at rest",
        ChargeSetpointCalculator.LimitedByOverVoltageRelease => "the smallest group reaching the OV release",
        ChargeSetpointCalculator.LimitedByCharger => "the charger's maximum voltage",
        ChargeSetpointCalculator.LimitedByTarget => "the entered target cell voltage",
        _ => key,
    };

    private static List<SettingRow> Charger(EvaluationResult r)
    {
        var c = r.Charger;
        return
        [
            new("cv", "Constant voltage (CV), pack", F.PackVoltage(c.ConstantVoltage), "Set by " + LimitedBy(c.ConstantVoltageLimitedBy) + "."),
            new("cv-per-cell", "Constant voltage per cell", F.CellVoltage(c.ConstantVoltagePerCell)),
            new("cc", "Constant current (CC)", F.Current(c.ConstantCurrentA), "Below the BMS charge over-current trip by the margin."),
            new("termination", "Termination current", F.Current(c.TerminationCurrentA), "End the charge when the current falls to this."),
            new("float", "Float or maintenance stage", F.OnOff(c.FloatCharge), "Lithium cells take no float charge."),
            new("charge-temp-min", "Charge allowed from", F.Temperature(c.ChargeTemperatureMinC), "Charging inhibited below this."),
            new("charge-temp-max", "Charge allowed up to", F.Temperature(c.ChargeTemperatureMaxC), "Charging inhibited above this."),
        ];
    }

    private static List<SettingRow> EndOfCharge(EvaluationResult r)
    {
        var c = r.Charger;
        return
        [
            new("typical-cell-voltage", "Typical cell at end of charge", F.CellVoltage(c.TypicalCellEndOfChargeVoltage)),
            new("weakest-cell-voltage", "Smallest group at end of charge", F.CellVoltage(c.WeakestCellEndOfChargeVoltage)),
            new("typical-soc", "Typical group state of charge", F.Percent(c.TypicalGroupEndOfChargeSocPercent)),
            new("weakest-soc", "Smallest group state of charge", F.Percent(c.WeakestGroupEndOfChargeSocPercent)),
            new("weakest-capacity", "Smallest group capacity (tolerance low end)", F.Capacity(c.WeakestGroupCapacityAh)),
        ];
    }

    private static List<SettingGroup> Protection(EvaluationResult r)
    {
        var p = r.Protection;
        var fuse = new List<SettingRow>
        {
            new("design-current", "Design continuous current", F.Current(p.ContinuousCurrentA), "The larger of the controller's continuous current and the charger CC."),
            new("fuse-minimum", "Fuse rating, at least", F.Current(p.FuseMinimumA), "125 % of the continuous current (NEC 210.20(A))."),
            p.FuseRatingA is { } rating
                ? new("fuse-rating", "Fuse rating, selected", F.Current(rating), "Next standard rating (NEC 240.6(A)).")
                : new("fuse-rating", "Fuse rating, selected", SheetValue.Word("none"), "No standard rating is large enough: specify a fuse for this current."),
            new("fuse-voltage", "Fuse DC voltage rating, at least", F.PackVoltage(p.FuseMinVoltageRating), "Pack maximum voltage; the rating must be a DC rating."),
            new("fuse-interrupting", "Fuse interrupting rating, at least", F.Current(p.FuseMinInterruptingRatingA), "At least the prospective short-circuit current (NEC 110.9)."),
        };
        var shortCircuit = new List<SettingRow>
        {
            new("prospective-short-circuit", "Prospective short-circuit current", F.Current(p.ProspectiveShortCircuitA), "Pack maximum voltage over the loop resistance, cells at the hottest ambient."),
            new("loop-resistance", "Short-circuit loop resistance", F.Milliohm(p.ShortCircuitLoopResistanceMilliohm)),
        };
        var contactor = new List<SettingRow>
        {
            new("contactor-continuous", "Contactor continuous current, at least", F.Current(p.ContactorContinuousA)),
            new("contactor-voltage", "Contactor DC voltage rating, at least", F.PackVoltage(p.ContactorMinVoltageRating)),
            new("contactor-breaking", "Contactor breaking current, at least", F.Current(p.ContactorBreakingCurrentA), "The largest load current it may have to open."),
        };
        List<SettingRow> precharge;
        string? prechargeNote = null;
        if (p.PrechargeResistanceOhm is { } ohm)
        {
            precharge =
            [
                new("precharge-resistance", "Precharge resistance", F.Ohm(ohm)),
                new("precharge-time", "Time to 95 %", F.ComputedSeconds(p.PrechargeTimeS ?? double.NaN), "3 R·C."),
                new("precharge-time-99", "Time to 99 %", F.ComputedSeconds(p.PrechargeTimeTo99PercentS ?? double.NaN), "4.6 R·C."),
                new("precharge-close", "Close the main contactor at, at least", F.PackVoltage(p.PrechargeCloseVoltage ?? double.NaN), "95 % of the pack maximum voltage."),
                new("precharge-peak-current", "Peak current", F.Current(p.PrechargePeakCurrentA ?? double.NaN), "At the moment of closing."),
                new("precharge-peak-power", "Peak power", F.Watts(p.PrechargePeakPowerW ?? double.NaN), "At the moment of closing."),
                new("precharge-average-power", "Average power to 95 %", F.Watts(p.PrechargeAveragePowerW ?? double.NaN)),
                new("precharge-energy", "Energy per precharge", F.Joules(p.PrechargeEnergyJ ?? double.NaN), "½ C·V², whatever the resistance."),
            ];
        }
        else
        {
            precharge = [];
            prechargeNote = "No DC-link capacitance entered: no precharge circuit is sized.";
        }

        var cable = new List<SettingRow>();
        if (p.CableResistanceMilliohm is { } cableMilliohm)
        {
            cable.Add(new("cable-resistance", "Main cable resistance", F.Milliohm(cableMilliohm), "Copper at 20 °C, both conductors."));
        }

        if (p.CableCurrentDensityAPerMm2 is { } density)
        {
            cable.Add(new("cable-current-density", "Cable current density", F.CurrentDensity(density), "At the design continuous current."));
        }

        cable.Add(new("link-resistance", "Series links, total", F.Milliohm(p.LinkResistanceTotalMilliohm)));
        cable.Add(new("pack-resistance", "Pack resistance at 25 °C", F.Milliohm(r.Pack.ResistanceMilliohm)));
        cable.Add(new("pack-resistance-cold", "Pack resistance at the coldest ambient", F.Milliohm(r.Pack.ColdResistanceMilliohm),
            r.Pack.ColdResistanceEstimated ? "Estimated (Arrhenius, no cold datasheet figure)." : null));

        return
        [
            new("fuse", "Main fuse", fuse),
            new("short-circuit", "Short circuit", shortCircuit),
            new("contactor", "Main contactor", contactor),
            new("precharge", "Precharge resistor", precharge, prechargeNote),
            new("cable", "Cable, links and pack resistance", cable, p.CableResistanceMilliohm is null ? "No main cable entered." : null),
        ];
    }

    private static OcvChartModel OcvChart(DesignInput input, EvaluationResult r)
    {
        var s = r.Pack.Series;
        var curve = r.Cell.OcvCurve.Points.Select(pt => new ChartPoint(pt.SocPercent, pt.Voltage * s)).ToList();
        ChartLine Line(string key, string label, double volts) => new(key, $"{label} {F.PackVoltage(volts).Text}", volts);
        return new OcvChartModel(
            "Pack open-circuit voltage against state of charge",
            "Rest voltage of the whole pack across the state of charge; the shaded band is the usable window.",
            "State of charge (%)",
            "Pack voltage at rest (V)",
            curve,
            input.SocWindow.MinPercent,
            input.SocWindow.MaxPercent,
            $"Window {F.Entered(input.SocWindow.MinPercent, "%").Text} to {F.Entered(input.SocWindow.MaxPercent, "%").Text}",
            [
                Line("controller-max", "Controller maximum", input.Controller.MaxVoltage),
                Line("ov-trip", "BMS OV trip", r.PackThresholds.OverVoltageTrip),
                Line("cv", "Charger CV", r.Charger.ConstantVoltage),
                Line("controller-min", "Controller minimum", input.Controller.MinVoltage),
                Line("uv-trip", "BMS UV trip", r.PackThresholds.UnderVoltageTrip),
            ]);
    }

    private static LadderChartModel Ladder(EvaluationResult r) => new(
        "Protection ladder, to scale per cell",
        "Every voltage layer per cell, to scale, highest first; each must sit at or below the one above it.",
        "Voltage per cell (V)",
        r.Ladder.Select(l => new LadderRung(l.Layer, l.Label, l.PerCellVoltage, F.CellVoltage(l.PerCellVoltage), F.PackVoltage(l.PackVoltage))).ToList());

    private static List<SignOffLine> SignOff(SheetSignOff? s)
    {
        SignOffLine Line(string role, SignOffEntry? e) => e is null
            ? new(role, "", "", false)
            : new(role, e.Name.Trim(), F.DateUtc(e.SignedAtUtc), true);
        return [Line("Designed by", s?.DesignedBy), Line("Checked by", s?.CheckedBy), Line("Approved by", s?.ApprovedBy)];
    }
}
