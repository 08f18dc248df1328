using System.Text.Json;
using PackDesigner.Core.Cells;
using PackDesigner.Web.Tests.TestData;

namespace PackDesigner.Web.Tests.Api;

/// <summary>GET /api/v1/presets: every chemistry preset with its values, OCV table and sources.</summary>
public sealed class PresetsEndpointTests(PackDesignerFactory factory) : IClassFixture<PackDesignerFactory>
{
    private static readonly string[] Figures =
    [
        "capacityAh", "nominalVoltage", "maxChargeVoltage", "minDischargeVoltage", "maxChargeCurrentA", "maxDischargeCurrentA",
        "peakDischargeCurrentA", "peakDischargeDurationS", "internalResistanceMilliohm", "massKg", "capacityTolerancePercent",
        "chargeTemperatureMinC", "chargeTemperatureMaxC", "dischargeTemperatureMinC", "dischargeTemperatureMaxC",
    ];

    private readonly HttpClient _client = factory.CreateClient();

    [Fact]
    public async Task Presets_Get_ListsEveryPresetWithItsFiguresAndSources()
    {
        var answer = await _client.GetAnswerAsync("/api/v1/presets");

        Assert.Equal(200, answer.Status);
        var presets = answer.Body.GetProperty("presets").EnumerateArray().ToList();
        Assert.Equal(["lfp", "nmc", "nca", "lto"], presets.Select(p => p.GetProperty("chemistry").GetString()));
        Assert.All(presets, p =>
        {
            Assert.False(string.IsNullOrWhiteSpace(p.GetProperty("description").GetString()));
            var sources = p.GetProperty("sources");
            foreach (var figure in Figures)
            {
                Assert.Equal(JsonValueKind.Number, p.GetProperty(figure).ValueKind);
                Assert.False(string.IsNullOrWhiteSpace(sources.GetProperty(figure).GetString()), $"{figure} has no source.");
            }

            Assert.False(string.IsNullOrWhiteSpace(sources.GetProperty("ocvCurve").GetString()));
            Assert.True(p.GetProperty("ocvCurve").GetArrayLength() >= 2);
        });
    }

    [Fact]
    public async Task Presets_Get_GiveTheSameValuesAsCore()
    {
        var answer = await _client.GetAnswerAsync("/api/v1/presets");

        var lfp = answer.Body.GetProperty("presets")[0];
        Assert.Equal(ChemistryPresets.Lfp.MaxChargeVoltage, lfp.GetProperty("maxChargeVoltage").GetDouble());
        Assert.Equal(ChemistryPresets.Lfp.OcvCurve.Count, lfp.GetProperty("ocvCurve").GetArrayLength());
        // LFP: 3.65 V maximum charge, 2.5 V minimum, 3.2 V nominal (REFERENCES.md, common practice).
        Assert.Equal(3.65, lfp.GetProperty("maxChargeVoltage").GetDouble());
        Assert.Equal(2.5, lfp.GetProperty("minDischargeVoltage").GetDouble());
        Assert.Equal(3.2, lfp.GetProperty("nominalVoltage").GetDouble());
        Assert.Equal("typical, common practice", lfp.GetProperty("sources").GetProperty("capacityAh").GetString());
    }

    [Theory]
    // Chen et al., J. Electrochem. Soc. 167 (2020) 080534, OCV fit evaluated at these states of charge (REFERENCES.md).
    [InlineData(10, 3.258)]
    [InlineData(20, 3.449)]
    [InlineData(50, 3.708)]
    [InlineData(80, 4.022)]
    public async Task Presets_NmcTable_FollowsThePublishedFitAndCitesIt(double socPercent, double volts)
    {
        var answer = await _client.GetAnswerAsync("/api/v1/presets");

        var nmc = answer.Body.GetProperty("presets").EnumerateArray().Single(p => p.GetProperty("chemistry").GetString() == "nmc");
        var row = nmc.GetProperty("ocvCurve").EnumerateArray().Single(r => r.GetProperty("socPercent").GetDouble() == socPercent);
        Assert.Equal(volts, row.GetProperty("voltage").GetDouble(), 1e-3);
        Assert.Contains("Chen et al.", nmc.GetProperty("sources").GetProperty("ocvCurve").GetString());
    }
}
