using System.Globalization;
using PackDesigner.Core.Spread;
using PackDesigner.Web.Api;
using PackDesigner.Web.Pages.Designs;
using PackDesigner.Web.Tests.TestData;

namespace PackDesigner.Web.Tests.Pages;

/// <summary>The design's cell-spread page: GET with the settings in the query string, parsed with AngleSharp.</summary>
public sealed class SpreadPageTests(PackDesignerFactory factory) : IClassFixture<PackDesignerFactory>
{
    private readonly HttpClient _client = factory.CreateClient();

    [Fact]
    public async Task Details_SavedDesign_LinksToTheSpreadPage()
    {
        var id = await _client.NewDesignIdAsync("Spread link " + Guid.NewGuid());

        var page = await HtmlPage.OpenAsync(_client, DesignRoutes.View(id));

        Assert.Equal(DesignRoutes.Spread(id), page.ByTestId("spread-link")!.GetAttribute("href"));
        Assert.Equal("Cell spread", page.ByTestId("spread-link")!.TextContent.Trim());
    }

    [Fact]
    public async Task Spread_SavedDesign_ShowsTheRecommendedCvOfCoresAnalysisAndTheHistogram()
    {
        var design = DesignRequestBuilder.Valid();
        var id = await _client.NewDesignIdAsync("Spread page " + Guid.NewGuid(), design);

        var page = await HtmlPage.OpenAsync(_client, DesignRoutes.Spread(id) + "?Input.Trials=2000&Input.Seed=5&Input.CapacitySigmaPercent=1.5");

        Assert.Equal(200, page.Status);
        var core = SpreadMonteCarlo.Analyze(new SpreadRequest
        {
            Design = DesignRequestMapper.TryMap(design.Build(), out _)!,
            Spread = new SpreadSettings { Trials = 2000, Seed = 5, CapacitySigmaPercent = 1.5, TripRisk = 0.001 },
        }).Result!;
        // The page shows Core's recommended CV for the same input, to 0.01 V.
        Assert.Equal(core.RecommendedConstantVoltage.ToString("0.00", CultureInfo.InvariantCulture) + "\u00A0V", page.ByTestId("recommended-cv")!.TextContent.Trim());
        Assert.NotNull(page.ByTestId("recommended-cv-cell"));
        var svg = page.ByTestId("spread-histogram");
        Assert.NotNull(svg);
        Assert.NotEmpty(svg!.QuerySelectorAll("rect"));
        Assert.NotNull(page.ByTestId("ov-release-mark"));
        Assert.NotNull(page.ByTestId("ov-trip-mark"));
        Assert.NotNull(page.ByTestId("p-ov-trip"));
        Assert.NotEmpty(page.AllByTestId("percentile-table"));
        Assert.Equal(2, page.ByTestId("spread-comparison")!.QuerySelectorAll("tbody tr").Length);
        Assert.NotNull(page.ByTestId("match-advice"));
        Assert.NotNull(page.ByTestId("safety-caution"));
    }

    [Fact]
    public async Task Spread_TooFewTrials_ShowsTheErrorBesideTrials()
    {
        var id = await _client.NewDesignIdAsync("Spread error " + Guid.NewGuid());

        var page = await HtmlPage.OpenAsync(_client, DesignRoutes.Spread(id) + "?Input.Trials=5");

        Assert.Equal(200, page.Status);
        Assert.NotNull(page.ByTestId("field-spread.trials")!.QuerySelector("[data-testid='error-spread.trials']"));
        Assert.Null(page.ByTestId("recommended-cv"));
    }

    [Fact]
    public async Task Spread_TrialsNotANumber_ShowsTheErrorBesideTrials()
    {
        var id = await _client.NewDesignIdAsync("Spread text " + Guid.NewGuid());

        var page = await HtmlPage.OpenAsync(_client, DesignRoutes.Spread(id) + "?Input.Trials=lots&Input.Seed=x");

        Assert.NotNull(page.ByTestId("error-spread.trials"));
        Assert.NotNull(page.ByTestId("error-spread.seed"));
    }

    [Fact]
    public async Task Spread_UnknownDesign_Is404()
    {
        var page = await HtmlPage.OpenAsync(_client, DesignRoutes.Spread(987654));

        Assert.Equal(404, page.Status);
    }
}
