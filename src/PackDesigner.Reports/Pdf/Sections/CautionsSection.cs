using PackDesigner.Reports.Model;

namespace PackDesigner.Reports.Pdf.Sections;

/// <summary>The cautions every sheet carries.</summary>
internal sealed class CautionsSection : ISheetSection
{
    public string Title => "Cautions";

    public void Render(DesignSheetModel model, SheetLayout layout)
    {
        foreach (var caution in model.Cautions)
        {
            layout.Block(caution.Title, caution.Text);
        }
    }
}
