using PackDesigner.Reports.Model;

namespace PackDesigner.Reports.Pdf.Sections;

/// <summary>Fuse, short circuit, contactor, precharge resistor, cable and links.</summary>
internal sealed class ProtectionSection : ISheetSection
{
    public string Title => "Protection hardware";

    public void Render(DesignSheetModel model, SheetLayout layout)
    {
        foreach (var group in model.Protection)
        {
            layout.SubHeading(group.Title);
            if (group.Note is { } note)
            {
                layout.Paragraph(note, muted: true, keepWithNext: group.Rows.Count > 0);
            }

            if (group.Rows.Count > 0)
            {
                layout.Table(ChargerSection.Settings(group.Title, group.Rows));
            }
        }
    }
}
