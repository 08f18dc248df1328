using System.Text.Json;
using System.Text.Json.Nodes;
using PackDesigner.Core.Demo;
using PackDesigner.Core.Evaluation;
using PackDesigner.Web.Tests.TestData;

namespace PackDesigner.Web.Tests.Api;

/// <summary>POST /api/v1/evaluate with valid designs: the answer is Core's result, in the contract's names.</summary>
public sealed class EvaluateEndpointTests(PackDesignerFactory factory) : IClassFixture<PackDesignerFactory>
{
    private readonly HttpClient _client = factory.CreateClient();

    [Fact]
    public async Task Evaluate_DemoDesign_ReturnsCoreResultAsJson()
    {
        var answer = await _client.EvaluateAsync(DesignRequestBuilder.From(DemoScenario.PickupConversion));

        Assert.Equal(200, answer.Status);
        Assert.Equal("application/json", answer.MediaType);
        // The API must answer exactly what Core computes for the same design (no rounding, nothing lost in mapping).
        var expected = JsonSerializer.SerializeToNode(DesignEvaluator.Evaluate(DemoScenario.PickupConversion).Result, factory.ApiJsonOptions);
        var actual = JsonNode.Parse(answer.Body.GetRawText());
        Assert.True(JsonNode.DeepEquals(expected, actual), "The API's result differs from Core's evaluation of the same design.");
    }

    [Fact]
    public async Task Evaluate_DemoDesign_HasTheContractsNamesWithFiniteNumbers()
    {
        var answer = await _client.EvaluateAsync(DesignRequestBuilder.From(DemoScenario.PickupConversion));
        var body = answer.Body;

        AssertNumbers(body.GetProperty("pack"), "maxVoltage", "nominalVoltage", "minVoltage", "windowHighVoltage", "windowLowVoltage",
            "loadedLowVoltage", "regenHighVoltage", "capacityAh", "nominalEnergyWh", "usableEnergyWh", "massKg");
        Assert.Equal(JsonValueKind.String, body.GetProperty("pack").GetProperty("voltageClass").ValueKind);
        AssertNumbers(body.GetProperty("charger"), "constantVoltage", "constantCurrentA", "terminationCurrentA", "weakestCellEndOfChargeVoltage");
        AssertNumbers(body.GetProperty("protection"), "continuousCurrentA", "fuseRatingA", "fuseMinVoltageRating", "prospectiveShortCircuitA",
            "contactorContinuousA", "prechargeResistanceOhm", "prechargeTimeS", "prechargeEnergyJ", "prechargePeakCurrentA");
        foreach (var name in new[] { "cellThresholds", "packThresholds", "thermal", "energy", "balancing", "cell" })
        {
            Assert.Equal(JsonValueKind.Object, body.GetProperty(name).ValueKind);
        }

        var ladder = body.GetProperty("ladder").EnumerateArray().ToList();
        Assert.NotEmpty(ladder);
        Assert.All(ladder, l =>
        {
            Assert.Equal(JsonValueKind.String, l.GetProperty("layer").ValueKind);
            AssertNumbers(l, "perCellVoltage", "packVoltage");
        });

        var findings = body.GetProperty("findings").EnumerateArray().ToList();
        Assert.NotEmpty(findings);
        Assert.All(findings, f =>
        {
            Assert.Contains(f.GetProperty("severity").GetString(), new[] { "error", "warning", "info" });
            Assert.False(string.IsNullOrWhiteSpace(f.GetProperty("code").GetString()));
            Assert.False(string.IsNullOrWhiteSpace(f.GetProperty("message").GetString()));
            Assert.Equal(JsonValueKind.Array, f.GetProperty("fields").ValueKind);
        });

        AssertAllNumbersFinite(body);
    }

    [Fact]
    public async Task Evaluate_BlankCellFigures_TakeThePresetAndSaySo()
    {
        var answer = await _client.EvaluateAsync(DesignRequestBuilder.Valid().WithCell(c => c with { MassKg = null, InternalResistanceMilliohm = null }));

        Assert.Equal(200, answer.Status);
        var cell = answer.Body.GetProperty("cell");
        // LFP preset values (Core's ChemistryPresets: typical, common practice).
        Assert.Equal(2.0, cell.GetProperty("massKg").GetDouble());
        Assert.Equal(0.6, cell.GetProperty("internalResistanceMilliohm").GetDouble());
        Assert.Equal("preset", cell.GetProperty("origins").GetProperty("massKg").GetString());
        Assert.Equal("datasheet", cell.GetProperty("origins").GetProperty("capacityAh").GetString());
    }

    [Fact]
    public async Task Evaluate_PrechargeEnergy_IsHalfCVSquared()
    {
        var answer = await _client.EvaluateAsync(DesignRequestBuilder.Valid());

        // Textbook circuit theory (REFERENCES.md): the precharge resistor dissipates ½·C·V² over a full charge,
        // independent of R. C = 1000 µF, V = 16 × 3.65 V = 58.4 V → 0.5 × 1e-3 × 58.4² = 1.70528 J.
        var energy = answer.Body.GetProperty("protection").GetProperty("prechargeEnergyJ").GetDouble();
        Assert.Equal(1.70528, energy, 1e-9);
        // τ = R·C with t95 = 3τ = 1 s → R = 1 / (3 × 1e-3) = 333.33 Ω (v(3τ) = 95.02 %, REFERENCES.md).
        Assert.Equal(1000.0 / 3, answer.Body.GetProperty("protection").GetProperty("prechargeResistanceOhm").GetDouble(), 1e-9);
    }

    [Fact]
    public async Task Evaluate_MarginsGivenInPart_KeepTheOtherDefaults()
    {
        var answer = await _client.EvaluateAsync(DesignRequestBuilder.Valid().WithMargins(new() { OverVoltageTripBelowMaxV = 0.1 }));

        var t = answer.Body.GetProperty("cellThresholds");
        Assert.Equal(3.55, t.GetProperty("overVoltageTrip").GetDouble(), 1e-12);
        // The default OV hysteresis of 0.10 V stays (Core's MarginsInput default, common practice 50–200 mV).
        Assert.Equal(3.45, t.GetProperty("overVoltageRelease").GetDouble(), 1e-12);
    }

    private static void AssertNumbers(JsonElement parent, params string[] names)
    {
        foreach (var name in names)
        {
            Assert.True(parent.TryGetProperty(name, out var value), $"'{name}' is missing.");
            Assert.Equal(JsonValueKind.Number, value.ValueKind);
            Assert.True(double.IsFinite(value.GetDouble()), $"'{name}' is not finite.");
        }
    }

    private static void AssertAllNumbersFinite(JsonElement element)
    {
        switch (element.ValueKind)
        {
            case JsonValueKind.Object:
                foreach (var p in element.EnumerateObject())
                {
                    AssertAllNumbersFinite(p.Value);
                }

                break;
            case JsonValueKind.Array:
                foreach (var item in element.EnumerateArray())
                {
                    AssertAllNumbersFinite(item);
                }

                break;
            case JsonValueKind.Number:
                Assert.True(double.IsFinite(element.GetDouble()));
                break;
        }
    }
}
