using PackDesigner.Reports.Model;

namespace PackDesigner.Reports.Pdf.Sections;

/// <summary>Every error, warning and information the checks raised, with its message.</summary>
internal sealed class FindingsSection : ISheetSection
{
    public string Title => "Findings";

    public void Render(DesignSheetModel model, SheetLayout layout)
    {
        layout.Paragraph(model.FindingCounts, bold: true, keepWithNext: model.Findings.Count > 0);
        if (model.Findings.Count == 0)
        {
            layout.Paragraph("The checks raised nothing.");
            return;
        }

        var rows = model.Findings.Select(f => SheetTableRow.Of(f.Severity, f.Message, f.Code)).ToList();
        layout.Table(new SheetTable(Title, [new("Severity", 0.55, Bold: true), new("Message", 3.0), new("Code", 1.25)], rows));
    }
}
