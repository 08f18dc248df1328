using PackDesigner.Core.Finder;
using PackDesigner.Core.Spread;
using PackDesigner.Core.Validation;

namespace PackDesigner.Web.Api;

/// <summary>Mapping of the spread and configuration-finder requests; the design part reuses the evaluate mapping under <c>design.</c>.</summary>
public static partial class DesignRequestMapper
{
    public const string DesignPrefix = "design.";

    /// <summary>Maps a spread request; returns null with the errors (keyed <c>design.*</c> and <c>spread.*</c>) when a member is missing or unknown.</summary>
    public static SpreadRequest? TryMapSpread(SpreadApiRequest request, out IReadOnlyList<ValidationError> errors)
    {
        ArgumentNullException.ThrowIfNull(request);
        var e = new Collector();
        e.Unknown(string.Empty, request.UnknownFields);
        Core.Design.DesignInput? design = null;
        if (request.Design is null)
        {
            e.Add("design", RequiredMessage);
        }
        else
        {
            design = TryMap(request.Design, out var designErrors);
            e.Errors.AddRange(designErrors.Select(d => d with { Field = DesignPrefix + d.Field }));
        }

        var settings = e.Object("spread", request.Spread, s => new SpreadSettings
        {
            Distribution = e.Need("spread.distribution", s.Distribution),
            CapacitySigmaPercent = s.CapacitySigmaPercent,
            ResistanceSigmaPercent = s.ResistanceSigmaPercent,
            Trials = e.Need("spread.trials", s.Trials),
            Seed = e.Need("spread.seed", s.Seed),
            TripRisk = s.TripRisk,
            MeasuredCapacitiesAh = s.MeasuredCapacitiesAh,
            MeasuredGrouping = s.MeasuredGrouping ?? MeasuredGrouping.Balanced,
        });

        errors = e.Errors;
        return e.Errors.Count == 0 && design is not null && settings is not null
            ? new SpreadRequest { Design = design, Spread = settings }
            : null;
    }

    /// <summary>Maps a configuration-finder request; returns null with the errors when a member is missing or unknown.</summary>
    public static ConfigurationRequest? TryMapConfigurations(ConfigurationsApiRequest request, out IReadOnlyList<ValidationError> errors)
    {
        ArgumentNullException.ThrowIfNull(request);
        var e = new Collector();
        e.Unknown(string.Empty, request.UnknownFields);
        var cell = MapCell(request.Cell, e);
        var controller = e.Object("controller", request.Controller, c => MapController(c, e));
        var charger = e.Optional("charger", request.Charger, c => MapCharger(c, e));
        var window = e.Optional("socWindow", request.SocWindow, w => new Core.Design.SocWindowInput(
            e.Need("socWindow.minPercent", w.MinPercent),
            e.Need("socWindow.maxPercent", w.MaxPercent)));
        var ambient = e.Optional("ambient", request.Ambient, a => new Core.Design.AmbientInput(
            e.Need("ambient.minC", a.MinC),
            e.Need("ambient.maxC", a.MaxC)));
        var cable = e.Optional("cable", request.Cable, c => new Core.Design.CableInput(
            e.Need("cable.crossSectionMm2", c.CrossSectionMm2),
            e.Need("cable.lengthM", c.LengthM)));
        var margins = e.Optional("margins", request.Margins, MapMargins);
        var targets = e.Optional("targets", request.Targets, t => new ConfigurationTargets
        {
            MinUsableEnergyWh = t.MinUsableEnergyWh,
            MaxCells = t.MaxCells,
            MaxMassKg = t.MaxMassKg,
            MinContinuousCurrentA = t.MinContinuousCurrentA,
            MinPeakCurrentA = t.MinPeakCurrentA,
            CostPerCell = t.CostPerCell,
            MaxCost = t.MaxCost,
        });

        errors = e.Errors;
        if (e.Errors.Count > 0 || cell is null || controller is null)
        {
            return null;
        }

        return new ConfigurationRequest
        {
            Cell = cell,
            Controller = controller,
            Charger = charger,
            SocWindow = window,
            Targets = targets,
            Ambient = ambient,
            Balancing = request.Balancing ?? Core.Design.BalancingMethod.Bottom,
            LinkResistanceMilliohm = request.LinkResistanceMilliohm ?? 0,
            Cable = cable,
            Margins = margins,
            SortBy = request.SortBy ?? ConfigurationSort.CellCount,
        };
    }
}
