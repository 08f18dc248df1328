using PackDesigner.Core.Design;
using PackDesigner.Core.Finder;
using PackDesigner.Core.Spread;

namespace PackDesigner.Web.Api;

/// <summary>Body of <c>POST /api/v1/spread</c>: the design (the evaluate request) and the spread settings.</summary>
public sealed record SpreadApiRequest : RequestObject
{
    public EvaluateRequest? Design { get; init; }
    public SpreadSettingsRequest? Spread { get; init; }
}

/// <summary>Spread settings; σ in % of the datasheet value (omitted: from the datasheet tolerance), trip risk as a fraction.</summary>
public sealed record SpreadSettingsRequest : RequestObject
{
    public SpreadDistribution? Distribution { get; init; }
    public double? CapacitySigmaPercent { get; init; }
    public double? ResistanceSigmaPercent { get; init; }
    public int? Trials { get; init; }
    public long? Seed { get; init; }
    public double? TripRisk { get; init; }
    public IReadOnlyList<double>? MeasuredCapacitiesAh { get; init; }
    public MeasuredGrouping? MeasuredGrouping { get; init; }
}

/// <summary>Body of <c>POST /api/v1/configurations</c>: a cell, the equipment limits and optional targets.</summary>
public sealed record ConfigurationsApiRequest : RequestObject
{
    public CellRequest? Cell { get; init; }
    public ControllerRequest? Controller { get; init; }
    public ChargerRequest? Charger { get; init; }
    public SocWindowRequest? SocWindow { get; init; }
    public TargetsRequest? Targets { get; init; }
    public AmbientRequest? Ambient { get; init; }
    public BalancingMethod? Balancing { get; init; }
    public double? LinkResistanceMilliohm { get; init; }
    public CableRequest? Cable { get; init; }
    public MarginsRequest? Margins { get; init; }
    public ConfigurationSort? SortBy { get; init; }
}

public sealed record TargetsRequest : RequestObject
{
    public double? MinUsableEnergyWh { get; init; }
    public int? MaxCells { get; init; }
    public double? MaxMassKg { get; init; }
    public double? MinContinuousCurrentA { get; init; }
    public double? MinPeakCurrentA { get; init; }
    public double? CostPerCell { get; init; }
    public double? MaxCost { get; init; }
}
