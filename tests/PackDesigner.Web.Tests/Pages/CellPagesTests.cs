using System.Globalization;
using System.Text;
using Microsoft.EntityFrameworkCore;
using Microsoft.Extensions.DependencyInjection;
using PackDesigner.Core.Cells;
using PackDesigner.Data;
using PackDesigner.Data.Cells;
using PackDesigner.Web.Tests.TestData;

namespace PackDesigner.Web.Tests.Pages;

/// <summary>The cell library's pages, used as a browser would: real form posts with the antiforgery token.</summary>
public sealed class CellPagesTests(PackDesignerFactory factory) : IClassFixture<PackDesignerFactory>
{
    private const string Form = "cell-form";
    private const string UnicodeName = "Zelle Ω-Ü 電池 <b>x</b>";
    private readonly HttpClient _client = factory.CreateClient();

    [Theory]
    [InlineData("lfp", Chemistry.Lfp)]
    [InlineData("nmc", Chemistry.Nmc)]
    [InlineData("nca", Chemistry.Nca)]
    [InlineData("lto", Chemistry.Lto)]
    public async Task GetNew_Preset_PrefillsEveryFigureOfThePreset(string preset, Chemistry chemistry)
    {
        var page = await HtmlPage.OpenAsync(_client, "/cells/new?preset=" + preset);

        var p = ChemistryPresets.For(chemistry)!;
        Assert.Equal(preset, page.Value(Form, "Input.Cell.Chemistry"));
        foreach (var (name, value) in PresetFigures(p))
        {
            Assert.Equal(Invariant(value), page.Value(Form, "Input.Cell." + name));
        }

        Assert.Equal(string.Empty, page.Value(Form, "Input.Cell.ColdInternalResistanceMilliohm"));
        Assert.Equal(string.Empty, page.Value(Form, "Input.Cell.OcvTable"));
        Assert.NotNull(page.Value(Form, "__RequestVerificationToken"));
    }

    [Fact]
    public async Task PostPreset_OtherChemistry_ReplacesTheFiguresKeepsTheNameAndSavesNothing()
    {
        var before = await CountCellsAsync();
        var page = await HtmlPage.OpenAsync(_client, "/cells/new");

        var filled = await page.SubmitAsync(_client, Form, new Dictionary<string, string>
        {
            ["Input.Name"] = "Kept name",
            ["Input.Cell.Chemistry"] = "lto",
            ["Input.Cell.CapacityAh"] = "7",
        }, button: "fill-preset");

        Assert.Equal(200, filled.Status);
        Assert.Equal("Kept name", filled.Value(Form, "Input.Name"));
        Assert.Equal("lto", filled.Value(Form, "Input.Cell.Chemistry"));
        Assert.Equal(Invariant(ChemistryPresets.Lto.CapacityAh), filled.Value(Form, "Input.Cell.CapacityAh"));
        Assert.Equal(Invariant(ChemistryPresets.Lto.MaxChargeVoltage), filled.Value(Form, "Input.Cell.MaxChargeVoltage"));
        Assert.Equal(before, await CountCellsAsync());
    }

    [Fact]
    public async Task PostNew_ValidForm_SavesTheCellAndShowsItsPage()
    {
        var name = "Form cell " + Guid.NewGuid().ToString("N")[..6];
        var page = await HtmlPage.OpenAsync(_client, "/cells/new?preset=nmc");

        var saved = await page.SubmitAsync(_client, Form, new Dictionary<string, string>
        {
            ["Input.Name"] = name,
            ["Input.Maker"] = "Workshop test",
            ["Input.Cell.CapacityAh"] = "4.8",
            ["Input.Cell.TerminationCurrentA"] = "0.1",
        });

        Assert.Equal(200, saved.Status);
        Assert.Matches(@"/cells/\d+$", saved.Address.AbsolutePath);
        Assert.Equal(name, saved.Text("cell-name"));
        Assert.NotNull(saved.ByTestId("saved-message"));
        var stored = await FindCellAsync(name);
        Assert.Equal(4.8, stored.Figures.CapacityAh);
        Assert.Equal(0.1, stored.Figures.TerminationCurrentA);
        Assert.Equal(ChemistryPresets.Nmc.MaxChargeVoltage, stored.Figures.MaxChargeVoltage);
        Assert.Equal("Workshop test", stored.Maker);
        Assert.Null(stored.Figures.OcvCurve);
    }

    [Fact]
    public async Task PostNew_UnicodeName_IsStoredExactlyAndShownEncoded()
    {
        var page = await HtmlPage.OpenAsync(_client, "/cells/new");

        var saved = await page.SubmitAsync(_client, Form, new Dictionary<string, string> { ["Input.Name"] = UnicodeName });
        var list = await HtmlPage.OpenAsync(_client, "/cells?q=" + Uri.EscapeDataString("電池"));

        Assert.Equal(UnicodeName, saved.Text("cell-name"));
        Assert.Contains("&lt;b&gt;x&lt;/b&gt;", saved.Html, StringComparison.Ordinal);
        Assert.DoesNotContain("<b>x</b>", saved.Html, StringComparison.Ordinal);
        Assert.Equal(UnicodeName, (await FindCellAsync(UnicodeName)).Name);
        Assert.Contains(list.AllByTestId("cell-row"), r => r.QuerySelector("a")!.TextContent == UnicodeName);
        Assert.DoesNotContain("<b>x</b>", list.Html, StringComparison.Ordinal);
    }

    [Fact]
    public async Task PostNew_BadValues_ShowsEachMessageBesideItsFieldAndSavesNothing()
    {
        var before = await CountCellsAsync();
        var page = await HtmlPage.OpenAsync(_client, "/cells/new");

        var result = await page.SubmitAsync(_client, Form, new Dictionary<string, string>
        {
            ["Input.Name"] = "  ",
            ["Input.Cell.CapacityAh"] = "abc",
            ["Input.Cell.MaxChargeVoltage"] = "3,65",
            ["Input.Cell.MassKg"] = "-1",
        });

        Assert.Equal(200, result.Status);
        Assert.Contains("Enter a name", result.Text("error-name"));
        Assert.Contains("Enter a number", result.Text("error-cell.capacityAh"));
        Assert.Contains("point as the decimal separator", result.Text("error-cell.maxChargeVoltage"));
        Assert.Equal("abc", result.Value(Form, "Input.Cell.CapacityAh"));
        Assert.Contains("Nothing was saved", result.Text("error-summary"));
        Assert.Equal(before, await CountCellsAsync());

        // Once the numbers parse, Core's range checks speak for the figures left wrong.
        var second = await result.SubmitAsync(_client, Form, new Dictionary<string, string>
        {
            ["Input.Name"] = "Range check",
            ["Input.Cell.CapacityAh"] = "100",
            ["Input.Cell.MaxChargeVoltage"] = "3.65",
        });
        Assert.NotNull(second.Text("error-cell.massKg"));
        Assert.Equal(before, await CountCellsAsync());
    }

    [Theory]
    [InlineData("0,2.5\n50,abc\n100,3.6", 2, "not a number")]
    [InlineData("0,2.5\n50;3.3\n100,3.6", 2, "Expected 2 values")]
    [InlineData("0,2.5\n60,3.30\n50,3.32\n100,3.6", 3, "increase strictly")]
    [InlineData("0,2.5\n60,3.30\n70,3.28\n100,3.6", 3, "increase strictly")]
    [InlineData("0,2.0\n50,3.3\n100,3.6", 1, "outside the cell's range")]
    [InlineData("10,2.6\n50,3.3\n100,3.6", 1, "0 % state of charge")]
    [InlineData("socPercent,voltage\n0,2.5\n\n50,\n100,3.6", 4, "voltage is empty")]
    [InlineData("0,2.5\n50,3.3\n100,7.5", 3, "outside 0–6 V")]
    public async Task PreviewPaste_BadRow_ShowsTheRowWithItsMessageAndSavesNothing(string table, int line, string message)
    {
        var before = await CountCellsAsync();
        var page = await HtmlPage.OpenAsync(_client, "/cells/new");

        var result = await page.SubmitAsync(_client, Form, new Dictionary<string, string>
        {
            ["Input.Name"] = "Row errors",
            ["Input.Cell.OcvTable"] = table,
        });

        Assert.Equal(200, result.Status);
        var row = Assert.Single(result.AllByTestId("ocv-preview-row"), r => r.GetAttribute("data-line") == Invariant(line));
        Assert.Contains(message, row.QuerySelector("[data-testid='ocv-row-error']")?.TextContent ?? string.Empty);
        Assert.NotNull(result.Text("error-cell.ocvCurve"));
        Assert.Equal(table, result.Value(Form, "Input.Cell.OcvTable"));
        Assert.Equal(before, await CountCellsAsync());
    }

    [Theory]
    [InlineData("0,2.5\n0.5,3.3\n1,3.6", "fraction")]
    [InlineData("0,2500\n50,3300\n100,3600", "millivolts")]
    [InlineData("socPercent;voltage\n0;2.5\n100;3.6", "semicolons")]
    [InlineData("soc,volts\n0,2.5\n100,3.6", "header socPercent,voltage")]
    [InlineData("0,2.5", "at least two rows")]
    public async Task PreviewPaste_WrongTable_ShowsTheTableErrorAndSavesNothing(string table, string message)
    {
        var before = await CountCellsAsync();
        var page = await HtmlPage.OpenAsync(_client, "/cells/new");

        var result = await page.SubmitAsync(_client, Form, new Dictionary<string, string> { ["Input.Cell.OcvTable"] = table }, button: "preview-ocv");

        Assert.Equal(200, result.Status);
        Assert.Contains(message, result.Text("ocv-table-errors"));
        Assert.Null(result.ByTestId("ocv-preview-ok"));
        Assert.Equal(before, await CountCellsAsync());
    }

    [Fact]
    public async Task PreviewPaste_TooManyRows_IsRefusedAtTheFirstRowTooMany()
    {
        var rows = string.Join('\n', Enumerable.Range(0, OcvCsv.MaxRows + 5).Select(i => FormattableString.Invariant($"{i * 100.0 / (OcvCsv.MaxRows + 4):0.####},{2.5 + i * 1.1 / (OcvCsv.MaxRows + 4):0.#####}")));
        var page = await HtmlPage.OpenAsync(_client, "/cells/new");

        var result = await page.SubmitAsync(_client, Form, new Dictionary<string, string> { ["Input.Cell.OcvTable"] = rows }, button: "preview-ocv");

        var row = Assert.Single(result.AllByTestId("ocv-preview-row"), r => r.GetAttribute("data-line") == Invariant(OcvCsv.MaxRows + 1));
        Assert.Contains("More than", row.TextContent);
    }

    [Fact]
    public async Task PreviewPaste_LargerThanTheLimit_IsRefusedWithTheLimit()
    {
        var huge = "socPercent,voltage\n" + new string('1', 3 * OcvCsv.MaxBytes) + ",3.3";
        var page = await HtmlPage.OpenAsync(_client, "/cells/new");

        var result = await page.SubmitAsync(_client, Form, new Dictionary<string, string> { ["Input.Cell.OcvTable"] = huge }, button: "preview-ocv");

        Assert.Equal(200, result.Status);
        Assert.Contains("larger than 64 KiB", result.Text("ocv-table-errors"));
    }

    [Fact]
    public async Task PostNew_ValidPastedTable_IsPreviewedFirstAndSavedOnTheSecondPost()
    {
        var name = "Previewed " + Guid.NewGuid().ToString("N")[..6];
        const string table = "0,2.5\n10,3.2\n50,3.3\n90,3.34\n100,3.6";
        var page = await HtmlPage.OpenAsync(_client, "/cells/new");

        var first = await page.SubmitAsync(_client, Form, new Dictionary<string, string> { ["Input.Name"] = name, ["Input.Cell.OcvTable"] = table });

        Assert.Equal(200, first.Status);
        Assert.NotNull(first.ByTestId("preview-note"));
        Assert.NotNull(first.ByTestId("ocv-preview-ok"));
        Assert.Equal(5, first.AllByTestId("ocv-preview-row").Count);
        Assert.Null(await TryFindCellAsync(name));

        var second = await first.SubmitAsync(_client, Form);

        Assert.Matches(@"/cells/\d+$", second.Address.AbsolutePath);
        Assert.Equal(5, second.AllByTestId("ocv-row").Count);
        var stored = await FindCellAsync(name);
        Assert.Equal([0, 10, 50, 90, 100], stored.Figures.OcvCurve!.Select(p => p.SocPercent));
        Assert.Equal(3.34, stored.Figures.OcvCurve![3].Voltage);
    }

    [Fact]
    public async Task PostNew_AfterThePreviewButton_SaveSavesInsteadOfPreviewingAgain()
    {
        var name = "Preview button " + Guid.NewGuid().ToString("N")[..6];
        var page = await HtmlPage.OpenAsync(_client, "/cells/new");

        var previewed = await page.SubmitAsync(_client, Form, new Dictionary<string, string> { ["Input.Name"] = name, ["Input.Cell.OcvTable"] = "0,2.5\n100,3.6" }, button: "preview-ocv");
        var filled = await previewed.SubmitAsync(_client, Form, new Dictionary<string, string> { ["Input.Cell.Chemistry"] = "lfp" }, button: "fill-preset");
        var saved = await filled.SubmitAsync(_client, Form);

        Assert.Contains("handler=preset", filled.Address.Query, StringComparison.Ordinal);
        Assert.Equal("/cells/new", filled.Form(Form).GetAttribute("action"));
        Assert.Matches(@"/cells/\d+$", saved.Address.AbsolutePath);
        Assert.Equal(2, (await FindCellAsync(name)).Figures.OcvCurve!.Count);
    }

    [Fact]
    public async Task PostNew_UploadedCsv_FillsTheBoxShowsThePreviewThenSaves()
    {
        var name = "Uploaded " + Guid.NewGuid().ToString("N")[..6];
        var csv = Encoding.UTF8.GetBytes("\uFEFFsocPercent,voltage\r\n0,2.6\r\n50,3.3\r\n100,3.55\r\n");
        var page = await HtmlPage.OpenAsync(_client, "/cells/new");

        var previewed = await page.SubmitAsync(_client, Form, new Dictionary<string, string> { ["Input.Name"] = name },
            file: new FormFile("OcvFile", "table.csv", csv));

        Assert.NotNull(previewed.ByTestId("ocv-preview-ok"));
        Assert.Contains("50,3.3", previewed.Value(Form, "Input.Cell.OcvTable"));
        Assert.Equal(["2", "3", "4"], previewed.AllByTestId("ocv-preview-row").Select(r => r.GetAttribute("data-line")!));
        Assert.Null(await TryFindCellAsync(name));

        var saved = await previewed.SubmitAsync(_client, Form);

        Assert.Matches(@"/cells/\d+$", saved.Address.AbsolutePath);
        Assert.Equal(3.55, (await FindCellAsync(name)).Figures.OcvCurve![2].Voltage);
    }

    [Theory]
    [InlineData("empty", "The file is empty")]
    [InlineData("huge", "larger than 64 KiB")]
    [InlineData("latin1", "not UTF-8")]
    [InlineData("bad-row", "'x' is not a number")]
    public async Task PostNew_BadUpload_IsRefusedBesideTheTableAndSavesNothing(string kind, string message)
    {
        var before = await CountCellsAsync();
        byte[] content = kind switch
        {
            "empty" => [],
            "huge" => Encoding.UTF8.GetBytes("socPercent,voltage\n" + string.Concat(Enumerable.Repeat("50,3.3\n", OcvCsv.MaxBytes / 7 + 10))),
            "latin1" => [.. Encoding.ASCII.GetBytes("socPercent,voltage\n0,2.5\n"), 0xE9, .. Encoding.ASCII.GetBytes(",3\n100,3.6\n")],
            _ => Encoding.UTF8.GetBytes("socPercent,voltage\n0,2.5\nx,3.3\n100,3.6\n"),
        };
        var page = await HtmlPage.OpenAsync(_client, "/cells/new");

        var result = await page.SubmitAsync(_client, Form, new Dictionary<string, string> { ["Input.Name"] = "Bad upload " + kind },
            file: new FormFile("OcvFile", kind + ".csv", content));

        Assert.Equal(200, result.Status);
        Assert.Contains(message, result.Document.QuerySelector("#section-ocv")!.TextContent);
        Assert.NotNull(result.ByTestId("error-cell.ocvCurve"));
        Assert.Equal(before, await CountCellsAsync());
    }

    [Fact]
    public async Task PostEdit_StaleVersion_ShowsTheConflictKeepsTheInputAndOverwritesOnlyWhenSavedAgain()
    {
        var cell = await CreateCellAsync("Conflict " + Guid.NewGuid().ToString("N")[..6]);
        var page = await HtmlPage.OpenAsync(_client, $"/cells/{cell.Id}/edit");
        Assert.Equal(Invariant(cell.Version), page.Value(Form, "Input.Version"));

        // Someone else saves first, through the API.
        var other = await _client.GetAnswerAsync($"/api/v1/cells/{cell.Id}");
        var body = other.Body.GetRawText().Replace("\"capacityAh\":100", "\"capacityAh\":90", StringComparison.Ordinal);
        Assert.Equal(200, (await _client.PutRawAsync($"/api/v1/cells/{cell.Id}", body)).Status);

        var result = await page.SubmitAsync(_client, Form, new Dictionary<string, string> { ["Input.Cell.CapacityAh"] = "123", ["Input.Notes"] = "mine" });

        Assert.Equal(200, result.Status);
        Assert.Contains("Someone else", result.Text("conflict"));
        Assert.Contains(result.ByTestId("conflict-table")!.QuerySelectorAll("tr"), r => r.TextContent.Contains("Capacity", StringComparison.Ordinal)
            && r.TextContent.Contains("90", StringComparison.Ordinal) && r.TextContent.Contains("123", StringComparison.Ordinal));
        Assert.Equal("123", result.Value(Form, "Input.Cell.CapacityAh"));
        Assert.Equal("mine", result.Value(Form, "Input.Notes"));
        var stored = await GetCellAsync(cell.Id);
        Assert.Equal(90, stored.Figures.CapacityAh);
        Assert.Null(stored.Notes);
        Assert.Equal(Invariant(stored.Version), result.Value(Form, "Input.Version"));

        var again = await result.SubmitAsync(_client, Form);

        Assert.Equal($"/cells/{cell.Id}", again.Address.AbsolutePath);
        Assert.Equal(123, (await GetCellAsync(cell.Id)).Figures.CapacityAh);
    }

    [Fact]
    public async Task GetEdit_CellWithOwnTable_ShowsTheTableAsCsvAndSavesWithoutAnotherPreview()
    {
        var cell = await CreateCellAsync("Own table " + Guid.NewGuid().ToString("N")[..6], withTable: true);
        var page = await HtmlPage.OpenAsync(_client, $"/cells/{cell.Id}/edit");

        Assert.StartsWith("socPercent,voltage", page.Value(Form, "Input.Cell.OcvTable"), StringComparison.Ordinal);

        var saved = await page.SubmitAsync(_client, Form, new Dictionary<string, string> { ["Input.Model"] = "M-2" });

        Assert.Equal($"/cells/{cell.Id}", saved.Address.AbsolutePath);
        var stored = await GetCellAsync(cell.Id);
        Assert.Equal("M-2", stored.Model);
        Assert.Equal(cell.Figures.OcvCurve, stored.Figures.OcvCurve);
    }

    [Fact]
    public async Task PostClone_CopiesTheCellAndOpensTheCopy()
    {
        var cell = await CreateCellAsync("Original " + Guid.NewGuid().ToString("N")[..6]);
        var details = await HtmlPage.OpenAsync(_client, $"/cells/{cell.Id}");

        var copy = await details.SubmitAsync(_client, "clone-form");

        Assert.Matches(@"/cells/\d+/edit$", copy.Address.AbsolutePath);
        Assert.Equal(cell.Name + " (copy)", copy.Value(Form, "Input.Name"));
        Assert.Equal("100", copy.Value(Form, "Input.Cell.CapacityAh"));
    }

    [Fact]
    public async Task PostDelete_CurrentVersion_DeletesAndStaleVersion_KeepsTheCell()
    {
        var cell = await CreateCellAsync("Delete me " + Guid.NewGuid().ToString("N")[..6]);
        var confirm = await HtmlPage.OpenAsync(_client, $"/cells/{cell.Id}/delete");
        Assert.Contains("No design links", confirm.Text("delete-consequence"));

        var stale = await confirm.SubmitAsync(_client, "delete-form", new Dictionary<string, string> { ["version"] = Invariant(cell.Version + 7) });
        Assert.NotNull(stale.ByTestId("delete-refused"));
        Assert.Equal(cell.Name, (await GetCellAsync(cell.Id)).Name);

        var deleted = await stale.SubmitAsync(_client, "delete-form");

        Assert.Equal("/cells", deleted.Address.AbsolutePath);
        Assert.Contains("deleted", deleted.Text("saved-message"));
        Assert.Null(await TryFindCellAsync(cell.Name));
    }

    [Fact]
    public async Task PostNew_WithoutAntiforgeryToken_IsRefusedAndSavesNothing()
    {
        var before = await CountCellsAsync();
        var page = await HtmlPage.OpenAsync(_client, "/cells/new");

        var result = await page.SubmitAsync(_client, Form, new Dictionary<string, string> { ["Input.Name"] = "No token" }, withToken: false);

        Assert.Equal(400, result.Status);
        Assert.Equal(before, await CountCellsAsync());
    }

    [Fact]
    public async Task GetIndex_Search_ListsOnlyMatchingCells()
    {
        var token = Guid.NewGuid().ToString("N")[..8];
        await CreateCellAsync($"Alpha {token}");
        await CreateCellAsync($"Beta {token}");

        var page = await HtmlPage.OpenAsync(_client, $"/cells?q=alpha+{token}");

        var row = Assert.Single(page.AllByTestId("cell-row"));
        Assert.Equal($"Alpha {token}", row.QuerySelector("a")!.TextContent);
        Assert.Equal($"alpha {token}", ((AngleSharp.Html.Dom.IHtmlInputElement)page.Document.QuerySelector("#q")!).Value);
    }

    [Fact]
    public async Task GetDetails_UnknownCell_IsNotFound()
    {
        var page = await HtmlPage.OpenAsync(_client, "/cells/987654");

        Assert.Equal(404, page.Status);
        Assert.NotNull(page.ByTestId("error-page"));
    }

    private static IEnumerable<(string Name, double Value)> PresetFigures(ChemistryPreset p) =>
    [
        ("CapacityAh", p.CapacityAh), ("NominalVoltage", p.NominalVoltage), ("MaxChargeVoltage", p.MaxChargeVoltage),
        ("MinDischargeVoltage", p.MinDischargeVoltage), ("MaxChargeCurrentA", p.MaxChargeCurrentA), ("MaxDischargeCurrentA", p.MaxDischargeCurrentA),
        ("PeakDischargeCurrentA", p.PeakDischargeCurrentA), ("PeakDischargeDurationS", p.PeakDischargeDurationS),
        ("InternalResistanceMilliohm", p.InternalResistanceMilliohm), ("MassKg", p.MassKg), ("CapacityTolerancePercent", p.CapacityTolerancePercent),
        ("ChargeTemperatureMinC", p.ChargeTemperatureMinC), ("ChargeTemperatureMaxC", p.ChargeTemperatureMaxC),
        ("DischargeTemperatureMinC", p.DischargeTemperatureMinC), ("DischargeTemperatureMaxC", p.DischargeTemperatureMaxC),
    ];

    private async Task<CellDetails> CreateCellAsync(string name, bool withTable = false)
    {
        using var scope = factory.Services.CreateScope();
        var figures = new CellInput
        {
            Chemistry = Chemistry.Lfp,
            CapacityAh = 100,
            OcvCurve = withTable ? [new(0, 2.5), new(50, 3.3), new(100, 3.6)] : null,
        };
        return (await scope.ServiceProvider.GetRequiredService<CellLibrary>().CreateAsync(new CellData(name, figures))).Value!;
    }

    private async Task<CellDetails> GetCellAsync(int id)
    {
        using var scope = factory.Services.CreateScope();
        return (await scope.ServiceProvider.GetRequiredService<CellLibrary>().GetAsync(id)).Value!;
    }

    private async Task<CellDetails?> TryFindCellAsync(string name)
    {
        using var scope = factory.Services.CreateScope();
        var id = await scope.ServiceProvider.GetRequiredService<PackDesignerDbContext>().Cells.Where(c => c.Name == name).Select(c => (int?)c.Id).FirstOrDefaultAsync();
        return id is { } i ? await GetCellAsync(i) : null;
    }

    private async Task<CellDetails> FindCellAsync(string name) => await TryFindCellAsync(name) ?? throw new InvalidOperationException($"No cell named {name}.");

    private async Task<int> CountCellsAsync()
    {
        using var scope = factory.Services.CreateScope();
        return await scope.ServiceProvider.GetRequiredService<PackDesignerDbContext>().Cells.CountAsync();
    }

    private static string Invariant(IFormattable value) => value.ToString(null, CultureInfo.InvariantCulture);
}
