using System.Text.Json;
using System.Text.Json.Nodes;
using PackDesigner.Core.Spread;
using PackDesigner.Web.Api;
using PackDesigner.Web.Tests.TestData;

namespace PackDesigner.Web.Tests.Api;

/// <summary>POST /api/v1/spread: Core's spread Monte Carlo through the API, and its ProblemDetails for bad input.</summary>
public sealed class SpreadEndpointTests(PackDesignerFactory factory) : IClassFixture<PackDesignerFactory>
{
    private const string Path = "/api/v1/spread";
    private readonly HttpClient _client = factory.CreateClient();

    private static string Body(DesignRequestBuilder design, object spread) =>
        new JsonObject
        {
            ["design"] = design.ToJsonObject(),
            ["spread"] = JsonSerializer.SerializeToNode(spread, DesignRequestBuilder.Json),
        }.ToJsonString();

    private static object Settings(int trials = 2000, long seed = 42) =>
        new { distribution = "normal", capacitySigmaPercent = 1.5, resistanceSigmaPercent = 5.0, trials, seed };

    [Fact]
    public async Task Spread_ValidDesign_GivesFiniteProbabilitiesAndTheContractsNames()
    {
        var answer = await _client.PostRawAsync(Path, Body(DesignRequestBuilder.Valid(), Settings()));

        Assert.Equal(200, answer.Status);
        var b = answer.Body;
        Assert.Equal(2000, b.GetProperty("trials").GetInt32());
        foreach (var name in new[] { "overVoltageTripProbability", "overVoltageReleaseProbability", "underVoltageTripProbability" })
        {
            var p = b.GetProperty(name).GetDouble();
            Assert.InRange(p, 0, 1);
        }

        Assert.True(double.IsFinite(b.GetProperty("recommendedConstantVoltage").GetDouble()));
        var high = b.GetProperty("highestCellVoltageAtEndOfCharge");
        var percentiles = new[] { "p5", "p50", "p95", "p999" }.Select(n => high.GetProperty(n).GetDouble()).ToArray();
        Assert.All(percentiles, v => Assert.True(double.IsFinite(v)));
        // Percentiles of one sample are ordered (definition of the empirical quantile).
        Assert.Equal(percentiles.Order(), percentiles);
        var energy = b.GetProperty("usableEnergyWh");
        Assert.True(energy.GetProperty("p5").GetDouble() <= energy.GetProperty("p50").GetDouble());
        Assert.True(energy.GetProperty("p50").GetDouble() <= energy.GetProperty("p95").GetDouble());
    }

    [Fact]
    public async Task Spread_SameSeedTwice_GivesTheSameJson()
    {
        var body = Body(DesignRequestBuilder.Valid(), Settings(seed: 7));

        var first = await _client.PostRawAsync(Path, body);
        var second = await _client.PostRawAsync(Path, body);

        Assert.Equal(200, first.Status);
        Assert.Equal(first.Text, second.Text);
    }

    [Fact]
    public async Task Spread_ValidDesign_EqualsCoresAnalysisOfTheSameInput()
    {
        var design = DesignRequestBuilder.Valid().WithParallel(2);
        var answer = await _client.PostRawAsync(Path, Body(design, Settings(trials: 1500, seed: 99)));

        var input = DesignRequestMapper.TryMap(design.Build(), out _)!;
        var core = SpreadMonteCarlo.Analyze(new SpreadRequest
        {
            Design = input,
            Spread = new SpreadSettings { Distribution = SpreadDistribution.Normal, CapacitySigmaPercent = 1.5, ResistanceSigmaPercent = 5, Trials = 1500, Seed = 99 },
        });
        var expected = JsonSerializer.SerializeToNode(core.Result, factory.ApiJsonOptions);
        Assert.True(JsonNode.DeepEquals(expected, JsonNode.Parse(answer.Text)), "The API's spread result differs from Core's for the same input.");
    }

    [Fact]
    public async Task Spread_TooFewTrials_NamesSpreadTrials()
    {
        var answer = await _client.PostRawAsync(Path, Body(DesignRequestBuilder.Valid(), Settings(trials: 3)));

        Assert.Equal(400, answer.Status);
        Assert.Contains("spread.trials", answer.Errors.Keys);
    }

    [Fact]
    public async Task Spread_TooManyCellDraws_NamesSpreadTrials()
    {
        // 1 000 000 trials of 16S4P are 64 million cell draws, above the 50 million bound.
        var answer = await _client.PostRawAsync(Path, Body(DesignRequestBuilder.Valid().WithParallel(4), Settings(trials: 1_000_000)));

        Assert.Equal(400, answer.Status);
        Assert.Contains("cell draws", Assert.Single(answer.Errors["spread.trials"]));
    }

    [Fact]
    public async Task Spread_BadDesignFigure_IsKeyedUnderDesign()
    {
        var answer = await _client.PostRawAsync(Path, Body(DesignRequestBuilder.Valid().WithCell(c => c with { CapacityAh = -5 }), Settings()));

        Assert.Equal(400, answer.Status);
        Assert.Contains("design.cell.capacityAh", answer.Errors.Keys);
    }

    [Fact]
    public async Task Spread_MissingSettings_NamesEachRequiredField()
    {
        var body = new JsonObject { ["design"] = DesignRequestBuilder.Valid().ToJsonObject(), ["spread"] = new JsonObject() }.ToJsonString();

        var answer = await _client.PostRawAsync(Path, body);

        Assert.Equal(400, answer.Status);
        Assert.Contains("spread.trials", answer.Errors.Keys);
        Assert.Contains("spread.seed", answer.Errors.Keys);
        Assert.Contains("spread.distribution", answer.Errors.Keys);
    }

    [Fact]
    public async Task Spread_MalformedJson_Is400WithoutParserText()
    {
        var answer = await _client.PostRawAsync(Path, "{\"design\": {\"series\": 16,,}");

        Assert.Equal(400, answer.Status);
        Assert.Contains("$", answer.Errors.Keys);
    }

    [Fact]
    public async Task Spread_TrialsAsText_NamesTheField()
    {
        var body = Body(DesignRequestBuilder.Valid(), new { distribution = "normal", trials = "many", seed = 1 });

        var answer = await _client.PostRawAsync(Path, body);

        Assert.Equal(400, answer.Status);
        Assert.Contains("spread.trials", answer.Errors.Keys);
    }
}
