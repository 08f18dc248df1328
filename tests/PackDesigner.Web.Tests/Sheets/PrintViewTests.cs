using System.Net;
using AngleSharp.Html.Dom;
using Microsoft.AspNetCore.Mvc.Testing;
using PackDesigner.Data.Entities;
using PackDesigner.Reports.Model;
using PackDesigner.Web.Pages.Sheets;
using PackDesigner.Web.Tests.Reports;

namespace PackDesigner.Web.Tests.Sheets;

/// <summary>The HTML print view: the model's strings, its cautions and marking, its links, and the paper setting.</summary>
public sealed class PrintViewTests(SheetAppFactory factory) : IClassFixture<SheetAppFactory>
{
    // ISO 216 A4 and US Letter in PDF points (1/72 in).
    private const double A4Width = 595.28, LetterWidth = 612;

    private readonly HttpClient _client = factory.CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false });

    [Fact]
    public async Task Get_SavedRevision_EveryBmsChargerAndProtectionRowOfTheModel()
    {
        var (id, model) = await CreateAsync();

        var page = await PrintViewPage.OpenAsync(_client, SheetRoutes.Sheet(id, 1));

        Assert.Equal(200, page.Status);
        var bms = page.Rows("bms-row");
        Assert.Equal(model.BmsSettings.Select(s => s.Key), page.AllByTestId("bms-row").Select(r => r.GetAttribute("data-key")));
        foreach (var s in model.BmsSettings)
        {
            Assert.Equal(s.Label, PrintViewPage.Text(bms[s.Key], "th"));
            Assert.Equal(s.PerCell.Text, PrintViewPage.Text(bms[s.Key], ".per-cell"));
            Assert.Equal(s.PerPack?.Text ?? "—", PrintViewPage.Text(bms[s.Key], ".per-pack"));
        }

        AssertSettingRows(page, "charger-row", model.ChargerSettings);
        AssertSettingRows(page, "end-of-charge-row", model.EndOfCharge);
        AssertSettingRows(page, "protection-row", model.Protection.SelectMany(g => g.Rows).ToList());
        Assert.Equal(model.Protection.Select(g => g.Title), page.AllByTestId("protection-group").Select(g => PrintViewPage.Text(g, "h3")));
    }

    [Fact]
    public async Task Get_SavedRevision_HeaderSummaryInputsFindingsAndBuildNotesOfTheModel()
    {
        var (id, model) = await CreateAsync();

        var page = await PrintViewPage.OpenAsync(_client, SheetRoutes.Sheet(id, 1));

        Assert.Equal(model.DesignName, page.ByTestId("header-design")!.TextContent);
        Assert.Equal(model.RevisionText, page.ByTestId("header-revision")!.TextContent);
        Assert.Equal(model.CustomerLine, page.ByTestId("header-customer")!.TextContent);
        Assert.Equal(model.MetaLine, page.ByTestId("header-meta")!.TextContent);
        Assert.Contains(model.ShortInputHash, model.MetaLine, StringComparison.Ordinal);
        // The header is the frame table's head, which a browser repeats on every printed page.
        Assert.NotNull(page.Document.QuerySelector("table.sheet-frame > thead [data-testid='sheet-header']"));
        Assert.Equal(model.Identity.Select(f => (f.Key, f.Label, f.Value)),
            page.AllByTestId("identity-field").Select(e => (e.GetAttribute("data-key")!, PrintViewPage.Text(e, "th"), PrintViewPage.Text(e, "td"))));
        Assert.Equal(model.Summary.Select(f => (f.Label, f.Value)),
            page.AllByTestId("summary-field").Select(e => (PrintViewPage.Text(e, "dt"), PrintViewPage.Text(e, "dd"))));
        var inputRows = page.AllByTestId("input-row");
        Assert.Equal(model.Inputs.SelectMany(g => g.Rows).Select(r => (r.Label, r.Value)),
            inputRows.Select(e => (PrintViewPage.Text(e, "th"), PrintViewPage.Text(e, ".value"))));
        Assert.Equal(model.Findings.Select(f => (f.Severity, f.Message, f.Code)),
            page.AllByTestId("finding").Select(e => (PrintViewPage.Text(e, ".severity"), PrintViewPage.Text(e, ".message"), PrintViewPage.Text(e, ".code"))));
        Assert.Contains(model.Findings, f => f.Severity == "Error");
        Assert.Equal(model.FindingCounts, page.ByTestId("finding-counts")!.TextContent);
        Assert.Equal(model.BuildNotes.Steps, page.AllByTestId("build-step").Select(e => e.TextContent));
    }

    [Fact]
    public async Task Get_SavedRevision_SpreadSectionWithTheModelsStringsAndLaterSectionsRenumbered()
    {
        var (id, model) = await CreateAsync();

        var page = await PrintViewPage.OpenAsync(_client, SheetRoutes.Sheet(id, 1));

        var spread = model.Spread!;
        Assert.Equal("7 Cell spread", PrintViewPage.Text(page.ByTestId("section-spread")!, "h2"));
        Assert.Equal(spread.RunLine, page.ByTestId("spread-run")!.TextContent.Trim());
        AssertSettingRows(page, "spread-probability-row", spread.Probabilities);
        AssertSettingRows(page, "spread-recommendation-row", spread.Recommendation);
        Assert.Equal(spread.Percentiles.Select(p => p.Key), page.AllByTestId("spread-percentile-row").Select(r => r.GetAttribute("data-key")));
        Assert.Equal("8 Findings", PrintViewPage.Text(page.ByTestId("section-findings")!, "h2"));
        Assert.Equal("11 Sign-off", PrintViewPage.Text(page.ByTestId("section-sign-off")!, "h2"));
    }

    [Fact]
    public async Task Get_DraftRevision_EveryCautionAndTheDraftMarking()
    {
        var (id, model) = await CreateAsync();

        var page = await PrintViewPage.OpenAsync(_client, SheetRoutes.Sheet(id, 1));

        Assert.Equal(10, model.Cautions.Count);
        Assert.Equal(model.Cautions.Select(c => (c.Key, c.Title, c.Text)),
            page.AllByTestId("caution").Select(e => (e.GetAttribute("data-key")!, PrintViewPage.Text(e, "h3"), PrintViewPage.Text(e, "p"))));
        // A fixed element outside the frame: a browser prints it on every page.
        var marking = page.ByTestId("draft-marking");
        Assert.Equal(DesignSheetModel.DraftMarkingText, marking?.TextContent);
        Assert.Equal("BODY", marking!.ParentElement!.TagName);
        Assert.Equal(DesignSheetModel.DraftMarkingText, page.ByTestId("header-marking")!.TextContent);
        Assert.All(page.AllByTestId("sign-off-line"), l => Assert.Equal("false", l.GetAttribute("data-recorded")));
        Assert.Equal(model.SignOff.Select(l => l.Role), page.AllByTestId("sign-off-line").Select(l => l.QuerySelector("th")!.FirstChild!.TextContent));
    }

    [Fact]
    public async Task Get_SignedOffRevision_ApprovalInsteadOfTheDraftMarking()
    {
        var (id, _) = await CreateAsync();
        await factory.ChangeStatusAsync(id, 1, RevisionStatus.Submitted, "Test designer");
        await factory.ChangeStatusAsync(id, 1, RevisionStatus.SignedOff, "Test approver");
        var model = await factory.ModelAsync(id, 1);

        var page = await PrintViewPage.OpenAsync(_client, SheetRoutes.Sheet(id, 1));

        Assert.Null(page.ByTestId("draft-marking"));
        Assert.Equal(model.SignOffMarking, page.ByTestId("header-marking")!.TextContent);
        Assert.StartsWith("Approved by Test approver on ", model.SignOffMarking, StringComparison.Ordinal);
        Assert.Equal(model.SignOff.Select(l => (l.Name, l.Date)),
            page.AllByTestId("sign-off-line").Select(l => (PrintViewPage.Text(l, ".name"), PrintViewPage.Text(l, ".date"))));
    }

    [Fact]
    public async Task Get_SavedRevision_ChartsAsImagesWithAltTextAndLinksToTheFiles()
    {
        var (id, model) = await CreateAsync();

        var page = await PrintViewPage.OpenAsync(_client, SheetRoutes.Sheet(id, 1));

        var ocv = (IHtmlImageElement)page.ByTestId("chart-ocv")!.QuerySelector("img")!;
        var ladder = (IHtmlImageElement)page.ByTestId("chart-ladder")!.QuerySelector("img")!;
        Assert.Equal(SheetRoutes.OcvChart(id, 1), ocv.GetAttribute("src"));
        Assert.Equal(SheetRoutes.LadderChart(id, 1), ladder.GetAttribute("src"));
        Assert.StartsWith(model.OcvChart.Title, ocv.AlternativeText, StringComparison.Ordinal);
        Assert.All(model.OcvChart.Lines, l => Assert.Contains(l.Label, ocv.AlternativeText, StringComparison.Ordinal));
        Assert.StartsWith(model.LadderChart.Title, ladder.AlternativeText, StringComparison.Ordinal);
        Assert.All(model.LadderChart.Rungs, r => Assert.Contains($"{r.Label} {r.PerCell.Text} per cell", ladder.AlternativeText, StringComparison.Ordinal));
        var spread = (IHtmlImageElement)page.ByTestId("chart-spread")!.QuerySelector("img")!;
        Assert.Equal(SheetRoutes.SpreadChart(id, 1), spread.GetAttribute("src"));
        Assert.StartsWith(model.Spread!.Histogram!.Title, spread.AlternativeText, StringComparison.Ordinal);
        foreach (var img in new[] { ocv, ladder, spread })
        {
            using var image = await _client.GetAsync(img.GetAttribute("src"));
            Assert.Equal("image/png", image.Content.Headers.ContentType?.MediaType);
        }

        Assert.Equal(SheetRoutes.Pdf(id, 1), page.ByTestId("link-pdf")!.GetAttribute("href"));
        Assert.Equal(SheetRoutes.SettingsCsv(id, 1), page.ByTestId("link-csv")!.GetAttribute("href"));
        Assert.Equal(SheetRoutes.SettingsJson(id, 1), page.ByTestId("link-json")!.GetAttribute("href"));
        Assert.Equal($"/designs/{id}", page.ByTestId("link-design")!.GetAttribute("href"));
        foreach (var link in new[] { "link-pdf", "link-csv", "link-json" })
        {
            using var file = await _client.GetAsync(page.ByTestId(link)!.GetAttribute("href"));
            Assert.Equal(HttpStatusCode.OK, file.StatusCode);
        }
    }

    [Theory]
    [InlineData("", "A4", "a4")]
    [InlineData("?paper=a4", "A4", "a4")]
    [InlineData("?paper=letter", "letter", "letter")]
    public async Task Get_PaperQuery_PrintCssForThatPaper(string query, string cssSize, string checkedPaper)
    {
        var (id, _) = await CreateAsync();

        var page = await PrintViewPage.OpenAsync(_client, SheetRoutes.Sheet(id, 1) + query);

        Assert.Equal($"@page {{ size: {cssSize}; }}", page.PageSizeCss);
        Assert.Equal(checkedPaper, page.PaperForm.QuerySelectorAll("input[name='paper']").OfType<IHtmlInputElement>().Single(r => r.IsChecked).Value);
        // The PDF link carries the address's paper so that it matches the view.
        Assert.Equal(query.Length == 0 ? SheetRoutes.Pdf(id, 1) : SheetRoutes.Pdf(id, 1) + query, page.ByTestId("link-pdf")!.GetAttribute("href"));
    }

    [Fact]
    public async Task PostPaperForm_Letter_CookieMakesTheViewAndThePdfLetterUntilAQueryOverridesIt()
    {
        var (id, _) = await CreateAsync();
        var client = factory.CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false });
        var page = await PrintViewPage.OpenAsync(client, SheetRoutes.Sheet(id, 1));
        Assert.NotNull(page.PaperForm.QuerySelector("input[name='__RequestVerificationToken']"));

        using var posted = await page.SubmitPaperAsync(client, "letter");

        Assert.Equal(HttpStatusCode.Redirect, posted.StatusCode);
        Assert.Equal(SheetRoutes.Sheet(id, 1), posted.Headers.Location?.OriginalString);
        var cookie = Assert.Single(posted.Headers.GetValues("Set-Cookie"), c => c.StartsWith(PaperSetting.CookieName + "=", StringComparison.Ordinal));
        Assert.StartsWith("pd-paper=letter;", cookie, StringComparison.Ordinal);
        Assert.Contains("httponly", cookie, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("samesite=lax", cookie, StringComparison.OrdinalIgnoreCase);

        var again = await PrintViewPage.OpenAsync(client, posted.Headers.Location!.OriginalString);
        Assert.Equal("@page { size: letter; }", again.PageSizeCss);
        Assert.Equal(LetterWidth, PdfText.Read(await client.GetByteArrayAsync(SheetRoutes.Pdf(id, 1))).PageSizes[0].Width, 0.5);
        Assert.Equal(A4Width, PdfText.Read(await client.GetByteArrayAsync(SheetRoutes.Pdf(id, 1) + "?paper=a4")).PageSizes[0].Width, 0.5);
        Assert.Equal("@page { size: A4; }", (await PrintViewPage.OpenAsync(client, SheetRoutes.Sheet(id, 1) + "?paper=a4")).PageSizeCss);

        using var back = await (await PrintViewPage.OpenAsync(client, SheetRoutes.Sheet(id, 1))).SubmitPaperAsync(client, "a4");
        Assert.Equal(A4Width, PdfText.Read(await client.GetByteArrayAsync(SheetRoutes.Pdf(id, 1))).PageSizes[0].Width, 0.5);
    }

    [Fact]
    public async Task PostPaperForm_WithoutToken_Returns400AndSetsNoCookie()
    {
        var (id, _) = await CreateAsync();
        var page = await PrintViewPage.OpenAsync(_client, SheetRoutes.Sheet(id, 1));

        using var posted = await page.SubmitPaperAsync(_client, "letter", withToken: false);

        Assert.Equal(HttpStatusCode.BadRequest, posted.StatusCode);
        Assert.False(posted.Headers.TryGetValues("Set-Cookie", out var cookies) && cookies.Any(c => c.StartsWith(PaperSetting.CookieName, StringComparison.Ordinal)));
    }

    [Fact]
    public async Task PostPaperForm_UnknownPaper_Returns400NoticeAndSetsNoCookie()
    {
        var (id, _) = await CreateAsync();
        var page = await PrintViewPage.OpenAsync(_client, SheetRoutes.Sheet(id, 1));
        var token = page.PaperForm.QuerySelector("input[name='__RequestVerificationToken']")!.GetAttribute("value")!;
        using var content = new FormUrlEncodedContent([new("__RequestVerificationToken", token), new("paper", "legal")]);

        using var posted = await _client.PostAsync(page.PaperForm.GetAttribute("action"), content);

        Assert.Equal(HttpStatusCode.BadRequest, posted.StatusCode);
        var notice = await PrintViewPage.ReadAsync(posted);
        Assert.Contains(PaperSetting.ChoiceMessage, notice.ByTestId("sheet-notice")!.TextContent, StringComparison.Ordinal);
        Assert.False(posted.Headers.TryGetValues("Set-Cookie", out var cookies) && cookies.Any(c => c.StartsWith(PaperSetting.CookieName, StringComparison.Ordinal)));
    }

    [Fact]
    public async Task Get_UnknownPaperQuery_Returns400Notice()
    {
        var (id, _) = await CreateAsync();

        var page = await PrintViewPage.OpenAsync(_client, SheetRoutes.Sheet(id, 1) + "?paper=tabloid");

        Assert.Equal(400, page.Status);
        Assert.Contains(PaperSetting.ChoiceMessage, page.ByTestId("sheet-notice")!.TextContent, StringComparison.Ordinal);
        Assert.Null(page.ByTestId("section-bms"));
        Assert.Equal(SheetRoutes.Sheet(id, 1), page.ByTestId("notice-link")!.GetAttribute("href"));
    }

    [Fact]
    public async Task Post_WithTokenButNoHandler_Returns405()
    {
        var (id, _) = await CreateAsync();
        var page = await PrintViewPage.OpenAsync(_client, SheetRoutes.Sheet(id, 1));
        var token = page.PaperForm.QuerySelector("input[name='__RequestVerificationToken']")!.GetAttribute("value")!;
        using var content = new FormUrlEncodedContent([new("__RequestVerificationToken", token), new("paper", "letter")]);

        using var posted = await _client.PostAsync(SheetRoutes.Sheet(id, 1), content);

        Assert.Equal(HttpStatusCode.MethodNotAllowed, posted.StatusCode);
        Assert.NotNull((await PrintViewPage.ReadAsync(posted)).ByTestId("error-page"));
    }

    [Fact]
    public async Task Get_UnknownDesignOrRevision_Returns404ErrorPage()
    {
        var (id, _) = await CreateAsync();

        foreach (var path in new[] { SheetRoutes.Sheet(id, 2), SheetRoutes.Sheet(int.MaxValue, 1), SheetRoutes.Sheet(id, -1) })
        {
            var page = await PrintViewPage.OpenAsync(_client, path);
            Assert.Equal(404, page.Status);
            Assert.NotNull(page.ByTestId("error-page"));
        }
    }

    [Fact]
    public async Task Get_RevisionOfAnotherCalculationVersion_Shows409NoticeAndNoFigures()
    {
        var (id, _) = await CreateAsync();
        var number = await factory.InsertRevisionAsync(id, "0.9.0");

        var page = await PrintViewPage.OpenAsync(_client, SheetRoutes.Sheet(id, number));

        Assert.Equal(409, page.Status);
        var notice = page.ByTestId("sheet-notice")!;
        Assert.Contains(RevisionSheetService.VersionMessage(number, "0.9.0"), notice.TextContent, StringComparison.Ordinal);
        Assert.Equal($"/designs/{id}", notice.QuerySelector("[data-testid='notice-link']")!.GetAttribute("href"));
        Assert.Null(page.ByTestId("section-bms"));
        Assert.Null(page.ByTestId("link-pdf"));
    }

    private async Task<(int Id, DesignSheetModel Model)> CreateAsync()
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard, SheetDesigns.Customer, SheetDesigns.Job);
        return (design.Id, await factory.ModelAsync(design.Id, 1));
    }

    private static void AssertSettingRows(PrintViewPage page, string testId, IReadOnlyList<SettingRow> expected)
    {
        var rows = page.AllByTestId(testId);
        Assert.NotEmpty(expected);
        Assert.Equal(expected.Select(r => (r.Key, r.Label, r.Value.Text, r.Note ?? "")),
            rows.Select(e => (e.GetAttribute("data-key")!, PrintViewPage.Text(e, "th"), PrintViewPage.Text(e, ".value"), PrintViewPage.Text(e, ".note"))));
    }
}
