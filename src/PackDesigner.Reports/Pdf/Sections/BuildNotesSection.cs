using PackDesigner.Reports.Model;

namespace PackDesigner.Reports.Pdf.Sections;

/// <summary>How to balance and assemble the string, in steps.</summary>
internal sealed class BuildNotesSection : ISheetSection
{
    public string Title => "Build notes";

    public void Render(DesignSheetModel model, SheetLayout layout)
    {
        layout.SubHeading(model.BuildNotes.Title);
        layout.Paragraph(model.BuildNotes.Introduction, keepWithNext: true);
        layout.Steps(model.BuildNotes.Steps);
    }
}
