using PackDesigner.Reports.Model;

namespace PackDesigner.Reports.Pdf.Sections;

/// <summary>The BMS thresholds, per cell and per pack, laid out to be typed into a BMS.</summary>
internal sealed class BmsSection : ISheetSection
{
    public string Title => "BMS settings";

    public void Render(DesignSheetModel model, SheetLayout layout)
    {
        layout.Paragraph(model.BmsNote, muted: true, keepWithNext: true);
        var rows = new List<SheetTableRow>();
        string? group = null;
        foreach (var s in model.BmsSettings)
        {
            if (s.Group != group)
            {
                group = s.Group;
                rows.Add(SheetTableRow.Group(group));
            }

            rows.Add(SheetTableRow.Of(s.Label, s.PerCell.Text, s.PerPack?.Text ?? "—"));
        }

        layout.Table(new SheetTable(Title, [new("Setting", 2), new("Per cell", 1, ColumnAlign.Right, Bold: true), new("Per pack", 1, ColumnAlign.Right, Bold: true)], rows));
    }
}
