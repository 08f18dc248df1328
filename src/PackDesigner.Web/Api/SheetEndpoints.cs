using System.Text;
using Microsoft.Net.Http.Headers;
using PackDesigner.Reports.Export;
using PackDesigner.Reports.Model;
using PackDesigner.Reports.Pdf;
using PackDesigner.Web.Pages.Sheets;

namespace PackDesigner.Web.Api;

/// <summary>
/// The files of a revision's design sheet: the PDF, the BMS and charger settings as CSV and JSON, and the print
/// view's chart images. An unknown design or revision is a 404 with the site's error page; a revision computed
/// with other calculation rules is a 409 ProblemDetails saying what to do; an unknown <c>paper</c> a 400 naming it.
/// </summary>
public static class SheetEndpoints
{
    public const string CsvContentType = "text/csv; charset=utf-8";
    public const string JsonContentType = "application/json; charset=utf-8";
    public const string VersionDiffersTitle = "This revision was computed with other calculation rules.";

    public static IEndpointRouteBuilder MapSheetEndpoints(this IEndpointRouteBuilder app)
    {
        var revision = app.MapGroup(SheetRoutes.RevisionTemplate);
        revision.MapGet(SheetRoutes.PdfPath, PdfAsync);
        revision.MapGet(SheetRoutes.CsvPath, (HttpContext c, int id, int n, RevisionSheetService s, CancellationToken ct) =>
            SendAsync(c, id, n, s, ct, m => Text(c, SettingsExport.ToCsv(m), CsvContentType, SheetRoutes.CsvFileName(id, n))));
        revision.MapGet(SheetRoutes.JsonPath, (HttpContext c, int id, int n, RevisionSheetService s, CancellationToken ct) =>
            SendAsync(c, id, n, s, ct, m => Text(c, SettingsExport.ToJson(m), JsonContentType, SheetRoutes.JsonFileName(id, n))));
        revision.MapGet(SheetRoutes.OcvChartPath, (HttpContext c, int id, int n, RevisionSheetService s, CancellationToken ct) =>
            SendAsync(c, id, n, s, ct, m => Results.Bytes(SheetChartImages.Ocv(m), "image/png")));
        revision.MapGet(SheetRoutes.LadderChartPath, (HttpContext c, int id, int n, RevisionSheetService s, CancellationToken ct) =>
            SendAsync(c, id, n, s, ct, m => Results.Bytes(SheetChartImages.Ladder(m), "image/png")));
        revision.MapGet(SheetRoutes.SpreadChartPath, (HttpContext c, int id, int n, RevisionSheetService s, CancellationToken ct) =>
            SendAsync(c, id, n, s, ct, m => SheetChartImages.Spread(m) is { } png ? Results.Bytes(png, "image/png") : Results.StatusCode(StatusCodes.Status404NotFound)));
        return app;
    }

    private static Task<IResult> PdfAsync(HttpContext context, int id, int n, RevisionSheetService sheets, CancellationToken ct)
    {
        var paper = PaperSetting.Resolve(context.Request);
        if (paper.Error is { } error)
        {
            return Task.FromResult<IResult>(TypedResults.ValidationProblem(
                new Dictionary<string, string[]> { [PaperSetting.QueryName] = [error] },
                title: "Unknown paper size.", detail: "The paper query value is a4 or letter; without it the saved setting (or A4) is used."));
        }

        return SendAsync(context, id, n, sheets, ct, model =>
        {
            SetDisposition(context, "inline", SheetRoutes.PdfFileName(id, n));
            return Results.Bytes(DesignSheetRenderer.RenderPdf(model, paper.Paper), "application/pdf");
        });
    }

    private static async Task<IResult> SendAsync(HttpContext context, int id, int n, RevisionSheetService sheets, CancellationToken ct,
        Func<DesignSheetModel, IResult> send)
    {
        var sheet = await sheets.LoadAsync(id, n, ct);
        return sheet.State switch
        {
            RevisionSheetState.Ready => send(sheet.Model!),
            // No body, so the status-code pages show the site's "page not found".
            RevisionSheetState.NotFound => Results.StatusCode(StatusCodes.Status404NotFound),
            RevisionSheetState.CalculationVersionDiffers => TypedResults.Problem(
                statusCode: StatusCodes.Status409Conflict, title: VersionDiffersTitle, detail: sheet.Message,
                instance: context.Request.Path.Value,
                extensions: new Dictionary<string, object?>
                {
                    ["storedCalculationVersion"] = sheet.StoredCalculationVersion,
                    ["design"] = SheetRoutes.Design(id),
                }),
            _ => throw new InvalidOperationException($"Unknown sheet state {sheet.State}."),
        };
    }

    private static IResult Text(HttpContext context, string text, string contentType, string fileName)
    {
        SetDisposition(context, "attachment", fileName);
        return Results.Bytes(Encoding.UTF8.GetBytes(text), contentType);
    }

    private static void SetDisposition(HttpContext context, string type, string fileName) =>
        context.Response.Headers.ContentDisposition = new ContentDispositionHeaderValue(type) { FileName = fileName }.ToString();
}
