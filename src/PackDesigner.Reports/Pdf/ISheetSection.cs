using PackDesigner.Reports.Model;

namespace PackDesigner.Reports.Pdf;

/// <summary>
/// One section of the design sheet. The renderer prints the numbered heading, then calls <see cref="Render"/>;
/// a new section (a spread histogram, an ageing forecast) is a new implementation added to the list given to
/// <see cref="DesignSheetRenderer.RenderPdf(DesignSheetModel, PaperSize, IReadOnlyList{ISheetSection})"/>.
/// </summary>
public interface ISheetSection
{
    /// <summary>The heading, without its number.</summary>
    string Title { get; }

    /// <summary>Whether the section prints for this model; when false the renderer prints neither its heading nor its body (nor counts its number).</summary>
    bool Prints(DesignSheetModel model) => true;

    void Render(DesignSheetModel model, SheetLayout layout);
}
