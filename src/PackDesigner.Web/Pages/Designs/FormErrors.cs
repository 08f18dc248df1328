using Microsoft.AspNetCore.Mvc.ModelBinding;
using PackDesigner.Core.Validation;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>Puts field-keyed errors (API paths) into model state under the form's field names.</summary>
public static class FormErrors
{
    /// <summary>
    /// Adds each error beside its field: <paramref name="extra"/> maps keys of the page's own fields (for example
    /// <c>name</c> → <c>Design.Name</c>); the design's input fields are found by <see cref="FormFieldPaths"/>;
    /// anything else goes to the summary.
    /// </summary>
    public static void Add(ModelStateDictionary state, IEnumerable<ValidationError> errors, IReadOnlyDictionary<string, string>? extra = null)
    {
        foreach (var error in errors)
        {
            var key = extra is not null && extra.TryGetValue(error.Field, out var own) ? own
                : FormFieldPaths.ForApiPath(error.Field)?.FormKey ?? string.Empty;
            state.AddModelError(key, error.Message);
        }
    }

    /// <summary>True when a margin field has an error, so the folded margins section opens.</summary>
    public static bool MarginsOpen(ModelStateDictionary state) =>
        state.Any(e => e.Key.StartsWith(FormFieldPaths.Prefix + ".Margins.", StringComparison.Ordinal) && e.Value?.Errors.Count > 0);

    /// <summary>Drops the model-state entries of one part of the form (before it is filled anew, for example from a library cell).</summary>
    public static void Clear(ModelStateDictionary state, string prefix)
    {
        foreach (var key in state.Keys.Where(k => k.StartsWith(prefix, StringComparison.Ordinal)).ToList())
        {
            state.Remove(key);
        }
    }
}
