using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Core.Demo;
using PackDesigner.Web.Api;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>The design form and its results. The form starts with the invented demo design.</summary>
public sealed class EvaluateModel : PageModel
{
    [BindProperty]
    public DesignForm Input { get; set; } = new();

    public ResultSheet? Sheet { get; private set; }

    public IReadOnlyList<SummaryError> Problems { get; private set; } = [];

    /// <summary>The margins start folded away, unless one of them needs correcting.</summary>
    public bool MarginsOpen => ModelState.Any(e => e.Key.StartsWith("Input.Margins.", StringComparison.Ordinal) && e.Value?.Errors.Count > 0);

    public void OnGet() => Input = DemoForm();

    public IActionResult OnPost()
    {
        var outcome = DesignFormMapper.Evaluate(Input);
        foreach (var error in outcome.Errors)
        {
            ModelState.AddModelError(FormFieldPaths.ForApiPath(error.Field)?.FormKey ?? string.Empty, error.Message);
        }

        Problems = SummaryError.From(ModelState);
        Sheet = ModelState.IsValid && outcome.Result is { } result ? ResultSheet.From(result) : null;
        return Page();
    }

    public static DesignForm DemoForm() => DesignFormMapper.FromRequest(DesignRequestMapper.ToRequest(DemoScenario.PickupConversion));
}
