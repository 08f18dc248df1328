namespace PackDesigner.Web.Pages.Designs;

/// <summary>One datasheet figure of a cell as the pages show it: its <see cref="CellForm"/> property, unit and hint.</summary>
public sealed record CellFigure(string Property, string Unit, string Hint);

/// <summary>
/// Units and hints of the cell figures, shared by the design form, the cell library's form and its cell sheet
/// (typical values are common practice).
/// </summary>
public static class CellFigures
{
    public const string ChemistryHint = "Sets the typical values of blank figures; it does not change figures already entered. Custom needs every figure.";

    public static IReadOnlyList<CellFigure> All { get; } =
    [
        new(nameof(CellForm.CapacityAh), "Ah", "Rated capacity; large prismatic cells 50–300 Ah, cylindrical 2–5 Ah."),
        new(nameof(CellForm.NominalVoltage), "V", "LFP 3.2, NMC 3.6–3.7, NCA 3.6, LTO 2.3–2.4."),
        new(nameof(CellForm.MaxChargeVoltage), "V", "LFP 3.65 (3.60 on some), NMC and NCA 4.2, LTO 2.7–2.8."),
        new(nameof(CellForm.MinDischargeVoltage), "V", "LFP 2.5 (2.0 on some), NMC 2.5–3.0, LTO 1.5–1.8."),
        new(nameof(CellForm.MaxChargeCurrentA), "A", "Continuous; often 0.5C–1C."),
        new(nameof(CellForm.MaxDischargeCurrentA), "A", "Continuous; often 1C–3C."),
        new(nameof(CellForm.PeakDischargeCurrentA), "A", "Short pulses; at least the continuous current."),
        new(nameof(CellForm.PeakDischargeDurationS), "s", "How long the peak may last; often 10–30 s."),
        new(nameof(CellForm.InternalResistanceMilliohm), "mΩ", "DC resistance; large prismatic 0.2–1 mΩ, cylindrical 10–30 mΩ."),
        new(nameof(CellForm.ColdInternalResistanceMilliohm), "mΩ", "Optional, with its temperature; blank = estimated from the 25 °C value."),
        new(nameof(CellForm.ColdResistanceTemperatureC), "°C", "Where the cold resistance was measured, for example −10 °C."),
        new(nameof(CellForm.MassKg), "kg", "Per cell; large prismatic 1–6 kg, 21700 cylindrical about 0.07 kg."),
        new(nameof(CellForm.CapacityTolerancePercent), "± %", "Spread of capacity between cells; often 2–5 %."),
        new(nameof(CellForm.ChargeTemperatureMinC), "°C", "Graphite anodes: no charging below 0 °C; LTO can charge below 0 °C."),
        new(nameof(CellForm.ChargeTemperatureMaxC), "°C", "Often 45 °C."),
        new(nameof(CellForm.DischargeTemperatureMinC), "°C", "Often −20 °C."),
        new(nameof(CellForm.DischargeTemperatureMaxC), "°C", "Often 60 °C."),
        new(nameof(CellForm.TerminationCurrentA), "A", "Where charging ends; blank = C/20 (some datasheets say 0.02C)."),
    ];

    private static readonly Dictionary<string, CellFigure> ByProperty = All.ToDictionary(f => f.Property, StringComparer.Ordinal);

    /// <summary>The figure of a <see cref="CellForm"/> property, e.g. <c>CellFigures.Of(nameof(CellForm.MassKg))</c>.</summary>
    public static CellFigure Of(string property) => ByProperty[property];
}
