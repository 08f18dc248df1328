using System.Globalization;
using System.Text;
using System.Text.Json;
using PackDesigner.Web.Formatting;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>One value that differs between two revisions; <see cref="Difference"/> is B − A for numbers.</summary>
public sealed record ValueChange(string Path, string Label, string Before, string After, string? Difference, string? Unit);

/// <summary>A finding present in only one of the two revisions.</summary>
public sealed record FindingChange(string Code, string Severity, string Message, bool Added);

/// <summary>What changed from revision A to revision B: inputs, the results that moved, and findings that came or went.</summary>
public sealed record RevisionComparison(
    IReadOnlyList<ValueChange> Inputs,
    IReadOnlyList<ValueChange> Results,
    IReadOnlyList<FindingChange> Findings)
{
    public bool NothingChanged => Inputs.Count == 0 && Results.Count == 0 && Findings.Count == 0;
}

/// <summary>
/// Compares two revisions by walking their stored JSON: the canonical input JSON and the result JSON. Every leaf
/// is keyed by its path (<c>controller.maxVoltage</c>, <c>pack.capacityAh</c>); protection-ladder rungs are keyed
/// by their layer rather than their position, OCV tables are compared as whole tables, and findings by code. The
/// unit of a value comes from its name's suffix, the project's naming rule (<c>…Ah</c>, <c>…Milliohm</c>, <c>…C</c>).
/// </summary>
public static class RevisionComparer
{
    private const string Findings = "findings";
    private const string Ladder = "ladder";

    /// <summary>Arrays compared as one value (their rows are summarised), by path.</summary>
    private static readonly HashSet<string> WholeTables = new(StringComparer.Ordinal) { "cell.ocvCurve", "cell.ocvCurve.points" };

    /// <summary>Name suffixes and their units, longest first so that <c>…WhPerKg</c> wins over <c>…Kg</c>.</summary>
    private static readonly (string Suffix, string Unit)[] Suffixes =
    [
        ("WhPerKg", "Wh/kg"), ("APerMm2", "A/mm²"), ("JPerKgK", "J/(kg·K)"), ("PerHourK", "K/h"),
        ("Microseconds", "µs"), ("Microfarad", "µF"), ("Millivolt", "mV"), ("Milliohm", "mΩ"), ("VoltageRating", "V"),
        ("Percent", "%"), ("Voltage", "V"), ("Factor", "×"), ("Ohm", "Ω"), ("Mm2", "mm²"), ("Ah", "Ah"), ("Wh", "Wh"),
        ("Kg", "kg"), ("A", "A"), ("V", "V"), ("C", "°C"), ("K", "K"), ("S", "s"), ("J", "J"), ("W", "W"), ("H", "h"), ("M", "m"),
    ];

    /// <summary>Inputs whose name says °C but which are temperature differences, shown in K as on the form.</summary>
    private static readonly HashSet<string> Kelvin = new(StringComparer.Ordinal) { "margins.temperatureMarginC", "margins.temperatureHysteresisC" };

    public static RevisionComparison Compare(string inputA, string inputB, string resultA, string resultB)
    {
        using var ia = JsonDocument.Parse(inputA);
        using var ib = JsonDocument.Parse(inputB);
        using var ra = JsonDocument.Parse(resultA);
        using var rb = JsonDocument.Parse(resultB);
        return new RevisionComparison(
            Diff(Leaves(ia.RootElement), Leaves(ib.RootElement), InputLabel),
            Diff(Leaves(ra.RootElement), Leaves(rb.RootElement), ResultLabel),
            FindingChanges(ra.RootElement, rb.RootElement));
    }

    /// <summary>A leaf value and the label of the rung it belongs to (ladder rows only).</summary>
    private sealed record Leaf(JsonElement Value, string? RowLabel);

    private static Dictionary<string, Leaf> Leaves(JsonElement root)
    {
        var leaves = new Dictionary<string, Leaf>(StringComparer.Ordinal);
        Walk(root, string.Empty, null, leaves);
        return leaves;
    }

    private static void Walk(JsonElement e, string path, string? rowLabel, Dictionary<string, Leaf> leaves)
    {
        if (path == Findings)
        {
            return;
        }

        switch (e.ValueKind)
        {
            case JsonValueKind.Object:
                foreach (var p in e.EnumerateObject())
                {
                    Walk(p.Value, path.Length == 0 ? p.Name : path + "." + p.Name, rowLabel, leaves);
                }

                break;
            case JsonValueKind.Array when WholeTables.Contains(path):
                leaves[path] = new Leaf(e.Clone(), rowLabel);
                break;
            case JsonValueKind.Array:
                var i = 0;
                foreach (var item in e.EnumerateArray())
                {
                    var key = path == Ladder && item.TryGetProperty("layer", out var layer) ? layer.GetString() : i.ToString(CultureInfo.InvariantCulture);
                    var label = path == Ladder && item.TryGetProperty("label", out var l) ? l.GetString() : rowLabel;
                    Walk(item, $"{path}[{key}]", label, leaves);
                    i++;
                }

                break;
            default:
                leaves[path] = new Leaf(e.Clone(), rowLabel);
                break;
        }
    }

    private static List<ValueChange> Diff(Dictionary<string, Leaf> a, Dictionary<string, Leaf> b, Func<string, Leaf, string> label)
    {
        var changes = new List<ValueChange>();
        foreach (var path in a.Keys.Concat(b.Keys.Where(k => !a.ContainsKey(k))))
        {
            a.TryGetValue(path, out var x);
            b.TryGetValue(path, out var y);
            if (x is not null && y is not null && Same(x.Value, y.Value))
            {
                continue;
            }

            var unit = UnitOf(path);
            string? difference = null;
            if (x?.Value.ValueKind == JsonValueKind.Number && y?.Value.ValueKind == JsonValueKind.Number)
            {
                difference = Difference(x.Value.GetDouble(), y.Value.GetDouble());
            }

            changes.Add(new ValueChange(path, label(path, (x ?? y)!), Show(x?.Value), Show(y?.Value), difference, unit));
        }

        return changes;
    }

    /// <summary>Numbers are the same when they differ by less than a part in 10¹² (JSON round trips); other values by their text.</summary>
    private static bool Same(JsonElement x, JsonElement y)
    {
        if (x.ValueKind == JsonValueKind.Number && y.ValueKind == JsonValueKind.Number)
        {
            double p = x.GetDouble(), q = y.GetDouble();
            return Math.Abs(p - q) <= 1e-12 * Math.Max(1, Math.Max(Math.Abs(p), Math.Abs(q)));
        }

        return x.ValueKind == y.ValueKind && x.GetRawText() == y.GetRawText();
    }

    private static string Difference(double before, double after)
    {
        var d = after - before;
        var text = (d > 0 ? "+" : d < 0 ? "−" : string.Empty) + Numbers.Compact(Math.Abs(d));
        return before == 0 ? text : text + " (" + (d > 0 ? "+" : "−") + Numbers.Compact(Math.Abs(d / before) * 100, 3) + " %)";
    }

    private static string Show(JsonElement? value) => value switch
    {
        null => Numbers.Missing,
        { ValueKind: JsonValueKind.Number } v => Numbers.Compact(v.GetDouble()),
        { ValueKind: JsonValueKind.String } v => v.GetString() ?? string.Empty,
        { ValueKind: JsonValueKind.True } => "yes",
        { ValueKind: JsonValueKind.False } => "no",
        { ValueKind: JsonValueKind.Null } => Numbers.Missing,
        { ValueKind: JsonValueKind.Array } v => Table(v),
        { } v => v.GetRawText(),
    };

    /// <summary>An OCV table as "n rows: soc % → V, …".</summary>
    private static string Table(JsonElement rows)
    {
        var points = rows.EnumerateArray()
            .Select(r => r.TryGetProperty("socPercent", out var s) && r.TryGetProperty("voltage", out var v)
                ? $"{Numbers.Compact(s.GetDouble())} %→{Numbers.Compact(v.GetDouble())} V"
                : r.GetRawText())
            .ToList();
        return string.Create(CultureInfo.InvariantCulture, $"{points.Count} rows: {string.Join(", ", points)}");
    }

    private static List<FindingChange> FindingChanges(JsonElement a, JsonElement b)
    {
        var before = FindingsOf(a);
        var after = FindingsOf(b);
        var beforeKeys = before.Select(f => f.Code + "\n" + f.Message).ToHashSet(StringComparer.Ordinal);
        var afterKeys = after.Select(f => f.Code + "\n" + f.Message).ToHashSet(StringComparer.Ordinal);
        return
        [
            .. before.Where(f => !afterKeys.Contains(f.Code + "\n" + f.Message)).Select(f => f with { Added = false }),
            .. after.Where(f => !beforeKeys.Contains(f.Code + "\n" + f.Message)).Select(f => f with { Added = true }),
        ];
    }

    private static List<FindingChange> FindingsOf(JsonElement result) =>
        result.TryGetProperty(Findings, out var list) && list.ValueKind == JsonValueKind.Array
            ? list.EnumerateArray().Select(f => new FindingChange(
                f.GetProperty("code").GetString() ?? string.Empty,
                f.GetProperty("severity").GetString() ?? string.Empty,
                f.GetProperty("message").GetString() ?? string.Empty,
                false)).ToList()
            : [];

    /// <summary>The unit of a value from the suffix of its name, or null for counts, text and flags.</summary>
    public static string? UnitOf(string path)
    {
        if (Kelvin.Contains(path))
        {
            return "K";
        }

        var name = LastName(path);
        if (name.StartsWith("minutes", StringComparison.Ordinal))
        {
            return "min";
        }

        var pascal = name.Length == 0 ? name : char.ToUpperInvariant(name[0]) + name[1..];
        foreach (var (suffix, unit) in Suffixes)
        {
            // A one-letter unit must follow a lower-case letter or digit (…CurrentA), not end a longer word.
            if (pascal.EndsWith(suffix, StringComparison.Ordinal) && pascal.Length > suffix.Length
                && (suffix.Length > 1 || char.IsLower(pascal[^2]) || char.IsDigit(pascal[^2])))
            {
                return unit;
            }
        }

        // Threshold trips and releases are voltages when their name says so (overVoltageTrip).
        return name.Contains("Voltage", StringComparison.Ordinal) ? "V" : null;
    }

    private static string InputLabel(string path, Leaf leaf) =>
        FormFieldPaths.ForApiPath(path) is { } field ? $"{field.Section}: {field.Label}" : Humanize(path, leaf.RowLabel);

    private static string ResultLabel(string path, Leaf leaf) => Humanize(path, leaf.RowLabel);

    /// <summary>"packThresholds.overVoltageTrip" → "Pack thresholds › over voltage trip"; a ladder rung shows its own label.</summary>
    private static string Humanize(string path, string? rowLabel)
    {
        var parts = path.Split('.');
        var words = new List<string>();
        foreach (var part in parts)
        {
            var bracket = part.IndexOf('[', StringComparison.Ordinal);
            var name = bracket >= 0 ? part[..bracket] : part;
            words.Add(Words(part == parts[^1] ? StripUnit(name) : name));
            if (bracket >= 0 && rowLabel is not null)
            {
                words.Add(rowLabel);
            }
            else if (bracket >= 0)
            {
                words.Add("row " + part[(bracket + 1)..].TrimEnd(']'));
            }
        }

        var text = string.Join(" › ", words.Where(w => w.Length > 0));
        return text.Length == 0 ? path : char.ToUpperInvariant(text[0]) + text[1..];
    }

    private static string LastName(string path)
    {
        var last = path[(path.LastIndexOf('.') + 1)..];
        var bracket = last.IndexOf('[', StringComparison.Ordinal);
        return bracket >= 0 ? last[..bracket] : last;
    }

    private static string StripUnit(string name)
    {
        var pascal = name.Length == 0 ? name : char.ToUpperInvariant(name[0]) + name[1..];
        foreach (var (suffix, _) in Suffixes)
        {
            if (suffix is not "Voltage" and not "VoltageRating" and not "Factor" && pascal.EndsWith(suffix, StringComparison.Ordinal)
                && pascal.Length > suffix.Length && (suffix.Length > 1 || char.IsLower(pascal[^2]) || char.IsDigit(pascal[^2])))
            {
                return name[..^suffix.Length];
            }
        }

        return name;
    }

    private static readonly HashSet<string> Acronyms = new(StringComparer.Ordinal) { "soc", "ocv", "bms", "dc", "cv", "cc", "ov", "uv" };

    /// <summary>camelCase → lower-case words, abbreviations in capitals.</summary>
    private static string Words(string camel) =>
        string.Join(' ', LowerWords(camel).Split(' ').Select(w => Acronyms.Contains(w) ? w.ToUpperInvariant() : w));

    private static string LowerWords(string camel)
    {
        var sb = new StringBuilder();
        foreach (var ch in camel)
        {
            if (char.IsUpper(ch) && sb.Length > 0)
            {
                sb.Append(' ');
            }

            sb.Append(char.ToLowerInvariant(ch));
        }

        return sb.ToString();
    }
}
