using PackDesigner.Reports.Charts;
using PackDesigner.Reports.Model;

namespace PackDesigner.Web.Pages.Sheets;

/// <summary>
/// The print view's chart images: their layout size in CSS pixels (the view reserves it, so nothing moves as
/// they load) and their PNG bytes, drawn at twice that many pixels so that they stay sharp on paper.
/// </summary>
public static class SheetChartImages
{
    public const int Width = 680;
    public const int OcvHeight = 340;
    public const int LadderHeight = 360;
    public const int SpreadHeight = 320;
    public const double Scale = 2;

    public static byte[] Ocv(DesignSheetModel model)
    {
        ArgumentNullException.ThrowIfNull(model);
        return SheetCharts.OcvChart(model.OcvChart, Width, OcvHeight, Scale, ChartImageFormat.Png);
    }

    public static byte[] Ladder(DesignSheetModel model)
    {
        ArgumentNullException.ThrowIfNull(model);
        return SheetCharts.LadderChart(model.LadderChart, Width, LadderHeight, Scale, ChartImageFormat.Png);
    }

    /// <summary>The spread histogram, or null when the model has no spread histogram.</summary>
    public static byte[]? Spread(DesignSheetModel model)
    {
        ArgumentNullException.ThrowIfNull(model);
        return model.Spread?.Histogram is { } h ? SheetCharts.SpreadHistogram(h, Width, SpreadHeight, Scale, ChartImageFormat.Png) : null;
    }

    /// <summary>What the spread histogram shows, for its alt text: the title, the caption and the marked lines.</summary>
    public static string SpreadAltText(SpreadHistogramModel chart)
    {
        ArgumentNullException.ThrowIfNull(chart);
        return $"{chart.Title}. {chart.Caption} Lines: {string.Join("; ", chart.Lines.Select(l => l.Label))}.";
    }

    /// <summary>What the OCV chart shows, for its alt text: the title, the window and every labelled line.</summary>
    public static string OcvAltText(OcvChartModel chart)
    {
        ArgumentNullException.ThrowIfNull(chart);
        return $"{chart.Title}. {chart.Caption} {chart.WindowLabel}. Lines: {string.Join("; ", chart.Lines.Select(l => l.Label))}.";
    }

    /// <summary>What the ladder shows, for its alt text: every layer, highest first, with its per-cell and per-pack value.</summary>
    public static string LadderAltText(LadderChartModel chart)
    {
        ArgumentNullException.ThrowIfNull(chart);
        return $"{chart.Title}. {chart.Caption} Layers: {string.Join("; ", chart.Rungs.Select(r => $"{r.Label} {r.PerCell.Text} per cell ({r.PerPack.Text} pack)"))}.";
    }
}
