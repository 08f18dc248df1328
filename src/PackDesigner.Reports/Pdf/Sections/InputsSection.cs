using PackDesigner.Reports.Model;

namespace PackDesigner.Reports.Pdf.Sections;

/// <summary>Every input, each cell figure marked as the datasheet's, the preset's typical value or derived.</summary>
internal sealed class InputsSection : ISheetSection
{
    public string Title => "Inputs";

    public void Render(DesignSheetModel model, SheetLayout layout)
    {
        layout.Paragraph(model.InputsNote, muted: true, keepWithNext: true);
        foreach (var group in model.Inputs)
        {
            layout.SubHeading(group.Title);
            var rows = group.Rows.Select(r => group.ShowsSource ? SheetTableRow.Of(r.Label, r.Value, r.Source) : SheetTableRow.Of(r.Label, r.Value)).ToList();
            IReadOnlyList<SheetColumn> columns = group.ShowsSource
                ? [new("Figure", 1.6), new("Value", 1.25), new("Source", 1.05)]
                : [new("Figure", 1.6), new("Value", 2.3)];
            layout.Table(new SheetTable(group.Title, columns, rows));
        }
    }
}
