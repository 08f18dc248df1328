using System.Text.Json.Nodes;
using PackDesigner.Core.Cells;
using PackDesigner.Web.Tests.TestData;

namespace PackDesigner.Web.Tests.Api;

/// <summary>POST /api/v1/evaluate with bad input: always a 4xx ProblemDetails naming the field, never a 500.</summary>
public sealed class EvaluateValidationTests(PackDesignerFactory factory) : IClassFixture<PackDesignerFactory>
{
    private const string ProblemJson = "application/problem+json";
    private readonly HttpClient _client = factory.CreateClient();

    [Fact]
    public async Task Evaluate_NegativeCapacity_NamesTheField()
    {
        var answer = await _client.EvaluateAsync(DesignRequestBuilder.Valid().WithCell(c => c with { CapacityAh = -5 }));

        AssertProblem(answer, 400);
        Assert.Contains("Ah", Assert.Single(answer.Errors["cell.capacityAh"]));
    }

    [Fact]
    public async Task Evaluate_MissingControllerFigure_NamesItsPath()
    {
        var answer = await _client.EvaluateAsync(DesignRequestBuilder.Valid().WithController(c => c with { MaxVoltage = null }));

        AssertProblem(answer, 400);
        Assert.Equal(["Required."], answer.Errors["controller.maxVoltage"]);
    }

    [Fact]
    public async Task Evaluate_MissingSections_AreAllReportedAtOnce()
    {
        var answer = await _client.EvaluateAsync(DesignRequestBuilder.Valid().WithoutController().WithSeries(null).WithCharger(c => c with { FloatStage = null }));

        AssertProblem(answer, 400);
        Assert.Contains("controller", answer.Errors.Keys);
        Assert.Contains("series", answer.Errors.Keys);
        Assert.Contains("charger.floatStage", answer.Errors.Keys);
    }

    [Fact]
    public async Task Evaluate_CustomChemistryWithoutFigures_NamesEachMissingFigureOnce()
    {
        var answer = await _client.EvaluateAsync(DesignRequestBuilder.Valid().WithCell(_ => new() { Chemistry = Chemistry.Custom, CapacityAh = 50 }));

        AssertProblem(answer, 400);
        foreach (var field in new[] { "cell.nominalVoltage", "cell.maxChargeVoltage", "cell.minDischargeVoltage", "cell.internalResistanceMilliohm", "cell.massKg" })
        {
            var message = Assert.Single(answer.Errors[field]);
            Assert.Contains("custom chemistry", message);
        }

        Assert.Contains("cell.ocvCurve", answer.Errors.Keys);
        Assert.DoesNotContain("cell.capacityAh", answer.Errors.Keys);
    }

    [Fact]
    public async Task Evaluate_CustomChemistryWithIncompleteDesign_ReportsCellAndDesignTogether()
    {
        var answer = await _client.EvaluateAsync(DesignRequestBuilder.Valid().WithoutController().WithCell(_ => new() { Chemistry = Chemistry.Custom }));

        AssertProblem(answer, 400);
        Assert.Contains("controller", answer.Errors.Keys);
        Assert.Contains("cell.capacityAh", answer.Errors.Keys);
    }

    [Fact]
    public async Task Evaluate_OcvRowsOutOfOrder_NamesTheRowAndItsMember()
    {
        var answer = await _client.EvaluateAsync(DesignRequestBuilder.Valid().WithOcvCurve((0, 2.5), (50, 3.3), (60, 3.2), (55, 3.4), (100, 3.6)));

        AssertProblem(answer, 400);
        Assert.Contains("Row 3", Assert.Single(answer.Errors["cell.ocvCurve[2].voltage"]));
        Assert.Contains("Row 4", Assert.Single(answer.Errors["cell.ocvCurve[3].socPercent"]));
    }

    [Fact]
    public async Task Evaluate_OcvTableNotFromZeroToHundred_NamesTheEndRows()
    {
        var answer = await _client.EvaluateAsync(DesignRequestBuilder.Valid().WithOcvCurve((5, 2.9), (50, 3.3), (95, 3.4)));

        AssertProblem(answer, 400);
        Assert.Contains("cell.ocvCurve[0].socPercent", answer.Errors.Keys);
        Assert.Contains("cell.ocvCurve[2].socPercent", answer.Errors.Keys);
    }

    [Fact]
    public async Task Evaluate_OcvRowWithoutVoltageOrNull_NamesTheRow()
    {
        var json = DesignRequestBuilder.Valid().WithOcvCurve((0, 2.5), (50, null), (100, 3.5)).ToJsonObject();
        json["cell"]!["ocvCurve"]!.AsArray().Insert(1, null);

        var answer = await _client.PostRawAsync(ApiClient.EvaluatePath, json.ToJsonString());

        AssertProblem(answer, 400);
        Assert.Contains("Row 2", Assert.Single(answer.Errors["cell.ocvCurve[1]"]));
        Assert.Equal(["Required."], answer.Errors["cell.ocvCurve[2].voltage"]);
    }

    [Fact]
    public async Task Evaluate_PresetCurveOutsideTheCellsVoltages_IsOneMessageAboutThePreset()
    {
        // The NMC preset's curve reaches 4.193 V; an LFP-like 3.65 V maximum cannot hold it.
        var answer = await _client.EvaluateAsync(DesignRequestBuilder.Valid().WithCell(c => c with { Chemistry = Chemistry.Nmc }));

        AssertProblem(answer, 400);
        Assert.Contains("NMC preset", Assert.Single(answer.Errors["cell.ocvCurve"]));
        Assert.DoesNotContain(answer.Errors.Keys, k => k.StartsWith("cell.ocvCurve[", StringComparison.Ordinal));
    }

    [Fact]
    public async Task Evaluate_WindowUpsideDown_NamesTheWindowTop()
    {
        var answer = await _client.EvaluateAsync(DesignRequestBuilder.Valid().WithSocWindow(80, 20));

        AssertProblem(answer, 400);
        Assert.Contains("socWindow.maxPercent", answer.Errors.Keys);
    }

    [Fact]
    public async Task Evaluate_MisspeltCellFigure_IsReportedNotIgnored()
    {
        var json = DesignRequestBuilder.Valid().ToJsonObject();
        json["cell"]!["internalResistanceMiliohm"] = 0.5;

        var answer = await _client.PostRawAsync(ApiClient.EvaluatePath, json.ToJsonString());

        AssertProblem(answer, 400);
        Assert.Contains("spelling", Assert.Single(answer.Errors["cell.internalResistanceMiliohm"]));
    }

    [Theory]
    [InlineData("{\"series\": 16,", "$")]
    [InlineData("{\"series\": 16 \"parallel\": 1}", "$")]
    [InlineData("not json at all", "$")]
    [InlineData("[1, 2]", "$")]
    [InlineData("null", "$")]
    [InlineData("{\"series\": \"sixteen\"}", "series")]
    [InlineData("{\"series\": 16.5}", "series")]
    [InlineData("{\"cell\": {\"chemistry\": \"lithium\"}}", "cell.chemistry")]
    [InlineData("{\"cell\": {\"chemistry\": 1}}", "cell.chemistry")]
    [InlineData("{\"cell\": {\"capacityAh\": \"100\"}}", "cell.capacityAh")]
    [InlineData("{\"cell\": \"lfp\"}", "cell")]
    [InlineData("{\"charger\": {\"floatStage\": \"no\"}}", "charger.floatStage")]
    [InlineData("{\"cell\": {\"ocvCurve\": [{\"socPercent\": 0, \"voltage\": \"2.5\"}]}}", "cell.ocvCurve[0].voltage")]
    public async Task Evaluate_MalformedOrWronglyTypedJson_Returns400NamingThePlace(string body, string field)
    {
        var answer = await _client.PostRawAsync(ApiClient.EvaluatePath, body);

        AssertProblem(answer, 400);
        var message = Assert.Single(Assert.Contains(field, answer.Errors));
        Assert.DoesNotContain("System.", message);
        Assert.DoesNotContain("Exception", message);
        if (field != "$" || body.StartsWith('{'))
        {
            Assert.Contains("line 1", message);
        }
    }

    [Fact]
    public async Task Evaluate_WrongType_SaysWhatWasExpected()
    {
        var json = DesignRequestBuilder.Valid().ToJsonObject();
        json["controller"]!["peakCurrentA"] = "a lot";

        var answer = await _client.PostRawAsync(ApiClient.EvaluatePath, json.ToJsonString());

        AssertProblem(answer, 400);
        Assert.StartsWith("Expected a number", Assert.Single(answer.Errors["controller.peakCurrentA"]));
    }

    [Theory]
    [InlineData("")]
    [InlineData("   ")]
    public async Task Evaluate_EmptyBody_Returns400(string body)
    {
        var answer = await _client.PostRawAsync(ApiClient.EvaluatePath, body);

        AssertProblem(answer, 400);
        Assert.Contains("$", answer.Errors.Keys);
    }

    [Fact]
    public async Task Evaluate_NotJsonMediaType_Returns415()
    {
        var answer = await _client.PostRawAsync(ApiClient.EvaluatePath, DesignRequestBuilder.Valid().ToJson(), "text/plain");

        AssertProblem(answer, 415);
    }

    [Fact]
    public async Task Evaluate_OversizedBody_Returns413()
    {
        var rows = Enumerable.Range(0, 3000).Select(i => new JsonObject { ["socPercent"] = i / 30.0, ["voltage"] = 2.5 + i / 3000.0 });
        var json = DesignRequestBuilder.Valid().ToJsonObject();
        json["cell"]!["ocvCurve"] = new JsonArray([.. rows]);

        var answer = await _client.PostRawAsync(ApiClient.EvaluatePath, json.ToJsonString());

        AssertProblem(answer, 413);
    }

    [Fact]
    public async Task Evaluate_Get_IsNotAServerError()
    {
        var answer = await _client.GetAnswerAsync(ApiClient.EvaluatePath);

        Assert.InRange(answer.Status, 400, 499);
        Assert.Equal(ProblemJson, answer.MediaType);
    }

    private static void AssertProblem(ApiAnswer answer, int status)
    {
        Assert.Equal(status, answer.Status);
        Assert.Equal(ProblemJson, answer.MediaType);
        Assert.Equal(status, answer.Body.GetProperty("status").GetInt32());
        Assert.False(string.IsNullOrWhiteSpace(answer.Body.GetProperty("title").GetString()));
    }
}
