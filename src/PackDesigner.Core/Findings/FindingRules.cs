using System.Globalization;
using PackDesigner.Core.Charging;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Protection;
using PackDesigner.Core.Standards;
using PackDesigner.Core.Voltages;

namespace PackDesigner.Core.Findings;

/// <summary>The design checks. Each finding has a stable code, a message with numbers and units, and the input fields it concerns.</summary>
public static class FindingRules
{
    public static IReadOnlyList<Finding> Check(
        PackContext ctx,
        PackVoltages v,
        ThresholdSet cellT,
        ThresholdSet packT,
        ChargeSetpoints charge,
        ProtectionResult protection,
        ThermalResult thermal,
        IReadOnlyList<LadderLayer> ladder)
    {
        var f = new List<Finding>();
        var c = ctx.Input.Controller;
        var charger = ctx.Input.Charger;
        var cell = ctx.Cell;
        var amb = ctx.Input.Ambient;
        var cv = charge.Result.ConstantVoltage;
        var p = ctx.P;

        void Add(Severity s, string code, FormattableString message, params string[] fields) =>
            f.Add(new Finding(s, code, message.ToString(CultureInfo.InvariantCulture), fields));

        // Voltage window against the controller.
        if (cv > c.MaxVoltage)
        {
            Add(Severity.Error, "pack.cv-above-controller-max",
                $"The charge voltage {cv:0.0} V is above the controller's maximum input {c.MaxVoltage:0.0} V.",
                "controller.maxVoltage", "series", "charger.targetCellVoltage");
        }

        if (packT.OverVoltageTrip > c.MaxVoltage)
        {
            Add(Severity.Warning, "pack.max-above-controller-max",
                $"The pack can reach {packT.OverVoltageTrip:0.0} V (S × OV trip) before the BMS stops it, above the controller's maximum input {c.MaxVoltage:0.0} V; the pack maximum is {v.Max:0.0} V.",
                "controller.maxVoltage", "series");
        }

        if (v.RegenHigh > c.MaxVoltage)
        {
            Add(Severity.Warning, "pack.regen-above-controller-max",
                $"Regenerative braking at the window's top lifts the pack to {v.RegenHigh:0.0} V, above the controller's maximum {c.MaxVoltage:0.0} V.",
                "controller.regenCurrentA", "controller.maxVoltage", "socWindow.maxPercent");
        }

        if (c.RegenCurrentA > 0 && v.RegenHigh / ctx.S > cellT.OverVoltageTrip)
        {
            Add(Severity.Warning, "pack.regen-above-ov-trip",
                $"Regenerative current at the window's top lifts a cell to {v.RegenHigh / ctx.S:0.000} V, above the OV trip {cellT.OverVoltageTrip:0.000} V: the BMS will cut regen.",
                "controller.regenCurrentA", "socWindow.maxPercent");
        }

        if (v.LoadedLow < c.MinVoltage)
        {
            Add(Severity.Error, "pack.loaded-low-below-controller-min",
                $"Under the peak current {c.PeakCurrentA:0} A at the window's bottom and {amb.MinC:0} °C the pack sags to {v.LoadedLow:0.0} V, below the controller's minimum {c.MinVoltage:0.0} V: the controller will cut out inside the window.",
                "controller.minVoltage", "controller.peakCurrentA", "ambient.minC", "socWindow.minPercent", "parallel");
        }

        // Charger.
        if (charge.Result.ConstantVoltageLimitedBy == ChargeSetpointCalculator.LimitedByCharger)
        {
            Add(Severity.Warning, "charger.cannot-reach-cv",
                $"The charger's maximum {charger.MaxVoltage:0.0} V is below the wanted charge voltage {charge.DesiredConstantVoltage:0.0} V; charging ends with the typical group at {charge.Result.TypicalGroupEndOfChargeSocPercent:0.0} % state of charge.",
                "charger.maxVoltage");
        }

        if (charger.MaxVoltage > packT.OverVoltageRelease)
        {
            Add(Severity.Info, "charger.can-exceed-ov-release",
                $"The charger can be set up to {charger.MaxVoltage:0.0} V, above S × OV release {packT.OverVoltageRelease:0.0} V: set its CV to {cv:0.00} V and lock the setting.",
                "charger.maxVoltage");
        }

        if (charger.FloatStage)
        {
            Add(Severity.Error, "charger.float-stage",
                $"The charger has a float stage that cannot be switched off. Lithium cells take no float charge: holding a voltage above rest keeps charging them.",
                "charger.floatStage");
        }

        if (charger.MaxCurrentA > cell.MaxChargeCurrentA * p)
        {
            Add(Severity.Info, "charger.current-limited",
                $"The charger can deliver {charger.MaxCurrentA:0.0} A, more than P × the cell's maximum charge current ({cell.MaxChargeCurrentA * p:0.0} A): set its CC to {charge.Result.ConstantCurrentA:0.0} A.",
                "charger.maxCurrentA", "cell.maxChargeCurrentA", "parallel");
        }

        // Balancing at the top.
        var weakest = charge.EndOfCharge.WeakestVoltage;
        if (weakest > cellT.OverVoltageRelease + 1e-6)
        {
            var trips = weakest >= cellT.OverVoltageTrip;
            Add(Severity.Error, "charge.weakest-above-ov-release",
                $"At the end of charge the weakest group reaches {weakest:0.000} V, above the OV release {cellT.OverVoltageRelease:0.000} V{(trips ? " and at or above the OV trip" : string.Empty)}: lower the charge voltage.",
                "charger.targetCellVoltage", "cell.capacityTolerancePercent", "margins.overVoltageHysteresisV");
        }

        if (ctx.Input.Balancing == BalancingMethod.Top && ctx.S > 1)
        {
            var weakBottom = charge.Model.WeakestSoc(ctx.SocLow);
            if (weakBottom <= 0.02)
            {
                Add(Severity.Warning, "balance.weakest-empty-in-window",
                    $"Top-balanced, the weakest group is at {Math.Max(0, weakBottom) * 100:0.0} % when the typical group reaches the window's bottom: it can be over-discharged.",
                    "socWindow.minPercent", "cell.capacityTolerancePercent", "balancing");
            }
        }

        // Temperatures.
        if (amb.MinC < cell.ChargeTemperatureMinC)
        {
            Add(Severity.Warning, "ambient.below-charge-min",
                $"The coldest ambient {amb.MinC:0} °C is below the cell's charge minimum {cell.ChargeTemperatureMinC:0} °C: charging must be inhibited below {cellT.ChargeTemperatureLowTripC:0} °C (BMS charge low-temperature trip), or the cells heated first.",
                "ambient.minC", "cell.chargeTemperatureMinC");
        }

        if (amb.MaxC > cell.ChargeTemperatureMaxC)
        {
            Add(Severity.Warning, "ambient.above-charge-max",
                $"The hottest ambient {amb.MaxC:0} °C is above the cell's charge maximum {cell.ChargeTemperatureMaxC:0} °C: charging will be inhibited in the heat.",
                "ambient.maxC", "cell.chargeTemperatureMaxC");
        }

        if (amb.MinC < cell.DischargeTemperatureMinC)
        {
            Add(Severity.Warning, "ambient.below-discharge-min",
                $"The coldest ambient {amb.MinC:0} °C is below the cell's discharge minimum {cell.DischargeTemperatureMinC:0} °C.",
                "ambient.minC", "cell.dischargeTemperatureMinC");
        }

        if (amb.MaxC > cell.DischargeTemperatureMaxC)
        {
            Add(Severity.Error, "ambient.above-discharge-max",
                $"The hottest ambient {amb.MaxC:0} °C is above the cell's discharge maximum {cell.DischargeTemperatureMaxC:0} °C.",
                "ambient.maxC", "cell.dischargeTemperatureMaxC");
        }

        // Currents.
        if (c.ContinuousCurrentA > cell.MaxDischargeCurrentA * p)
        {
            Add(Severity.Error, "current.continuous-exceeds-cells",
                $"The controller's continuous current {c.ContinuousCurrentA:0} A exceeds what {p} cell(s) in parallel allow ({cell.MaxDischargeCurrentA * p:0} A).",
                "controller.continuousCurrentA", "parallel", "cell.maxDischargeCurrentA");
        }

        if (c.PeakCurrentA > cell.PeakDischargeCurrentA * p)
        {
            Add(Severity.Error, "current.peak-exceeds-cells",
                $"The controller's peak current {c.PeakCurrentA:0} A exceeds what {p} cell(s) in parallel allow ({cell.PeakDischargeCurrentA * p:0} A).",
                "controller.peakCurrentA", "parallel", "cell.peakDischargeCurrentA");
        }

        if (c.PeakCurrentA > cell.MaxDischargeCurrentA * p && c.PeakDurationS > cell.PeakDischargeDurationS)
        {
            Add(Severity.Warning, "current.peak-too-long",
                $"The controller holds its peak for {c.PeakDurationS:0.#} s; the cell's peak rating lasts {cell.PeakDischargeDurationS:0.#} s: the BMS will trip after {cellT.DischargeOverCurrentDelayS:0.#} s.",
                "controller.peakDurationS", "cell.peakDischargeDurationS");
        }

        if (c.RegenCurrentA > cell.MaxChargeCurrentA * p)
        {
            Add(Severity.Warning, "current.regen-exceeds-cells",
                $"The regenerative current {c.RegenCurrentA:0} A exceeds P × the cell's maximum charge current ({cell.MaxChargeCurrentA * p:0} A): limit regen in the controller.",
                "controller.regenCurrentA", "parallel", "cell.maxChargeCurrentA");
        }

        // Protection hardware.
        if (protection.FuseRatingA is null)
        {
            Add(Severity.Error, "fuse.no-standard-rating",
                $"The fuse must carry at least {protection.FuseMinimumA:0} A, above the largest NEC 240.6(A) standard rating (6000 A): split the pack or the load.",
                "controller.continuousCurrentA");
        }

        Add(Severity.Warning, "fuse.interrupting-rating",
            $"The prospective short-circuit current is {protection.ProspectiveShortCircuitA:0} A: the fuse needs a DC interrupting rating of at least that at {protection.FuseMinVoltageRating:0.0} V DC (NEC 110.9).",
            "series", "parallel", "cell.internalResistanceMilliohm");

        if (cellT.ShortCircuitA * p >= protection.ProspectiveShortCircuitA)
        {
            Add(Severity.Warning, "protection.short-circuit-trip-unreachable",
                $"The BMS short-circuit trip {cellT.ShortCircuitA * p:0} A is at or above the prospective short-circuit current {protection.ProspectiveShortCircuitA:0} A: only the fuse protects against a short.",
                "margins.shortCircuitTripFactor");
        }

        if (c.DcLinkCapacitanceMicrofarad <= 0)
        {
            Add(Severity.Info, "precharge.no-capacitance",
                $"No DC-link capacitance entered: the precharge resistor is not sized.",
                "controller.dcLinkCapacitanceMicrofarad");
        }

        if (protection.CableCurrentDensityAPerMm2 is > 5)
        {
            Add(Severity.Warning, "cable.current-density",
                $"The main cable carries {protection.CableCurrentDensityAPerMm2:0.0} A/mm² at the continuous current: check its ampacity for the insulation and installation.",
                "cable.crossSectionMm2");
        }

        if (v.VoltageClass != VoltageClass.A)
        {
            Add(Severity.Warning, "voltage.class-b",
                v.VoltageClass == VoltageClass.B
                    ? (FormattableString)$"The pack maximum {v.Max:0.0} V DC is above 60 V DC (ISO 6469-3 class B): hazardous-voltage practice applies (isolation, touch protection, marking, interlocks, trained people)."
                    : $"The pack maximum {v.Max:0.0} V DC is above 1500 V DC, beyond ISO 6469-3 class B: hazardous-voltage practice applies and the equipment must be rated for it.",
                "series");
        }

        // Thermal.
        if (thermal.CellTemperatureAfterPeakC > cell.DischargeTemperatureMaxC)
        {
            Add(Severity.Warning, "thermal.peak-over-limit",
                $"Starting at {amb.MaxC:0} °C, a peak of {c.PeakDurationS:0.#} s heats a cell to about {thermal.CellTemperatureAfterPeakC:0} °C (adiabatic), above its discharge maximum {cell.DischargeTemperatureMaxC:0} °C.",
                "controller.peakCurrentA", "controller.peakDurationS", "parallel");
        }

        var runtimeMin = charge.Result.ConstantCurrentA > 0 ? ctx.GroupCapacityAh * (ctx.SocHigh - ctx.SocLow) / c.ContinuousCurrentA * 60 : 0;
        if (thermal.MinutesToDischargeLimitAtContinuous < runtimeMin)
        {
            Add(Severity.Warning, "thermal.continuous-needs-cooling",
                $"At the continuous current a cell rises about {thermal.ContinuousTemperatureRisePerHourK:0.0} K per hour (adiabatic) and reaches its discharge limit after {thermal.MinutesToDischargeLimitAtContinuous:0} min, before the window is used up ({runtimeMin:0} min): cooling or a current limit is needed.",
                "controller.continuousCurrentA", "parallel", "ambient.maxC");
        }

        if (ctx.ColdResistanceEstimated && amb.MinC < 15)
        {
            Add(Severity.Info, "cell.cold-resistance-estimated",
                $"The cell's resistance at {amb.MinC:0} °C ({ctx.CellResistanceColdOhm * 1000:0.00} mΩ) is an Arrhenius estimate from its 25 °C value; enter the datasheet's low-temperature value where it has one.",
                "cell.coldInternalResistanceMilliohm");
        }

        if (charge.Result.ConstantVoltage != charge.UnroundedConstantVoltage)
        {
            Add(Severity.Info, "charger.cv-rounded",
                $"The charge voltage is rounded down from {charge.UnroundedConstantVoltage:0.000} V to the charger's {charger.VoltageStepV:0.###} V step: {cv:0.000} V.",
                "charger.voltageStepV");
        }

        f.AddRange(LadderBuilder.Check(ladder, charger.VoltageStepV / ctx.S));
        return f;
    }
}
