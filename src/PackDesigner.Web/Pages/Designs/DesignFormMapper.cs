using System.Globalization;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Validation;
using PackDesigner.Web.Api;
using PackDesigner.Web.Formatting;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>What the form says: the Core input when it is complete and valid, and the evaluation outcome.</summary>
public sealed record FormReading(DesignInput? Input, EvaluationOutcome Outcome);

/// <summary>
/// Between the design form's text and the API contract: the page parses its fields (invariant culture) into an
/// <see cref="EvaluateRequest"/> and then shares the API's mapping and Core's evaluation.
/// </summary>
public static class DesignFormMapper
{
    public const int MaxOcvRows = 500;
    private const string OcvHeader = "socPercent,voltage";

    public static readonly IReadOnlyList<string> ChemistryNames = Names<Chemistry>();
    public static readonly IReadOnlyList<string> BalancingNames = Names<BalancingMethod>();

    /// <summary>
    /// Parses and evaluates the form. Every problem comes back keyed by API path: parse errors first, then the
    /// mapping's and Core's for the other fields. A result is given only when there is no error at all.
    /// </summary>
    public static EvaluationOutcome Evaluate(DesignForm form) => Read(form).Outcome;

    /// <summary>
    /// As <see cref="Evaluate"/>, and also the Core input the form describes (null unless the outcome has a result),
    /// for saving it.
    /// </summary>
    public static FormReading Read(DesignForm form)
    {
        var parser = new Parser();
        var request = parser.ToRequest(form);
        var outcome = DesignRequestMapper.Evaluate(request);
        if (parser.Errors.Count == 0)
        {
            return new FormReading(outcome.IsValid ? DesignRequestMapper.TryMap(request, out _) : null, outcome);
        }

        var parsed = parser.Errors.Select(e => e.Field).ToHashSet(StringComparer.Ordinal);
        var rest = outcome.Errors.Where(e => !parsed.Contains(e.Field) && !(parsed.Any(IsOcv) && IsOcv(e.Field)));
        return new FormReading(null, new EvaluationOutcome(null, [.. parser.Errors, .. rest]));
    }

    /// <summary>The form showing a saved Core input.</summary>
    public static DesignForm FromInput(DesignInput input) => FromRequest(DesignRequestMapper.ToRequest(input));

    /// <summary>
    /// Parses the figures of a cell form (invariant culture, blank = null) without its OCV table; parse errors are
    /// keyed by API path (<c>cell.capacityAh</c>).
    /// </summary>
    public static CellRequest ParseCell(CellForm form, out IReadOnlyList<ValidationError> errors)
    {
        var parser = new Parser();
        var request = parser.ParseCell(form, withTable: false);
        errors = parser.Errors;
        return request;
    }

    /// <summary>The form showing <paramref name="request"/>; margins left out of the request show their defaults.</summary>
    public static DesignForm FromRequest(EvaluateRequest request)
    {
        var m = request.Margins ?? new MarginsRequest();
        var d = new MarginsInput();
        return new DesignForm
        {
            Cell = FromCellRequest(request.Cell ?? new CellRequest()),
            Series = Numbers.ForInput(request.Series),
            Parallel = Numbers.ForInput(request.Parallel),
            LinkResistanceMilliohm = Numbers.ForInput(request.LinkResistanceMilliohm),
            Cable = new CableForm
            {
                CrossSectionMm2 = Numbers.ForInput(request.Cable?.CrossSectionMm2),
                LengthM = Numbers.ForInput(request.Cable?.LengthM),
            },
            Balancing = Name(request.Balancing),
            SocWindow = new SocWindowForm
            {
                MinPercent = Numbers.ForInput(request.SocWindow?.MinPercent),
                MaxPercent = Numbers.ForInput(request.SocWindow?.MaxPercent),
            },
            Controller = new ControllerForm
            {
                MinVoltage = Numbers.ForInput(request.Controller?.MinVoltage),
                MaxVoltage = Numbers.ForInput(request.Controller?.MaxVoltage),
                ContinuousCurrentA = Numbers.ForInput(request.Controller?.ContinuousCurrentA),
                PeakCurrentA = Numbers.ForInput(request.Controller?.PeakCurrentA),
                PeakDurationS = Numbers.ForInput(request.Controller?.PeakDurationS),
                RegenCurrentA = Numbers.ForInput(request.Controller?.RegenCurrentA),
                DcLinkCapacitanceMicrofarad = Numbers.ForInput(request.Controller?.DcLinkCapacitanceMicrofarad),
                PrechargeTimeS = Numbers.ForInput(request.Controller?.PrechargeTimeS),
            },
            Charger = new ChargerForm
            {
                MaxVoltage = Numbers.ForInput(request.Charger?.MaxVoltage),
                MaxCurrentA = Numbers.ForInput(request.Charger?.MaxCurrentA),
                VoltageStepV = Numbers.ForInput(request.Charger?.VoltageStepV),
                FloatStage = request.Charger?.FloatStage ?? false,
                TargetCellVoltage = Numbers.ForInput(request.Charger?.TargetCellVoltage),
            },
            Ambient = new AmbientForm
            {
                MinC = Numbers.ForInput(request.Ambient?.MinC),
                MaxC = Numbers.ForInput(request.Ambient?.MaxC),
            },
            Margins = new MarginsForm
            {
                OverVoltageTripBelowMaxV = Numbers.ForInput(m.OverVoltageTripBelowMaxV ?? d.OverVoltageTripBelowMaxV),
                OverVoltageHysteresisV = Numbers.ForInput(m.OverVoltageHysteresisV ?? d.OverVoltageHysteresisV),
                UnderVoltageTripAboveMinV = Numbers.ForInput(m.UnderVoltageTripAboveMinV ?? d.UnderVoltageTripAboveMinV),
                UnderVoltageHysteresisV = Numbers.ForInput(m.UnderVoltageHysteresisV ?? d.UnderVoltageHysteresisV),
                TemperatureMarginC = Numbers.ForInput(m.TemperatureMarginC ?? d.TemperatureMarginC),
                TemperatureHysteresisC = Numbers.ForInput(m.TemperatureHysteresisC ?? d.TemperatureHysteresisC),
                ChargeCurrentMarginPercent = Numbers.ForInput(m.ChargeCurrentMarginPercent ?? d.ChargeCurrentMarginPercent),
                ShortCircuitTripFactor = Numbers.ForInput(m.ShortCircuitTripFactor ?? d.ShortCircuitTripFactor),
                OverVoltageDelayS = Numbers.ForInput(m.OverVoltageDelayS ?? d.OverVoltageDelayS),
                UnderVoltageDelayS = Numbers.ForInput(m.UnderVoltageDelayS ?? d.UnderVoltageDelayS),
                ChargeOverCurrentDelayS = Numbers.ForInput(m.ChargeOverCurrentDelayS ?? d.ChargeOverCurrentDelayS),
                ShortCircuitDelayMicroseconds = Numbers.ForInput(m.ShortCircuitDelayMicroseconds ?? d.ShortCircuitDelayMicroseconds),
            },
        };
    }

    /// <summary>The cell part of the form showing <paramref name="c"/>.</summary>
    public static CellForm FromCellRequest(CellRequest c)
    {
        ArgumentNullException.ThrowIfNull(c);
        return new CellForm
        {
            Chemistry = Name(c.Chemistry),
            CapacityAh = Numbers.ForInput(c.CapacityAh),
            NominalVoltage = Numbers.ForInput(c.NominalVoltage),
            MaxChargeVoltage = Numbers.ForInput(c.MaxChargeVoltage),
            MinDischargeVoltage = Numbers.ForInput(c.MinDischargeVoltage),
            MaxChargeCurrentA = Numbers.ForInput(c.MaxChargeCurrentA),
            MaxDischargeCurrentA = Numbers.ForInput(c.MaxDischargeCurrentA),
            PeakDischargeCurrentA = Numbers.ForInput(c.PeakDischargeCurrentA),
            PeakDischargeDurationS = Numbers.ForInput(c.PeakDischargeDurationS),
            InternalResistanceMilliohm = Numbers.ForInput(c.InternalResistanceMilliohm),
            ColdInternalResistanceMilliohm = Numbers.ForInput(c.ColdInternalResistanceMilliohm),
            ColdResistanceTemperatureC = Numbers.ForInput(c.ColdResistanceTemperatureC),
            MassKg = Numbers.ForInput(c.MassKg),
            CapacityTolerancePercent = Numbers.ForInput(c.CapacityTolerancePercent),
            ChargeTemperatureMinC = Numbers.ForInput(c.ChargeTemperatureMinC),
            ChargeTemperatureMaxC = Numbers.ForInput(c.ChargeTemperatureMaxC),
            DischargeTemperatureMinC = Numbers.ForInput(c.DischargeTemperatureMinC),
            DischargeTemperatureMaxC = Numbers.ForInput(c.DischargeTemperatureMaxC),
            TerminationCurrentA = Numbers.ForInput(c.TerminationCurrentA),
            OcvTable = c.OcvCurve is null ? null : string.Join('\n',
                c.OcvCurve.Select(p => $"{Numbers.ForInput(p?.SocPercent)},{Numbers.ForInput(p?.Voltage)}")),
        };
    }

    private static bool IsOcv(string field) => field.StartsWith(FormFieldPaths.OcvApiPath, StringComparison.Ordinal);

    private static string? Name<T>(T? value)
        where T : struct, Enum => value is { } v ? Camel(v.ToString()) : null;

    private static string Camel(string name) => System.Text.Json.JsonNamingPolicy.CamelCase.ConvertName(name);

    private static string[] Names<T>()
        where T : struct, Enum => Enum.GetNames<T>().Select(Camel).ToArray();

    /// <summary>Parses the form's text; blank optional fields stay null (a blank cell figure takes the preset).</summary>
    private sealed class Parser
    {
        public List<ValidationError> Errors { get; } = [];

        public EvaluateRequest ToRequest(DesignForm f) => new()
        {
            Cell = ParseCell(f.Cell, withTable: true),
            Series = Integer("series", f.Series),
            Parallel = Integer("parallel", f.Parallel),
            LinkResistanceMilliohm = Number("linkResistanceMilliohm", f.LinkResistanceMilliohm),
            Cable = string.IsNullOrWhiteSpace(f.Cable.CrossSectionMm2) && string.IsNullOrWhiteSpace(f.Cable.LengthM) ? null : new CableRequest
            {
                CrossSectionMm2 = Number("cable.crossSectionMm2", f.Cable.CrossSectionMm2),
                LengthM = Number("cable.lengthM", f.Cable.LengthM),
            },
            Balancing = Choice<BalancingMethod>("balancing", f.Balancing, BalancingNames),
            SocWindow = new SocWindowRequest
            {
                MinPercent = Number("socWindow.minPercent", f.SocWindow.MinPercent),
                MaxPercent = Number("socWindow.maxPercent", f.SocWindow.MaxPercent),
            },
            Controller = new ControllerRequest
            {
                MinVoltage = Number("controller.minVoltage", f.Controller.MinVoltage),
                MaxVoltage = Number("controller.maxVoltage", f.Controller.MaxVoltage),
                ContinuousCurrentA = Number("controller.continuousCurrentA", f.Controller.ContinuousCurrentA),
                PeakCurrentA = Number("controller.peakCurrentA", f.Controller.PeakCurrentA),
                PeakDurationS = Number("controller.peakDurationS", f.Controller.PeakDurationS),
                RegenCurrentA = Number("controller.regenCurrentA", f.Controller.RegenCurrentA),
                DcLinkCapacitanceMicrofarad = Number("controller.dcLinkCapacitanceMicrofarad", f.Controller.DcLinkCapacitanceMicrofarad),
                PrechargeTimeS = Number("controller.prechargeTimeS", f.Controller.PrechargeTimeS),
            },
            Charger = new ChargerRequest
            {
                MaxVoltage = Number("charger.maxVoltage", f.Charger.MaxVoltage),
                MaxCurrentA = Number("charger.maxCurrentA", f.Charger.MaxCurrentA),
                VoltageStepV = Number("charger.voltageStepV", f.Charger.VoltageStepV),
                FloatStage = f.Charger.FloatStage,
                TargetCellVoltage = Number("charger.targetCellVoltage", f.Charger.TargetCellVoltage),
            },
            Ambient = new AmbientRequest
            {
                MinC = Number("ambient.minC", f.Ambient.MinC),
                MaxC = Number("ambient.maxC", f.Ambient.MaxC),
            },
            Margins = new MarginsRequest
            {
                OverVoltageTripBelowMaxV = Number("margins.overVoltageTripBelowMaxV", f.Margins.OverVoltageTripBelowMaxV),
                OverVoltageHysteresisV = Number("margins.overVoltageHysteresisV", f.Margins.OverVoltageHysteresisV),
                UnderVoltageTripAboveMinV = Number("margins.underVoltageTripAboveMinV", f.Margins.UnderVoltageTripAboveMinV),
                UnderVoltageHysteresisV = Number("margins.underVoltageHysteresisV", f.Margins.UnderVoltageHysteresisV),
                TemperatureMarginC = Number("margins.temperatureMarginC", f.Margins.TemperatureMarginC),
                TemperatureHysteresisC = Number("margins.temperatureHysteresisC", f.Margins.TemperatureHysteresisC),
                ChargeCurrentMarginPercent = Number("margins.chargeCurrentMarginPercent", f.Margins.ChargeCurrentMarginPercent),
                ShortCircuitTripFactor = Number("margins.shortCircuitTripFactor", f.Margins.ShortCircuitTripFactor),
                OverVoltageDelayS = Number("margins.overVoltageDelayS", f.Margins.OverVoltageDelayS),
                UnderVoltageDelayS = Number("margins.underVoltageDelayS", f.Margins.UnderVoltageDelayS),
                ChargeOverCurrentDelayS = Number("margins.chargeOverCurrentDelayS", f.Margins.ChargeOverCurrentDelayS),
                ShortCircuitDelayMicroseconds = Number("margins.shortCircuitDelayMicroseconds", f.Margins.ShortCircuitDelayMicroseconds),
            },
        };

        /// <summary>The cell's figures; the OCV table only when <paramref name="withTable"/> (the cell pages read it as CSV).</summary>
        public CellRequest ParseCell(CellForm c, bool withTable) => new()
        {
            Chemistry = Choice<Chemistry>("cell.chemistry", c.Chemistry, ChemistryNames),
            CapacityAh = Number("cell.capacityAh", c.CapacityAh),
            NominalVoltage = Number("cell.nominalVoltage", c.NominalVoltage),
            MaxChargeVoltage = Number("cell.maxChargeVoltage", c.MaxChargeVoltage),
            MinDischargeVoltage = Number("cell.minDischargeVoltage", c.MinDischargeVoltage),
            MaxChargeCurrentA = Number("cell.maxChargeCurrentA", c.MaxChargeCurrentA),
            MaxDischargeCurrentA = Number("cell.maxDischargeCurrentA", c.MaxDischargeCurrentA),
            PeakDischargeCurrentA = Number("cell.peakDischargeCurrentA", c.PeakDischargeCurrentA),
            PeakDischargeDurationS = Number("cell.peakDischargeDurationS", c.PeakDischargeDurationS),
            InternalResistanceMilliohm = Number("cell.internalResistanceMilliohm", c.InternalResistanceMilliohm),
            ColdInternalResistanceMilliohm = Number("cell.coldInternalResistanceMilliohm", c.ColdInternalResistanceMilliohm),
            ColdResistanceTemperatureC = Number("cell.coldResistanceTemperatureC", c.ColdResistanceTemperatureC),
            MassKg = Number("cell.massKg", c.MassKg),
            CapacityTolerancePercent = Number("cell.capacityTolerancePercent", c.CapacityTolerancePercent),
            ChargeTemperatureMinC = Number("cell.chargeTemperatureMinC", c.ChargeTemperatureMinC),
            ChargeTemperatureMaxC = Number("cell.chargeTemperatureMaxC", c.ChargeTemperatureMaxC),
            DischargeTemperatureMinC = Number("cell.dischargeTemperatureMinC", c.DischargeTemperatureMinC),
            DischargeTemperatureMaxC = Number("cell.dischargeTemperatureMaxC", c.DischargeTemperatureMaxC),
            TerminationCurrentA = Number("cell.terminationCurrentA", c.TerminationCurrentA),
            OcvCurve = withTable ? Table(c.OcvTable) : null,
        };

        private void Add(string field, string message) => Errors.Add(new ValidationError(field, message));

        private double? Number(string field, string? text)
        {
            if (string.IsNullOrWhiteSpace(text))
            {
                return null;
            }

            if (TryNumber(text, out var value))
            {
                return value;
            }

            Add(field, text.Contains(',', StringComparison.Ordinal) && TryNumber(text.Replace(',', '.'), out _)
                ? "Use a point as the decimal separator, for example 3.65 rather than 3,65."
                : "Enter a number, for example 3.65.");
            return null;
        }

        private int? Integer(string field, string? text)
        {
            if (string.IsNullOrWhiteSpace(text))
            {
                return null;
            }

            if (int.TryParse(text.Trim(), NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var value))
            {
                return value;
            }

            Add(field, "Enter a whole number, for example 16.");
            return null;
        }

        private T? Choice<T>(string field, string? text, IReadOnlyList<string> names)
            where T : struct, Enum
        {
            if (string.IsNullOrWhiteSpace(text))
            {
                return null;
            }

            var i = names.ToList().FindIndex(n => string.Equals(n, text.Trim(), StringComparison.OrdinalIgnoreCase));
            if (i >= 0)
            {
                return Enum.GetValues<T>()[i];
            }

            Add(field, "Choose one of: " + string.Join(", ", names) + ".");
            return null;
        }

        /// <summary>Rows "socPercent,voltage", one per line; blank lines and a header line are skipped.</summary>
        private List<OcvPointRequest?>? Table(string? text)
        {
            if (string.IsNullOrWhiteSpace(text))
            {
                return null;
            }

            var lines = text.Split('\n', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries)
                .Where(l => !string.Equals(l.Replace(" ", string.Empty, StringComparison.Ordinal), OcvHeader, StringComparison.OrdinalIgnoreCase))
                .ToList();
            if (lines.Count > MaxOcvRows)
            {
                Add(FormFieldPaths.OcvApiPath, FormattableString.Invariant($"The table may have at most {MaxOcvRows} rows."));
                return null;
            }

            var rows = new List<OcvPointRequest?>(lines.Count);
            for (var i = 0; i < lines.Count; i++)
            {
                var parts = lines[i].Split(',', StringSplitOptions.TrimEntries);
                if (parts.Length == 2 && TryNumber(parts[0], out var soc) && TryNumber(parts[1], out var volts))
                {
                    rows.Add(new OcvPointRequest { SocPercent = soc, Voltage = volts });
                    continue;
                }

                Add(FormattableString.Invariant($"{FormFieldPaths.OcvApiPath}[{i}]"), FormattableString.Invariant(
                    $"Row {i + 1}: expected two numbers as socPercent,voltage with a point for decimals, for example 50,3.30."));
            }

            return Errors.Any(e => IsOcv(e.Field)) ? null : rows;
        }

        private static bool TryNumber(string text, out double value) =>
            double.TryParse(text.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out value) && double.IsFinite(value);
    }
}
