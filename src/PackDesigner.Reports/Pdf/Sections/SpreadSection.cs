using PackDesigner.Reports.Charts;
using PackDesigner.Reports.Model;

namespace PackDesigner.Reports.Pdf.Sections;

/// <summary>The cell-spread analysis: how it was run, the trip probabilities, the recommended CV, the percentiles and the histogram. Prints nothing without one.</summary>
internal sealed class SpreadSection : ISheetSection
{
    private const int HistogramHeight = 260;

    public string Title => SheetSpreadBuilder.Title;

    public bool Prints(DesignSheetModel model) => model.Spread is not null;

    public void Render(DesignSheetModel model, SheetLayout layout)
    {
        if (model.Spread is not { } spread)
        {
            return;
        }

        layout.Paragraph(spread.RunLine, muted: true);
        layout.Table(ChargerSection.Settings("Trip probabilities", spread.Probabilities));
        layout.SubHeading("Recommended charge voltage");
        layout.Table(ChargerSection.Settings("Recommended charge voltage", spread.Recommendation));
        layout.SubHeading("Percentiles over the trials");
        layout.Table(new SheetTable(
            "Percentiles over the trials",
            [
                new("Figure", 1.9), new("P5", 0.6, ColumnAlign.Right), new("P50", 0.6, ColumnAlign.Right, Bold: true),
                new("P95", 0.6, ColumnAlign.Right), new("P99.9", 0.6, ColumnAlign.Right),
            ],
            spread.Percentiles.Select(p => SheetTableRow.Of(p.Label, p.P5.Text, p.P50.Text, p.P95.Text, p.P999.Text)).ToList()));
        if (spread.Histogram is { } h)
        {
            var width = (int)Math.Floor(layout.ContentWidth);
            layout.SubHeading(h.Title);
            layout.Image(SheetCharts.SpreadHistogram(h, width, HistogramHeight, ChartsSection.PrintScale, ChartImageFormat.Jpeg), HistogramHeight, h.Caption);
        }
    }
}
