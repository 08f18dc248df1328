using System.ComponentModel.DataAnnotations;
using System.Globalization;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Finder;
using PackDesigner.Core.Validation;
using PackDesigner.Web.Api;

namespace PackDesigner.Web.Pages.Finder;

/// <summary>
/// The finder's form, as typed: a cell (blank figures take the chemistry preset), the controller's window and
/// currents, an optional charger, the state-of-charge window, targets and the sort. It is turned into the API's
/// configurations request, so the page and <c>POST /api/v1/configurations</c> check the same things.
/// </summary>
public sealed class FinderForm
{
    public const string Prefix = "Input";

    /// <summary>Controller figures the finder does not ask for; they only affect findings, not which S×P fit (common practice values).</summary>
    public const double AssumedPeakDurationS = 10;
    public const double AssumedDcLinkMicrofarad = 1000;
    public const double AssumedPrechargeTimeS = 1;
    public const double ChargerStepV = 0.1;

    [Display(Name = "Chemistry")] public string? Chemistry { get; set; } = "lfp";
    [Display(Name = "Capacity")] public string? CapacityAh { get; set; }
    [Display(Name = "Nominal voltage")] public string? NominalVoltage { get; set; }
    [Display(Name = "Maximum charge voltage")] public string? MaxChargeVoltage { get; set; }
    [Display(Name = "Minimum discharge voltage")] public string? MinDischargeVoltage { get; set; }
    [Display(Name = "Continuous discharge current")] public string? MaxDischargeCurrentA { get; set; }
    [Display(Name = "Peak discharge current")] public string? PeakDischargeCurrentA { get; set; }
    [Display(Name = "DC resistance")] public string? InternalResistanceMilliohm { get; set; }
    [Display(Name = "Mass")] public string? MassKg { get; set; }

    [Display(Name = "Controller minimum voltage")] public string? ControllerMinVoltage { get; set; } = "46";
    [Display(Name = "Controller maximum voltage")] public string? ControllerMaxVoltage { get; set; } = "60";
    [Display(Name = "Controller continuous current")] public string? ControllerContinuousCurrentA { get; set; } = "80";
    [Display(Name = "Controller peak current")] public string? ControllerPeakCurrentA { get; set; } = "150";
    [Display(Name = "Regen current")] public string? ControllerRegenCurrentA { get; set; } = "0";

    [Display(Name = "Charger maximum voltage")] public string? ChargerMaxVoltage { get; set; }
    [Display(Name = "Charger current")] public string? ChargerMaxCurrentA { get; set; }

    [Display(Name = "Window bottom")] public string? SocMinPercent { get; set; } = "10";
    [Display(Name = "Window top")] public string? SocMaxPercent { get; set; } = "90";

    [Display(Name = "Minimum usable energy")] public string? MinUsableEnergyWh { get; set; }
    [Display(Name = "Most cells")] public string? MaxCells { get; set; }
    [Display(Name = "Heaviest")] public string? MaxMassKg { get; set; }
    [Display(Name = "Minimum continuous current")] public string? MinContinuousCurrentA { get; set; }
    [Display(Name = "Minimum peak current")] public string? MinPeakCurrentA { get; set; }

    [Display(Name = "Sort by")] public string? SortBy { get; set; } = "cellCount";

    /// <summary>The API field path of each form property, so errors from the mapping and from Core land beside their field.</summary>
    public static IReadOnlyDictionary<string, string> ApiPaths { get; } = new Dictionary<string, string>(StringComparer.Ordinal)
    {
        [nameof(Chemistry)] = "cell.chemistry",
        [nameof(CapacityAh)] = "cell.capacityAh",
        [nameof(NominalVoltage)] = "cell.nominalVoltage",
        [nameof(MaxChargeVoltage)] = "cell.maxChargeVoltage",
        [nameof(MinDischargeVoltage)] = "cell.minDischargeVoltage",
        [nameof(MaxDischargeCurrentA)] = "cell.maxDischargeCurrentA",
        [nameof(PeakDischargeCurrentA)] = "cell.peakDischargeCurrentA",
        [nameof(InternalResistanceMilliohm)] = "cell.internalResistanceMilliohm",
        [nameof(MassKg)] = "cell.massKg",
        [nameof(ControllerMinVoltage)] = "controller.minVoltage",
        [nameof(ControllerMaxVoltage)] = "controller.maxVoltage",
        [nameof(ControllerContinuousCurrentA)] = "controller.continuousCurrentA",
        [nameof(ControllerPeakCurrentA)] = "controller.peakCurrentA",
        [nameof(ControllerRegenCurrentA)] = "controller.regenCurrentA",
        [nameof(ChargerMaxVoltage)] = "charger.maxVoltage",
        [nameof(ChargerMaxCurrentA)] = "charger.maxCurrentA",
        [nameof(SocMinPercent)] = "socWindow.minPercent",
        [nameof(SocMaxPercent)] = "socWindow.maxPercent",
        [nameof(MinUsableEnergyWh)] = "targets.minUsableEnergyWh",
        [nameof(MaxCells)] = "targets.maxCells",
        [nameof(MaxMassKg)] = "targets.maxMassKg",
        [nameof(MinContinuousCurrentA)] = "targets.minContinuousCurrentA",
        [nameof(MinPeakCurrentA)] = "targets.minPeakCurrentA",
        [nameof(SortBy)] = "sortBy",
    };

    private static readonly Dictionary<string, string> FormKeys =
        ApiPaths.ToDictionary(p => p.Value, p => Prefix + "." + p.Key, StringComparer.Ordinal);

    /// <summary>The form key an API field path is shown beside, or null for a path the form has no field for.</summary>
    public static string? FormKeyOf(string apiPath) => FormKeys.GetValueOrDefault(apiPath);

    /// <summary>The request, or null with the errors keyed by API path when a figure does not parse or is missing.</summary>
    public ConfigurationRequest? TryMap(out IReadOnlyList<ValidationError> errors)
    {
        var e = new List<ValidationError>();
        var chemistry = Enum.TryParse<Chemistry>(Chemistry, ignoreCase: true, out var c) && Enum.IsDefined(c) ? c : (Chemistry?)null;
        if (chemistry is null)
        {
            e.Add(new ValidationError("cell.chemistry", "Choose a chemistry."));
        }

        var sort = Enum.TryParse<ConfigurationSort>(SortBy, ignoreCase: true, out var s) && Enum.IsDefined(s) ? s : (ConfigurationSort?)null;
        if (sort is null)
        {
            e.Add(new ValidationError("sortBy", "Choose what to sort by."));
        }

        double? N(string property, string? text) => Parse(property, text, e);
        var chargerVoltage = N(nameof(ChargerMaxVoltage), ChargerMaxVoltage);
        var chargerCurrent = N(nameof(ChargerMaxCurrentA), ChargerMaxCurrentA);
        var request = new ConfigurationsApiRequest
        {
            Cell = new CellRequest
            {
                Chemistry = chemistry,
                CapacityAh = N(nameof(CapacityAh), CapacityAh),
                NominalVoltage = N(nameof(NominalVoltage), NominalVoltage),
                MaxChargeVoltage = N(nameof(MaxChargeVoltage), MaxChargeVoltage),
                MinDischargeVoltage = N(nameof(MinDischargeVoltage), MinDischargeVoltage),
                MaxDischargeCurrentA = N(nameof(MaxDischargeCurrentA), MaxDischargeCurrentA),
                PeakDischargeCurrentA = N(nameof(PeakDischargeCurrentA), PeakDischargeCurrentA),
                InternalResistanceMilliohm = N(nameof(InternalResistanceMilliohm), InternalResistanceMilliohm),
                MassKg = N(nameof(MassKg), MassKg),
            },
            Controller = new ControllerRequest
            {
                MinVoltage = N(nameof(ControllerMinVoltage), ControllerMinVoltage),
                MaxVoltage = N(nameof(ControllerMaxVoltage), ControllerMaxVoltage),
                ContinuousCurrentA = N(nameof(ControllerContinuousCurrentA), ControllerContinuousCurrentA),
                PeakCurrentA = N(nameof(ControllerPeakCurrentA), ControllerPeakCurrentA),
                PeakDurationS = AssumedPeakDurationS,
                RegenCurrentA = N(nameof(ControllerRegenCurrentA), ControllerRegenCurrentA) ?? 0,
                DcLinkCapacitanceMicrofarad = AssumedDcLinkMicrofarad,
                PrechargeTimeS = AssumedPrechargeTimeS,
            },
            // A charger only when its voltage or current is given; the mapping then asks for the other one.
            Charger = chargerVoltage is null && chargerCurrent is null ? null : new ChargerRequest
            {
                MaxVoltage = chargerVoltage,
                MaxCurrentA = chargerCurrent,
                VoltageStepV = ChargerStepV,
                FloatStage = false,
            },
            SocWindow = new SocWindowRequest { MinPercent = N(nameof(SocMinPercent), SocMinPercent), MaxPercent = N(nameof(SocMaxPercent), SocMaxPercent) },
            Targets = new TargetsRequest
            {
                MinUsableEnergyWh = N(nameof(MinUsableEnergyWh), MinUsableEnergyWh),
                MaxCells = WholeNumber(nameof(MaxCells), MaxCells, e),
                MaxMassKg = N(nameof(MaxMassKg), MaxMassKg),
                MinContinuousCurrentA = N(nameof(MinContinuousCurrentA), MinContinuousCurrentA),
                MinPeakCurrentA = N(nameof(MinPeakCurrentA), MinPeakCurrentA),
            },
            SortBy = sort,
        };
        if (e.Count > 0)
        {
            errors = e;
            return null;
        }

        return DesignRequestMapper.TryMapConfigurations(request, out errors);
    }

    private static double? Parse(string property, string? text, List<ValidationError> errors)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            return null;
        }

        if (double.TryParse(text.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out var v) && double.IsFinite(v))
        {
            return v;
        }

        errors.Add(new ValidationError(ApiPaths[property], "Enter a number with a point as the decimal separator, e.g. 3.2."));
        return null;
    }

    private static int? WholeNumber(string property, string? text, List<ValidationError> errors)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            return null;
        }

        if (int.TryParse(text.Trim(), NumberStyles.None, CultureInfo.InvariantCulture, out var v))
        {
            return v;
        }

        errors.Add(new ValidationError(ApiPaths[property], "Enter a whole number."));
        return null;
    }
}
