using PackDesigner.Reports.Charts;
using PackDesigner.Reports.Model;

namespace PackDesigner.Reports.Pdf.Sections;

/// <summary>The two charts, drawn at print resolution and fitted to the text column.</summary>
internal sealed class ChartsSection : ISheetSection
{
    /// <summary>Image pixels per layout point: 2.5 gives 180 dpi.</summary>
    internal const double PrintScale = 2.5;

    public string Title => "Charts";

    public void Render(DesignSheetModel model, SheetLayout layout)
    {
        var width = (int)Math.Floor(layout.ContentWidth);
        const int ocvHeight = 275;
        const int ladderHeight = 290;
        layout.SubHeading(model.OcvChart.Title);
        layout.Image(SheetCharts.OcvChart(model.OcvChart, width, ocvHeight, PrintScale, ChartImageFormat.Jpeg), ocvHeight, model.OcvChart.Caption);
        layout.SubHeading(model.LadderChart.Title);
        layout.Image(SheetCharts.LadderChart(model.LadderChart, width, ladderHeight, PrintScale, ChartImageFormat.Jpeg), ladderHeight, model.LadderChart.Caption);
    }
}
