using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;

namespace PackDesigner.Core.Finder;

/// <summary>What the candidate list is sorted by; ties go to fewer cells, then fewer in series.</summary>
public enum ConfigurationSort
{
    /// <summary>Fewest cells first.</summary>
    CellCount,
    /// <summary>Most worst-case usable energy first.</summary>
    UsableEnergy,
    /// <summary>Lightest first.</summary>
    Mass,
    /// <summary>Cheapest first (needs <see cref="ConfigurationTargets.CostPerCell"/>; otherwise the same as cell count).</summary>
    Cost,
    /// <summary>Most continuous current first.</summary>
    ContinuousCurrent,
    /// <summary>Fewest error findings, then fewest warnings.</summary>
    Findings,
}

/// <summary>
/// Optional targets a configuration must meet. Energy Wh, mass kg, currents A; cost in any currency, per cell and
/// for the pack.
/// </summary>
public sealed record ConfigurationTargets
{
    /// <summary>The worst-case usable energy (weakest group, at the CV) must reach this, Wh.</summary>
    public double? MinUsableEnergyWh { get; init; }
    public int? MaxCells { get; init; }
    public double? MaxMassKg { get; init; }

    /// <summary>P × the cell's continuous discharge current must reach this (besides the controller's continuous current), A.</summary>
    public double? MinContinuousCurrentA { get; init; }

    /// <summary>P × the cell's peak discharge current must reach this (besides the controller's peak current), A.</summary>
    public double? MinPeakCurrentA { get; init; }
    public double? CostPerCell { get; init; }
    public double? MaxCost { get; init; }
}

/// <summary>
/// A search for the S×P configurations of a cell that fit the equipment. Omitted parts take stated defaults: the
/// window 10–90 % (<see cref="FinderLimits.DefaultSocWindow"/>), an ambient of 25 °C, and a charger sized to each
/// configuration (its maximum voltage the configuration's own CV, its current P × the cell's maximum charge current,
/// a 0.1 V step, no float stage).
/// </summary>
public sealed record ConfigurationRequest
{
    public required CellInput Cell { get; init; }
    public required ControllerInput Controller { get; init; }
    public ChargerInput? Charger { get; init; }
    public SocWindowInput? SocWindow { get; init; }
    public ConfigurationTargets? Targets { get; init; }
    public AmbientInput? Ambient { get; init; }
    public BalancingMethod Balancing { get; init; } = BalancingMethod.Bottom;
    public double LinkResistanceMilliohm { get; init; }
    public CableInput? Cable { get; init; }
    public MarginsInput? Margins { get; init; }
    public ConfigurationSort SortBy { get; init; } = ConfigurationSort.CellCount;
}

/// <summary>Bounds and defaults of the configuration finder.</summary>
public static class FinderLimits
{
    public const int MaxSeries = 400;
    public const int MaxParallel = 50;
    public const double DefaultChargerStepV = 0.1;

    public static SocWindowInput DefaultSocWindow { get; } = new(10, 90);
    public static AmbientInput DefaultAmbient { get; } = new(25, 25);
}
