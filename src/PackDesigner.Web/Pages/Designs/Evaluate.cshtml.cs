using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Core.Demo;
using PackDesigner.Web.Api;
using PackDesigner.Web.Storage;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>The design form and its results. The form starts with the invented demo design.</summary>
[StorageFree]
public sealed class EvaluateModel : PageModel, IDesignFormHost
{
    [BindProperty]
    public DesignForm Input { get; set; } = new();

    public ResultSheet? Sheet { get; private set; }

    public IReadOnlyList<SummaryError> Problems { get; private set; } = [];

    /// <summary>The margins start folded away, unless one of them needs correcting.</summary>
    public bool MarginsOpen => FormErrors.MarginsOpen(ModelState);

    public void OnGet() => Input = DemoForm();

    public IActionResult OnPost()
    {
        var outcome = DesignFormMapper.Evaluate(Input);
        FormErrors.Add(ModelState, outcome.Errors);
        Problems = SummaryError.From(ModelState);
        Sheet = ModelState.IsValid && outcome.Result is { } result ? ResultSheet.From(result) : null;
        return Page();
    }

    public static DesignForm DemoForm() => DesignFormMapper.FromRequest(DesignRequestMapper.ToRequest(DemoScenario.PickupConversion));
}
