using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Data.Cells;
using PackDesigner.Data.Results;

namespace PackDesigner.Web.Pages.Cells;

/// <summary>
/// Confirms and deletes a library cell at the version shown. Linked designs keep their own figures (the library
/// sets their link to none); a cell changed since the page was opened is not deleted.
/// </summary>
public sealed class DeleteModel(CellLibrary cells) : PageModel
{
    public int Id { get; private set; }

    public string Name { get; private set; } = string.Empty;

    public long Version { get; private set; }

    public int LinkedDesigns { get; private set; }

    public string? Message { get; private set; }

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct) =>
        await LoadAsync(id, ct) ? Page() : NotFound();

    public async Task<IActionResult> OnPostAsync(int id, long version, CancellationToken ct)
    {
        var result = await cells.DeleteAsync(id, version, ct);
        if (result.Status is StoreStatus.Ok or StoreStatus.NotFound)
        {
            TempData[CellFormPageModel.SavedMessageKey] = result.IsOk ? "The cell was deleted from the library." : "The cell had already been deleted.";
            return RedirectToPage("/Cells/Index");
        }

        if (!await LoadAsync(id, ct))
        {
            return RedirectToPage("/Cells/Index");
        }

        Message = "The cell was changed after you opened this page, so it was not deleted. Check it below and confirm again.";
        return Page();
    }

    private async Task<bool> LoadAsync(int id, CancellationToken ct)
    {
        var cell = await cells.GetAsync(id, ct);
        if (!cell.IsOk)
        {
            return false;
        }

        (Id, Name, Version) = (id, cell.Value!.Name, cell.Value.Version);
        LinkedDesigns = (await cells.CountLinkedDesignsAsync(id, ct)).Value;
        return true;
    }
}
