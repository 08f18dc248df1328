using PackDesigner.Core.Cells;
using PackDesigner.Core.Curves;

namespace PackDesigner.Web.Api;

/// <summary>Body of <c>GET /api/v1/presets</c>.</summary>
public sealed record PresetsResponse(IReadOnlyList<PresetResponse> Presets)
{
    public static PresetsResponse From(IEnumerable<ChemistryPreset> presets) => new(presets.Select(PresetResponse.From).ToList());
}

/// <summary>
/// One chemistry preset with its figures (units in the names), its OCV table, and for every figure the source
/// of its value: "typical, common practice" or a published citation.
/// </summary>
public sealed record PresetResponse(
    Chemistry Chemistry,
    string Description,
    double CapacityAh,
    double NominalVoltage,
    double MaxChargeVoltage,
    double MinDischargeVoltage,
    double MaxChargeCurrentA,
    double MaxDischargeCurrentA,
    double PeakDischargeCurrentA,
    double PeakDischargeDurationS,
    double InternalResistanceMilliohm,
    double MassKg,
    double CapacityTolerancePercent,
    double ChargeTemperatureMinC,
    double ChargeTemperatureMaxC,
    double DischargeTemperatureMinC,
    double DischargeTemperatureMaxC,
    IReadOnlyList<OcvPoint> OcvCurve,
    IReadOnlyDictionary<string, string> Sources)
{
    /// <summary>The figures a preset supplies, as camelCase field names of the cell.</summary>
    public static IReadOnlyList<string> FigureNames { get; } =
    [
        "capacityAh", "nominalVoltage", "maxChargeVoltage", "minDischargeVoltage", "maxChargeCurrentA",
        "maxDischargeCurrentA", "peakDischargeCurrentA", "peakDischargeDurationS", "internalResistanceMilliohm",
        "massKg", "capacityTolerancePercent", "chargeTemperatureMinC", "chargeTemperatureMaxC",
        "dischargeTemperatureMinC", "dischargeTemperatureMaxC", "ocvCurve",
    ];

    public const string DefaultSource = "typical, common practice";

    public static PresetResponse From(ChemistryPreset p) => new(
        p.Chemistry, p.Description, p.CapacityAh, p.NominalVoltage, p.MaxChargeVoltage, p.MinDischargeVoltage,
        p.MaxChargeCurrentA, p.MaxDischargeCurrentA, p.PeakDischargeCurrentA, p.PeakDischargeDurationS,
        p.InternalResistanceMilliohm, p.MassKg, p.CapacityTolerancePercent, p.ChargeTemperatureMinC,
        p.ChargeTemperatureMaxC, p.DischargeTemperatureMinC, p.DischargeTemperatureMaxC, p.OcvCurve,
        FigureNames.ToDictionary(n => n, n => SourceOf(p, n), StringComparer.Ordinal));

    // Core's convention: Sources names a figure when it has its own source, and "*" holds the rest.
    private static string SourceOf(ChemistryPreset p, string figure) =>
        p.Sources.TryGetValue(figure, out var own) ? own
        : p.Sources.TryGetValue("*", out var rest) ? rest
        : DefaultSource;
}
