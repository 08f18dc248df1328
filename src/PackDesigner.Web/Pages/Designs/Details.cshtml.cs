using System.Globalization;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Core.Evaluation;
using PackDesigner.Data.Designs;
using PackDesigner.Data.Json;
using PackDesigner.Data.Results;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>
/// A design: one revision's results (the latest, or <c>?revision=n</c>), its revision history, compare and export
/// links, and restoring an old revision as a new one. The results are Core's evaluation of the revision's stored
/// input; the page checks that they match the stored result and says so when the calculation rules have changed.
/// </summary>
public sealed class DetailsModel(DesignStore store) : PageModel
{
    public const string SavedMessageKey = "design-saved";

    public DesignDetails Design { get; private set; } = null!;

    public RevisionDetails Revision { get; private set; } = null!;

    public IReadOnlyList<RevisionSummary> Revisions { get; private set; } = [];

    /// <summary>Null only when today's rules refuse the stored input (then <see cref="RefusedBecause"/> says why).</summary>
    public ResultSheet? Sheet { get; private set; }

    public IReadOnlyList<string> RefusedBecause { get; private set; } = [];

    /// <summary>False when today's rules give another result than the stored one (the revision was saved under other rules).</summary>
    public bool ResultAsStored { get; private set; }

    public string? Saved { get; private set; }

    public string? RestoreProblem { get; private set; }

    [BindProperty]
    [System.ComponentModel.DataAnnotations.Display(Name = "Your name")]
    public string? SavedBy { get; set; }

    public async Task<IActionResult> OnGetAsync(int id, int? revision, CancellationToken ct)
    {
        SavedBy = SaverCookie.Read(Request);
        Saved = TempData[SavedMessageKey] as string;
        return await LoadAsync(id, revision, ct) ? Page() : NotFound();
    }

    /// <summary>Saves the input of revision <paramref name="revision"/> as a new revision, based on <paramref name="basedOn"/>.</summary>
    public async Task<IActionResult> OnPostRestoreAsync(int id, int revision, int basedOn, CancellationToken ct)
    {
        if (string.IsNullOrWhiteSpace(SavedBy))
        {
            ModelState.AddModelError(nameof(SavedBy), "Enter your name or initials: the revision history shows who saved each revision.");
            RestoreProblem = "Nothing was restored.";
            return await LoadAsync(id, revision, ct) ? Page() : NotFound();
        }

        var saved = await store.RestoreRevisionAsync(id, revision, basedOn, SavedBy, ct);
        switch (saved.Status)
        {
            case StoreStatus.Ok:
                SaverCookie.Write(Response, SavedBy);
                TempData[SavedMessageKey] = string.Create(CultureInfo.InvariantCulture,
                    $"Restored revision {revision} as revision {saved.Value!.LatestRevisionNumber}.");
                return Redirect(DesignRoutes.View(id));
            case StoreStatus.Conflict or StoreStatus.Invalid:
                RestoreProblem = saved.Message ?? string.Join(" ", saved.Errors.Select(e => e.Message));
                return await LoadAsync(id, revision, ct) ? Page() : NotFound();
            default:
                return NotFound();
        }
    }

    private async Task<bool> LoadAsync(int id, int? revision, CancellationToken ct)
    {
        var design = await store.GetDesignAsync(id, ct);
        if (!design.IsOk)
        {
            return false;
        }

        Design = design.Value!;
        var shown = revision is { } n && n != Design.LatestRevisionNumber ? await store.GetRevisionAsync(id, n, ct) : null;
        if (shown is { IsOk: false })
        {
            return false;
        }

        Revision = shown?.Value ?? Design.LatestRevision;
        Revisions = (await store.GetRevisionsAsync(id, ct)).Value ?? [];
        var outcome = DesignEvaluator.Evaluate(Revision.Input);
        Sheet = outcome.Result is { } result ? ResultSheet.From(result) : null;
        ResultAsStored = outcome.Result is { } r && CanonicalDesignJson.SerializeResult(r) == Revision.ResultJson;
        RefusedBecause = outcome.Errors.Select(e => $"{e.Field}: {e.Message}").ToList();
        return true;
    }

    /// <summary>The first 12 hex digits of a hash, as the history shows it.</summary>
    public static string Short(string hash) => hash.Length > 12 ? hash[..12] : hash;

    public static string Utc(DateTime t) => t.ToUniversalTime().ToString("yyyy-MM-dd HH:mm 'UTC'", CultureInfo.InvariantCulture);

    public static string StatusText(Data.Entities.RevisionStatus s) => s switch
    {
        Data.Entities.RevisionStatus.Draft => "Draft",
        Data.Entities.RevisionStatus.Submitted => "Submitted for review",
        Data.Entities.RevisionStatus.SignedOff => "Signed off",
        Data.Entities.RevisionStatus.Returned => "Returned",
        _ => s.ToString(),
    };
}
