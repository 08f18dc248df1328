using PackDesigner.Core.Validation;

namespace PackDesigner.Core.Finder;

/// <summary>
/// A configuration that fits, with the design sheet's key figures for it. Voltages V (pack), energy Wh, currents A
/// (what P cells allow), mass kg; the counts are the full evaluator's findings by severity.
/// </summary>
public sealed record ConfigurationCandidate(
    int Series,
    int Parallel,
    int CellCount,
    double MaxVoltage,
    double ConstantVoltage,
    double LoadedLowVoltage,
    double NominalEnergyWh,
    double UsableEnergyWh,
    double UsableEnergyWorstCaseWh,
    double ContinuousCurrentA,
    double PeakCurrentA,
    double MassKg,
    double? Cost,
    int Errors,
    int Warnings,
    int Infos);

/// <summary>
/// Why a series count, a parallel count, or a combination does not fit. <see cref="Series"/> alone (with
/// <see cref="SeriesTo"/> for a run) means no P fits those S; <see cref="Parallel"/> alone means those P fail for
/// every S; both mean the combinations S × P…ParallelTo. <see cref="Code"/> is stable: <c>top-of-charge</c>,
/// <c>loaded-bottom</c>, <c>continuous-current</c>, <c>peak-current</c>, <c>energy</c>, <c>cells</c>, <c>mass</c>,
/// <c>cost</c>, <c>mixed</c>.
/// </summary>
public sealed record ConfigurationRejection(int? Series, int? SeriesTo, int? Parallel, int? ParallelTo, string Code, string Reason);

public sealed record ConfigurationResult(
    IReadOnlyList<ConfigurationCandidate> Candidates,
    IReadOnlyList<ConfigurationRejection> Rejected,
    int CombinationsChecked,
    ConfigurationSort SortBy,
    IReadOnlyList<string> Notes);

/// <summary>Either validation errors keyed by request field (<c>cell.capacityAh</c>, <c>targets.maxCells</c>…) or a result.</summary>
public sealed record ConfigurationOutcome(ConfigurationResult? Result, IReadOnlyList<ValidationError> Errors)
{
    public bool IsValid => Result is not null;
}
