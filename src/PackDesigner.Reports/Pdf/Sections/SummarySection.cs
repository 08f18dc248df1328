using PackDesigner.Reports.Model;

namespace PackDesigner.Reports.Pdf.Sections;

/// <summary>The design's identity, then the pack at a glance in two columns of label and value.</summary>
internal sealed class SummarySection : ISheetSection
{
    public string Title => "Summary";

    public void Render(DesignSheetModel model, SheetLayout layout)
    {
        var identity = model.Identity.Select(f => SheetTableRow.Of(f.Label, f.Value)).ToList();
        layout.Table(new SheetTable(Title, [new("Design", 1), new("", 3.2, Bold: true)], identity));

        // Filled column by column: the left column reads top to bottom, then the right one.
        var half = (model.Summary.Count + 1) / 2;
        var rows = new List<SheetTableRow>();
        for (var i = 0; i < half; i++)
        {
            var left = model.Summary[i];
            var right = i + half < model.Summary.Count ? model.Summary[i + half] : null;
            rows.Add(SheetTableRow.Of(left.Label, left.Value, right?.Label ?? "", right?.Value ?? ""));
        }

        layout.Table(new SheetTable(Title, [new("Pack", 0.95), new("", 1.45, Bold: true), new("", 1.0), new("", 0.9, Bold: true)], rows));
    }
}
