using System.Globalization;
using System.Text.Json;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Curves;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Validation;

namespace PackDesigner.Web.Api;

/// <summary>
/// Maps the API contract to Core's <see cref="DesignInput"/> and back, by hand. Missing required members and
/// unknown members are reported as <see cref="ValidationError"/>s keyed by their camelCase field path, the same
/// keys Core uses, so pages and API show every problem in one list.
/// </summary>
public static partial class DesignRequestMapper
{
    public const string RequiredMessage = "Required.";
    public const string UnknownMessage = "Unknown field: check its spelling against the API contract.";
    public const string OcvCurvePath = "cell.ocvCurve";

    /// <summary>Maps and evaluates: mapping errors, or Core's validation errors, or the result.</summary>
    public static EvaluationOutcome Evaluate(EvaluateRequest request)
    {
        var design = TryMap(request, out var errors);
        if (design is not null)
        {
            var outcome = DesignEvaluator.Evaluate(design);
            return outcome.IsValid ? outcome : outcome with { Errors = ExplainPresetCurve(request.Cell, outcome.Errors) };
        }

        // The rest of the design is incomplete, but the cell's own checks can still be reported in the same answer.
        var cellMapping = new Collector();
        IReadOnlyList<ValidationError> cellErrors = [];
        if (MapCell(request.Cell, cellMapping) is { } cell && cellMapping.Errors.Count == 0)
        {
            CellResolver.TryResolve(cell, out cellErrors);
        }

        return new EvaluationOutcome(null, [.. errors, .. cellErrors]);
    }

    /// <summary>
    /// When no table was sent, Core checks the chemistry preset's typical curve against the entered voltages; its
    /// row errors would point at rows the client never sent, so they become one message about the preset.
    /// </summary>
    public static IReadOnlyList<ValidationError> ExplainPresetCurve(CellRequest? cell, IReadOnlyList<ValidationError> errors)
    {
        ArgumentNullException.ThrowIfNull(errors);
        if (cell is not { OcvCurve: null, Chemistry: { } chemistry } || ChemistryPresets.For(chemistry) is not { } preset)
        {
            return errors;
        }

        var rows = errors.Where(e => e.Field.StartsWith(OcvCurvePath + "[", StringComparison.Ordinal)).ToList();
        if (rows.Count == 0)
        {
            return errors;
        }

        var message = string.Create(CultureInfo.InvariantCulture,
            $"The {chemistry.ToString().ToUpperInvariant()} preset's typical curve ({preset.OcvCurve[0].Voltage:0.###}–{preset.OcvCurve[^1].Voltage:0.###} V) does not fit this cell's minimum and maximum voltages: enter the cell's own table, or check the chemistry and the voltages.");
        return [.. errors.Except(rows), new ValidationError(OcvCurvePath, message)];
    }

    /// <summary>Maps a request; returns null with the errors when a required member is missing or a member is unknown.</summary>
    public static DesignInput? TryMap(EvaluateRequest request, out IReadOnlyList<ValidationError> errors)
    {
        var e = new Collector();
        e.Unknown(string.Empty, request.UnknownFields);
        var cell = MapCell(request.Cell, e);
        var series = e.Need("series", request.Series);
        var parallel = e.Need("parallel", request.Parallel);
        var links = e.Need("linkResistanceMilliohm", request.LinkResistanceMilliohm);
        var balancing = e.Need("balancing", request.Balancing);
        var cable = e.Optional("cable", request.Cable, c => new CableInput(
            e.Need("cable.crossSectionMm2", c.CrossSectionMm2),
            e.Need("cable.lengthM", c.LengthM)));
        var window = e.Object("socWindow", request.SocWindow, w => new SocWindowInput(
            e.Need("socWindow.minPercent", w.MinPercent),
            e.Need("socWindow.maxPercent", w.MaxPercent)));
        var controller = e.Object("controller", request.Controller, c => MapController(c, e));
        var charger = e.Object("charger", request.Charger, c => MapCharger(c, e));
        var ambient = e.Object("ambient", request.Ambient, a => new AmbientInput(
            e.Need("ambient.minC", a.MinC),
            e.Need("ambient.maxC", a.MaxC)));
        var margins = e.Optional("margins", request.Margins, MapMargins);

        errors = e.Errors;
        if (e.Errors.Count > 0 || cell is null || window is null || controller is null || charger is null || ambient is null)
        {
            return null;
        }

        return new DesignInput
        {
            Cell = cell,
            Series = series,
            Parallel = parallel,
            LinkResistanceMilliohm = links,
            Cable = cable,
            Balancing = balancing,
            SocWindow = window,
            Controller = controller,
            Charger = charger,
            Ambient = ambient,
            Margins = margins,
        };
    }

    /// <summary>
    /// Maps a cell datasheet alone (for the cell library); returns null with the errors (keyed <c>cell.*</c>, as
    /// Core keys them) when the chemistry is missing, a table row is incomplete or a member is unknown.
    /// </summary>
    public static CellInput? TryMapCell(CellRequest request, out IReadOnlyList<ValidationError> errors)
    {
        var e = new Collector();
        var cell = MapCell(request, e);
        errors = e.Errors;
        return e.Errors.Count == 0 ? cell : null;
    }

    /// <summary>The request that describes <paramref name="design"/> (every cell figure as given, margins only when set).</summary>
    public static EvaluateRequest ToRequest(DesignInput design)
    {
        var m = design.Margins;
        return new EvaluateRequest
        {
            Cell = ToCellRequest(design.Cell),
            Series = design.Series,
            Parallel = design.Parallel,
            LinkResistanceMilliohm = design.LinkResistanceMilliohm,
            Cable = design.Cable is { } cable ? new CableRequest { CrossSectionMm2 = cable.CrossSectionMm2, LengthM = cable.LengthM } : null,
            Balancing = design.Balancing,
            SocWindow = new SocWindowRequest { MinPercent = design.SocWindow.MinPercent, MaxPercent = design.SocWindow.MaxPercent },
            Controller = new ControllerRequest
            {
                MinVoltage = design.Controller.MinVoltage,
                MaxVoltage = design.Controller.MaxVoltage,
                ContinuousCurrentA = design.Controller.ContinuousCurrentA,
                PeakCurrentA = design.Controller.PeakCurrentA,
                PeakDurationS = design.Controller.PeakDurationS,
                RegenCurrentA = design.Controller.RegenCurrentA,
                DcLinkCapacitanceMicrofarad = design.Controller.DcLinkCapacitanceMicrofarad,
                PrechargeTimeS = design.Controller.PrechargeTimeS,
            },
            Charger = new ChargerRequest
            {
                MaxVoltage = design.Charger.MaxVoltage,
                MaxCurrentA = design.Charger.MaxCurrentA,
                VoltageStepV = design.Charger.VoltageStepV,
                FloatStage = design.Charger.FloatStage,
                TargetCellVoltage = design.Charger.TargetCellVoltage,
            },
            Ambient = new AmbientRequest { MinC = design.Ambient.MinC, MaxC = design.Ambient.MaxC },
            Margins = m is null ? null : new MarginsRequest
            {
                OverVoltageTripBelowMaxV = m.OverVoltageTripBelowMaxV,
                OverVoltageHysteresisV = m.OverVoltageHysteresisV,
                UnderVoltageTripAboveMinV = m.UnderVoltageTripAboveMinV,
                UnderVoltageHysteresisV = m.UnderVoltageHysteresisV,
                TemperatureMarginC = m.TemperatureMarginC,
                TemperatureHysteresisC = m.TemperatureHysteresisC,
                ChargeCurrentMarginPercent = m.ChargeCurrentMarginPercent,
                ShortCircuitTripFactor = m.ShortCircuitTripFactor,
                OverVoltageDelayS = m.OverVoltageDelayS,
                UnderVoltageDelayS = m.UnderVoltageDelayS,
                ChargeOverCurrentDelayS = m.ChargeOverCurrentDelayS,
                ShortCircuitDelayMicroseconds = m.ShortCircuitDelayMicroseconds,
            },
        };
    }

    /// <summary>The request that describes a cell datasheet, every figure as given.</summary>
    public static CellRequest ToCellRequest(CellInput c)
    {
        ArgumentNullException.ThrowIfNull(c);
        return new CellRequest
        {
            Chemistry = c.Chemistry,
            CapacityAh = c.CapacityAh,
            NominalVoltage = c.NominalVoltage,
            MaxChargeVoltage = c.MaxChargeVoltage,
            MinDischargeVoltage = c.MinDischargeVoltage,
            MaxChargeCurrentA = c.MaxChargeCurrentA,
            MaxDischargeCurrentA = c.MaxDischargeCurrentA,
            PeakDischargeCurrentA = c.PeakDischargeCurrentA,
            PeakDischargeDurationS = c.PeakDischargeDurationS,
            InternalResistanceMilliohm = c.InternalResistanceMilliohm,
            ColdInternalResistanceMilliohm = c.ColdInternalResistanceMilliohm,
            ColdResistanceTemperatureC = c.ColdResistanceTemperatureC,
            MassKg = c.MassKg,
            CapacityTolerancePercent = c.CapacityTolerancePercent,
            ChargeTemperatureMinC = c.ChargeTemperatureMinC,
            ChargeTemperatureMaxC = c.ChargeTemperatureMaxC,
            DischargeTemperatureMinC = c.DischargeTemperatureMinC,
            DischargeTemperatureMaxC = c.DischargeTemperatureMaxC,
            TerminationCurrentA = c.TerminationCurrentA,
            OcvCurve = c.OcvCurve?.Select(p => new OcvPointRequest { SocPercent = p.SocPercent, Voltage = p.Voltage }).ToList(),
        };
    }

    private static CellInput? MapCell(CellRequest? c, Collector e)
    {
        if (c is null)
        {
            e.Add("cell", RequiredMessage);
            return null;
        }

        e.Unknown("cell.", c.UnknownFields);
        var chemistry = e.Need("cell.chemistry", c.Chemistry);
        return new CellInput
        {
            Chemistry = chemistry,
            CapacityAh = c.CapacityAh,
            NominalVoltage = c.NominalVoltage,
            MaxChargeVoltage = c.MaxChargeVoltage,
            MinDischargeVoltage = c.MinDischargeVoltage,
            MaxChargeCurrentA = c.MaxChargeCurrentA,
            MaxDischargeCurrentA = c.MaxDischargeCurrentA,
            PeakDischargeCurrentA = c.PeakDischargeCurrentA,
            PeakDischargeDurationS = c.PeakDischargeDurationS,
            InternalResistanceMilliohm = c.InternalResistanceMilliohm,
            ColdInternalResistanceMilliohm = c.ColdInternalResistanceMilliohm,
            ColdResistanceTemperatureC = c.ColdResistanceTemperatureC,
            MassKg = c.MassKg,
            CapacityTolerancePercent = c.CapacityTolerancePercent,
            ChargeTemperatureMinC = c.ChargeTemperatureMinC,
            ChargeTemperatureMaxC = c.ChargeTemperatureMaxC,
            DischargeTemperatureMinC = c.DischargeTemperatureMinC,
            DischargeTemperatureMaxC = c.DischargeTemperatureMaxC,
            TerminationCurrentA = c.TerminationCurrentA,
            OcvCurve = c.OcvCurve is null ? null : MapCurve(c.OcvCurve, e),
        };
    }

    private static List<OcvPoint> MapCurve(IReadOnlyList<OcvPointRequest?> rows, Collector e)
    {
        var points = new List<OcvPoint>(rows.Count);
        for (var i = 0; i < rows.Count; i++)
        {
            var path = FormattableString.Invariant($"cell.ocvCurve[{i}]");
            if (rows[i] is not { } row)
            {
                e.Add(path, FormattableString.Invariant($"Row {i + 1}: expected an object with socPercent and voltage."));
                continue;
            }

            e.Unknown(path + ".", row.UnknownFields);
            points.Add(new OcvPoint(e.Need(path + ".socPercent", row.SocPercent), e.Need(path + ".voltage", row.Voltage)));
        }

        return points;
    }

    private static ControllerInput MapController(ControllerRequest c, Collector e) => new(
        e.Need("controller.minVoltage", c.MinVoltage),
        e.Need("controller.maxVoltage", c.MaxVoltage),
        e.Need("controller.continuousCurrentA", c.ContinuousCurrentA),
        e.Need("controller.peakCurrentA", c.PeakCurrentA),
        e.Need("controller.peakDurationS", c.PeakDurationS),
        e.Need("controller.regenCurrentA", c.RegenCurrentA),
        e.Need("controller.dcLinkCapacitanceMicrofarad", c.DcLinkCapacitanceMicrofarad),
        e.Need("controller.prechargeTimeS", c.PrechargeTimeS));

    private static ChargerInput MapCharger(ChargerRequest c, Collector e) => new(
        e.Need("charger.maxVoltage", c.MaxVoltage),
        e.Need("charger.maxCurrentA", c.MaxCurrentA),
        e.Need("charger.voltageStepV", c.VoltageStepV),
        e.Need("charger.floatStage", c.FloatStage),
        c.TargetCellVoltage);

    private static MarginsInput MapMargins(MarginsRequest m)
    {
        var d = new MarginsInput();
        return new MarginsInput
        {
            OverVoltageTripBelowMaxV = m.OverVoltageTripBelowMaxV ?? d.OverVoltageTripBelowMaxV,
            OverVoltageHysteresisV = m.OverVoltageHysteresisV ?? d.OverVoltageHysteresisV,
            UnderVoltageTripAboveMinV = m.UnderVoltageTripAboveMinV ?? d.UnderVoltageTripAboveMinV,
            UnderVoltageHysteresisV = m.UnderVoltageHysteresisV ?? d.UnderVoltageHysteresisV,
            TemperatureMarginC = m.TemperatureMarginC ?? d.TemperatureMarginC,
            TemperatureHysteresisC = m.TemperatureHysteresisC ?? d.TemperatureHysteresisC,
            ChargeCurrentMarginPercent = m.ChargeCurrentMarginPercent ?? d.ChargeCurrentMarginPercent,
            ShortCircuitTripFactor = m.ShortCircuitTripFactor ?? d.ShortCircuitTripFactor,
            OverVoltageDelayS = m.OverVoltageDelayS ?? d.OverVoltageDelayS,
            UnderVoltageDelayS = m.UnderVoltageDelayS ?? d.UnderVoltageDelayS,
            ChargeOverCurrentDelayS = m.ChargeOverCurrentDelayS ?? d.ChargeOverCurrentDelayS,
            ShortCircuitDelayMicroseconds = m.ShortCircuitDelayMicroseconds ?? d.ShortCircuitDelayMicroseconds,
        };
    }

    /// <summary>Collects mapping errors in input order.</summary>
    private sealed class Collector
    {
        public List<ValidationError> Errors { get; } = [];

        public void Add(string field, string message) => Errors.Add(new ValidationError(field, message));

        public T Need<T>(string field, T? value)
            where T : struct
        {
            if (value is { } v)
            {
                return v;
            }

            Add(field, RequiredMessage);
            return default;
        }

        /// <summary>A required object: reported when missing; its unknown members are reported under its path.</summary>
        public TOut? Object<TIn, TOut>(string field, TIn? value, Func<TIn, TOut> map)
            where TIn : RequestObject
            where TOut : class
        {
            if (value is null)
            {
                Add(field, RequiredMessage);
                return null;
            }

            Unknown(field + ".", value.UnknownFields);
            return map(value);
        }

        public TOut? Optional<TIn, TOut>(string field, TIn? value, Func<TIn, TOut> map)
            where TIn : RequestObject
            where TOut : class
        {
            if (value is null)
            {
                return null;
            }

            Unknown(field + ".", value.UnknownFields);
            return map(value);
        }

        public void Unknown(string prefix, Dictionary<string, JsonElement>? members)
        {
            foreach (var name in members?.Keys ?? Enumerable.Empty<string>())
            {
                Add(prefix + name, UnknownMessage);
            }
        }
    }
}
