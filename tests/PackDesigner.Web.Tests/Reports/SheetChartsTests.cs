using PackDesigner.Reports.Charts;

namespace PackDesigner.Web.Tests.Reports;

/// <summary>The charts: label spreading of the ladder, and the image encodings.</summary>
public sealed class SheetChartsTests
{
    private static readonly SheetTestDesign Design = new();

    [Fact]
    public void Spread_CrowdedValues_KeepOrderAndGapInsideBounds()
    {
        double[] values = [3.65, 3.60, 3.353, 3.346, 3.345, 3.26, 2.5];
        var y = SheetCharts.Spread(values, 0.05, 2.45, 3.70);
        for (var i = 1; i < y.Length; i++)
        {
            Assert.True(y[i - 1] - y[i] >= 0.05 - 1e-12, $"labels {i - 1} and {i} overlap");
        }

        Assert.All(y, v => Assert.InRange(v, 2.45, 3.70));
        Assert.Equal(3.65, y[0]);
        Assert.Equal(2.5, y[^1]);
    }

    [Fact]
    public void Spread_CrowdedAtTheBottom_PushedUpFromTheFloor()
    {
        double[] values = [2.52, 2.51, 2.50];
        var y = SheetCharts.Spread(values, 0.1, 2.5, 3.0);
        Assert.Equal(2.5, y[^1], 12);
        Assert.Equal(2.7, y[0], 12);
    }

    [Fact]
    public void OcvChart_Png_IsAPngOfTheScaledSize()
    {
        var model = Design.Model();
        var png = SheetCharts.OcvChart(model.OcvChart, 400, 200, 2);
        // PNG signature and IHDR width/height (ISO/IEC 15948, 5.2 and 11.2.2).
        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A }, png[..8]);
        Assert.Equal(800, (png[16] << 24) | (png[17] << 16) | (png[18] << 8) | png[19]);
        Assert.Equal(400, (png[20] << 24) | (png[21] << 16) | (png[22] << 8) | png[23]);
    }

    [Fact]
    public void LadderChart_Jpeg_IsAJpegAndRepeatable()
    {
        var model = Design.Model();
        var a = SheetCharts.LadderChart(model.LadderChart, 400, 250, 1.5, ChartImageFormat.Jpeg);
        var b = SheetCharts.LadderChart(model.LadderChart, 400, 250, 1.5, ChartImageFormat.Jpeg);
        // JPEG SOI marker FF D8 (ITU-T T.81, B.1.1.3).
        Assert.Equal(0xFF, a[0]);
        Assert.Equal(0xD8, a[1]);
        Assert.Equal(a, b);
    }

    [Fact]
    public void SpreadHistogram_Jpeg_IsAJpegAndRepeatable()
    {
        var chart = new PackDesigner.Reports.Model.SpreadHistogramModel("Title", "Caption", "V", "Packs", 3.3410, 0.00001,
            [.. Enumerable.Range(0, 40).Select(i => (long)(i * (40 - i)))],
            [new("ov-release", "OV release 3.500 V", 3.5), new("ov-trip", "OV trip 3.600 V", 3.6)]);
        var a = SheetCharts.SpreadHistogram(chart, 400, 200, 1.5, ChartImageFormat.Jpeg);
        var b = SheetCharts.SpreadHistogram(chart, 400, 200, 1.5, ChartImageFormat.Jpeg);
        // JPEG SOI marker FF D8 (ITU-T T.81, B.1.1.3).
        Assert.Equal(0xFF, a[0]);
        Assert.Equal(0xD8, a[1]);
        Assert.Equal(a, b);
    }

    [Fact]
    public void SpreadHistogram_AllTrialsEqual_PngOfTheScaledSize()
    {
        var chart = new PackDesigner.Reports.Model.SpreadHistogramModel("Title", "Caption", "V", "Packs", 3.45, 0, [10000],
            [new("ov-release", "OV release 3.500 V", 3.5), new("ov-trip", "OV trip 3.600 V", 3.6)]);
        var png = SheetCharts.SpreadHistogram(chart, 300, 150, 2);
        // PNG signature and IHDR width/height (ISO/IEC 15948, 5.2 and 11.2.2).
        Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A }, png[..8]);
        Assert.Equal(600, (png[16] << 24) | (png[17] << 16) | (png[18] << 8) | png[19]);
        Assert.Equal(300, (png[20] << 24) | (png[21] << 16) | (png[22] << 8) | png[23]);
    }
}
