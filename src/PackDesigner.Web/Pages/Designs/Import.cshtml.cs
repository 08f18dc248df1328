using System.ComponentModel.DataAnnotations;
using System.Globalization;
using System.Text;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using Microsoft.Extensions.Options;
using PackDesigner.Core.Validation;
using PackDesigner.Data.Designs;
using PackDesigner.Data.Results;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>Imports a design file (see <see cref="DesignExchange"/>), pasted or uploaded, as a new design.</summary>
public sealed class ImportModel(DesignStore store, IOptions<Microsoft.AspNetCore.Http.Json.JsonOptions> json) : PageModel
{
    [BindProperty]
    [Display(Name = "Design file (JSON)")]
    public string? Json { get; set; }

    [BindProperty]
    public IFormFile? Upload { get; set; }

    [BindProperty]
    [Display(Name = "Your name")]
    public string? SavedBy { get; set; }

    /// <summary>Problems with the file, keyed by their path in it.</summary>
    public IReadOnlyList<ValidationError> Errors { get; private set; } = [];

    public void OnGet() => SavedBy = SaverCookie.Read(Request);

    public async Task<IActionResult> OnPostAsync(CancellationToken ct)
    {
        if (Upload is { Length: > 0 } upload)
        {
            if (upload.Length > DesignExchange.MaxBytes)
            {
                return Refuse([new ValidationError("file", string.Create(CultureInfo.InvariantCulture,
                    $"The uploaded file is larger than {DesignExchange.MaxBytes / 1024} KiB; a design file is a few kilobytes."))]);
            }

            using var reader = new StreamReader(upload.OpenReadStream(), Encoding.UTF8);
            Json = await reader.ReadToEndAsync(ct);
        }

        var file = DesignExchange.Read(Json ?? string.Empty, json.Value.SerializerOptions);
        var errors = file.Errors.ToList();
        if (string.IsNullOrWhiteSpace(SavedBy))
        {
            errors.Add(new ValidationError("savedBy", "Enter your name or initials: the revision history shows who saved each revision."));
        }

        if (errors.Count > 0 || !file.IsValid)
        {
            return Refuse(errors);
        }

        var saved = await store.CreateDesignAsync(file.Name!, null, null, null, file.Input!, SavedBy!, "Imported from a design file.", ct);
        if (saved.Status == StoreStatus.Invalid)
        {
            return Refuse(saved.Errors.Select(e => e.Field is "name" or "createdBy" or "note" ? e : e with { Field = "input." + e.Field }).ToList());
        }

        if (!saved.IsOk)
        {
            return Refuse([new ValidationError("file", saved.Message ?? "The design could not be saved.")]);
        }

        SaverCookie.Write(Response, SavedBy!);
        var hash = saved.Value!.LatestRevision.InputSha256;
        TempData[DetailsModel.SavedMessageKey] = file.ExportedInputHash is null ? "Imported as a new design."
            : file.ExportedInputHash == hash ? "Imported as a new design. Its input hash matches the exported revision's, so the figures are exactly those exported."
            : "Imported as a new design. Its input hash differs from the one in the file: the input was changed after it was exported.";
        return Redirect(DesignRoutes.View(saved.Value.Id));
    }

    private PageResult Refuse(IReadOnlyList<ValidationError> errors)
    {
        Errors = errors;
        foreach (var e in errors.Where(e => e.Field == "savedBy"))
        {
            ModelState.AddModelError(nameof(SavedBy), e.Message);
        }

        return Page();
    }
}
