using System.Globalization;

namespace PackDesigner.Web.Tests.Pages;

/// <summary>The configuration finder page: GET with the form in the query string, parsed with AngleSharp.</summary>
public sealed class FinderPageTests(PackDesignerFactory factory) : IClassFixture<PackDesignerFactory>
{
    private const string Query = "/finder?Input.Chemistry=lfp&Input.CapacityAh=100&Input.NominalVoltage=3.2&Input.MaxChargeVoltage=3.65"
        + "&Input.MinDischargeVoltage=2.5&Input.MaxDischargeCurrentA=100&Input.PeakDischargeCurrentA=200&Input.MassKg=2"
        + "&Input.ControllerMinVoltage=46&Input.ControllerMaxVoltage=60&Input.ControllerContinuousCurrentA=80&Input.ControllerPeakCurrentA=150"
        + "&Input.MaxCells=40&Input.SortBy=cellCount";

    private readonly HttpClient _client = factory.CreateClient();

    [Fact]
    public async Task Finder_NoQuery_ShowsTheFormAndTheNavEntry()
    {
        var page = await HtmlPage.OpenAsync(_client, "/finder");

        Assert.Equal(200, page.Status);
        Assert.NotNull(page.ByTestId("finder-form"));
        Assert.Null(page.ByTestId("finder-results"));
        Assert.Contains(page.ByTestId("main-nav")!.QuerySelectorAll("a"), a => a.GetAttribute("href") == "/finder" && a.TextContent == "Finder");
    }

    [Fact]
    public async Task Finder_LfpCellFor48VController_ListsCandidatesThatFitAndRejections()
    {
        var page = await HtmlPage.OpenAsync(_client, Query);

        var rows = page.AllByTestId("finder-candidate");
        Assert.NotEmpty(rows);
        // By hand: 16S1P of 3.65 V LFP cells peaks at 58.4 V, inside 46–60 V (common-practice LFP figures), with 16 ≤ 40 cells.
        Assert.Contains(rows, r => r.GetAttribute("data-series") == "16" && r.GetAttribute("data-parallel") == "1");
        Assert.All(rows, r => Assert.True(
            int.Parse(r.GetAttribute("data-series")!, CultureInfo.InvariantCulture) * int.Parse(r.GetAttribute("data-parallel")!, CultureInfo.InvariantCulture) <= 40));
        var rejected = page.ByTestId("finder-rejected")!;
        Assert.NotEmpty(rejected.QuerySelectorAll("li[data-code='top-of-charge']"));
        Assert.NotEmpty(rejected.QuerySelectorAll("li[data-code='loaded-bottom']"));
    }

    [Fact]
    public async Task Finder_RowLink_OpensTheNewDesignWithThatSeriesAndParallel()
    {
        var page = await HtmlPage.OpenAsync(_client, Query);
        var row = page.AllByTestId("finder-candidate").First(r => r.GetAttribute("data-series") == "16" && r.GetAttribute("data-parallel") == "2");
        var link = row.QuerySelector("[data-testid='open-as-design']")!.GetAttribute("href")!;

        var editor = await HtmlPage.OpenAsync(_client, link);

        Assert.Equal(200, editor.Status);
        Assert.Equal("16", editor.Document.QuerySelector("input[name='Input.Series']")!.GetAttribute("value"));
        Assert.Equal("2", editor.Document.QuerySelector("input[name='Input.Parallel']")!.GetAttribute("value"));
    }

    [Fact]
    public async Task Finder_BadFigures_ShowErrorsBesideTheirFields()
    {
        var page = await HtmlPage.OpenAsync(_client, "/finder?Input.Chemistry=lfp&Input.CapacityAh=abc&Input.ControllerMaxVoltage=&Input.MaxCells=-3");

        Assert.Equal(200, page.Status);
        Assert.NotNull(page.ByTestId("error-cell.capacityAh"));
        Assert.Null(page.ByTestId("finder-results"));
    }

    [Fact]
    public async Task Finder_MissingControllerVoltage_NamesTheField()
    {
        var page = await HtmlPage.OpenAsync(_client, "/finder?Input.Chemistry=lfp&Input.ControllerMaxVoltage=");

        Assert.NotNull(page.ByTestId("error-controller.maxVoltage"));
    }
}
