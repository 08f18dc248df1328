using PackDesigner.Web.Pages.Designs;

namespace PackDesigner.Web.Tests.Pages;

/// <summary>The comparison of two revisions' stored JSON.</summary>
public sealed class RevisionComparerTests
{
    [Theory]
    [InlineData("cell.capacityAh", "Ah")]
    [InlineData("controller.maxCurrentA", "A")]
    [InlineData("pack.maxVoltage", "V")]
    [InlineData("cellThresholds.overVoltageTrip", "V")]
    [InlineData("protection.fuseMinVoltageRating", "V")]
    [InlineData("pack.resistanceMilliohm", "mΩ")]
    [InlineData("protection.prechargeResistanceOhm", "Ω")]
    [InlineData("energy.specificEnergyWhPerKg", "Wh/kg")]
    [InlineData("protection.cableCurrentDensityAPerMm2", "A/mm²")]
    [InlineData("protection.prechargeTimeTo99PercentS", "s")]
    [InlineData("cell.chargeTemperatureMinC", "°C")]
    [InlineData("margins.temperatureMarginC", "K")]
    [InlineData("thermal.minutesToDischargeLimitAtContinuous", "min")]
    [InlineData("controller.dcLinkCapacitanceMicrofarad", "µF")]
    [InlineData("cable.crossSectionMm2", "mm²")]
    [InlineData("ladder[ov-trip].perCellVoltage", "V")]
    [InlineData("series", null)]
    [InlineData("pack.configuration", null)]
    public void UnitOf_NameSuffix_GivesTheUnit(string path, string? unit) => Assert.Equal(unit, RevisionComparer.UnitOf(path));

    [Fact]
    public void Compare_ChangedNumbers_GiveTheDifferenceBMinusA()
    {
        var c = RevisionComparer.Compare(
            """{"series":16,"cell":{"capacityAh":100}}""", """{"series":16,"cell":{"capacityAh":105.5}}""",
            """{"pack":{"maxVoltage":58.4},"findings":[]}""", """{"pack":{"maxVoltage":58.4},"findings":[]}""");

        var change = Assert.Single(c.Inputs);
        Assert.Equal(("cell.capacityAh", "100", "105.5", "+5.5 (+5.5 %)", "Ah"), (change.Path, change.Before, change.After, change.Difference, change.Unit));
        Assert.Empty(c.Results);
    }

    [Fact]
    public void Compare_LadderRungs_AreMatchedByLayerNotPosition()
    {
        var a = """{"ladder":[{"layer":"max","label":"Datasheet maximum","perCellVoltage":3.65},{"layer":"ov","label":"OV trip","perCellVoltage":3.6}],"findings":[]}""";
        var b = """{"ladder":[{"layer":"max","label":"Datasheet maximum","perCellVoltage":3.65},{"layer":"cv","label":"CV","perCellVoltage":3.45},{"layer":"ov","label":"OV trip","perCellVoltage":3.55}],"findings":[]}""";

        var c = RevisionComparer.Compare("{}", "{}", a, b);

        var ov = Assert.Single(c.Results, r => r.Path == "ladder[ov].perCellVoltage");
        Assert.Equal("−0.05 (−1.39 %)", ov.Difference);
        Assert.Contains("OV trip", ov.Label);
        Assert.Contains(c.Results, r => r.Path == "ladder[cv].perCellVoltage" && r.Before == "—");
        Assert.DoesNotContain(c.Results, r => r.Path.StartsWith("ladder[max]", StringComparison.Ordinal));
    }

    [Fact]
    public void Compare_OcvTablesAndFindings_AreComparedAsWholes()
    {
        var c = RevisionComparer.Compare(
            """{"cell":{"ocvCurve":[{"socPercent":0,"voltage":2.5},{"socPercent":100,"voltage":3.6}]}}""",
            """{"cell":{"ocvCurve":[{"socPercent":0,"voltage":2.5},{"socPercent":50,"voltage":3.3},{"socPercent":100,"voltage":3.6}]}}""",
            """{"findings":[{"severity":"warning","code":"a.b","message":"Old","fields":[]}]}""",
            """{"findings":[{"severity":"error","code":"c.d","message":"New","fields":[]}]}""");

        var table = Assert.Single(c.Inputs);
        Assert.Equal("cell.ocvCurve", table.Path);
        Assert.StartsWith("3 rows", table.After);
        Assert.Null(table.Difference);
        Assert.Equal([("a.b", false), ("c.d", true)], c.Findings.Select(f => (f.Code, f.Added)));
    }

    [Fact]
    public void Compare_RoundingNoise_IsNotAChange()
    {
        var c = RevisionComparer.Compare("""{"x":0.30000000000000004}""", """{"x":0.3}""", """{"findings":[]}""", """{"findings":[]}""");

        Assert.True(c.NothingChanged);
    }
}
