using System.Globalization;
using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.RazorPages;
using Microsoft.AspNetCore.Mvc.Rendering;
using PackDesigner.Core.Validation;
using PackDesigner.Data.Cells;
using PackDesigner.Data.Designs;
using PackDesigner.Data.Results;
using PackDesigner.Data.Storage;
using PackDesigner.Web.Api;
using PackDesigner.Web.Formatting;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>
/// A new design (<c>/designs/new</c>, optionally <c>?from=id</c> to start as a copy) or the next revision of one
/// (<c>/designs/{id}/edit</c>). Every post re-evaluates the form; "Calculate" works without script, and the page's
/// script fetches the results panel alone (handler Results). Saving names the revision it is based on, so a save
/// after someone else's shows a conflict with the input kept. When the database is down the form comes back with
/// a 503 and the input kept.
/// </summary>
public sealed class EditorModel(DesignStore store, CellLibrary cells, DesignLinkChoices choices) : PageModel, IDesignFormHost
{
    [BindProperty]
    public DesignForm Input { get; set; } = new();

    [BindProperty]
    public DesignInfoForm Design { get; set; } = new();

    public int? Id { get; private set; }

    /// <summary>The saved design being edited, as it is now; null for a new design (or when storage is down).</summary>
    public DesignDetails? Current { get; private set; }

    public LiveResults Panel { get; private set; } = new(null, [], false);

    public IReadOnlyList<SummaryError> Problems { get; private set; } = [];

    public IReadOnlyList<SelectListItem> Owners { get; private set; } = [];

    public IReadOnlyList<SelectListItem> Cells { get; private set; } = [];

    public SaveConflict? Conflict { get; private set; }

    public string? Notice { get; private set; }

    public bool StorageDown { get; private set; }

    public bool MarginsOpen => FormErrors.MarginsOpen(ModelState);

    public string Title => Id is null ? "New design" : Current is { } c ? $"Edit “{c.Name}”" : "Edit design";

    public async Task<IActionResult> OnGetAsync(int? id, int? from, int? revision, int? series, int? parallel, CancellationToken ct)
    {
        Id = id;
        if (id is { } designId)
        {
            if (await LoadCurrentAsync(designId, ct) is not { } current)
            {
                return NotFound();
            }

            Input = DesignFormMapper.FromInput(current.LatestRevision.Input);
            Design = InfoOf(current, current.Name, null);
        }
        else if (from is { } sourceId)
        {
            var source = await store.GetDesignAsync(sourceId, ct);
            var picked = source.IsOk && revision is { } n ? (await store.GetRevisionAsync(sourceId, n, ct)).Value : source.Value?.LatestRevision;
            if (!source.IsOk || picked is not { } rev)
            {
                return NotFound();
            }

            Input = DesignFormMapper.FromInput(rev.Input);
            Design = InfoOf(source.Value!, source.Value!.Name + " (copy)",
                string.Create(CultureInfo.InvariantCulture, $"Duplicated from design {sourceId}, revision {rev.Number}."));
            Design.BasedOnRevision = null;
        }
        else
        {
            Input = EvaluateModel.DemoForm();
        }

        if (id is null)
        {
            // A new design opened from the finder: ?series=&parallel= replace those two counts only.
            Input.Series = series is { } s ? Numbers.ForInput(s) : Input.Series;
            Input.Parallel = parallel is { } p ? Numbers.ForInput(p) : Input.Parallel;
        }

        Design.SavedBy = SaverCookie.Read(Request);
        return await ShowAsync(ct);
    }

    public async Task<IActionResult> OnPostCalculateAsync(int? id, CancellationToken ct)
    {
        Id = id;
        return id is { } designId && await LoadCurrentAsync(designId, ct) is null ? NotFound() : await ShowAsync(ct);
    }

    /// <summary>Copies the chosen library cell's figures into the cell section (the rest of the form is kept).</summary>
    public async Task<IActionResult> OnPostUseCellAsync(int? id, CancellationToken ct)
    {
        Id = id;
        if (id is { } designId && await LoadCurrentAsync(designId, ct) is null)
        {
            return NotFound();
        }

        var key = DesignInfoForm.Prefix + "." + nameof(DesignInfoForm.CellId);
        if (!int.TryParse(Design.CellId, NumberStyles.None, CultureInfo.InvariantCulture, out var cellId))
        {
            ModelState.AddModelError(key, "Choose a library cell first, then press “Use this cell's figures”.");
            return await ShowAsync(ct);
        }

        var cell = await cells.GetAsync(cellId, ct);
        if (!cell.IsOk)
        {
            ModelState.AddModelError(key, "There is no such cell in the library any more; choose another.");
            return await ShowAsync(ct);
        }

        FormErrors.Clear(ModelState, FormFieldPaths.Prefix + ".Cell.");
        Input.Cell = DesignFormMapper.FromCellRequest(DesignRequestMapper.ToCellRequest(cell.Value!.Figures));
        Notice = $"The cell section now holds the figures of library cell “{cell.Value.Name}”. They are saved with the next revision.";
        return await ShowAsync(ct);
    }

    /// <summary>The results panel alone, for the page's script.</summary>
    public PartialViewResult OnPostResults()
    {
        var reading = Evaluate();
        return Partial("_LivePanel", new LiveResults(SheetOf(reading), Problems, ListProblems: true));
    }

    /// <summary>
    /// Saves the form as revision 1 of a new design or as the next revision. <paramref name="rebase"/> is set by the
    /// conflict box's button: save on top of the revision someone else saved, after seeing it.
    /// </summary>
    public async Task<IActionResult> OnPostSaveAsync(int? id, int? rebase, CancellationToken ct)
    {
        Id = id;
        try
        {
            if (id is { } designId && await LoadCurrentAsync(designId, ct) is null)
            {
                return NotFound();
            }

            var reading = Evaluate();
            var (customerId, jobId, cellId) = ReadLinks();
            if (!ModelState.IsValid || reading.Input is null)
            {
                return await ShowAsync(ct, evaluated: true);
            }

            var saved = id is null
                ? await store.CreateDesignAsync(Design.Name!, customerId, jobId, cellId, reading.Input, Design.SavedBy!, Design.Note, ct)
                : await store.SaveRevisionAsync(id.Value, rebase ?? Design.BasedOnRevision!.Value, reading.Input, Design.SavedBy!,
                    Design.Name, Design.Note, new CellLink(cellId), new DesignOwner(customerId, jobId), ct);
            return await AfterSaveAsync(saved, ct);
        }
        catch (StorageUnavailableException)
        {
            return ShowWithoutStorage();
        }
    }

    private async Task<IActionResult> AfterSaveAsync(StoreResult<DesignDetails> saved, CancellationToken ct)
    {
        switch (saved.Status)
        {
            case StoreStatus.Ok:
                SaverCookie.Write(Response, Design.SavedBy!);
                TempData[DetailsModel.SavedMessageKey] = string.Create(CultureInfo.InvariantCulture,
                    $"Saved revision {saved.Value!.LatestRevisionNumber}.");
                return Redirect(DesignRoutes.View(saved.Value.Id));
            case StoreStatus.Invalid:
                FormErrors.Add(ModelState, saved.Errors, DesignInfoForm.ErrorKeys);
                return await ShowAsync(ct, evaluated: true);
            case StoreStatus.Conflict:
                var latest = await store.GetDesignAsync(Id!.Value, ct);
                Current = latest.Value ?? Current;
                Conflict = new SaveConflict(Id.Value, saved.Message!, Design.BasedOnRevision ?? 0, latest.Value?.LatestRevisionNumber);
                return await ShowAsync(ct, evaluated: true);
            default:
                return NotFound();
        }
    }

    /// <summary>Checks the editor's own fields; returns the links to save.</summary>
    private (int? CustomerId, int? JobId, int? CellId) ReadLinks()
    {
        var errors = new List<ValidationError>();
        if (string.IsNullOrWhiteSpace(Design.Name))
        {
            errors.Add(new ValidationError("name", "Enter a name for the design, for example the vehicle or system it is for."));
        }

        if (string.IsNullOrWhiteSpace(Design.SavedBy))
        {
            errors.Add(new ValidationError("createdBy", "Enter your name or initials: the revision history shows who saved each revision."));
        }

        if (!DesignLinkChoices.TryReadOwner(Design.Owner, out var customerId, out var jobId))
        {
            errors.Add(new ValidationError("customerId", "Choose a customer and job from the list."));
        }

        int? cellId = null;
        if (!string.IsNullOrEmpty(Design.CellId))
        {
            if (int.TryParse(Design.CellId, NumberStyles.None, CultureInfo.InvariantCulture, out var c))
            {
                cellId = c;
            }
            else
            {
                errors.Add(new ValidationError("cellId", "Choose a library cell from the list."));
            }
        }

        if (Id is not null && Design.BasedOnRevision is null)
        {
            ModelState.AddModelError(string.Empty, "The form does not say which revision it is based on. Open the design again and redo the change.");
        }

        FormErrors.Add(ModelState, errors, DesignInfoForm.ErrorKeys);
        return (customerId, jobId, cellId);
    }

    private FormReading Evaluate()
    {
        var reading = DesignFormMapper.Read(Input);
        FormErrors.Add(ModelState, reading.Outcome.Errors);
        Problems = SummaryError.From(ModelState, DesignInfoForm.Fields);
        return reading;
    }

    private static ResultSheet? SheetOf(FormReading reading) => reading.Outcome.Result is { } r ? ResultSheet.From(r) : null;

    private async Task<IActionResult> ShowAsync(CancellationToken ct, bool evaluated = false)
    {
        var reading = evaluated ? DesignFormMapper.Read(Input) : Evaluate();
        Problems = SummaryError.From(ModelState, DesignInfoForm.Fields);
        Panel = new LiveResults(SheetOf(reading), Problems, ListProblems: false);
        Owners = Options(await choices.OwnersAsync(ct), Design.Owner);
        Cells = Options(await choices.CellsAsync(ct), Design.CellId);
        return Page();
    }

    /// <summary>The form as posted, with a 503 and a notice: nothing was saved and the input is still here.</summary>
    private PageResult ShowWithoutStorage()
    {
        StorageDown = true;
        var reading = DesignFormMapper.Read(Input);
        Panel = new LiveResults(SheetOf(reading), Problems, ListProblems: false);
        Owners = Options([new ChoiceOption(DesignLinkChoices.NoOwner, "No customer (own project)")], Design.Owner);
        Cells = Options([new ChoiceOption(string.Empty, "None: figures entered by hand")], Design.CellId);
        Response.StatusCode = StatusCodes.Status503ServiceUnavailable;
        Response.Headers.RetryAfter = "10";
        return Page();
    }

    private async Task<DesignDetails?> LoadCurrentAsync(int id, CancellationToken ct)
    {
        var design = await store.GetDesignAsync(id, ct);
        Current = design.Value;
        return Current;
    }

    private static DesignInfoForm InfoOf(DesignDetails d, string name, string? note) => new()
    {
        Name = name,
        Owner = DesignLinkChoices.OwnerValue(d.CustomerId, d.JobId),
        CellId = d.CellId?.ToString(CultureInfo.InvariantCulture),
        Note = note,
        BasedOnRevision = d.LatestRevisionNumber,
    };

    /// <summary>The select's options; a chosen value missing from the list (not among the first ones) stays selectable.</summary>
    private static List<SelectListItem> Options(IReadOnlyList<ChoiceOption> options, string? chosen)
    {
        var groups = new Dictionary<string, SelectListGroup>(StringComparer.Ordinal);
        var items = options.Select(o => new SelectListItem(o.Text, o.Value)
        {
            Group = o.Group is null ? null : groups.TryGetValue(o.Group, out var g) ? g : groups[o.Group] = new SelectListGroup { Name = o.Group },
        }).ToList();
        if (!string.IsNullOrEmpty(chosen) && items.All(i => i.Value != chosen))
        {
            items.Add(new SelectListItem("The design's current choice", chosen));
        }

        return items;
    }
}
