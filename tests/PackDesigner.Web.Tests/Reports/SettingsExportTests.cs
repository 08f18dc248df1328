using System.Text.Json;
using PackDesigner.Reports.Export;
using F = PackDesigner.Reports.Formatting.SheetFormatter;

namespace PackDesigner.Web.Tests.Reports;

/// <summary>CSV (RFC 4180) and JSON exports of the BMS and charger settings.</summary>
public sealed class SettingsExportTests
{
    private static readonly SheetTestDesign Design = new();

    [Fact]
    public void ToCsv_EveryBmsSettingOneRowPerScopeWithPrintedDigits()
    {
        var result = Design.Evaluate();
        var csv = SettingsExport.ToCsv(PackDesigner.Reports.Model.DesignSheetModel.Create(Design.Header, Design.Input, result));
        var lines = csv.Split("\r\n", StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal(SettingsExport.CsvHeader, lines[0]);
        var prefix = $"1,\"Test trailer, 24S2P\",4,{SheetTestDesign.Hash},";
        Assert.All(lines.Skip(1), l => Assert.StartsWith(prefix, l, StringComparison.Ordinal));
        Assert.Contains(prefix + $"bms,ov-trip,Over-voltage trip,cell,{F.CellVoltage(result.CellThresholds.OverVoltageTrip).Number},V", lines);
        Assert.Contains(prefix + $"bms,ov-trip,Over-voltage trip,pack,{F.PackVoltage(result.PackThresholds.OverVoltageTrip).Number},V", lines);
        Assert.Contains(prefix + $"bms,short-circuit-delay,Short-circuit delay,cell,{F.Microseconds(result.CellThresholds.ShortCircuitDelayMicroseconds).Number},µs", lines);
        Assert.Contains(prefix + $"bms,charge-low-temp-trip,Charge low-temperature trip,pack,{F.Temperature(result.CellThresholds.ChargeTemperatureLowTripC).Number},°C", lines);
        Assert.Contains(prefix + $"charger,cv,\"Constant voltage (CV), pack\",pack,{F.PackVoltage(result.Charger.ConstantVoltage).Number},V", lines);
        Assert.Contains(prefix + "charger,float,Float or maintenance stage,pack,off,", lines);
        // 22 thresholds and the top-balancing switch, twice each (cell, pack), and 7 charger rows.
        Assert.Equal(1 + 23 * 2 + 7, lines.Length);
    }

    [Fact]
    public void ToCsv_NameLikeAFormula_NeutralisedAndQuoted()
    {
        var csv = SettingsExport.ToCsv(Design.WithName("=HYPERLINK(\"x\")").Model());
        Assert.Contains(",\"'=HYPERLINK(\"\"x\"\")\",", csv, StringComparison.Ordinal);
    }

    [Fact]
    public void ToJson_SchemaVersionDesignAndEverySettingAsNumbersWithUnits()
    {
        var result = Design.Evaluate();
        var json = SettingsExport.ToJson(PackDesigner.Reports.Model.DesignSheetModel.Create(Design.Header, Design.Input, result));
        using var doc = JsonDocument.Parse(json);
        var root = doc.RootElement;
        Assert.Equal(1, root.GetProperty("schemaVersion").GetInt32());
        var design = root.GetProperty("design");
        Assert.Equal("Test trailer, 24S2P", design.GetProperty("name").GetString());
        Assert.Equal(4, design.GetProperty("revision").GetInt32());
        Assert.Equal(SheetTestDesign.Hash, design.GetProperty("inputHash").GetString());
        Assert.Equal("2026-03-14T15:09:26Z", design.GetProperty("createdAtUtc").GetString());
        Assert.Equal("24S2P", design.GetProperty("configuration").GetString());

        var bms = root.GetProperty("bms").EnumerateArray().ToDictionary(e => e.GetProperty("key").GetString()!);
        var ov = bms["ov-trip"];
        Assert.Equal(JsonValueKind.Number, ov.GetProperty("perCell").GetProperty("value").ValueKind);
        Assert.Equal(F.CellVoltage(result.CellThresholds.OverVoltageTrip).Number, ov.GetProperty("perCell").GetProperty("value").GetRawText());
        Assert.Equal(F.PackVoltage(result.PackThresholds.OverVoltageTrip).Number, ov.GetProperty("perPack").GetProperty("value").GetRawText());
        Assert.Equal("V", ov.GetProperty("perPack").GetProperty("unit").GetString());
        Assert.Equal(result.PackThresholds.UnderVoltageTrip, bms["uv-trip"].GetProperty("perPack").GetProperty("value").GetDouble(), 0.005);
        Assert.Equal("°C", bms["discharge-high-temp-release"].GetProperty("perCell").GetProperty("unit").GetString());
        Assert.Equal("off", bms["top-balancing"].GetProperty("perCell").GetProperty("value").GetString());
        Assert.Equal(23, bms.Count);

        var charger = root.GetProperty("charger").EnumerateArray().ToDictionary(e => e.GetProperty("key").GetString()!);
        Assert.Equal(F.Current(result.Charger.ConstantCurrentA).Number, charger["cc"].GetProperty("value").GetRawText());
        Assert.Equal("A", charger["termination"].GetProperty("unit").GetString());
        Assert.Equal("off", charger["float"].GetProperty("value").GetString());
    }

    [Fact]
    public void ToJson_UnicodeName_WrittenAsText()
    {
        var json = SettingsExport.ToJson(Design.WithName("Café Ω ≤ 45 °C").Model());
        using var doc = JsonDocument.Parse(json);
        Assert.Equal("Café Ω ≤ 45 °C", doc.RootElement.GetProperty("design").GetProperty("name").GetString());
        Assert.Contains("Café Ω ≤ 45 °C", json, StringComparison.Ordinal);
    }
}
