using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Core.Validation;
using PackDesigner.Data.Cells;
using PackDesigner.Web.Pages.Designs;

namespace PackDesigner.Web.Pages.Cells;

/// <summary>
/// What the new-cell and edit-cell pages share: the form, the uploaded OCV file, the table preview, and turning
/// the check's and the library's errors into messages beside their fields. Nothing is saved unless the whole
/// form is valid and the OCV table's preview has been shown.
/// </summary>
public abstract class CellFormPageModel : PageModel
{
    /// <summary>TempData key of the message shown after a save.</summary>
    public const string SavedMessageKey = "CellSaved";

    [BindProperty]
    public CellPageForm Input { get; set; } = new();

    /// <summary>An OCV table as a CSV file; it replaces the text area's table and is previewed before it is saved.</summary>
    [BindProperty]
    public IFormFile? OcvFile { get; set; }

    public OcvTablePreview? Preview { get; private set; }

    public IReadOnlyList<SummaryError> Problems { get; private set; } = [];

    /// <summary>Why the preview is shown instead of saving, when it is.</summary>
    public string? PreviewNote { get; private set; }

    /// <summary>Reads an uploaded file into the form's table and checks the form; false when the file could not be read.</summary>
    protected async Task<CellFormCheck?> CheckAsync(CancellationToken ct)
    {
        ModelState.Clear();
        if (OcvFile is { FileName.Length: > 0 } file)
        {
            await using var stream = file.OpenReadStream();
            var (text, error) = await OcvTablePreview.ReadUploadAsync(stream, ct);
            if (text is null)
            {
                ShowErrors([new ValidationError(FormFieldPaths.OcvApiPath, $"The file {file.FileName} was not used: {error}")]);
                return null;
            }

            Input.Cell.OcvTable = text;
        }

        var check = CellFormMapper.Check(Input);
        Preview = check.Preview;
        if (Preview is not null)
        {
            Input.OcvPreviewed = Preview.Fingerprint;
        }

        if (check.NeedsPreview)
        {
            PreviewNote = "Nothing is saved yet: check the OCV table below, then save again.";
        }

        ShowErrors(check.Errors);
        return check;
    }

    /// <summary>Shows the preview only (the Preview button): nothing is saved.</summary>
    protected async Task<IActionResult> PreviewOnlyAsync(CancellationToken ct)
    {
        var check = await CheckAsync(ct);
        if (check?.Preview is null && ModelState.IsValid)
        {
            PreviewNote = "There is no OCV table to preview: paste rows into the box or choose a CSV file. A blank table uses the chemistry's typical curve.";
        }

        return Page();
    }

    /// <summary>The form with the chosen chemistry's typical figures (the "Fill in typical figures" button).</summary>
    protected IActionResult FillPreset()
    {
        ModelState.Clear();
        Input = CellFormMapper.WithPreset(Input, CellFormMapper.ChemistryOf(Input.Cell.Chemistry));
        return Page();
    }

    protected void ShowErrors(IEnumerable<ValidationError> errors)
    {
        foreach (var e in errors)
        {
            ModelState.AddModelError(CellFormMapper.FormKeyOf(e.Field), e.Message);
        }

        Problems = SummaryError.From(ModelState, NameLabels, "Cell");
        ViewData["SummaryNote"] = "Nothing was saved. Each message is also shown beside its field.";
    }

    protected IActionResult SavedRedirect(CellDetails cell, string message)
    {
        TempData[SavedMessageKey] = message;
        return RedirectToPage("/Cells/Details", new { id = cell.Id });
    }

    private static readonly IReadOnlyList<(string Key, string Label)> NameLabels =
    [
        ("Input.Name", "Name"), ("Input.Maker", "Maker"), ("Input.Model", "Model"), ("Input.Notes", "Notes"),
    ];
}
