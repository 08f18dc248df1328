using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Core.Spread;
using PackDesigner.Data.Designs;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>
/// <c>/designs/{id}/spread</c>: the cell-to-cell spread Monte Carlo of the design's latest revision, bottom- and
/// top-balanced on the same drawn cells. The settings come in the query string, so the form works without script.
/// </summary>
public sealed class SpreadModel(DesignStore store) : PageModel
{
    [BindProperty(SupportsGet = true)]
    public SpreadForm Input { get; set; } = new();

    public DesignDetails Design { get; private set; } = null!;

    public SpreadSheet? Sheet { get; private set; }

    /// <summary>Errors about the stored design itself (today's rules refuse it), shown above the form.</summary>
    public IReadOnlyList<string> DesignProblems { get; private set; } = [];

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct)
    {
        var design = await store.GetDesignAsync(id, ct);
        if (!design.IsOk)
        {
            return NotFound();
        }

        Design = design.Value!;
        ModelState.Clear();
        if (Input.TryMap(out var formErrors) is not { } settings)
        {
            formErrors.ToList().ForEach(e => ModelState.AddModelError(e.Field, e.Message));
            return Page();
        }

        var request = new SpreadRequest { Design = Design.LatestRevision.Input, Spread = settings };
        try
        {
            var outcome = SpreadMonteCarlo.Compare(request, ct);
            foreach (var e in outcome.Errors)
            {
                if (SpreadForm.FormKeyOf(e.Field) is { } key)
                {
                    ModelState.AddModelError(key, e.Message);
                }
            }

            DesignProblems = outcome.Errors.Where(e => SpreadForm.FormKeyOf(e.Field) is null).Select(e => $"{e.Field}: {e.Message}").ToList();
            Sheet = outcome.Result is { } comparison ? SpreadSheet.From(comparison, Design.LatestRevision.Input.Balancing) : null;
            return Page();
        }
        catch (OperationCanceledException) when (ct.IsCancellationRequested)
        {
            // The browser went away: nobody reads the answer, and it is not an error.
            return new EmptyResult();
        }
    }
}
