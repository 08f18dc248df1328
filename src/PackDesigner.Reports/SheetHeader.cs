namespace PackDesigner.Reports;

/// <summary>
/// Identity of the revision a design sheet is printed for. Everything here comes from the stored revision, never
/// from the clock, so that the same revision always prints the same sheet.
/// </summary>
/// <param name="DesignName">The design's name as the user gave it.</param>
/// <param name="CustomerName">Customer, when the design has one.</param>
/// <param name="JobTitle">Job or order the design belongs to, when it has one.</param>
/// <param name="RevisionNumber">Revision number, 1 or more.</param>
/// <param name="CreatedAtUtc">When the revision was saved, UTC (<see cref="DateTimeKind.Unspecified"/> is read as UTC).</param>
/// <param name="CalculationVersion">Version of the calculation rules that produced the result.</param>
/// <param name="InputHash">Hash of the revision's input, hexadecimal (at least 12 digits).</param>
/// <param name="Status">The revision's status as the application names it (for example "draft" or "released").</param>
/// <param name="SignOff">Who designed, checked and approved the revision; null when nobody has signed yet.</param>
public sealed record SheetHeader(
    string DesignName,
    string? CustomerName,
    string? JobTitle,
    int RevisionNumber,
    DateTime CreatedAtUtc,
    string CalculationVersion,
    string InputHash,
    string Status,
    SheetSignOff? SignOff = null);

/// <summary>One recorded signature: the person's name and when they signed, UTC.</summary>
public sealed record SignOffEntry(string Name, DateTime SignedAtUtc);

/// <summary>
/// The sign-off of a revision. The sheet counts as signed off once the approval is recorded; until then every
/// page carries the draft marking.
/// </summary>
public sealed record SheetSignOff(SignOffEntry? DesignedBy, SignOffEntry? CheckedBy, SignOffEntry? ApprovedBy)
{
    /// <summary>True once the approval is recorded.</summary>
    public bool IsSignedOff => ApprovedBy is not null;
}

/// <summary>Paper the sheet is laid out for.</summary>
public enum PaperSize
{
    /// <summary>ISO A4, 210 × 297 mm.</summary>
    A4,
    /// <summary>US Letter, 8.5 × 11 in.</summary>
    Letter,
}
