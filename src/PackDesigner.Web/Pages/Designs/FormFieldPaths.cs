using System.ComponentModel.DataAnnotations;
using System.Reflection;
using System.Text.Json;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>One field of the design form: its API path, its form name (model-state key) and its label.</summary>
public sealed record FormField(string ApiPath, string FormKey, string Label, string Section);

/// <summary>
/// Links the API's field paths (<c>controller.maxVoltage</c>, <c>cell.ocvCurve[3].voltage</c>) to the form's
/// field names (<c>Input.Controller.MaxVoltage</c>, <c>Input.Cell.OcvTable</c>) and labels, from the
/// <see cref="DesignForm"/> properties and their <see cref="DisplayAttribute"/>s.
/// </summary>
public static class FormFieldPaths
{
    public const string Prefix = "Input";
    public const string OcvApiPath = "cell.ocvCurve";

    private static readonly Dictionary<string, FormField> ByApiPath = Build();
    private static readonly Dictionary<string, FormField> ByFormKey = ByApiPath.Values.ToDictionary(f => f.FormKey, StringComparer.Ordinal);

    public static IReadOnlyCollection<FormField> All => ByApiPath.Values;

    /// <summary>The form field an API path belongs to; every row of the OCV table belongs to the table's text area.</summary>
    public static FormField? ForApiPath(string apiPath)
    {
        if (ByApiPath.TryGetValue(apiPath, out var field))
        {
            return field;
        }

        return apiPath.StartsWith(OcvApiPath, StringComparison.Ordinal) ? ByApiPath[OcvApiPath] : null;
    }

    public static FormField? ForFormKey(string formKey) => ByFormKey.GetValueOrDefault(formKey);

    private static Dictionary<string, FormField> Build()
    {
        var fields = new Dictionary<string, FormField>(StringComparer.Ordinal);
        foreach (var p in typeof(DesignForm).GetProperties())
        {
            var name = Display(p);
            if (p.PropertyType == typeof(string) || p.PropertyType == typeof(bool))
            {
                Add(fields, Camel(p.Name), $"{Prefix}.{p.Name}", name, "Configuration");
                continue;
            }

            foreach (var q in p.PropertyType.GetProperties())
            {
                var api = q.Name == nameof(CellForm.OcvTable) ? OcvApiPath : $"{Camel(p.Name)}.{Camel(q.Name)}";
                Add(fields, api, $"{Prefix}.{p.Name}.{q.Name}", Display(q), name);
            }
        }

        return fields;
    }

    private static void Add(Dictionary<string, FormField> fields, string api, string key, string label, string section) =>
        fields.Add(api, new FormField(api, key, label, section));

    private static string Display(PropertyInfo p) => p.GetCustomAttribute<DisplayAttribute>()?.Name ?? p.Name;

    private static string Camel(string name) => JsonNamingPolicy.CamelCase.ConvertName(name);
}
