using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using System.Text.RegularExpressions;
using PackDesigner.Core.Curves;
using PackDesigner.Core.Validation;
using PackDesigner.Data.Cells;

namespace PackDesigner.Web.Pages.Cells;

/// <summary>One line of a pasted or uploaded OCV table as typed, with its problems. <see cref="Line"/> counts the text's lines from 1.</summary>
public sealed record OcvPreviewRow(int Line, string SocPercent, string Voltage, IReadOnlyList<string> Errors)
{
    public bool HasErrors => Errors.Count > 0;
}

/// <summary>
/// The preview of an OCV table before it is saved: every row as typed with the problems found in it, and the
/// problems of the whole table. The text is read as <see cref="OcvCsv"/> reads a file (so a paste and an upload
/// get the same checks and messages); a paste without the header line gets one. Line numbers are those of the
/// text the person gave.
/// </summary>
public sealed partial record OcvTablePreview(
    IReadOnlyList<OcvPreviewRow> Rows,
    IReadOnlyList<string> TableErrors,
    IReadOnlyList<OcvPoint> Points,
    IReadOnlyList<int> PointLines,
    string Fingerprint,
    int HiddenRows)
{
    /// <summary>At most this many rows are shown; a longer table is refused by <see cref="OcvCsv.MaxRows"/> anyway.</summary>
    public const int MaxShownRows = OcvCsv.MaxRows + 1;

    public int ErrorCount => TableErrors.Count + Rows.Sum(r => r.Errors.Count);

    public bool IsValid => ErrorCount == 0;

    /// <summary>Reads the text of a table: its rows, the points when it parses, and the problems by line.</summary>
    public static OcvTablePreview Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var normal = NormaliseLines(text);
        var lines = normal.Split('\n');
        var first = Array.FindIndex(lines, l => l.Trim().Length > 0);
        var hasHeader = first >= 0 && !LooksLikeData(lines[first]);
        var offset = hasHeader ? 0 : 1;
        var parsed = OcvCsv.Parse(hasHeader ? normal : $"{OcvCsv.SocHeader},{OcvCsv.VoltageHeader}\n{normal}");

        var rows = new List<(int Line, string Soc, string Volts, List<string> Errors)>();
        var hidden = 0;
        for (var i = 0; i < lines.Length; i++)
        {
            if (lines[i].Trim().Length == 0 || (hasHeader && i == first))
            {
                continue;
            }

            if (rows.Count >= MaxShownRows)
            {
                hidden++;
                continue;
            }

            var cells = lines[i].Split(',');
            rows.Add((i + 1, cells[0].Trim(), cells.Length > 1 ? string.Join(",", cells[1..]).Trim() : string.Empty, []));
        }

        var tableErrors = new List<string>();
        foreach (var error in parsed.Errors)
        {
            var row = error.Line is { } l ? rows.FindIndex(r => r.Line == l - offset) : -1;
            if (row >= 0)
            {
                rows[row].Errors.Add(error.Message);
            }
            else
            {
                tableErrors.Add(error.Line is { } line ? new CsvLineError(line - offset, error.Message).ToString() : error.Message);
            }
        }

        return new OcvTablePreview(
            rows.Select(r => new OcvPreviewRow(r.Line, r.Soc, r.Volts, r.Errors)).ToList(),
            tableErrors,
            parsed.Points,
            parsed.Lines.Select(l => l - offset).ToList(),
            FingerprintOf(text),
            hidden);
    }

    /// <summary>
    /// The preview with Core's checks of the table against the cell (<c>cell.ocvCurve[i].*</c>: range, 0 % and
    /// 100 % rows, rising) put on the rows they concern; other table errors go above the table.
    /// </summary>
    public OcvTablePreview WithCellErrors(IEnumerable<ValidationError> curveErrors)
    {
        ArgumentNullException.ThrowIfNull(curveErrors);
        var rows = Rows.Select(r => (Row: r, Errors: r.Errors.ToList())).ToList();
        var table = TableErrors.ToList();
        foreach (var error in curveErrors)
        {
            var m = PointIndex().Match(error.Field);
            var index = m.Success ? int.Parse(m.Groups[1].Value, NumberStyles.None, CultureInfo.InvariantCulture) : -1;
            var row = index >= 0 && index < PointLines.Count ? rows.FindIndex(r => r.Row.Line == PointLines[index]) : -1;
            if (row >= 0)
            {
                var message = RowPrefix().Replace(error.Message, string.Empty);
                rows[row].Errors.Add(char.ToUpperInvariant(message[0]) + message[1..]);
            }
            else
            {
                table.Add(error.Message);
            }
        }

        return this with { Rows = rows.Select(r => r.Row with { Errors = r.Errors }).ToList(), TableErrors = table };
    }

    /// <summary>
    /// A short fingerprint of a table's text (line ends and surrounding blanks ignored): the form carries the one of
    /// the last preview shown, so a table is saved only after its preview was seen.
    /// </summary>
    public static string FingerprintOf(string? text) =>
        Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(NormaliseLines(text ?? string.Empty).Trim())))[..32];

    /// <summary>
    /// The text of an uploaded file, or the file's problem (empty, too large, not UTF-8) in <see cref="OcvCsv"/>'s words.
    /// Reads at most <see cref="OcvCsv.MaxBytes"/> + 1 bytes.
    /// </summary>
    public static async Task<(string? Text, string? Error)> ReadUploadAsync(Stream file, CancellationToken ct)
    {
        ArgumentNullException.ThrowIfNull(file);
        using var buffer = new MemoryStream();
        var chunk = new byte[8192];
        int n;
        while (buffer.Length <= OcvCsv.MaxBytes && (n = await file.ReadAsync(chunk, ct)) > 0)
        {
            buffer.Write(chunk, 0, n);
        }

        var bytes = buffer.ToArray();
        if (bytes.Length <= OcvCsv.MaxBytes)
        {
            try
            {
                var text = new UTF8Encoding(false, throwOnInvalidBytes: true).GetString(bytes);
                return text.TrimStart('\uFEFF').Trim().Length > 0 ? (text, null) : (null, OcvCsv.Parse(text).Errors[0].Message);
            }
            catch (DecoderFallbackException)
            {
                // Worded by OcvCsv below.
            }
        }

        using var again = new MemoryStream(bytes);
        var refused = await OcvCsv.ParseAsync(again, ct);
        return (null, refused.Errors.Count > 0 ? refused.Errors[0].Message : "The file could not be read as a CSV table.");
    }

    private static string NormaliseLines(string text) =>
        text.TrimStart('\uFEFF').Replace("\r\n", "\n", StringComparison.Ordinal).Replace('\r', '\n');

    /// <summary>A row of numbers rather than a header: starts with a digit, a sign or a point.</summary>
    private static bool LooksLikeData(string line)
    {
        var t = line.TrimStart();
        return t.Length > 0 && (char.IsAsciiDigit(t[0]) || t[0] is '-' or '+' or '.');
    }

    [GeneratedRegex(@"^cell\.ocvCurve\[(\d+)\]")]
    private static partial Regex PointIndex();

    [GeneratedRegex(@"^Row \d+: ")]
    private static partial Regex RowPrefix();
}
