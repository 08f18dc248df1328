using System.Globalization;
using System.Text;
using CsvHelper;
using PackDesigner.Core.Curves;

namespace PackDesigner.Data.Cells;

/// <summary>One problem in an uploaded OCV table; <see cref="Line"/> is the file's line (the header is line 1), null for the whole file.</summary>
public sealed record CsvLineError(int? Line, string Message)
{
    /// <summary>The message with its line, for a person: "Line 4: ...".</summary>
    public override string ToString() =>
        Line is { } l ? string.Create(CultureInfo.InvariantCulture, $"Line {l}: {Message}") : Message;
}

/// <summary>The rows read from an OCV CSV file, each with its line in the file, or the problems found.</summary>
public sealed record OcvCsvResult(IReadOnlyList<OcvPoint> Points, IReadOnlyList<int> Lines, IReadOnlyList<CsvLineError> Errors)
{
    public bool IsValid => Errors.Count == 0;
}

/// <summary>
/// Reads and writes an open-circuit-voltage table as CSV: header <c>socPercent,voltage</c>, comma-separated, dot
/// as the decimal separator, state of charge in % (0–100) and rest voltage per cell in V. Refuses files over
/// <see cref="MaxBytes"/> or <see cref="MaxRows"/> rows, and tables whose units are evidently wrong (SOC given as
/// 0–1 fractions, voltages in mV). The curve's own rules (0 % and 100 % rows, strictly increasing) are Core's
/// <see cref="OcvCurve.Validate"/>, applied by the cell library with the cell's voltage limits.
/// </summary>
public static class OcvCsv
{
    public const int MaxBytes = 64 * 1024;
    public const int MaxRows = 1000;
    public const string SocHeader = "socPercent";
    public const string VoltageHeader = "voltage";
    /// <summary>No single lithium cell rests above this, V; a larger number is almost certainly a unit mistake.</summary>
    public const double MaxCellVoltage = 6.0;
    /// <summary>At most this many line errors are listed; the rest are summarised.</summary>
    public const int MaxListedErrors = 20;

    /// <summary>Reads at most <see cref="MaxBytes"/> + 1 bytes from <paramref name="stream"/> and parses them.</summary>
    public static async Task<OcvCsvResult> ParseAsync(Stream stream, CancellationToken ct = default)
    {
        ArgumentNullException.ThrowIfNull(stream);
        var buffer = new byte[MaxBytes + 1];
        var read = 0;
        while (read < buffer.Length)
        {
            var n = await stream.ReadAsync(buffer.AsMemory(read), ct).ConfigureAwait(false);
            if (n == 0)
            {
                break;
            }

            read += n;
        }

        if (read > MaxBytes)
        {
            return Fail(null, string.Create(CultureInfo.InvariantCulture, $"The file is larger than {MaxBytes / 1024} KiB; an OCV table needs far less."));
        }

        string text;
        try
        {
            text = new UTF8Encoding(false, throwOnInvalidBytes: true).GetString(buffer, 0, read);
        }
        catch (DecoderFallbackException)
        {
            return Fail(null, "The file is not UTF-8 text. Save it as CSV (UTF-8).");
        }

        return Parse(text);
    }

    /// <summary>Parses CSV text (a leading byte-order mark is ignored).</summary>
    public static OcvCsvResult Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (Encoding.UTF8.GetByteCount(text) > MaxBytes)
        {
            return Fail(null, string.Create(CultureInfo.InvariantCulture, $"The file is larger than {MaxBytes / 1024} KiB; an OCV table needs far less."));
        }

        text = text.TrimStart('\uFEFF');
        if (text.Trim().Length == 0)
        {
            return Fail(null, "The file is empty. The first line must be the header socPercent,voltage.");
        }

        var options = CsvReaderOptions.Default with
        {
            Separator = ',',
            HasHeader = true,
            TrimWhitespace = true,
            SkipEmptyLines = true,
            TrackLineNumbers = true,
            DetectSeparatorHint = false,
            FormatProvider = CultureInfo.InvariantCulture,
            MaxRecordSize = MaxBytes,
        };
        using var reader = CsvReader.FromText(text, options);
        var headerError = CheckHeader(reader.Headers);
        if (headerError is not null)
        {
            return Fail(1, headerError);
        }

        var socIndex = IndexOf(reader.Headers, SocHeader);
        var voltIndex = IndexOf(reader.Headers, VoltageHeader);
        var points = new List<OcvPoint>();
        var lines = new List<int>();
        var errors = new List<CsvLineError>();
        var rows = 0;
        while (reader.Read())
        {
            rows++;
            var line = (int)reader.LineNumber;
            if (rows > MaxRows)
            {
                errors.Add(new CsvLineError(line, string.Create(CultureInfo.InvariantCulture, $"More than {MaxRows} rows; an OCV table needs far fewer.")));
                break;
            }

            if (reader.FieldCount != 2)
            {
                errors.Add(new CsvLineError(line, string.Create(CultureInfo.InvariantCulture,
                    $"Expected 2 values (socPercent,voltage), found {reader.FieldCount}. Use a dot as the decimal separator and a comma between the values.")));
                continue;
            }

            var soc = ReadNumber(reader.GetString(socIndex), SocHeader, "%", line, errors);
            var volts = ReadNumber(reader.GetString(voltIndex), VoltageHeader, "V", line, errors);
            if (soc is { } s && (s < 0 || s > 100))
            {
                errors.Add(new CsvLineError(line, string.Create(CultureInfo.InvariantCulture, $"socPercent {s:0.####} is outside 0–100 %.")));
            }

            if (volts is { } v && (v <= 0 || v > MaxCellVoltage) && v <= 100)
            {
                errors.Add(new CsvLineError(line, string.Create(CultureInfo.InvariantCulture,
                    $"voltage {v:0.####} V is outside 0–{MaxCellVoltage:0.#} V; give the rest voltage of one cell in volts.")));
            }

            if (soc is { } sv && volts is { } vv)
            {
                points.Add(new OcvPoint(sv, vv));
                lines.Add(line);
            }
        }

        CheckUnits(points, lines, errors);
        if (errors.Count == 0 && points.Count < 2)
        {
            errors.Add(new CsvLineError(null, "The table needs at least two rows (0 % and 100 %)."));
        }

        return errors.Count == 0 ? new OcvCsvResult(points, lines, []) : new OcvCsvResult([], [], Summarise(errors));
    }

    /// <summary>Writes the table with the header, invariant numbers in their shortest round-trip form, CRLF line ends.</summary>
    public static string Write(IReadOnlyList<OcvPoint> points)
    {
        ArgumentNullException.ThrowIfNull(points);
        using var text = new StringWriter(CultureInfo.InvariantCulture);
        using (var writer = CsvWriter.Create(text, CsvWriterOptions.Default with { FormatProvider = CultureInfo.InvariantCulture }, leaveOpen: true))
        {
            writer.WriteHeader([SocHeader, VoltageHeader]);
            foreach (var p in points)
            {
                writer.WriteField(p.SocPercent, default);
                writer.WriteField(p.Voltage, default);
                writer.EndRecord();
            }

            writer.Flush();
        }

        return text.ToString();
    }

    private static string? CheckHeader(IReadOnlyList<string> headers)
    {
        const string expected = "The first line must be the header socPercent,voltage (comma-separated).";
        if (headers.Count == 1 && headers[0].Contains(';', StringComparison.Ordinal))
        {
            return expected + " This file uses semicolons.";
        }

        if (headers.Count != 2 || IndexOf(headers, SocHeader) < 0 || IndexOf(headers, VoltageHeader) < 0)
        {
            return expected + " Found: " + string.Join(",", headers) + ".";
        }

        return null;
    }

    private static int IndexOf(IReadOnlyList<string> headers, string name)
    {
        for (var i = 0; i < headers.Count; i++)
        {
            if (string.Equals(headers[i].Trim(), name, StringComparison.OrdinalIgnoreCase))
            {
                return i;
            }
        }

        return -1;
    }

    private static double? ReadNumber(string text, string column, string unit, int line, List<CsvLineError> errors)
    {
        if (text.Length == 0)
        {
            errors.Add(new CsvLineError(line, $"{column} is empty."));
            return null;
        }

        if (!double.TryParse(text, NumberStyles.AllowLeadingSign | NumberStyles.AllowDecimalPoint | NumberStyles.AllowExponent,
                CultureInfo.InvariantCulture, out var value) || !double.IsFinite(value))
        {
            errors.Add(new CsvLineError(line, $"{column} '{Shorten(text)}' is not a number in {unit} (use a dot as the decimal separator, no unit sign)."));
            return null;
        }

        return value;
    }

    /// <summary>Whole-file unit mistakes, which would otherwise show as a row error on every line.</summary>
    private static void CheckUnits(List<OcvPoint> points, List<int> lines, List<CsvLineError> errors)
    {
        if (points.Count < 2)
        {
            return;
        }

        if (points.Max(p => p.SocPercent) <= 1)
        {
            errors.Insert(0, new CsvLineError(null,
                "socPercent looks like a fraction (all values 0–1): give the state of charge in percent, 0–100."));
        }

        var millivolt = points.Select((p, i) => (p, i)).Where(x => x.p.Voltage > 100).ToList();
        if (millivolt.Count > 0)
        {
            errors.Insert(0, new CsvLineError(millivolt.Count == points.Count ? null : lines[millivolt[0].i],
                "voltage looks like millivolts: give the rest voltage in volts (3.2, not 3200)."));
        }
    }

    private static List<CsvLineError> Summarise(List<CsvLineError> errors)
    {
        if (errors.Count <= MaxListedErrors)
        {
            return errors;
        }

        var listed = errors.Take(MaxListedErrors).ToList();
        listed.Add(new CsvLineError(null, string.Create(CultureInfo.InvariantCulture, $"… and {errors.Count - MaxListedErrors} more problems.")));
        return listed;
    }

    private static string Shorten(string text) => text.Length <= 20 ? text : text[..20] + "…";

    private static OcvCsvResult Fail(int? line, string message) => new([], [], [new CsvLineError(line, message)]);
}
