using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Data.Cells;

namespace PackDesigner.Web.Pages.Cells;

/// <summary>The cell library, searched and paged in the database.</summary>
public sealed class IndexModel(CellLibrary cells) : PageModel
{
    public const int PageSize = 25;

    public string? Search { get; private set; }

    public IReadOnlyList<CellRow> Rows { get; private set; } = [];

    public Pager? Pager { get; private set; }

    public string? SavedMessage { get; private set; }

    public async Task OnGetAsync(string? q, int? page, CancellationToken ct)
    {
        Search = q?.Trim();
        var result = await cells.ListAsync(Search, page ?? 1, PageSize, ct);
        Rows = result.Items;
        Pager = new Pager(result.Page, result.PageCount, result.TotalCount, "/cells", Search);
        SavedMessage = TempData[CellFormPageModel.SavedMessageKey] as string;
    }
}
