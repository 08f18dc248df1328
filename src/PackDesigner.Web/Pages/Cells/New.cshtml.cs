using Microsoft.AspNetCore.Mvc;
using PackDesigner.Data.Cells;

namespace PackDesigner.Web.Pages.Cells;

/// <summary>A new library cell, started from a chemistry preset (<c>?preset=nmc</c>, LFP by default).</summary>
public sealed class NewModel(CellLibrary cells) : CellFormPageModel
{
    public void OnGet(string? preset) => Input = CellFormMapper.FromPreset(CellFormMapper.ChemistryOf(preset));

    public IActionResult OnPostPreset() => FillPreset();

    public Task<IActionResult> OnPostPreviewAsync(CancellationToken ct) => PreviewOnlyAsync(ct);

    public async Task<IActionResult> OnPostAsync(CancellationToken ct)
    {
        var check = await CheckAsync(ct);
        if (check?.Data is not { } data)
        {
            return Page();
        }

        var result = await cells.CreateAsync(data, ct);
        if (result.IsOk)
        {
            return SavedRedirect(result.Value!, "The cell was added to the library.");
        }

        ShowErrors(result.Errors);
        return Page();
    }
}
