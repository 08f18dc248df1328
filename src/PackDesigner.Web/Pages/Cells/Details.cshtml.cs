using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Data.Cells;

namespace PackDesigner.Web.Pages.Cells;

/// <summary>A library cell: its figures (blank ones with the value a design takes), its OCV table, and the actions on it.</summary>
public sealed class DetailsModel(CellLibrary cells) : PageModel
{
    public CellDetails? Cell { get; private set; }

    public CellSheet? Sheet { get; private set; }

    public int LinkedDesigns { get; private set; }

    public string? SavedMessage { get; private set; }

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct)
    {
        var cell = await cells.GetAsync(id, ct);
        if (!cell.IsOk)
        {
            return NotFound();
        }

        Cell = cell.Value!;
        Sheet = CellSheet.From(Cell);
        LinkedDesigns = (await cells.CountLinkedDesignsAsync(id, ct)).Value;
        SavedMessage = TempData[CellFormPageModel.SavedMessageKey] as string;
        return Page();
    }

    /// <summary>Copies the cell and opens the copy for editing.</summary>
    public async Task<IActionResult> OnPostCloneAsync(int id, CancellationToken ct)
    {
        var copy = await cells.CloneAsync(id, null, ct);
        if (copy.Status == Data.Results.StoreStatus.NotFound)
        {
            return NotFound();
        }

        if (!copy.IsOk)
        {
            TempData[CellFormPageModel.SavedMessageKey] = "The cell could not be copied: " + string.Join(" ", copy.Errors.Select(e => e.Message));
            return RedirectToPage("/Cells/Details", new { id });
        }

        TempData[CellFormPageModel.SavedMessageKey] = "This is a copy of the cell; rename it and change what differs.";
        return RedirectToPage("/Cells/Edit", new { id = copy.Value!.Id });
    }
}
