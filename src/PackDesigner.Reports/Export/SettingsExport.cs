using System.Globalization;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using PackDesigner.Reports.Formatting;
using PackDesigner.Reports.Model;

namespace PackDesigner.Reports.Export;

/// <summary>
/// The BMS and charger settings of a design sheet as CSV and as JSON, for typing into (or importing into) a BMS
/// or charger tool. Both carry the numbers exactly as the sheet prints them and the unit in its own field.
/// Schema version 1:
/// <list type="bullet">
/// <item>CSV (RFC 4180, UTF-8, CRLF): <c>schemaVersion,design,revision,inputHash,section,key,setting,scope,value,unit</c>;
/// section is <c>bms</c> or <c>charger</c>, scope <c>cell</c> or <c>pack</c>; a BMS setting has one row per scope.</item>
/// <item>JSON: <c>{ schemaVersion, design: { name, revision, inputHash, calculationVersion, createdAtUtc, configuration },
/// bms: [ { key, group, setting, perCell: { value, unit }, perPack: { value, unit } | null } ],
/// charger: [ { key, setting, value, unit } ] }</c>; a numeric value is a JSON number with the printed digits,
/// a word ("off") a string.</item>
/// </list>
/// </summary>
public static class SettingsExport
{
    public const int SchemaVersion = 1;

    public const string CsvHeader = "schemaVersion,design,revision,inputHash,section,key,setting,scope,value,unit";

    public static string ToCsv(DesignSheetModel model)
    {
        ArgumentNullException.ThrowIfNull(model);
        var inv = CultureInfo.InvariantCulture;
        var prefix = string.Join(",",
            SchemaVersion.ToString(inv),
            Field(model.DesignName),
            model.Header.RevisionNumber.ToString(inv),
            Field(model.Header.InputHash.Trim().ToLowerInvariant()));
        var csv = new StringBuilder();
        csv.Append(CsvHeader).Append("\r\n");
        void Row(string section, string key, string setting, string scope, SheetValue value) =>
            csv.Append(prefix).Append(',').Append(section).Append(',').Append(Field(key)).Append(',').Append(Field(setting))
               .Append(',').Append(scope).Append(',').Append(Field(value.Number)).Append(',').Append(Field(value.Unit)).Append("\r\n");

        foreach (var s in model.BmsSettings)
        {
            Row("bms", s.Key, s.Label, "cell", s.PerCell);
            if (s.PerPack is { } pack)
            {
                Row("bms", s.Key, s.Label, "pack", pack);
            }
        }

        foreach (var c in model.ChargerSettings)
        {
            Row("charger", c.Key, c.Label, c.Key == "cv-per-cell" ? "cell" : "pack", c.Value);
        }

        return csv.ToString();
    }

    public static string ToJson(DesignSheetModel model)
    {
        ArgumentNullException.ThrowIfNull(model);
        using var buffer = new MemoryStream();
        using (var w = new Utf8JsonWriter(buffer, new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping }))
        {
            w.WriteStartObject();
            w.WriteNumber("schemaVersion", SchemaVersion);
            w.WriteStartObject("design");
            w.WriteString("name", model.DesignName);
            w.WriteNumber("revision", model.Header.RevisionNumber);
            w.WriteString("inputHash", model.Header.InputHash.Trim().ToLowerInvariant());
            w.WriteString("calculationVersion", model.Header.CalculationVersion);
            w.WriteString("createdAtUtc", DateTime.SpecifyKind(model.Header.CreatedAtUtc, DateTimeKind.Utc).ToString("yyyy-MM-dd'T'HH:mm:ss'Z'", CultureInfo.InvariantCulture));
            w.WriteString("configuration", model.Result.Pack.Configuration);
            w.WriteEndObject();

            w.WriteStartArray("bms");
            foreach (var s in model.BmsSettings)
            {
                w.WriteStartObject();
                w.WriteString("key", s.Key);
                w.WriteString("group", s.Group);
                w.WriteString("setting", s.Label);
                w.WritePropertyName("perCell");
                WriteValue(w, s.PerCell);
                w.WritePropertyName("perPack");
                if (s.PerPack is { } pack)
                {
                    WriteValue(w, pack);
                }
                else
                {
                    w.WriteNullValue();
                }

                w.WriteEndObject();
            }

            w.WriteEndArray();
            w.WriteStartArray("charger");
            foreach (var c in model.ChargerSettings)
            {
                w.WriteStartObject();
                w.WriteString("key", c.Key);
                w.WriteString("setting", c.Label);
                WriteNumberOrWord(w, "value", c.Value);
                w.WriteString("unit", c.Value.Unit);
                w.WriteEndObject();
            }

            w.WriteEndArray();
            w.WriteEndObject();
        }

        return Encoding.UTF8.GetString(buffer.ToArray());
    }

    private static void WriteValue(Utf8JsonWriter w, SheetValue value)
    {
        w.WriteStartObject();
        WriteNumberOrWord(w, "value", value);
        w.WriteString("unit", value.Unit);
        w.WriteEndObject();
    }

    private static void WriteNumberOrWord(Utf8JsonWriter w, string name, SheetValue value)
    {
        w.WritePropertyName(name);
        if (value.IsNumeric && double.TryParse(value.Number, NumberStyles.AllowLeadingSign | NumberStyles.AllowDecimalPoint, CultureInfo.InvariantCulture, out _))
        {
            // The printed digits, kept as they are ("3.600", not 3.6).
            w.WriteRawValue(value.Number);
        }
        else
        {
            w.WriteStringValue(value.Number);
        }
    }

    /// <summary>Quotes a CSV field when it needs it; a field a spreadsheet would run as a formula gets a leading apostrophe.</summary>
    private static string Field(string text)
    {
        var formulaLike = (text.Length > 0 && "=+@\t\r".Contains(text[0]))
            || (text.StartsWith('-') && !double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out _));
        var safe = formulaLike ? "'" + text : text;
        return safe.IndexOfAny([',', '"', '\r', '\n']) >= 0 ? "\"" + safe.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"" : safe;
    }
}
