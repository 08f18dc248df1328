using System.Reflection;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Curves;
using PackDesigner.Data.Cells;
using PackDesigner.Web.Formatting;
using PackDesigner.Web.Pages.Designs;

namespace PackDesigner.Web.Pages.Cells;

/// <summary>One figure on the cell sheet: label, value with unit, and where the value comes from.</summary>
public sealed record CellSheetRow(string Label, string Value, string Origin, bool FromDatasheet);

/// <summary>
/// A library cell as read: every figure with its unit, the ones left blank with the chemistry's typical value (as
/// Core's <see cref="CellResolver"/> fills them in for a design), and the OCV table in use.
/// </summary>
public sealed record CellSheet(string Chemistry, IReadOnlyList<CellSheetRow> Figures, IReadOnlyList<OcvPoint> Curve, bool OwnCurve)
{
    private static readonly Dictionary<string, PropertyInfo> SpecProperties =
        typeof(CellSpec).GetProperties().ToDictionary(p => p.Name, StringComparer.Ordinal);

    public static CellSheet From(CellDetails cell)
    {
        ArgumentNullException.ThrowIfNull(cell);
        var input = cell.Figures;
        var spec = CellResolver.TryResolve(input, out _);
        var form = DesignFormMapper.FromCellRequest(Api.DesignRequestMapper.ToCellRequest(input));
        var chemistry = DesignFormChoices.Chemistries.FirstOrDefault(c => string.Equals(c.Value, form.Chemistry, StringComparison.Ordinal))?.Text
            ?? input.Chemistry.ToString();
        var rows = new List<CellSheetRow>();
        foreach (var figure in CellFigures.All)
        {
            var label = FormFieldPaths.ForFormKey($"{FormFieldPaths.Prefix}.{nameof(CellPageForm.Cell)}.{figure.Property}")!.Label;
            var entered = (string?)typeof(CellForm).GetProperty(figure.Property)!.GetValue(form);
            if (!string.IsNullOrEmpty(entered))
            {
                rows.Add(new CellSheetRow(label, WithUnit(entered, figure.Unit), "datasheet", true));
                continue;
            }

            var resolved = spec is null ? null : SpecProperties[figure.Property].GetValue(spec) as double?;
            var origin = spec?.Origins.GetValueOrDefault(Camel(figure.Property)) switch
            {
                FigureOrigin.Preset => "typical value of the chemistry (common practice)",
                FigureOrigin.Derived => "derived: capacity ÷ 20 (C/20)",
                _ => figure.Property == nameof(CellForm.ColdInternalResistanceMilliohm) ? "not given: estimated from the 25 °C value where needed" : "not given",
            };
            rows.Add(new CellSheetRow(label, resolved is { } v ? WithUnit(Numbers.ForInput(v), figure.Unit) : Numbers.Missing, origin, false));
        }

        var curve = input.OcvCurve ?? ChemistryPresets.For(input.Chemistry)?.OcvCurve ?? [];
        return new CellSheet(chemistry, rows, curve, input.OcvCurve is not null);
    }

    /// <summary>"3" and "± %" → "±3 %"; otherwise the value, a no-break space and the unit.</summary>
    private static string WithUnit(string value, string unit) =>
        unit.StartsWith("± ", StringComparison.Ordinal) ? "±" + value + "\u00a0" + unit[2..] : value + "\u00a0" + unit;

    private static string Camel(string name) => System.Text.Json.JsonNamingPolicy.CamelCase.ConvertName(name);
}
