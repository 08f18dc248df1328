namespace PackDesigner.Reports.Pdf;

/// <summary>Horizontal alignment of a table column.</summary>
public enum ColumnAlign
{
    Left,
    Right,
}

/// <summary>A table column: its title, its share of the table's width (relative weights) and its alignment.</summary>
public sealed record SheetColumn(string Title, double Weight, ColumnAlign Align = ColumnAlign.Left, bool Bold = false);

/// <summary>A table row: one text per column, or a group heading spanning the whole width.</summary>
public sealed record SheetTableRow(IReadOnlyList<string> Cells, bool IsGroupHeading = false)
{
    public static SheetTableRow Of(params string[] cells) => new(cells);

    public static SheetTableRow Group(string title) => new([title], IsGroupHeading: true);
}

/// <summary>
/// A table for <see cref="SheetLayout.Table"/>: cells wrap inside their column, a row never splits across pages,
/// and a table that breaks repeats its title (marked "continued") and its column headings on the next page.
/// </summary>
public sealed record SheetTable(string? Title, IReadOnlyList<SheetColumn> Columns, IReadOnlyList<SheetTableRow> Rows);
