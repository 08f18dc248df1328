using System.Globalization;
using System.Net;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using PackDesigner.Core.Cells;
using PackDesigner.Data;
using PackDesigner.Data.Cells;
using PackDesigner.Web.Pages.Designs;
using PackDesigner.Web.Tests.Data.Infrastructure;
using PackDesigner.Web.Tests.TestData;

namespace PackDesigner.Web.Tests.Pages;

public sealed class DesignPagesSqliteTests(PackDesignerFactory factory) : DesignPagesTests<PackDesignerFactory>(factory);

public sealed class DesignPagesPostgresTests(PostgresAppFactory factory) : DesignPagesTests<PostgresAppFactory>(factory), IPostgresTests;

/// <summary>The design pages used as a browser would: real form posts with the antiforgery token, on both providers.</summary>
public abstract class DesignPagesTests<TFactory>(TFactory factory) : IClassFixture<TFactory>
    where TFactory : WebApplicationFactory<Program>
{
    private readonly HttpClient _client = factory.CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false });

    [ProviderFact]
    public async Task New_SaveFilledForm_StoresRevision1AndShowsIt()
    {
        var name = "Form pack " + Guid.NewGuid();
        var page = await DesignPage.OpenAsync(_client, DesignRoutes.New);
        Assert.Equal(200, page.Status);
        Assert.NotNull(page.ByTestId("live-results")!.QuerySelector("[data-testid='results']"));

        var saved = await page.PressAsync(_client, "save", new Dictionary<string, string> { ["Design.Name"] = name, ["Design.SavedBy"] = "Ana" });

        Assert.Equal(302, saved.Status);
        var view = await DesignPage.OpenAsync(_client, saved.Location!.OriginalString);
        Assert.Equal(name, view.ByTestId("design-name")!.TextContent);
        Assert.Contains("Saved revision 1", view.ByTestId("saved-message")!.TextContent);
        var row = Assert.Single(view.Document.QuerySelectorAll("[data-testid='revision-row']"));
        Assert.Contains("Ana", row.TextContent);
        // The name is remembered for the next form.
        Assert.Equal("Ana", (await DesignPage.OpenAsync(_client, DesignRoutes.New)).Value("Design.SavedBy"));
    }

    [ProviderFact]
    public async Task View_SheetLinks_OpenThePrintViewAndThePdfOfTheShownRevision()
    {
        var id = await _client.NewDesignIdAsync("Sheet links " + Guid.NewGuid());
        var view = await DesignPage.OpenAsync(_client, DesignRoutes.View(id));

        var sheetHref = view.ByTestId("sheet-link")!.GetAttribute("href")!;
        var pdfHref = view.ByTestId("sheet-pdf-link")!.GetAttribute("href")!;
        Assert.Equal($"/designs/{id}/revisions/1/sheet", sheetHref);
        using var sheet = await _client.GetAsync(sheetHref);
        Assert.Equal(System.Net.HttpStatusCode.OK, sheet.StatusCode);
        using var pdf = await _client.GetAsync(pdfHref);
        Assert.Equal("application/pdf", pdf.Content.Headers.ContentType!.MediaType);
        Assert.StartsWith("%PDF-", System.Text.Encoding.ASCII.GetString(await pdf.Content.ReadAsByteArrayAsync())[..5]);
    }

    [ProviderFact]
    public async Task Edit_SaveChangedField_AddsRevision2()
    {
        var id = await _client.NewDesignIdAsync("Edit me " + Guid.NewGuid());
        var edit = await DesignPage.OpenAsync(_client, DesignRoutes.Edit(id));
        Assert.Equal("1", edit.Value("Design.BasedOnRevision"));
        Assert.Equal("16", edit.Value("Input.Series"));

        var saved = await edit.PressAsync(_client, "save", new Dictionary<string, string> { ["Input.Parallel"] = "2", ["Design.SavedBy"] = "Ben" });

        Assert.Equal(302, saved.Status);
        var view = await DesignPage.OpenAsync(_client, DesignRoutes.View(id));
        Assert.Equal(["2", "1"], view.Document.QuerySelectorAll("[data-testid='revision-row']").Select(r => r.GetAttribute("data-number")));
        Assert.Equal("2", view.ByTestId("revision-head")!.GetAttribute("data-number"));
        Assert.Contains("16S2P", view.ByTestId("results")!.TextContent);
    }

    [ProviderFact]
    public async Task Save_InvalidForm_StoresNothingAndShowsEachMessageBesideItsField()
    {
        var before = await CountAsync();
        var page = await DesignPage.OpenAsync(_client, DesignRoutes.New);

        var result = await page.PressAsync(_client, "save", new Dictionary<string, string>
        {
            ["Design.Name"] = "",
            ["Design.SavedBy"] = "Cy",
            ["Input.Cell.CapacityAh"] = "abc",
        });

        Assert.Equal(200, result.Status);
        Assert.Contains("Enter a number", result.ByTestId("error-cell.capacityAh")!.TextContent);
        Assert.Contains("Enter a name", result.ByTestId("error-Design.Name")!.TextContent);
        Assert.Contains("Nothing has been saved", result.ByTestId("error-summary")!.TextContent);
        Assert.Equal("abc", result.Value("Input.Cell.CapacityAh"));
        Assert.Equal(before, await CountAsync());
    }

    [ProviderFact]
    public async Task Save_SomeoneSavedInBetween_ShowsTheConflictAndKeepsTheInput()
    {
        var id = await _client.NewDesignIdAsync("Two editors " + Guid.NewGuid());
        using var other = factory.CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false });
        var mine = await DesignPage.OpenAsync(_client, DesignRoutes.Edit(id));
        var theirs = await DesignPage.OpenAsync(other, DesignRoutes.Edit(id));
        Assert.Equal(302, (await theirs.PressAsync(other, "save", new Dictionary<string, string> { ["Input.Parallel"] = "2", ["Design.SavedBy"] = "They" })).Status);

        var conflict = await mine.PressAsync(_client, "save", new Dictionary<string, string> { ["Input.Parallel"] = "3", ["Design.SavedBy"] = "Me" });

        Assert.Equal(200, conflict.Status);
        var box = conflict.ByTestId("conflict-message")!;
        Assert.Contains("revision 2", box.TextContent);
        Assert.EndsWith(DesignRoutes.View(id, 2), box.QuerySelector("[data-testid='conflict-latest-link']")!.GetAttribute("href"));
        Assert.Equal("3", conflict.Value("Input.Parallel"));
        Assert.Equal("Me", conflict.Value("Design.SavedBy"));
        var revisions = await _client.GetAnswerAsync(DesignRoutes.ApiRevisions(id));
        Assert.Equal(2, revisions.Body.GetArrayLength());

        // After seeing revision 2, the user may still save their input on top of it, as revision 3.
        var onTop = await conflict.PressAsync(_client, "save-on-top");
        Assert.Equal(302, onTop.Status);
        var third = await _client.GetAnswerAsync(DesignRoutes.ApiRevision(id, 3));
        Assert.Equal(3, third.Body.GetProperty("input").GetProperty("parallel").GetInt32());
        Assert.Equal(2, (await _client.GetAnswerAsync(DesignRoutes.ApiRevision(id, 2))).Body.GetProperty("input").GetProperty("parallel").GetInt32());
    }

    [ProviderFact]
    public async Task Calculate_WithoutScript_ShowsTheNewResults()
    {
        var page = await DesignPage.OpenAsync(_client, DesignRoutes.New);

        var result = await page.PressAsync(_client, "calculate", new Dictionary<string, string> { ["Input.Series"] = "20" });

        Assert.Equal(200, result.Status);
        Assert.Contains("Results for 20S", result.ByTestId("live-results")!.TextContent);
        Assert.Equal("20", result.Value("Input.Series"));
    }

    [ProviderFact]
    public async Task Results_Handler_ReturnsOnlyTheResultsPanel()
    {
        var page = await DesignPage.OpenAsync(_client, DesignRoutes.New);
        var action = page.ByTestId("design-form")!.GetAttribute("data-live-results")!;

        var fragment = await page.PostToAsync(_client, WebUtility.HtmlDecode(action), new Dictionary<string, string> { ["Input.Parallel"] = "3" });
        var broken = await page.PostToAsync(_client, WebUtility.HtmlDecode(action), new Dictionary<string, string> { ["Input.Parallel"] = "x" });

        Assert.Equal(200, fragment.Status);
        Assert.DoesNotContain("<html", fragment.Html, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("Results for", fragment.Html);
        Assert.Contains("data-valid=\"true\"", fragment.Html);
        Assert.Contains("Enter a whole number", broken.Html);
        Assert.Contains("data-valid=\"false\"", broken.Html);
    }

    [ProviderFact]
    public async Task UseCell_LibraryCellChosen_FillsTheCellFiguresFromTheLibrary()
    {
        var cellId = await NewCellAsync("Library cell " + Guid.NewGuid(), 123);
        var page = await DesignPage.OpenAsync(_client, DesignRoutes.New);

        var result = await page.PressAsync(_client, "use-cell", new Dictionary<string, string> { ["Design.CellId"] = cellId.ToString(CultureInfo.InvariantCulture) });

        Assert.Equal(200, result.Status);
        Assert.Equal("123", result.Value("Input.Cell.CapacityAh"));
        Assert.Equal(cellId.ToString(CultureInfo.InvariantCulture), result.Value("Design.CellId"));
        Assert.NotNull(result.ByTestId("notice"));
    }

    [ProviderFact]
    public async Task View_LibraryCellEditedSinceTheSave_SaysSo()
    {
        var cellId = await NewCellAsync("Changing cell " + Guid.NewGuid(), 100);
        var id = await _client.NewDesignIdAsync("Cell link " + Guid.NewGuid(), cellId: cellId);
        Assert.Null((await DesignPage.OpenAsync(_client, DesignRoutes.View(id))).ByTestId("library-cell-changed"));

        using (var scope = factory.Services.CreateScope())
        {
            var cells = scope.ServiceProvider.GetRequiredService<CellLibrary>();
            var cell = (await cells.GetAsync(cellId)).Value!;
            Assert.True((await cells.UpdateAsync(cellId, cell.Version, new CellData(cell.Name, cell.Figures with { CapacityAh = 101 }))).IsOk);
        }

        var view = await DesignPage.OpenAsync(_client, DesignRoutes.View(id));
        Assert.NotNull(view.ByTestId("library-cell-changed"));
    }

    [ProviderFact]
    public async Task Compare_TwoRevisions_ShowsChangedInputsAndMovedResultsWithUnits()
    {
        var id = await _client.NewDesignIdAsync("Compare " + Guid.NewGuid());
        await _client.SaveRevisionAsync(id, 1, DesignRequestBuilder.Valid().WithParallel(2));

        var page = await DesignPage.OpenAsync(_client, DesignRoutes.Compare(id, 1, 2));

        Assert.Equal(200, page.Status);
        var inputs = page.ByTestId("compare-inputs")!;
        var parallel = Assert.Single(inputs.QuerySelectorAll("[data-path='parallel']"));
        Assert.Equal(["1", "2", "+1 (+100 %)"], parallel.QuerySelectorAll("td").Take(3).Select(c => c.TextContent));
        Assert.Single(inputs.QuerySelectorAll("[data-testid='change-row']"));
        // Twice the cells in parallel: twice the capacity (100 → 200 Ah) and half the cell resistance per group.
        var capacity = page.ByTestId("compare-results")!.QuerySelector("[data-path='pack.capacityAh']")!;
        Assert.Equal(["100", "200", "+100 (+100 %)", "Ah"], capacity.QuerySelectorAll("td").Select(c => c.TextContent));
        Assert.Null(page.ByTestId("compare-results")!.QuerySelector("[data-path='pack.maxVoltage']"));
    }

    [ProviderFact]
    public async Task ExportThenImport_GivesTheSameInputHash()
    {
        var id = await _client.NewDesignIdAsync("Round trip " + Guid.NewGuid(), DesignRequestBuilder.Valid().WithOcvCurve((0, 2.5), (50, 3.3), (100, 3.6)).WithCable(35, 2));
        var hash = (await _client.GetAnswerAsync(DesignRoutes.ApiRevision(id, 1))).Body.GetProperty("inputHash").GetString();
        using var export = await _client.GetAsync(DesignRoutes.Export(id, 1));
        Assert.Equal("application/json", export.Content.Headers.ContentType!.MediaType);
        var json = await export.Content.ReadAsStringAsync();

        var imported = await ImportAsync(json);

        Assert.Equal(302, imported.Status);
        var newId = int.Parse(imported.Location!.OriginalString.Split('/')[^1], CultureInfo.InvariantCulture);
        Assert.NotEqual(id, newId);
        Assert.Equal(hash, (await _client.GetAnswerAsync(DesignRoutes.ApiRevision(newId, 1))).Body.GetProperty("inputHash").GetString());
        Assert.Contains("matches", (await DesignPage.OpenAsync(_client, DesignRoutes.View(newId))).ByTestId("saved-message")!.TextContent);
    }

    [ProviderFact]
    public async Task Import_InvalidFile_ListsEachProblemByItsPathAndImportsNothing()
    {
        var before = await CountAsync();
        var json = """
            { "schemaVersion": 2, "kind": "something.else", "name": "",
              "input": { "cell": { "chemistry": "lfp", "capacityAh": "lots" }, "series": 16 } }
            """;

        var page = await ImportAsync(json);

        Assert.Equal(200, page.Status);
        var fields = page.Document.QuerySelectorAll("[data-testid='import-error']").Select(e => e.GetAttribute("data-field")).ToList();
        Assert.Contains("schemaVersion", fields);
        Assert.Contains("kind", fields);
        Assert.Contains("name", fields);
        Assert.Contains("input.cell.capacityAh", fields);
        Assert.Equal(json, page.WithForm("import-form").Value("Json")!.Replace("\r\n", "\n", StringComparison.Ordinal));
        Assert.Equal(before, await CountAsync());
    }

    [ProviderFact]
    public async Task Import_InputMissingAFigure_NamesTheField()
    {
        var json = """{ "schemaVersion": 1, "kind": "packdesigner.design", "name": "No series", "input": { "cell": { "chemistry": "lfp" } } }""";

        var page = await ImportAsync(json);

        var fields = page.Document.QuerySelectorAll("[data-testid='import-error']").Select(e => e.GetAttribute("data-field")).ToList();
        Assert.Contains("input.series", fields);
        Assert.Contains("input.controller", fields);
    }

    [ProviderFact]
    public async Task Pages_NameWithMarkup_AreShownAsTextNeverAsMarkup()
    {
        var name = "<script>alert('x')</script> Ωmega 電池 " + Guid.NewGuid();
        var id = await _client.NewDesignIdAsync(name);

        var list = await DesignPage.OpenAsync(_client, DesignRoutes.List + "?q=" + Uri.EscapeDataString(name[^36..]));
        var view = await DesignPage.OpenAsync(_client, DesignRoutes.View(id));

        var row = Assert.Single(list.Document.QuerySelectorAll("[data-testid='design-row']"));
        Assert.Equal(name, row.QuerySelector("[data-testid='design-link']")!.TextContent);
        Assert.Empty(row.QuerySelectorAll("script"));
        Assert.Equal(name, view.ByTestId("design-name")!.TextContent);
        Assert.DoesNotContain("<script>alert", view.Html);
        Assert.DoesNotContain("<script>alert", list.Html);
    }

    [ProviderFact]
    public async Task List_SearchSortAndPaging_ThroughThePage()
    {
        var tag = "Pg" + Guid.NewGuid().ToString("N")[..8];
        foreach (var n in new[] { "alpha", "charlie", "bravo" })
        {
            await _client.NewDesignIdAsync($"{tag} {n}");
        }

        var first = await DesignPage.OpenAsync(_client, $"{DesignRoutes.List}?q={tag}&sort=nameDescending&size=2");
        var next = first.ByTestId("pager-next")!.GetAttribute("href")!;
        var second = await DesignPage.OpenAsync(_client, WebUtility.HtmlDecode(next));

        Assert.Equal([$"{tag} charlie", $"{tag} bravo"], RowNames(first));
        Assert.Equal([$"{tag} alpha"], RowNames(second));
        Assert.Contains("of 3", first.ByTestId("list-count")!.TextContent);
        Assert.Null(second.ByTestId("pager-next"));
        Assert.Empty(RowNames(await DesignPage.OpenAsync(_client, $"{DesignRoutes.List}?q=nothing-{Guid.NewGuid()}")));
    }

    [ProviderFact]
    public async Task Restore_OldRevisionThroughTheViewPage_SavesItAsANewRevision()
    {
        var id = await _client.NewDesignIdAsync("Restore page " + Guid.NewGuid());
        var firstHash = (await _client.GetAnswerAsync(DesignRoutes.ApiRevision(id, 1))).Body.GetProperty("inputHash").GetString();
        await _client.SaveRevisionAsync(id, 1, DesignRequestBuilder.Valid().WithParallel(2));
        var old = (await DesignPage.OpenAsync(_client, DesignRoutes.View(id, 1))).WithForm("restore-form");

        var restored = await old.PressAsync(_client, "restore-button", new Dictionary<string, string> { ["SavedBy"] = "Dee" });

        Assert.Equal(302, restored.Status);
        var third = await _client.GetAnswerAsync(DesignRoutes.ApiRevision(id, 3));
        Assert.Equal(firstHash, third.Body.GetProperty("inputHash").GetString());
        Assert.Equal("Dee", third.Body.GetProperty("createdBy").GetString());
    }

    [ProviderFact]
    public async Task Pages_UnknownDesign_Answer404()
    {
        Assert.Equal(404, (await DesignPage.OpenAsync(_client, DesignRoutes.View(int.MaxValue))).Status);
        Assert.Equal(404, (await DesignPage.OpenAsync(_client, DesignRoutes.Edit(int.MaxValue))).Status);
        Assert.Equal(404, (await DesignPage.OpenAsync(_client, DesignRoutes.Compare(int.MaxValue, 1, 2))).Status);
    }

    private async Task<DesignPage> ImportAsync(string json)
    {
        var form = (await DesignPage.OpenAsync(_client, DesignRoutes.Import)).WithForm("import-form");
        var token = form.Value("__RequestVerificationToken")!;
        using var content = new MultipartFormDataContent
        {
            { new StringContent(token), "__RequestVerificationToken" },
            { new StringContent(json), "Json" },
            { new StringContent("Importer"), "SavedBy" },
        };
        using var response = await _client.PostAsync(DesignRoutes.Import, content);
        return await DesignPage.ReadAsync(response);
    }

    private static List<string> RowNames(DesignPage page) =>
        page.Document.QuerySelectorAll("[data-testid='design-row'] [data-testid='design-link']").Select(a => a.TextContent).ToList();

    private async Task<int> NewCellAsync(string name, double capacityAh)
    {
        using var scope = factory.Services.CreateScope();
        var figures = DesignRequestBuilder.Valid().Build().Cell!;
        var input = new CellInput
        {
            Chemistry = Chemistry.Lfp,
            CapacityAh = capacityAh,
            NominalVoltage = figures.NominalVoltage,
            MaxChargeVoltage = figures.MaxChargeVoltage,
            MinDischargeVoltage = figures.MinDischargeVoltage,
            MaxChargeCurrentA = figures.MaxChargeCurrentA,
            MaxDischargeCurrentA = figures.MaxDischargeCurrentA,
            PeakDischargeCurrentA = figures.PeakDischargeCurrentA,
            PeakDischargeDurationS = figures.PeakDischargeDurationS,
            InternalResistanceMilliohm = figures.InternalResistanceMilliohm,
            MassKg = figures.MassKg,
        };
        var created = await scope.ServiceProvider.GetRequiredService<CellLibrary>().CreateAsync(new CellData(name, input));
        Assert.True(created.IsOk, string.Join("; ", created.Errors.Select(e => e.Field + ": " + e.Message)));
        return created.Value!.Id;
    }

    private async Task<int> CountAsync()
    {
        using var scope = factory.Services.CreateScope();
        var db = scope.ServiceProvider.GetRequiredService<PackDesignerDbContext>();
        return await db.Designs.CountAsync() + await db.DesignRevisions.CountAsync();
    }
}
