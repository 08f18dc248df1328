using PackDesigner.Reports.Model;

namespace PackDesigner.Reports.Pdf.Sections;

/// <summary>Designed, checked and approved: names, dates and signature lines.</summary>
internal sealed class SignOffSection : ISheetSection
{
    public string Title => "Sign-off";

    public void Render(DesignSheetModel model, SheetLayout layout)
    {
        layout.Paragraph(model.IsDraft
            ? "This sheet is a draft until the approval is recorded; every page is marked so."
            : model.SignOffMarking + ".", bold: model.IsDraft, keepWithNext: true);
        layout.SignOffBlock(model.SignOff);
    }
}
