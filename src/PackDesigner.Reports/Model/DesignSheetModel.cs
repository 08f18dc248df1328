using System.Globalization;
using PackDesigner.Core.Design;
using PackDesigner.Core.Evaluation;
using PackDesigner.Core.Spread;
using PackDesigner.Reports.Formatting;

namespace PackDesigner.Reports.Model;

/// <summary>
/// Everything the design sheet prints, already formatted by <see cref="SheetFormatter"/>: the PDF, the HTML print
/// view and the CSV/JSON exports all read their strings from here, so they print the same text. Built by
/// <see cref="Create(SheetHeader, DesignInput, EvaluationResult, SpreadResult?)"/> from the revision's header, its input and its evaluation result.
/// </summary>
public sealed class DesignSheetModel
{
    /// <summary>The marking every page carries until the approval is recorded.</summary>
    public const string DraftMarkingText = "DRAFT: not signed off";

    public const string SheetTitle = "Pack design sheet";

    internal DesignSheetModel(SheetHeader header, DesignInput input, EvaluationResult result)
    {
        Header = header;
        Input = input;
        Result = result;
    }

    public SheetHeader Header { get; }

    /// <summary>The input the sheet was built from, for sections that draw from it (charts, later sections).</summary>
    public DesignInput Input { get; }

    /// <summary>The evaluation result the sheet was built from.</summary>
    public EvaluationResult Result { get; }

    /// <summary>Design name as printed in the page header and the summary.</summary>
    public required string DesignName { get; init; }

    /// <summary>"Customer: … · Job: …", or a note that neither was recorded.</summary>
    public required string CustomerLine { get; init; }

    /// <summary>"Revision 3".</summary>
    public required string RevisionText { get; init; }

    /// <summary>Revision date and time, "2026-12-01 14:03 UTC".</summary>
    public required string DateText { get; init; }

    /// <summary>"Calculation 1.0.0".</summary>
    public required string CalculationText { get; init; }

    /// <summary>First 12 hexadecimal digits of the input hash.</summary>
    public required string ShortInputHash { get; init; }

    /// <summary>Date, calculation version and short hash on one line: the page header's second line.</summary>
    public required string MetaLine { get; init; }

    /// <summary>True until the approval is recorded.</summary>
    public required bool IsDraft { get; init; }

    /// <summary><see cref="DraftMarkingText"/> while a draft, else "Approved by … on …".</summary>
    public required string SignOffMarking { get; init; }

    /// <summary>Design, customer, job and status.</summary>
    public required IReadOnlyList<SheetField> Identity { get; init; }

    /// <summary>The pack at a glance: configuration, chemistry, voltages, capacity, energy, mass, class, findings.</summary>
    public required IReadOnlyList<SheetField> Summary { get; init; }

    public required IReadOnlyList<InputGroup> Inputs { get; init; }

    /// <summary>The note above the inputs on where preset figures come from.</summary>
    public required string InputsNote { get; init; }

    public required IReadOnlyList<BmsSetting> BmsSettings { get; init; }

    /// <summary>How to read the BMS table (per cell / per pack).</summary>
    public required string BmsNote { get; init; }

    public required IReadOnlyList<SettingRow> ChargerSettings { get; init; }

    public required IReadOnlyList<SettingRow> EndOfCharge { get; init; }

    public required IReadOnlyList<SettingGroup> Protection { get; init; }

    public required OcvChartModel OcvChart { get; init; }

    public required LadderChartModel LadderChart { get; init; }

    public required IReadOnlyList<FindingRow> Findings { get; init; }

    /// <summary>"1 error, 2 warnings, 0 info".</summary>
    public required string FindingCounts { get; init; }

    public required BuildNotes BuildNotes { get; init; }

    public required IReadOnlyList<Caution> Cautions { get; init; }

    public required IReadOnlyList<SignOffLine> SignOff { get; init; }

    /// <summary>The cell-spread analysis; null when the sheet was built without one (then it prints no spread section).</summary>
    public SheetSpread? Spread { get; init; }

    /// <summary>"Page 2 of 7".</summary>
    public static string PageLabel(int page, int pageCount) => SheetFormatter.PageLabel(page, pageCount);

    /// <summary>
    /// Builds the model. The header, the input and the result must belong together: the same S and P, and the
    /// result's calculation version must be the header's.
    /// </summary>
    /// <exception cref="ArgumentException">A header field is missing or malformed, or the three do not belong together.</exception>
    public static DesignSheetModel Create(SheetHeader header, DesignInput input, EvaluationResult result) =>
        Create(header, input, result, null);

    /// <summary>
    /// Builds the model with the cell-spread analysis of the same input (<paramref name="spread"/>; null prints no
    /// spread section).
    /// </summary>
    /// <exception cref="ArgumentException">As <see cref="Create(SheetHeader, DesignInput, EvaluationResult)"/>, or the spread describes another configuration.</exception>
    public static DesignSheetModel Create(SheetHeader header, DesignInput input, EvaluationResult result, SpreadResult? spread)
    {
        ArgumentNullException.ThrowIfNull(header);
        ArgumentNullException.ThrowIfNull(input);
        ArgumentNullException.ThrowIfNull(result);
        Check(header, input, result);
        if (spread is not null && (spread.Series != input.Series || spread.Parallel != input.Parallel))
        {
            throw new ArgumentException("The spread analysis describes a different configuration than the input.", nameof(spread));
        }

        return DesignSheetModelBuilder.Build(header, input, result, spread is null ? null : SheetSpreadBuilder.Build(spread));
    }

    private static void Check(SheetHeader header, DesignInput input, EvaluationResult result)
    {
        if (string.IsNullOrWhiteSpace(header.DesignName))
        {
            throw new ArgumentException("The design name is required.", nameof(header));
        }

        if (header.RevisionNumber < 1)
        {
            throw new ArgumentException("The revision number must be 1 or more.", nameof(header));
        }

        var hash = header.InputHash?.Trim() ?? "";
        if (hash.Length < 12 || !hash.All(Uri.IsHexDigit))
        {
            throw new ArgumentException("The input hash must be hexadecimal with at least 12 digits.", nameof(header));
        }

        if (string.IsNullOrWhiteSpace(header.CalculationVersion))
        {
            throw new ArgumentException("The calculation version is required.", nameof(header));
        }

        if (!string.Equals(header.CalculationVersion, result.CalculationVersion, StringComparison.Ordinal))
        {
            throw new ArgumentException(string.Create(CultureInfo.InvariantCulture,
                $"The header's calculation version {header.CalculationVersion} differs from the result's {result.CalculationVersion}."), nameof(header));
        }

        CheckUtc(header.CreatedAtUtc, "The revision time");
        if (header.SignOff is { } s)
        {
            foreach (var (entry, role) in new[] { (s.DesignedBy, "designer"), (s.CheckedBy, "checker"), (s.ApprovedBy, "approver") })
            {
                if (entry is null)
                {
                    continue;
                }

                if (string.IsNullOrWhiteSpace(entry.Name))
                {
                    throw new ArgumentException($"The {role}'s name is required when the {role}'s signature is recorded.", nameof(header));
                }

                CheckUtc(entry.SignedAtUtc, $"The {role}'s signature time");
            }
        }

        if (input.Series != result.Pack.Series || input.Parallel != result.Pack.Parallel)
        {
            throw new ArgumentException("The input and the result describe different configurations.", nameof(result));
        }
    }

    private static void CheckUtc(DateTime time, string what)
    {
        if (time.Kind == DateTimeKind.Local)
        {
            throw new ArgumentException($"{what} must be given in UTC.", nameof(time));
        }
    }
}
