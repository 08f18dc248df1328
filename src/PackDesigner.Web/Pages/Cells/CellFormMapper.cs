using System.Globalization;
using System.Reflection;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Validation;
using PackDesigner.Data.Cells;
using PackDesigner.Web.Api;
using PackDesigner.Web.Formatting;
using PackDesigner.Web.Pages.Designs;

namespace PackDesigner.Web.Pages.Cells;

/// <summary>What checking a cell form found: the data to save, or the errors; and the OCV table's preview, if any.</summary>
public sealed record CellFormCheck(CellData? Data, IReadOnlyList<ValidationError> Errors, OcvTablePreview? Preview)
{
    /// <summary>The table was changed since its last preview: it is shown first and nothing is saved.</summary>
    public bool NeedsPreview { get; init; }
}

/// <summary>One figure or name that differs between the stored cell and a person's unsaved edit.</summary>
public sealed record FieldDifference(string Label, string Stored, string Yours);

/// <summary>Between the cell form's text and the cell library: parsing, presets, stored cells and error keys.</summary>
public static class CellFormMapper
{
    public const string NameField = "name";

    private static readonly PropertyInfo[] FigureProperties = typeof(CellForm).GetProperties()
        .Where(p => p.PropertyType == typeof(string))
        .ToArray();

    /// <summary>An empty form with every figure of <paramref name="chemistry"/>'s preset filled in (none for custom).</summary>
    public static CellPageForm FromPreset(Chemistry chemistry) => WithPreset(new CellPageForm(), chemistry);

    /// <summary>The form with its figures replaced by the preset's; names, notes, version and OCV table kept.</summary>
    public static CellPageForm WithPreset(CellPageForm form, Chemistry chemistry)
    {
        ArgumentNullException.ThrowIfNull(form);
        var p = ChemistryPresets.For(chemistry);
        var figures = p is null ? new CellInput { Chemistry = chemistry } : new CellInput
        {
            Chemistry = chemistry,
            CapacityAh = p.CapacityAh,
            NominalVoltage = p.NominalVoltage,
            MaxChargeVoltage = p.MaxChargeVoltage,
            MinDischargeVoltage = p.MinDischargeVoltage,
            MaxChargeCurrentA = p.MaxChargeCurrentA,
            MaxDischargeCurrentA = p.MaxDischargeCurrentA,
            PeakDischargeCurrentA = p.PeakDischargeCurrentA,
            PeakDischargeDurationS = p.PeakDischargeDurationS,
            InternalResistanceMilliohm = p.InternalResistanceMilliohm,
            MassKg = p.MassKg,
            CapacityTolerancePercent = p.CapacityTolerancePercent,
            ChargeTemperatureMinC = p.ChargeTemperatureMinC,
            ChargeTemperatureMaxC = p.ChargeTemperatureMaxC,
            DischargeTemperatureMinC = p.DischargeTemperatureMinC,
            DischargeTemperatureMaxC = p.DischargeTemperatureMaxC,
        };
        var cell = DesignFormMapper.FromCellRequest(DesignRequestMapper.ToCellRequest(figures));
        cell.OcvTable = form.Cell.OcvTable;
        form.Cell = cell;
        return form;
    }

    /// <summary>The form showing a stored cell; its own OCV table as CSV text, already previewed.</summary>
    public static CellPageForm FromDetails(CellDetails d)
    {
        ArgumentNullException.ThrowIfNull(d);
        var cell = DesignFormMapper.FromCellRequest(DesignRequestMapper.ToCellRequest(d.Figures with { OcvCurve = null }));
        cell.OcvTable = d.Figures.OcvCurve is { } curve ? OcvCsv.Write(curve) : null;
        return new CellPageForm
        {
            Name = d.Name,
            Maker = d.Maker,
            Model = d.Model,
            Notes = d.Notes,
            Cell = cell,
            OcvPreviewed = cell.OcvTable is null ? null : OcvTablePreview.FingerprintOf(cell.OcvTable),
            Version = d.Version,
        };
    }

    /// <summary>The chemistry the form names, or LFP when it names none the app knows.</summary>
    public static Chemistry ChemistryOf(string? text) =>
        Enum.TryParse<Chemistry>(text?.Trim(), ignoreCase: true, out var c) && Enum.IsDefined(c) ? c : Chemistry.Lfp;

    /// <summary>
    /// Parses the form and checks it as the library will (Core's figure rules and the table against the cell), so
    /// that every problem shows at once and nothing is half-saved. A table whose preview was not shown yet is
    /// previewed instead of saved.
    /// </summary>
    public static CellFormCheck Check(CellPageForm form)
    {
        ArgumentNullException.ThrowIfNull(form);
        var errors = new List<ValidationError>();
        if (string.IsNullOrWhiteSpace(form.Name))
        {
            errors.Add(new ValidationError(NameField, "Enter a name for the cell."));
        }

        var request = DesignFormMapper.ParseCell(form.Cell, out var parseErrors);
        errors.AddRange(parseErrors);
        var preview = string.IsNullOrWhiteSpace(form.Cell.OcvTable) ? null : OcvTablePreview.Parse(form.Cell.OcvTable);
        if (preview is { IsValid: true })
        {
            request = request with { OcvCurve = preview.Points.Select(p => new OcvPointRequest { SocPercent = p.SocPercent, Voltage = p.Voltage }).ToList() };
        }

        CellInput? figures = null;
        if (parseErrors.Count == 0 && (preview is null || preview.IsValid))
        {
            figures = DesignRequestMapper.TryMapCell(request, out var mapErrors);
            errors.AddRange(mapErrors);
            if (figures is not null)
            {
                CellResolver.TryResolve(figures, out var coreErrors);
                var explained = DesignRequestMapper.ExplainPresetCurve(request, coreErrors);
                var rowErrors = explained.Where(e => preview is not null && e.Field.StartsWith(FormFieldPaths.OcvApiPath + "[", StringComparison.Ordinal)).ToList();
                preview = preview?.WithCellErrors(rowErrors);
                errors.AddRange(explained.Except(rowErrors));
            }
        }

        if (preview is { IsValid: false })
        {
            errors.Add(new ValidationError(FormFieldPaths.OcvApiPath, PreviewSummary(preview)));
        }

        var needsPreview = preview is not null && preview.Fingerprint != form.OcvPreviewed;
        var data = errors.Count == 0 && !needsPreview && figures is not null
            ? new CellData(form.Name!, figures, form.Maker, form.Model, form.Notes)
            : null;
        return new CellFormCheck(data, errors, preview) { NeedsPreview = needsPreview && errors.Count == 0 };
    }

    /// <summary>The model-state key of a library or Core error: <c>cell.capacityAh</c> → <c>Input.Cell.CapacityAh</c>; <c>name</c> → <c>Input.Name</c>.</summary>
    public static string FormKeyOf(string field)
    {
        ArgumentNullException.ThrowIfNull(field);
        if (FormFieldPaths.ForApiPath(field) is { } cellField)
        {
            return cellField.FormKey;
        }

        return field switch
        {
            CellLibrary.OcvCsvField => FormFieldPaths.ForApiPath(FormFieldPaths.OcvApiPath)!.FormKey,
            "name" or "maker" or "model" or "notes" => FormFieldPaths.Prefix + "." + char.ToUpperInvariant(field[0]) + field[1..],
            _ => string.Empty,
        };
    }

    /// <summary>The names and figures whose stored value differs from the person's (numbers compared as numbers).</summary>
    public static IReadOnlyList<FieldDifference> Differences(CellPageForm stored, CellPageForm yours)
    {
        ArgumentNullException.ThrowIfNull(stored);
        ArgumentNullException.ThrowIfNull(yours);
        var list = new List<FieldDifference>();
        void Compare(string label, string? a, string? b)
        {
            if (!SameText(a, b))
            {
                list.Add(new FieldDifference(label, Show(a), Show(b)));
            }
        }

        Compare("Name", stored.Name, yours.Name);
        Compare("Maker", stored.Maker, yours.Maker);
        Compare("Model", stored.Model, yours.Model);
        Compare("Notes", stored.Notes, yours.Notes);
        foreach (var p in FigureProperties)
        {
            var label = FormFieldPaths.ForFormKey($"{FormFieldPaths.Prefix}.{nameof(CellPageForm.Cell)}.{p.Name}")?.Label ?? p.Name;
            var a = (string?)p.GetValue(stored.Cell);
            var b = (string?)p.GetValue(yours.Cell);
            if (p.Name == nameof(CellForm.OcvTable))
            {
                if (OcvTablePreview.FingerprintOf(a) != OcvTablePreview.FingerprintOf(b))
                {
                    list.Add(new FieldDifference(label, RowCount(a), RowCount(b)));
                }

                continue;
            }

            Compare(label, a, b);
        }

        return list;
    }

    private static string PreviewSummary(OcvTablePreview preview) => preview.ErrorCount == 1
        ? "The OCV table has a problem; see the preview below."
        : string.Create(CultureInfo.InvariantCulture, $"The OCV table has {preview.ErrorCount} problems; see the preview below.");

    private static bool SameText(string? a, string? b)
    {
        a = a?.Trim() ?? string.Empty;
        b = b?.Trim() ?? string.Empty;
        if (double.TryParse(a, NumberStyles.Float, CultureInfo.InvariantCulture, out var x)
            && double.TryParse(b, NumberStyles.Float, CultureInfo.InvariantCulture, out var y))
        {
            return x.Equals(y);
        }

        return string.Equals(a, b, StringComparison.Ordinal);
    }

    private static string Show(string? text) => string.IsNullOrWhiteSpace(text) ? Numbers.Missing : text.Trim();

    private static string RowCount(string? table)
    {
        if (string.IsNullOrWhiteSpace(table))
        {
            return "none (typical curve)";
        }

        var rows = OcvTablePreview.Parse(table).Rows.Count;
        return string.Create(CultureInfo.InvariantCulture, $"{rows} row{(rows == 1 ? "" : "s")}");
    }
}
