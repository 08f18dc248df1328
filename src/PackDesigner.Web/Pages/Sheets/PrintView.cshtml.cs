using Microsoft.AspNetCore.Mvc;
using Microsoft.AspNetCore.Mvc.Filters;
using Microsoft.AspNetCore.Mvc.RazorPages;
using PackDesigner.Reports;
using PackDesigner.Reports.Model;

namespace PackDesigner.Web.Pages.Sheets;

/// <summary>A message shown instead of the sheet, with the status it is sent with and a link onwards.</summary>
public sealed record SheetNotice(int Status, string Title, string Message, string LinkUrl, string LinkText);

/// <summary>
/// The design sheet of a saved revision as an HTML print view: the same strings as the PDF (every one from the
/// <see cref="DesignSheetModel"/>), print CSS for the chosen paper, and the paper setting's form.
/// </summary>
public sealed class PrintViewModel(RevisionSheetService sheets) : PageModel
{
    public DesignSheetModel? Sheet { get; private set; }

    public SheetNotice? Notice { get; private set; }

    public int DesignId { get; private set; }

    public int RevisionNumber { get; private set; }

    public PaperChoice Paper { get; private set; }

    /// <summary>The PDF on the paper this view is laid out for (the query's paper is passed on; the saved setting needs no query).</summary>
    public string PdfUrl => SheetRoutes.Pdf(DesignId, RevisionNumber, Paper.FromQuery ? Paper.Paper : null);

    public async Task<IActionResult> OnGetAsync(int id, int n, CancellationToken ct)
    {
        (DesignId, RevisionNumber) = (id, n);
        Paper = PaperSetting.Resolve(Request);
        if (Paper.Error is { } error)
        {
            return Show(PaperNotice($"The paper in the address is not known. {error}"));
        }

        var sheet = await sheets.LoadAsync(id, n, ct);
        switch (sheet.State)
        {
            case RevisionSheetState.NotFound:
                return NotFound();
            case RevisionSheetState.CalculationVersionDiffers:
                return Show(new SheetNotice(StatusCodes.Status409Conflict, "This revision was computed with other rules", sheet.Message!,
                    SheetRoutes.Design(id), "Back to the design"));
            default:
                Sheet = sheet.Model;
                return Page();
        }
    }

    /// <summary>The settings form: saves the paper in its cookie and goes back to the sheet.</summary>
    public IActionResult OnPostPaper(int id, int n, string? paper)
    {
        (DesignId, RevisionNumber) = (id, n);
        if (!PaperSetting.TryParse(paper, out var chosen))
        {
            return Show(PaperNotice(PaperSetting.ChoiceMessage));
        }

        PaperSetting.Remember(Response, chosen);
        return LocalRedirect(SheetRoutes.Sheet(id, n));
    }

    /// <summary>A request for this page that no handler answers (a POST without the paper handler) is not allowed.</summary>
    public override Task OnPageHandlerExecutionAsync(PageHandlerExecutingContext context, PageHandlerExecutionDelegate next)
    {
        ArgumentNullException.ThrowIfNull(context);
        ArgumentNullException.ThrowIfNull(next);
        if (context.HandlerMethod is null)
        {
            context.Result = StatusCode(StatusCodes.Status405MethodNotAllowed);
            return Task.CompletedTask;
        }

        return next();
    }

    private SheetNotice PaperNotice(string message) => new(StatusCodes.Status400BadRequest, "Unknown paper size", message,
        SheetRoutes.Sheet(DesignId, RevisionNumber), "Open the sheet on the saved paper");

    private PageResult Show(SheetNotice notice)
    {
        Notice = notice;
        Response.StatusCode = notice.Status;
        return Page();
    }

    public static IReadOnlyList<PaperSize> PaperSizes => PaperSetting.All;
}
