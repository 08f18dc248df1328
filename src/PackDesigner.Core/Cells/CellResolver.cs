using PackDesigner.Core.Curves;
using PackDesigner.Core.Validation;

namespace PackDesigner.Core.Cells;

/// <summary>Fills omitted datasheet figures from the chemistry preset and checks each figure's range and consistency.</summary>
public static class CellResolver
{
    private const string Prefix = "cell.";

    /// <summary>Resolves <paramref name="input"/>; returns null with errors (field paths under <c>cell.</c>) when it is invalid.</summary>
    public static CellSpec? TryResolve(CellInput input, out IReadOnlyList<ValidationError> errors)
    {
        var list = new ErrorList();
        var preset = ChemistryPresets.For(input.Chemistry);
        var origins = new Dictionary<string, FigureOrigin>();
        var missing = new HashSet<string>();

        double Take(string name, double? value, Func<ChemistryPreset, double> fromPreset)
        {
            if (value is { } v)
            {
                origins[name] = FigureOrigin.Datasheet;
                return v;
            }

            if (preset is not null)
            {
                origins[name] = FigureOrigin.Preset;
                return fromPreset(preset);
            }

            list.Add(Prefix + name, "Required for a custom chemistry (no preset to fall back on).");
            missing.Add(name);
            return double.NaN;
        }

        // A missing figure already has its error: its range check would only add a second one for the same field.
        bool Range(string name, double value, double lo, double hi, string unit, bool exclusiveLow = false) =>
            !missing.Contains(name) && list.Range(Prefix + name, value, lo, hi, unit, exclusiveLow);

        var capacity = Take("capacityAh", input.CapacityAh, p => p.CapacityAh);
        var nominal = Take("nominalVoltage", input.NominalVoltage, p => p.NominalVoltage);
        var max = Take("maxChargeVoltage", input.MaxChargeVoltage, p => p.MaxChargeVoltage);
        var min = Take("minDischargeVoltage", input.MinDischargeVoltage, p => p.MinDischargeVoltage);
        var maxCharge = Take("maxChargeCurrentA", input.MaxChargeCurrentA, p => p.MaxChargeCurrentA);
        var maxDischarge = Take("maxDischargeCurrentA", input.MaxDischargeCurrentA, p => p.MaxDischargeCurrentA);
        var peak = Take("peakDischargeCurrentA", input.PeakDischargeCurrentA, p => p.PeakDischargeCurrentA);
        var peakDuration = Take("peakDischargeDurationS", input.PeakDischargeDurationS, p => p.PeakDischargeDurationS);
        var resistance = Take("internalResistanceMilliohm", input.InternalResistanceMilliohm, p => p.InternalResistanceMilliohm);
        var mass = Take("massKg", input.MassKg, p => p.MassKg);
        var tolerance = Take("capacityTolerancePercent", input.CapacityTolerancePercent, p => p.CapacityTolerancePercent);
        var chargeMin = Take("chargeTemperatureMinC", input.ChargeTemperatureMinC, p => p.ChargeTemperatureMinC);
        var chargeMax = Take("chargeTemperatureMaxC", input.ChargeTemperatureMaxC, p => p.ChargeTemperatureMaxC);
        var dischargeMin = Take("dischargeTemperatureMinC", input.DischargeTemperatureMinC, p => p.DischargeTemperatureMinC);
        var dischargeMax = Take("dischargeTemperatureMaxC", input.DischargeTemperatureMaxC, p => p.DischargeTemperatureMaxC);

        var capacityOk = Range("capacityAh", capacity, 0, 10_000, "Ah", exclusiveLow: true);
        var nominalOk = Range("nominalVoltage", nominal, 0.5, 5.5, "V");
        var maxOk = Range("maxChargeVoltage", max, 0.5, 5.5, "V");
        var minOk = Range("minDischargeVoltage", min, 0.5, 5.5, "V");
        Range("maxChargeCurrentA", maxCharge, 0, 10_000, "A", exclusiveLow: true);
        var dischargeOk = Range("maxDischargeCurrentA", maxDischarge, 0, 50_000, "A", exclusiveLow: true);
        var peakOk = Range("peakDischargeCurrentA", peak, 0, 100_000, "A", exclusiveLow: true);
        Range("peakDischargeDurationS", peakDuration, 0, 3600, "s", exclusiveLow: true);
        Range("internalResistanceMilliohm", resistance, 0, 1000, "mΩ", exclusiveLow: true);
        Range("massKg", mass, 0, 200, "kg", exclusiveLow: true);
        Range("capacityTolerancePercent", tolerance, 0, 50, "%");
        var chargeMinOk = Range("chargeTemperatureMinC", chargeMin, -60, 100, "°C");
        var chargeMaxOk = Range("chargeTemperatureMaxC", chargeMax, -60, 100, "°C");
        var dischargeMinOk = Range("dischargeTemperatureMinC", dischargeMin, -60, 100, "°C");
        var dischargeMaxOk = Range("dischargeTemperatureMaxC", dischargeMax, -60, 100, "°C");

        if (minOk && nominalOk && min >= nominal)
        {
            list.Add(Prefix + "minDischargeVoltage", "The minimum discharge voltage must be below the nominal voltage.");
        }

        if (maxOk && nominalOk && nominal >= max)
        {
            list.Add(Prefix + "maxChargeVoltage", "The maximum charge voltage must be above the nominal voltage.");
        }

        if (peakOk && dischargeOk && peak < maxDischarge)
        {
            list.Add(Prefix + "peakDischargeCurrentA", "The peak discharge current cannot be below the continuous discharge current.");
        }

        if (chargeMinOk && chargeMaxOk && chargeMin >= chargeMax)
        {
            list.Add(Prefix + "chargeTemperatureMaxC", "The charge temperature window's maximum must be above its minimum.");
        }

        if (dischargeMinOk && dischargeMaxOk && dischargeMin >= dischargeMax)
        {
            list.Add(Prefix + "dischargeTemperatureMaxC", "The discharge temperature window's maximum must be above its minimum.");
        }

        ResolveColdResistance(input, resistance, list);

        double termination;
        if (input.TerminationCurrentA is { } term)
        {
            origins["terminationCurrentA"] = FigureOrigin.Datasheet;
            termination = term;
            if (list.Range(Prefix + "terminationCurrentA", term, 0, 10_000, "A", exclusiveLow: true) && term > maxCharge)
            {
                list.Add(Prefix + "terminationCurrentA", "The termination current cannot exceed the maximum charge current.");
            }
        }
        else
        {
            origins["terminationCurrentA"] = FigureOrigin.Derived;
            termination = capacity / 20.0;
        }

        OcvCurve? curve = null;
        var table = input.OcvCurve ?? preset?.OcvCurve;
        origins["ocvCurve"] = input.OcvCurve is null ? FigureOrigin.Preset : FigureOrigin.Datasheet;
        if (table is null)
        {
            list.Add(Prefix + "ocvCurve", "Required for a custom chemistry: a table of state of charge (%) against rest voltage (V).");
        }
        else if (minOk && maxOk && min < max)
        {
            var curveErrors = OcvCurve.Validate(table, min, max);
            list.AddRange(curveErrors);
            if (curveErrors.Count == 0)
            {
                curve = OcvCurve.Create(table);
            }
        }

        errors = list;
        if (list.Count > 0 || curve is null || !capacityOk)
        {
            return null;
        }

        return new CellSpec(
            input.Chemistry, capacity, nominal, max, min, maxCharge, maxDischarge, peak, peakDuration, resistance,
            input.ColdInternalResistanceMilliohm, input.ColdResistanceTemperatureC, mass, tolerance,
            chargeMin, chargeMax, dischargeMin, dischargeMax, termination, curve, origins);
    }

    private static void ResolveColdResistance(CellInput input, double resistance, ErrorList list)
    {
        var cold = input.ColdInternalResistanceMilliohm;
        var coldT = input.ColdResistanceTemperatureC;
        if (cold is null && coldT is null)
        {
            return;
        }

        if (cold is null || coldT is null)
        {
            list.Add(Prefix + (cold is null ? "coldInternalResistanceMilliohm" : "coldResistanceTemperatureC"),
                "Give the cold resistance and the temperature it was measured at together.");
            return;
        }

        list.Range(Prefix + "coldResistanceTemperatureC", coldT.Value, -60, 15, "°C");
        if (list.Range(Prefix + "coldInternalResistanceMilliohm", cold.Value, 0, 10_000, "mΩ", exclusiveLow: true)
            && double.IsFinite(resistance) && cold.Value < resistance)
        {
            list.Add(Prefix + "coldInternalResistanceMilliohm", "A cell's resistance at low temperature cannot be below its 25 °C value.");
        }
    }
}
