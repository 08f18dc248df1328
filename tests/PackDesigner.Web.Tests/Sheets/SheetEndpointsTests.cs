using System.Net;
using System.Text.Json;
using Microsoft.AspNetCore.Mvc.Testing;
using Microsoft.Extensions.Logging;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Spread;
using PackDesigner.Reports.Export;
using PackDesigner.Web.Pages.Sheets;
using PackDesigner.Web.Tests.Reports;
using F = PackDesigner.Reports.Formatting.SheetFormatter;

namespace PackDesigner.Web.Tests.Sheets;

/// <summary>The sheet's files: the PDF, the settings as CSV and JSON, and the chart images.</summary>
public sealed class SheetEndpointsTests(SheetAppFactory factory) : IClassFixture<SheetAppFactory>
{
    // ISO 216 A4 is 210 × 297 mm and US Letter 8.5 × 11 in; in PDF points (1/72 in) 595.3 × 841.9 and 612 × 792.
    private const double A4Width = 595.28, A4Height = 841.89, LetterWidth = 612, LetterHeight = 792;

    private readonly HttpClient _client = factory.CreateClient(new WebApplicationFactoryClientOptions { AllowAutoRedirect = false });

    public static TheoryData<string> FileRoutes => new()
    {
        SheetRoutes.PdfPath, SheetRoutes.CsvPath, SheetRoutes.JsonPath, SheetRoutes.OcvChartPath, SheetRoutes.LadderChartPath, SheetRoutes.SpreadChartPath,
    };

    [Fact]
    public async Task GetPdf_SavedRevision_SpreadSectionWithTheRecommendedCv()
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);

        var text = PdfText.Read(await _client.GetByteArrayAsync(SheetRoutes.Pdf(design.Id, 1)));

        // The stored input analysed with the default (deterministic) settings, independently of the app.
        var spread = SpreadMonteCarlo.Analyze(new SpreadRequest { Design = SheetDesigns.Standard, Spread = new SpreadSettings() }).Result!;
        Assert.Contains("7 Cell spread", text.AllLines);
        Assert.Contains($"Recommended CV, pack {F.PackVoltage(spread.RecommendedConstantVoltage).Text}", text.Flat, StringComparison.Ordinal);
        Assert.Contains($"Recommended CV per cell {F.CellVoltage(spread.RecommendedConstantVoltagePerCell).Text}", text.AllLines);
    }

    [Fact]
    public async Task GetSpreadChart_SavedRevision_Png()
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);

        using var response = await _client.GetAsync(SheetRoutes.SpreadChart(design.Id, 1));

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("image/png", response.Content.Headers.ContentType?.MediaType);
        var bytes = await response.Content.ReadAsByteArrayAsync();
        // PNG signature (ISO/IEC 15948, 5.2).
        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A }, bytes[..8]);
    }

    [Fact]
    public async Task GetPdf_SavedRevision_InlinePdfWithTheHashAndTheModelsBmsValues()
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard, SheetDesigns.Customer, SheetDesigns.Job);
        var model = await factory.ModelAsync(design.Id, 1);

        using var response = await _client.GetAsync(SheetRoutes.Pdf(design.Id, 1));

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("application/pdf", response.Content.Headers.ContentType?.MediaType);
        Assert.Equal("inline", response.Content.Headers.ContentDisposition?.DispositionType);
        Assert.Equal($"design-{design.Id}-rev-1.pdf", response.Content.Headers.ContentDisposition?.FileName);
        var text = PdfText.Read(await response.Content.ReadAsByteArrayAsync());
        var hash = design.LatestRevision.InputSha256[..12];
        Assert.All(text.PageLines, page => Assert.Contains(page, l => l.Contains("Input " + hash, StringComparison.Ordinal)));
        Assert.All(text.PageLines, page => Assert.Contains(page, l => l.Contains(SheetDesigns.Name, StringComparison.Ordinal)));
        Assert.NotEmpty(model.BmsSettings);
        foreach (var s in model.BmsSettings)
        {
            Assert.Contains($"{s.Label} {s.PerCell.Text} {s.PerPack?.Text ?? "—"}", text.AllLines);
        }

        // The model's figures are Core's, formatted once: the over-voltage trip per cell as an independent check.
        var core = DesignEvaluator.Evaluate(SheetDesigns.Standard).Result!;
        Assert.Equal(F.CellVoltage(core.CellThresholds.OverVoltageTrip).Text, model.BmsSettings.Single(s => s.Key == "ov-trip").PerCell.Text);
        // The OCV chart, the ladder and the spread histogram.
        Assert.Equal(3, text.ImagesPerPage.Sum());
        Assert.All(model.Cautions, c => Assert.Contains(c.Title, text.AllLines));
    }

    [Fact]
    public async Task GetPdf_TwoRequests_ByteIdentical()
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);

        var first = await _client.GetByteArrayAsync(SheetRoutes.Pdf(design.Id, 1));
        var second = await _client.GetByteArrayAsync(SheetRoutes.Pdf(design.Id, 1));

        Assert.True(first.Length > 10_000);
        Assert.Equal(first, second);
    }

    [Theory]
    [InlineData(null, A4Width, A4Height)]
    [InlineData("a4", A4Width, A4Height)]
    [InlineData("letter", LetterWidth, LetterHeight)]
    [InlineData("LETTER", LetterWidth, LetterHeight)]
    public async Task GetPdf_PaperQuery_PagesOfThatSize(string? paper, double width, double height)
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);
        var path = SheetRoutes.Pdf(design.Id, 1) + (paper is null ? "" : "?paper=" + paper);

        var text = PdfText.Read(await _client.GetByteArrayAsync(path));

        Assert.All(text.PageSizes, size =>
        {
            Assert.Equal(width, size.Width, 0.5);
            Assert.Equal(height, size.Height, 0.5);
        });
    }

    [Theory]
    [InlineData("?paper=legal")]
    [InlineData("?paper=")]
    [InlineData("?paper=a4&paper=letter")]
    public async Task GetPdf_UnknownPaper_Returns400NamingPaper(string query)
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);

        using var response = await _client.GetAsync(SheetRoutes.Pdf(design.Id, 1) + query);

        Assert.Equal(HttpStatusCode.BadRequest, response.StatusCode);
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        using var body = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        Assert.Equal(PaperSetting.ChoiceMessage, body.RootElement.GetProperty("errors").GetProperty("paper")[0].GetString());
    }

    [Theory]
    [MemberData(nameof(FileRoutes))]
    public async Task GetFile_UnknownDesignOrRevision_Returns404ErrorPage(string route)
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);

        foreach (var path in new[] { SheetRoutes.Revision(design.Id, 2) + route, SheetRoutes.Revision(int.MaxValue, 1) + route, "/designs/abc/revisions/1" + route })
        {
            using var response = await _client.GetAsync(path);
            Assert.Equal(HttpStatusCode.NotFound, response.StatusCode);
            var page = await PrintViewPage.ReadAsync(response);
            Assert.NotNull(page.ByTestId("error-page"));
        }
    }

    [Theory]
    [MemberData(nameof(FileRoutes))]
    public async Task GetFile_RevisionOfAnotherCalculationVersion_Returns409Problem(string route)
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);
        var number = await factory.InsertRevisionAsync(design.Id, "0.9.0");

        using var response = await _client.GetAsync(SheetRoutes.Revision(design.Id, number) + route);

        Assert.Equal(HttpStatusCode.Conflict, response.StatusCode);
        Assert.Equal("application/problem+json", response.Content.Headers.ContentType?.MediaType);
        using var body = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        Assert.Equal(409, body.RootElement.GetProperty("status").GetInt32());
        Assert.Equal(RevisionSheetService.VersionMessage(number, "0.9.0"), body.RootElement.GetProperty("detail").GetString());
        Assert.Equal("0.9.0", body.RootElement.GetProperty("storedCalculationVersion").GetString());
        Assert.Null(response.Content.Headers.ContentDisposition);
    }

    [Fact]
    public async Task GetPdf_StoredResultDiffersFromTheRecomputedOne_Returns500AndLogsIt()
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);
        var number = await factory.InsertRevisionAsync(design.Id, DesignEvaluator.CalculationVersion, json => json.Replace("\"series\":24", "\"series\":23", StringComparison.Ordinal));

        using var response = await _client.GetAsync(SheetRoutes.Pdf(design.Id, number));

        Assert.Equal(HttpStatusCode.InternalServerError, response.StatusCode);
        var page = await PrintViewPage.ReadAsync(response);
        Assert.NotNull(page.ByTestId("error-page"));
        Assert.DoesNotContain("stored result", page.Document.Body!.TextContent, StringComparison.Ordinal);
        Assert.Contains(factory.Logs.Entries, e => e.Level == LogLevel.Error && e.Exception is SheetIntegrityException integrity
            && integrity.Message.Contains($"Revision {number} of design {design.Id}", StringComparison.Ordinal));
    }

    [Fact]
    public async Task GetSettingsCsv_SavedRevision_EveryBmsAndChargerValueOfTheModel()
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);
        var model = await factory.ModelAsync(design.Id, 1);

        using var response = await _client.GetAsync(SheetRoutes.SettingsCsv(design.Id, 1));

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("text/csv", response.Content.Headers.ContentType?.MediaType);
        Assert.Equal("utf-8", response.Content.Headers.ContentType?.CharSet);
        Assert.Equal("attachment", response.Content.Headers.ContentDisposition?.DispositionType);
        Assert.Equal($"design-{design.Id}-rev-1-settings.csv", response.Content.Headers.ContentDisposition?.FileName);
        var lines = (await response.Content.ReadAsStringAsync()).Split("\r\n", StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(SettingsExport.CsvHeader, lines[0]);
        var rows = lines.Skip(1).Select(CsvFields).ToList();
        Assert.All(rows, r => Assert.Equal(10, r.Length));
        Assert.All(rows, r => Assert.Equal([SheetDesigns.Name, "1", design.LatestRevision.InputSha256], r[1..4]));
        Assert.Equal(model.BmsSettings.Count(s => s.PerPack is not null) + model.BmsSettings.Count + model.ChargerSettings.Count, rows.Count);
        foreach (var s in model.BmsSettings)
        {
            Assert.Contains(rows, r => r[4] == "bms" && r[5] == s.Key && r[7] == "cell" && r[8] == s.PerCell.Number && r[9] == s.PerCell.Unit);
            if (s.PerPack is { } pack)
            {
                Assert.Contains(rows, r => r[4] == "bms" && r[5] == s.Key && r[7] == "pack" && r[8] == pack.Number && r[9] == pack.Unit);
            }
        }

        foreach (var c in model.ChargerSettings)
        {
            Assert.Contains(rows, r => r[4] == "charger" && r[5] == c.Key && r[6] == c.Label && r[8] == c.Value.Number && r[9] == c.Value.Unit);
        }
    }

    [Fact]
    public async Task GetSettingsJson_SavedRevision_EveryBmsAndChargerValueOfTheModel()
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);
        var model = await factory.ModelAsync(design.Id, 1);

        using var response = await _client.GetAsync(SheetRoutes.SettingsJson(design.Id, 1));

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("application/json", response.Content.Headers.ContentType?.MediaType);
        Assert.Equal($"design-{design.Id}-rev-1-settings.json", response.Content.Headers.ContentDisposition?.FileName);
        using var json = JsonDocument.Parse(await response.Content.ReadAsStringAsync());
        var root = json.RootElement;
        Assert.Equal(SettingsExport.SchemaVersion, root.GetProperty("schemaVersion").GetInt32());
        Assert.Equal(SheetDesigns.Name, root.GetProperty("design").GetProperty("name").GetString());
        Assert.Equal(design.LatestRevision.InputSha256, root.GetProperty("design").GetProperty("inputHash").GetString());
        var bms = root.GetProperty("bms").EnumerateArray().ToDictionary(e => e.GetProperty("key").GetString()!);
        Assert.Equal(model.BmsSettings.Select(s => s.Key), bms.Keys);
        foreach (var s in model.BmsSettings)
        {
            var perCell = bms[s.Key].GetProperty("perCell");
            Assert.Equal(s.PerCell.Number, Value(perCell.GetProperty("value")));
            Assert.Equal(s.PerCell.Unit, perCell.GetProperty("unit").GetString());
            if (s.PerPack is { } pack)
            {
                Assert.Equal(pack.Number, Value(bms[s.Key].GetProperty("perPack").GetProperty("value")));
            }
        }

        var charger = root.GetProperty("charger").EnumerateArray().ToDictionary(e => e.GetProperty("key").GetString()!);
        Assert.Equal(model.ChargerSettings.Select(c => c.Key), charger.Keys);
        Assert.All(model.ChargerSettings, c => Assert.Equal(c.Value.Number, Value(charger[c.Key].GetProperty("value"))));
    }

    [Theory]
    [InlineData("ocv")]
    [InlineData("ladder")]
    public async Task GetChart_SavedRevision_PngImage(string chart)
    {
        var design = await factory.CreateDesignAsync(SheetDesigns.Name, SheetDesigns.Standard);
        var path = chart == "ocv" ? SheetRoutes.OcvChart(design.Id, 1) : SheetRoutes.LadderChart(design.Id, 1);

        using var response = await _client.GetAsync(path);

        Assert.Equal(HttpStatusCode.OK, response.StatusCode);
        Assert.Equal("image/png", response.Content.Headers.ContentType?.MediaType);
        var png = await response.Content.ReadAsByteArrayAsync();
        // PNG signature and IHDR size (ISO/IEC 15948): width and height big-endian at bytes 16 and 20.
        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A }, png[..8]);
        var width = (png[16] << 24) | (png[17] << 16) | (png[18] << 8) | png[19];
        var height = (png[20] << 24) | (png[21] << 16) | (png[22] << 8) | png[23];
        Assert.Equal(SheetChartImages.Width * SheetChartImages.Scale, width);
        Assert.Equal((chart == "ocv" ? SheetChartImages.OcvHeight : SheetChartImages.LadderHeight) * SheetChartImages.Scale, height);
    }

    /// <summary>The fields of one RFC 4180 record: commas separate, double quotes enclose, "" is a quote inside quotes.</summary>
    private static string[] CsvFields(string line)
    {
        var fields = new List<string>();
        var field = new System.Text.StringBuilder();
        var quoted = false;
        for (var i = 0; i < line.Length; i++)
        {
            var c = line[i];
            if (quoted && c == '"' && i + 1 < line.Length && line[i + 1] == '"')
            {
                field.Append('"');
                i++;
            }
            else if (c == '"')
            {
                quoted = !quoted;
            }
            else if (c == ',' && !quoted)
            {
                fields.Add(field.ToString());
                field.Clear();
            }
            else
            {
                field.Append(c);
            }
        }

        fields.Add(field.ToString());
        return [.. fields];
    }

    /// <summary>A JSON value as its printed digits: the export writes numbers with the sheet's digits, words as strings.</summary>
    private static string Value(JsonElement value) => value.ValueKind == JsonValueKind.Number ? value.GetRawText() : value.GetString()!;
}
