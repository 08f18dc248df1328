using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Core.Finder;

namespace PackDesigner.Web.Pages.Finder;

/// <summary>
/// <c>/finder</c>: every S×P of a cell that fits the controller, charger and targets, each row opening a new
/// design, and why the other S and P do not fit. The form is a GET, so it works without script and can be linked.
/// </summary>
public sealed class IndexModel : PageModel
{
    public const string Route = "/finder";

    [BindProperty(SupportsGet = true)]
    public FinderForm Input { get; set; } = new();

    public IReadOnlyList<FinderRow> Rows { get; private set; } = [];

    public ConfigurationResult? Result { get; private set; }

    /// <summary>Errors the form has no field for (shown above the form).</summary>
    public IReadOnlyList<string> OtherProblems { get; private set; } = [];

    public IActionResult OnGet(CancellationToken ct)
    {
        ModelState.Clear();
        if (Request.Query.Count == 0)
        {
            return Page();
        }

        try
        {
            var request = Input.TryMap(out var errors);
            var outcome = request is null ? null : ConfigurationFinder.Find(request, ct);
            var all = request is null ? errors : outcome!.Errors;
            foreach (var e in all.Where(e => FinderForm.FormKeyOf(e.Field) is not null))
            {
                ModelState.AddModelError(FinderForm.FormKeyOf(e.Field)!, e.Message);
            }

            OtherProblems = all.Where(e => FinderForm.FormKeyOf(e.Field) is null).Select(e => $"{e.Field}: {e.Message}").ToList();
            Result = outcome?.Result;
            Rows = Result?.Candidates.Select(FinderRow.From).ToList() ?? [];
            return Page();
        }
        catch (OperationCanceledException) when (ct.IsCancellationRequested)
        {
            return new EmptyResult();
        }
    }
}
