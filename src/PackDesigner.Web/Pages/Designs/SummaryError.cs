using Microsoft.AspNetCore.Mvc.ModelBinding;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>One line of the error summary at the top of the form, linking to its field.</summary>
public sealed record SummaryError(string Label, string? Anchor, string Message)
{
    /// <summary>Errors not tied to a field first, then in the order the fields appear on the form.</summary>
    public static IReadOnlyList<SummaryError> From(ModelStateDictionary state) => Build(state, [], [], "Design");

    /// <summary>As <see cref="From(ModelStateDictionary)"/>, with the page's own <paramref name="ownFields"/> before the design's.</summary>
    public static IReadOnlyList<SummaryError> From(ModelStateDictionary state, IEnumerable<FormField> ownFields) =>
        Build(state, [], ownFields, "Design");

    /// <summary>
    /// As <see cref="From(ModelStateDictionary)"/>, with the page's own fields (model-state key and label, for
    /// example a name above the cell figures) listed before the design form's.
    /// </summary>
    public static IReadOnlyList<SummaryError> From(ModelStateDictionary state, IReadOnlyList<(string Key, string Label)> leading, string generalLabel = "Design") =>
        Build(state, leading, [], generalLabel);

    private static List<SummaryError> Build(ModelStateDictionary state, IReadOnlyList<(string Key, string Label)> leading, IEnumerable<FormField> ownFields, string generalLabel)
    {
        ArgumentNullException.ThrowIfNull(state);
        var list = new List<SummaryError>();
        if (state.TryGetValue(string.Empty, out var general))
        {
            list.AddRange(general.Errors.Select(e => new SummaryError(generalLabel, null, e.ErrorMessage)));
        }

        foreach (var (key, label) in leading)
        {
            if (state.TryGetValue(key, out var entry))
            {
                list.AddRange(entry.Errors.Select(e => new SummaryError(label, ResultSheet.IdOf(key), e.ErrorMessage)));
            }
        }

        foreach (var field in ownFields.DistinctBy(f => f.FormKey).Concat(FormFieldPaths.All))
        {
            if (state.TryGetValue(field.FormKey, out var entry))
            {
                list.AddRange(entry.Errors.Select(e => new SummaryError($"{field.Section}: {field.Label}", ResultSheet.IdOf(field.FormKey), e.ErrorMessage)));
            }
        }

        return list;
    }
}
