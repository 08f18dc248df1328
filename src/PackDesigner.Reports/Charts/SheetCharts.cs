using PackDesigner.Reports.Model;
using PackDesigner.Reports.Pdf;
using ScottPlot;
using SkiaSharp;

namespace PackDesigner.Reports.Charts;

/// <summary>Encoding of a chart image.</summary>
public enum ChartImageFormat
{
    /// <summary>Lossless; for the browser.</summary>
    Png,
    /// <summary>
    /// JPEG at quality 92 without chroma subsampling: PDFsharp embeds it as it is, where a PNG would have to be
    /// decoded and compressed again (about three times the cost of the chart).
    /// </summary>
    Jpeg,
}

/// <summary>
/// The sheet's charts as images, drawn with ScottPlot (the only file that uses it: its Color, Colors, Image
/// and Label types clash with other namespaces). Sizes are in layout pixels; <c>scale</c> multiplies the pixel
/// count and every line and text size, so a print image is sharp at the same layout.
/// </summary>
public static class SheetCharts
{
    private const string FontName = "PackDesigner Sans";
    private static readonly object FontGate = new();
    private static bool _fontsInstalled;

    /// <summary>Rungs run from 0 to here on the ladder's x axis of 0–20; labels start just after.</summary>
    private const double RungEnd = 1.6;

    private const float AxisLabelSize = 10f;
    private const float TickLabelSize = 8.5f;

    private static readonly Color Text = Color.FromHex("#1a1a1a");
    private static readonly Color Grid = Color.FromHex("#e3e6e9");
    private static readonly Color Curve = Color.FromHex("#1f4e79");
    private static readonly Color WindowFill = Color.FromHex("#2e7d32").WithAlpha(0.14);
    private static readonly Color Datasheet = Color.FromHex("#8b1a1a");
    private static readonly Color Bms = Color.FromHex("#d2691e");
    private static readonly Color Charger = Color.FromHex("#1f4e79");
    private static readonly Color Window = Color.FromHex("#2e7d32");
    private static readonly Color Estimate = Color.FromHex("#6a3d9a");
    private static readonly Color Controller = Color.FromHex("#555555");

    /// <summary>Pack OCV against state of charge, the window shaded, each limit a labelled horizontal line.</summary>
    public static byte[] OcvChart(OcvChartModel chart, int width, int height, double scale, ChartImageFormat format = ChartImageFormat.Png)
    {
        ArgumentNullException.ThrowIfNull(chart);
        EnsureFonts();
        var plot = NewPlot(scale);

        var window = plot.Add.HorizontalSpan(chart.WindowLowPercent, chart.WindowHighPercent, WindowFill);
        window.LineWidth = 0;
        window.LegendText = chart.WindowLabel;

        var xs = chart.Curve.Select(p => p.X).ToArray();
        var ys = chart.Curve.Select(p => p.Y).ToArray();
        var curve = plot.Add.ScatterLine(xs, ys, Curve);
        curve.LineWidth = 2.2f;
        curve.MarkerSize = 0;
        curve.LegendText = "Pack OCV at rest";

        foreach (var line in chart.Lines)
        {
            var (color, pattern) = line.Key switch
            {
                "ov-trip" => (Datasheet, LinePattern.Solid),
                "uv-trip" => (Bms, LinePattern.Solid),
                "cv" => (Charger, LinePattern.Dashed),
                "controller-max" => (Controller, LinePattern.Dotted),
                _ => (Controller, LinePattern.DenselyDashed),
            };
            var h = plot.Add.HorizontalLine(line.Value, 1.4f, color, pattern);
            h.LegendText = line.Label;
            h.EnableAutoscale = false;
        }

        var values = chart.Curve.Select(p => p.Y).Concat(chart.Lines.Select(l => l.Value)).Where(double.IsFinite).ToList();
        var low = values.Min();
        var high = values.Max();
        var pad = Math.Max((high - low) * 0.06, 0.5);
        plot.Axes.SetLimits(0, 100, low - pad, high + pad);
        plot.XLabel(chart.XLabel, AxisLabelSize);
        plot.YLabel(chart.YLabel, AxisLabelSize);
        plot.ShowLegend(Edge.Bottom);
        plot.Legend.Orientation = Orientation.Horizontal;
        plot.Legend.FontSize = 8.5f;
        plot.Legend.OutlineWidth = 0;
        plot.Legend.ShadowColor = Colors.Transparent;
        plot.Legend.FontName = FontName;
        return Encode(plot, width, height, scale, format);
    }

    /// <summary>
    /// The protection ladder to scale: each layer a short rung at its voltage per cell; the labels are spread so
    /// they never overlap and joined to their rung by a leader line.
    /// </summary>
    public static byte[] LadderChart(LadderChartModel chart, int width, int height, double scale, ChartImageFormat format = ChartImageFormat.Png)
    {
        ArgumentNullException.ThrowIfNull(chart);
        EnsureFonts();
        var plot = NewPlot(scale);
        var rungs = chart.Rungs.Where(r => double.IsFinite(r.PerCellVoltage)).OrderByDescending(r => r.PerCellVoltage).ToList();
        if (rungs.Count == 0)
        {
            return Encode(plot, width, height, scale, format);
        }

        // Fixed layout (layout pixels) so the data-to-pixel ratio is known when spreading the labels.
        const float padLeft = 58, padRight = 8, padTop = 10, padBottom = 10;
        plot.Layout.Fixed(new PixelPadding(padLeft, padRight, padBottom, padTop));
        var top = rungs[0].PerCellVoltage;
        var bottom = rungs[^1].PerCellVoltage;
        var span = Math.Max(top - bottom, 0.05);
        var yMin = bottom - span * 0.06;
        var yMax = top + span * 0.06;
        var plotHeight = height - padTop - padBottom;
        const float fontSize = 9f;
        var gap = (yMax - yMin) * (fontSize * 1.45) / plotHeight;
        var labelY = Spread(rungs.Select(r => r.PerCellVoltage).ToArray(), gap, yMin + gap / 2, yMax - gap / 2);

        // Shade the state-of-charge window between its two rungs.
        var windowTop = rungs.FirstOrDefault(r => r.Key == "window-top");
        var windowBottom = rungs.FirstOrDefault(r => r.Key == "window-bottom");
        if (windowTop is not null && windowBottom is not null)
        {
            var band = plot.Add.Rectangle(0, RungEnd, windowBottom.PerCellVoltage, windowTop.PerCellVoltage);
            band.FillColor = WindowFill;
            band.LineWidth = 0;
        }

        for (var i = 0; i < rungs.Count; i++)
        {
            var r = rungs[i];
            var color = LadderColor(r.Key);
            var rung = plot.Add.Line(0, r.PerCellVoltage, RungEnd, r.PerCellVoltage);
            rung.LineColor = color;
            rung.LineWidth = 2.2f;
            rung.MarkerSize = 0;
            var leader = plot.Add.Line(RungEnd, r.PerCellVoltage, RungEnd + 0.5, labelY[i]);
            leader.LineColor = color.WithAlpha(0.7);
            leader.LineWidth = 0.9f;
            leader.MarkerSize = 0;
            var label = plot.Add.Text($"{r.PerCell.Text}  {r.Label} · {r.PerPack.Text} pack", RungEnd + 0.6, labelY[i]);
            label.LabelFontName = FontName;
            label.LabelFontSize = fontSize;
            label.LabelFontColor = color == Controller ? Text : color.Darken(0.25);
            label.LabelAlignment = Alignment.MiddleLeft;
        }

        plot.Axes.SetLimits(0, 20, yMin, yMax);
        plot.Axes.Bottom.IsVisible = false;
        plot.Axes.Top.IsVisible = false;
        plot.Axes.Right.IsVisible = false;
        plot.HideGrid();
        plot.YLabel(chart.YLabel, AxisLabelSize);
        return Encode(plot, width, height, scale, format);
    }

    /// <summary>
    /// The spread histogram: the count of packs in each bin of the highest cell voltage at the end of charge, with
    /// the OV release and the OV trip as labelled vertical lines (the legend names them with their voltage).
    /// </summary>
    public static byte[] SpreadHistogram(SpreadHistogramModel chart, int width, int height, double scale, ChartImageFormat format = ChartImageFormat.Png)
    {
        ArgumentNullException.ThrowIfNull(chart);
        EnsureFonts();
        var plot = NewPlot(scale);

        // A width of 0 means every trial gave the same value: draw that one bin 1 mV wide.
        var binWidth = chart.BinWidth > 0 ? chart.BinWidth : 0.001;
        var lines = chart.Lines.Where(l => double.IsFinite(l.Value)).ToList();
        var dataHigh = chart.Low + binWidth * Math.Max(chart.Counts.Count, 1);
        var low = Math.Min(chart.Low, lines.Count == 0 ? chart.Low : lines.Min(l => l.Value));
        var high = Math.Max(dataHigh, lines.Count == 0 ? dataHigh : lines.Max(l => l.Value));
        var pad = Math.Max((high - low) * 0.05, 0.002);

        // A tight spread far from the OV lines gives bins far narrower than a pixel: merge neighbouring bins (summing
        // their counts) until a bar is at least 1/200 of the axis wide, so the distribution stays visible where it is.
        var merge = Math.Max(1, (int)Math.Ceiling((high - low + 2 * pad) / 200 / binWidth));
        var counts = chart.Counts.Select((c, i) => (c, i)).GroupBy(x => x.i / merge, x => x.c).Select(g => g.Sum()).ToList();
        var barWidth = binWidth * merge;

        foreach (var line in lines)
        {
            var color = line.Key == "ov-trip" ? Datasheet : Bms;
            var v = plot.Add.VerticalLine(line.Value, 1.6f, color, line.Key == "ov-trip" ? LinePattern.Solid : LinePattern.Dashed);
            v.LegendText = line.Label;
            v.LabelText = line.Label;
            v.LabelFontName = FontName;
            v.LabelFontSize = 8f;
            v.LabelOppositeAxis = true;
            v.EnableAutoscale = false;
        }

        // Bars after the lines, so a spread sitting on a line is drawn over it.
        var bars = counts.Select((count, i) => new Bar
        {
            Position = chart.Low + (i + 0.5) * barWidth,
            Value = count,
            Size = barWidth,
            FillColor = Curve.WithAlpha(0.85),
            LineWidth = 0,
        }).ToList();
        var barPlot = plot.Add.Bars(bars);
        barPlot.LegendText = "Packs per bin";

        high = Math.Max(high, chart.Low + barWidth * Math.Max(counts.Count, 1));
        var top = counts.Count == 0 ? 1 : Math.Max(counts.Max(), 1);
        plot.Axes.SetLimits(low - pad, high + pad, 0, top * 1.1);
        plot.XLabel(chart.XLabel, AxisLabelSize);
        plot.YLabel(chart.YLabel, AxisLabelSize);
        plot.ShowLegend(Edge.Bottom);
        plot.Legend.Orientation = Orientation.Horizontal;
        plot.Legend.FontSize = 8.5f;
        plot.Legend.OutlineWidth = 0;
        plot.Legend.ShadowColor = Colors.Transparent;
        plot.Legend.FontName = FontName;
        return Encode(plot, width, height, scale, format);
    }

    /// <summary>
    /// Label positions for points sorted high to low: each at its own value where possible, at least
    /// <paramref name="gap"/> apart, inside [<paramref name="low"/>, <paramref name="high"/>].
    /// </summary>
    internal static double[] Spread(double[] values, double gap, double low, double high)
    {
        var n = values.Length;
        var y = values.Select(v => Math.Clamp(v, low, high)).ToArray();
        for (var i = 1; i < n; i++)
        {
            y[i] = Math.Min(y[i], y[i - 1] - gap);
        }

        if (n > 0 && y[^1] < low)
        {
            y[^1] = low;
            for (var i = n - 2; i >= 0; i--)
            {
                y[i] = Math.Max(y[i], y[i + 1] + gap);
            }
        }

        return y;
    }

    private static byte[] Encode(Plot plot, int width, int height, double scale, ChartImageFormat format)
    {
        var pixelWidth = (int)Math.Round(width * scale);
        var pixelHeight = (int)Math.Round(height * scale);
        if (format == ChartImageFormat.Png)
        {
            return plot.GetImageBytes(pixelWidth, pixelHeight, ImageFormat.Png);
        }

        using var surface = SKSurface.Create(new SKImageInfo(pixelWidth, pixelHeight, SKColorType.Rgba8888, SKAlphaType.Premul))
            ?? throw new InvalidOperationException("Could not create a drawing surface for the chart.");
        plot.Render(surface);
        using var image = surface.Snapshot();
        using var pixels = image.PeekPixels();
        using var data = pixels.Encode(new SKJpegEncoderOptions(92, SKJpegEncoderDownsample.Downsample444, SKJpegEncoderAlphaOption.Ignore))
            ?? throw new InvalidOperationException("Could not encode the chart.");
        return data.ToArray();
    }

    private static Color LadderColor(string key) => key switch
    {
        "datasheet-max" or "datasheet-min" => Datasheet,
        "ov-trip" or "ov-release" or "uv-release" or "uv-trip" => Bms,
        "charge-voltage" => Charger,
        "window-top" or "window-bottom" => Window,
        "highest-cell-end-of-charge" or "lowest-cell-under-load" => Estimate,
        _ => Controller,
    };

    private static Plot NewPlot(double scale)
    {
        var plot = new Plot { ScaleFactor = scale };
        plot.Font.Set(FontName);
        plot.Axes.Color(Text);
        plot.Axes.Bottom.TickLabelStyle.FontSize = TickLabelSize;
        plot.Axes.Left.TickLabelStyle.FontSize = TickLabelSize;
        plot.Grid.MajorLineColor = Grid;
        plot.FigureBackground.Color = Colors.White;
        plot.DataBackground.Color = Colors.White;
        return plot;
    }

    private static void EnsureFonts()
    {
        if (Volatile.Read(ref _fontsInstalled))
        {
            return;
        }

        lock (FontGate)
        {
            if (_fontsInstalled)
            {
                return;
            }

            var (regular, bold) = SheetFonts.FilePaths;
            Fonts.AddFontFile(FontName, regular, bold: false, italic: false);
            Fonts.AddFontFile(FontName, bold, bold: true, italic: false);
            Fonts.Default = FontName;
            Volatile.Write(ref _fontsInstalled, true);
        }
    }
}
