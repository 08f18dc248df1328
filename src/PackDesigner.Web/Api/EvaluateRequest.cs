using System.Text.Json;
using System.Text.Json.Serialization;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;

namespace PackDesigner.Web.Api;

/// <summary>
/// A JSON object of the API contract. Members the contract does not know land in <see cref="UnknownFields"/>
/// so that a misspelt cell figure is reported instead of silently falling back to the preset.
/// </summary>
public abstract record RequestObject
{
    [JsonExtensionData]
    public Dictionary<string, JsonElement>? UnknownFields { get; init; }
}

/// <summary>
/// Body of <c>POST /api/v1/evaluate</c>. Every member is nullable so that a missing required member is reported by
/// name (see <see cref="DesignRequestMapper"/>) rather than defaulting to zero. Units are in the member names.
/// </summary>
public sealed record EvaluateRequest : RequestObject
{
    public CellRequest? Cell { get; init; }
    public int? Series { get; init; }
    public int? Parallel { get; init; }
    public double? LinkResistanceMilliohm { get; init; }
    public CableRequest? Cable { get; init; }
    public BalancingMethod? Balancing { get; init; }
    public SocWindowRequest? SocWindow { get; init; }
    public ControllerRequest? Controller { get; init; }
    public ChargerRequest? Charger { get; init; }
    public AmbientRequest? Ambient { get; init; }
    public MarginsRequest? Margins { get; init; }
}

/// <summary>
/// The cell datasheet; an omitted figure takes the chemistry preset's typical value (not for <c>custom</c>). Not
/// sealed: the cell library's bodies add their names to the same flat figures.
/// </summary>
public record CellRequest : RequestObject
{
    public Chemistry? Chemistry { get; init; }
    public double? CapacityAh { get; init; }
    public double? NominalVoltage { get; init; }
    public double? MaxChargeVoltage { get; init; }
    public double? MinDischargeVoltage { get; init; }
    public double? MaxChargeCurrentA { get; init; }
    public double? MaxDischargeCurrentA { get; init; }
    public double? PeakDischargeCurrentA { get; init; }
    public double? PeakDischargeDurationS { get; init; }
    public double? InternalResistanceMilliohm { get; init; }
    public double? ColdInternalResistanceMilliohm { get; init; }
    public double? ColdResistanceTemperatureC { get; init; }
    public double? MassKg { get; init; }
    public double? CapacityTolerancePercent { get; init; }
    public double? ChargeTemperatureMinC { get; init; }
    public double? ChargeTemperatureMaxC { get; init; }
    public double? DischargeTemperatureMinC { get; init; }
    public double? DischargeTemperatureMaxC { get; init; }
    public double? TerminationCurrentA { get; init; }
    public IReadOnlyList<OcvPointRequest?>? OcvCurve { get; init; }
}

/// <summary>One row of the open-circuit-voltage table: state of charge (%) and rest voltage (V).</summary>
public sealed record OcvPointRequest : RequestObject
{
    public double? SocPercent { get; init; }
    public double? Voltage { get; init; }
}

public sealed record CableRequest : RequestObject
{
    public double? CrossSectionMm2 { get; init; }
    public double? LengthM { get; init; }
}

public sealed record SocWindowRequest : RequestObject
{
    public double? MinPercent { get; init; }
    public double? MaxPercent { get; init; }
}

public sealed record ControllerRequest : RequestObject
{
    public double? MinVoltage { get; init; }
    public double? MaxVoltage { get; init; }
    public double? ContinuousCurrentA { get; init; }
    public double? PeakCurrentA { get; init; }
    public double? PeakDurationS { get; init; }
    public double? RegenCurrentA { get; init; }
    public double? DcLinkCapacitanceMicrofarad { get; init; }
    public double? PrechargeTimeS { get; init; }
}

public sealed record ChargerRequest : RequestObject
{
    public double? MaxVoltage { get; init; }
    public double? MaxCurrentA { get; init; }
    public double? VoltageStepV { get; init; }
    public bool? FloatStage { get; init; }
    public double? TargetCellVoltage { get; init; }
}

public sealed record AmbientRequest : RequestObject
{
    public double? MinC { get; init; }
    public double? MaxC { get; init; }
}

/// <summary>Protection margins; each omitted member keeps the default of <see cref="MarginsInput"/> (common practice).</summary>
public sealed record MarginsRequest : RequestObject
{
    public double? OverVoltageTripBelowMaxV { get; init; }
    public double? OverVoltageHysteresisV { get; init; }
    public double? UnderVoltageTripAboveMinV { get; init; }
    public double? UnderVoltageHysteresisV { get; init; }
    public double? TemperatureMarginC { get; init; }
    public double? TemperatureHysteresisC { get; init; }
    public double? ChargeCurrentMarginPercent { get; init; }
    public double? ShortCircuitTripFactor { get; init; }
    public double? OverVoltageDelayS { get; init; }
    public double? UnderVoltageDelayS { get; init; }
    public double? ChargeOverCurrentDelayS { get; init; }
    public double? ShortCircuitDelayMicroseconds { get; init; }
}
