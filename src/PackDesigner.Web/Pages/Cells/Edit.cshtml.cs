using Microsoft.AspNetCore.Mvc;
using PackDesigner.Data.Cells;
using PackDesigner.Data.Results;

namespace PackDesigner.Web.Pages.Cells;

/// <summary>What another person saved meanwhile, beside the edit that was not saved.</summary>
public sealed record CellConflict(string Message, long StoredVersion, IReadOnlyList<FieldDifference> Differences);

/// <summary>
/// Edits a library cell at the version it was opened at. A stale version stores nothing: the page keeps the
/// person's input, shows what differs from the cell as saved now, and moves the form to that version so that
/// saving again deliberately replaces it.
/// </summary>
public sealed class EditModel(CellLibrary cells) : CellFormPageModel
{
    public int Id { get; private set; }

    public string StoredName { get; private set; } = string.Empty;

    public CellConflict? Conflict { get; private set; }

    public async Task<IActionResult> OnGetAsync(int id, CancellationToken ct)
    {
        var cell = await cells.GetAsync(id, ct);
        if (!cell.IsOk)
        {
            return NotFound();
        }

        (Id, StoredName) = (id, cell.Value!.Name);
        Input = CellFormMapper.FromDetails(cell.Value);
        return Page();
    }

    public async Task<IActionResult> OnPostPresetAsync(int id, CancellationToken ct)
    {
        await LoadNameAsync(id, ct);
        return FillPreset();
    }

    public async Task<IActionResult> OnPostPreviewAsync(int id, CancellationToken ct)
    {
        await LoadNameAsync(id, ct);
        return await PreviewOnlyAsync(ct);
    }

    public async Task<IActionResult> OnPostAsync(int id, CancellationToken ct)
    {
        await LoadNameAsync(id, ct);
        var check = await CheckAsync(ct);
        if (check?.Data is not { } data)
        {
            return Page();
        }

        var result = await cells.UpdateAsync(id, Input.Version, data, ct);
        switch (result.Status)
        {
            case StoreStatus.Ok:
                return SavedRedirect(result.Value!, "Your changes to the cell were saved.");
            case StoreStatus.Conflict when (await cells.GetAsync(id, ct)).Value is { } now:
                Conflict = new CellConflict(result.Message!, now.Version, CellFormMapper.Differences(CellFormMapper.FromDetails(now), Input));
                Input.Version = now.Version;
                return Page();
            case StoreStatus.Invalid:
                ShowErrors(result.Errors);
                return Page();
            default:
                ModelState.AddModelError(string.Empty, "This cell has been deleted from the library since you opened it; nothing was saved. Add it again as a new cell.");
                ShowErrors([]);
                return Page();
        }
    }

    /// <summary>The page's heading names the cell as stored (or as typed, when it has been deleted meanwhile).</summary>
    private async Task LoadNameAsync(int id, CancellationToken ct)
    {
        Id = id;
        StoredName = (await cells.GetAsync(id, ct)).Value?.Name ?? Input.Name ?? string.Empty;
    }
}
