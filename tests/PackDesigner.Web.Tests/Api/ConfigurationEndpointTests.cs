using System.Text.Json;
using System.Text.Json.Nodes;
using PackDesigner.Web.Tests.TestData;

namespace PackDesigner.Web.Tests.Api;

/// <summary>POST /api/v1/configurations: the S×P candidates of a cell for a controller, and the rejected ranges.</summary>
public sealed class ConfigurationEndpointTests(PackDesignerFactory factory) : IClassFixture<PackDesignerFactory>
{
    private const string Path = "/api/v1/configurations";
    private const double ControllerMin = 46;
    private const double ControllerMax = 60;
    private readonly HttpClient _client = factory.CreateClient();

    private static JsonObject Request()
    {
        var design = DesignRequestBuilder.Valid().ToJsonObject();
        return new JsonObject
        {
            ["cell"] = design["cell"]!.DeepClone(),
            ["controller"] = design["controller"]!.DeepClone(),
            ["targets"] = new JsonObject { ["maxCells"] = 64 },
        };
    }

    [Fact]
    public async Task Configurations_LfpCellFor48VController_CandidatesFitTheWindow()
    {
        var answer = await _client.PostRawAsync(Path, Request().ToJsonString());

        Assert.Equal(200, answer.Status);
        var candidates = answer.Body.GetProperty("candidates").EnumerateArray().ToList();
        Assert.NotEmpty(candidates);
        Assert.All(candidates, c =>
        {
            // The finder's top of charge is the charge voltage (CV) the configuration's charger stops at.
            Assert.InRange(c.GetProperty("constantVoltage").GetDouble(), 0, ControllerMax);
            Assert.True(c.GetProperty("maxVoltage").GetDouble() >= c.GetProperty("constantVoltage").GetDouble());
            Assert.True(c.GetProperty("loadedLowVoltage").GetDouble() >= ControllerMin);
            Assert.True(c.GetProperty("series").GetInt32() * c.GetProperty("parallel").GetInt32() <= 64);
            foreach (var name in new[] { "usableEnergyWh", "continuousCurrentA", "massKg" })
            {
                Assert.True(double.IsFinite(c.GetProperty(name).GetDouble()));
            }

            Assert.Equal(JsonValueKind.Number, c.GetProperty("errors").ValueKind);
            Assert.Equal(JsonValueKind.Number, c.GetProperty("warnings").ValueKind);
        });
        // By hand: 16S1P charged no higher than 16 × 3.65 V = 58.4 V (LFP cell maximum, common practice) stays under
        // the 60 V maximum; 19S cannot, since even 19 × 3.2 V nominal = 60.8 V is above it.
        Assert.Contains(candidates, c => c.GetProperty("series").GetInt32() == 16 && c.GetProperty("parallel").GetInt32() == 1);
        Assert.DoesNotContain(candidates, c => c.GetProperty("series").GetInt32() >= 19);
        // By hand: 14S is at most 14 × 3.2 V = 44.8 V at nominal, below the controller's 46 V minimum.
        Assert.DoesNotContain(candidates, c => c.GetProperty("series").GetInt32() <= 14);
    }

    [Fact]
    public async Task Configurations_LfpCellFor48VController_RejectedCarryReasons()
    {
        var answer = await _client.PostRawAsync(Path, Request().ToJsonString());

        var rejected = answer.Body.GetProperty("rejected").EnumerateArray().ToList();
        Assert.NotEmpty(rejected);
        Assert.All(rejected, r => Assert.False(string.IsNullOrWhiteSpace(r.GetProperty("reason").GetString())));
        // Too many in series fail at the top of charge, too few at the loaded bottom (see the hand figures above).
        Assert.Contains(rejected, r => r.GetProperty("code").GetString() == "top-of-charge"
            && r.GetProperty("series").ValueKind == JsonValueKind.Number && r.GetProperty("series").GetInt32() <= 19);
        Assert.Contains(rejected, r => r.GetProperty("code").GetString() == "loaded-bottom"
            && r.GetProperty("series").ValueKind == JsonValueKind.Number && r.GetProperty("series").GetInt32() <= 14);
    }

    [Fact]
    public async Task Configurations_MissingController_NamesIt()
    {
        var request = Request();
        request.Remove("controller");

        var answer = await _client.PostRawAsync(Path, request.ToJsonString());

        Assert.Equal(400, answer.Status);
        Assert.Contains("controller", answer.Errors.Keys);
    }

    [Fact]
    public async Task Configurations_NegativeTarget_NamesTheTarget()
    {
        var request = Request();
        request["targets"] = new JsonObject { ["minUsableEnergyWh"] = -1 };

        var answer = await _client.PostRawAsync(Path, request.ToJsonString());

        Assert.Equal(400, answer.Status);
        Assert.Contains("targets.minUsableEnergyWh", answer.Errors.Keys);
    }
}
