using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Data.Designs;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>Two revisions side by side: <c>/designs/{id}/compare?a=1&amp;b=2</c> (default: the latest and the one before).</summary>
public sealed class CompareModel(DesignStore store) : PageModel
{
    public DesignDetails Design { get; private set; } = null!;

    public RevisionDetails A { get; private set; } = null!;

    public RevisionDetails B { get; private set; } = null!;

    public IReadOnlyList<RevisionSummary> Revisions { get; private set; } = [];

    public RevisionComparison Comparison { get; private set; } = null!;

    public async Task<IActionResult> OnGetAsync(int id, int? a, int? b, CancellationToken ct)
    {
        var design = await store.GetDesignAsync(id, ct);
        if (!design.IsOk)
        {
            return NotFound();
        }

        Design = design.Value!;
        var right = b ?? Design.LatestRevisionNumber;
        var left = a ?? Math.Max(1, right - 1);
        var ra = await store.GetRevisionAsync(id, left, ct);
        var rb = await store.GetRevisionAsync(id, right, ct);
        if (!ra.IsOk || !rb.IsOk)
        {
            return NotFound();
        }

        (A, B) = (ra.Value!, rb.Value!);
        Revisions = (await store.GetRevisionsAsync(id, ct)).Value ?? [];
        Comparison = RevisionComparer.Compare(A.InputJson, B.InputJson, A.ResultJson, B.ResultJson);
        return Page();
    }
}
