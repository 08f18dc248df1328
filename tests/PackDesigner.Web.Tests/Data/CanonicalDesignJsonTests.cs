using System.Globalization;
using System.Reflection;
using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using PackDesigner.Core.Cells;
using PackDesigner.Core.Curves;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;
using PackDesigner.Data.Json;
using PackDesigner.Web.Tests.Data.Infrastructure;

namespace PackDesigner.Web.Tests.Data;

public sealed class CanonicalDesignJsonTests
{
    private static readonly DesignInput Small = new()
    {
        Cell = new CellInput { Chemistry = Chemistry.Nmc, CapacityAh = 5, OcvCurve = [new OcvPoint(0, 3.0), new OcvPoint(100, 4.2)] },
        Series = 14,
        Parallel = 4,
        LinkResistanceMilliohm = 0.25,
        SocWindow = new SocWindowInput(5, 95),
        Controller = new ControllerInput(40, 60, 80, 160, 5, 20, 470, 0.5),
        Charger = new ChargerInput(58.8, 10, 0.1, false),
        Ambient = new AmbientInput(-10, 40),
    };

    [Fact]
    public void Serialize_SmallInput_GivesThePinnedCanonicalText()
    {
        // The stored form: declaration order, camelCase, enums as camelCase strings, shortest invariant numbers,
        // nulls left out, no whitespace. Changing any of that changes every stored hash.
        const string expected =
            """
            {"cell":{"chemistry":"nmc","capacityAh":5,"ocvCurve":[{"socPercent":0,"voltage":3},{"socPercent":100,"voltage":4.2}]},
            "series":14,"parallel":4,"linkResistanceMilliohm":0.25,"balancing":"bottom","socWindow":{"minPercent":5,"maxPercent":95},
            "controller":{"minVoltage":40,"maxVoltage":60,"continuousCurrentA":80,"peakCurrentA":160,"peakDurationS":5,"regenCurrentA":20,
            "dcLinkCapacitanceMicrofarad":470,"prechargeTimeS":0.5},"charger":{"maxVoltage":58.8,"maxCurrentA":10,"voltageStepV":0.1,
            "floatStage":false},"ambient":{"minC":-10,"maxC":40}}
            """;

        Assert.Equal(expected.ReplaceLineEndings(""), CanonicalDesignJson.Serialize(Small));
    }

    [Fact]
    public void Serialize_EveryProperty_FollowsDeclarationOrder()
    {
        var input = TestDesigns.Default().WithEveryOptionalFigure().Build();
        using var doc = JsonDocument.Parse(CanonicalDesignJson.Serialize(input));

        AssertOrder(typeof(DesignInput), doc.RootElement);
        AssertOrder(typeof(CellInput), doc.RootElement.GetProperty("cell"));
        AssertOrder(typeof(MarginsInput), doc.RootElement.GetProperty("margins"));
        AssertOrder(typeof(ChargerInput), doc.RootElement.GetProperty("charger"));
    }

    [Fact]
    public void Deserialize_CanonicalText_RoundTripsEveryField()
    {
        var input = TestDesigns.Default().WithEveryOptionalFigure().Build();
        var json = CanonicalDesignJson.Serialize(input);

        var back = CanonicalDesignJson.Deserialize(json);

        Assert.Equal(json, CanonicalDesignJson.Serialize(back));
        Assert.Equal(input.Cell.OcvCurve, back.Cell.OcvCurve);
        Assert.Equal(input with { Cell = input.Cell with { OcvCurve = null } }, back with { Cell = back.Cell with { OcvCurve = null } });
        Assert.Equal(BalancingMethod.Top, back.Balancing);
        Assert.Equal(3.45, back.Charger.TargetCellVoltage);
        Assert.Equal(-10, back.Cell.ColdResistanceTemperatureC);
    }

    [Fact]
    public void Serialize_UnderACommaDecimalCulture_StillWritesInvariantNumbers()
    {
        var culture = (CultureInfo)CultureInfo.InvariantCulture.Clone();
        culture.NumberFormat.NumberDecimalSeparator = ",";
        culture.NumberFormat.NumberGroupSeparator = ".";
        var saved = CultureInfo.CurrentCulture;
        try
        {
            CultureInfo.CurrentCulture = culture;
            var json = CanonicalDesignJson.Serialize(Small);
            Assert.Contains("\"voltage\":4.2", json, StringComparison.Ordinal);
            Assert.Contains("\"maxVoltage\":58.8", json, StringComparison.Ordinal);
        }
        finally
        {
            CultureInfo.CurrentCulture = saved;
        }
    }

    [Fact]
    public void Serialize_EnumValues_AreCamelCaseNames()
    {
        var json = CanonicalDesignJson.Serialize(Small with { Cell = Small.Cell with { Chemistry = Chemistry.Custom }, Balancing = BalancingMethod.Top });

        Assert.Contains("\"chemistry\":\"custom\"", json, StringComparison.Ordinal);
        Assert.Contains("\"balancing\":\"top\"", json, StringComparison.Ordinal);
    }

    [Fact]
    public void Deserialize_EnumAsNumber_IsRefused()
    {
        var json = CanonicalDesignJson.Serialize(Small).Replace("\"nmc\"", "1", StringComparison.Ordinal);

        Assert.Throws<JsonException>(() => CanonicalDesignJson.Deserialize(json));
    }

    [Fact]
    public void Deserialize_MissingRequiredProperty_IsRefused()
    {
        var json = CanonicalDesignJson.Serialize(Small).Replace("\"series\":14,", "", StringComparison.Ordinal);

        Assert.Throws<JsonException>(() => CanonicalDesignJson.Deserialize(json));
    }

    [Fact]
    public void Serialize_NaN_IsRefused()
    {
        var input = Small with { LinkResistanceMilliohm = double.NaN };

        Assert.Throws<ArgumentException>(() => CanonicalDesignJson.Serialize(input));
    }

    [Fact]
    public void Sha256Hex_Abc_MatchesThePublishedTestVector()
    {
        // FIPS 180-2, Appendix B.1: SHA-256("abc").
        Assert.Equal("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", CanonicalDesignJson.Sha256Hex("abc"));
    }

    [Fact]
    public void Sha256Hex_NonAsciiText_HashesItsUtf8Bytes()
    {
        const string text = "{\"name\":\"Ωmega 電池\"}";

        Assert.Equal(Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(text))), CanonicalDesignJson.Sha256Hex(text));
    }

    [Fact]
    public void SerializeResult_EvaluatedDesign_WritesTheResultTree()
    {
        var result = DesignEvaluator.Evaluate(TestDesigns.Valid()).Result!;

        using var doc = JsonDocument.Parse(CanonicalDesignJson.SerializeResult(result));

        Assert.Equal(DesignEvaluator.CalculationVersion, doc.RootElement.GetProperty("calculationVersion").GetString());
        Assert.Equal("16S2P", doc.RootElement.GetProperty("pack").GetProperty("configuration").GetString());
        Assert.Equal(result.Pack.NominalEnergyWh, doc.RootElement.GetProperty("pack").GetProperty("nominalEnergyWh").GetDouble());
        Assert.True(doc.RootElement.GetProperty("cell").GetProperty("ocvCurve").GetProperty("points").GetArrayLength() >= 2);
    }

    private static void AssertOrder(Type type, JsonElement element)
    {
        var declared = type.GetProperties(BindingFlags.Public | BindingFlags.Instance)
            .OrderBy(p => p.MetadataToken)
            .Select(p => JsonNamingPolicy.CamelCase.ConvertName(p.Name))
            .ToList();
        var written = element.EnumerateObject().Select(p => p.Name).ToList();
        Assert.Equal(declared.Where(written.Contains), written);
    }
}
