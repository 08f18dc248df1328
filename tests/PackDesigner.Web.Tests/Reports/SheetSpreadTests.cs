using PackDesigner.Core.Spread;
using PackDesigner.Reports;
using PackDesigner.Reports.Model;
using PackDesigner.Reports.Pdf;
using F = PackDesigner.Reports.Formatting.SheetFormatter;

namespace PackDesigner.Web.Tests.Reports;

/// <summary>The cell-spread part of the design sheet: its model strings and its PDF section.</summary>
public sealed class SheetSpreadTests
{
    private static readonly SheetTestDesign Design = new();

    // One analysis and one render of the standard test design with its spread (default settings: deterministic).
    private static readonly Lazy<(SpreadResult Spread, DesignSheetModel Model, byte[] Pdf, PdfText Text)> WithSpread = new(() =>
    {
        var spread = Analyze(Design);
        var model = DesignSheetModel.Create(Design.Header, Design.Input, Design.Evaluate(), spread);
        var pdf = DesignSheetRenderer.RenderPdf(model, PaperSize.A4);
        return (spread, model, pdf, PdfText.Read(pdf));
    });

    [Fact]
    public void Create_WithSpread_StringsAreTheFormattedResult()
    {
        var (s, model, _, _) = WithSpread.Value;
        var part = model.Spread!;

        Assert.Equal("Cell spread", part.Title);
        SettingRow Row(IReadOnlyList<SettingRow> rows, string key) => rows.Single(r => r.Key == key);
        foreach (var (key, p, ci) in new[]
        {
            ("ov-trip", s.OverVoltageTripProbability, s.OverVoltageTripConfidence95),
            ("ov-release", s.OverVoltageReleaseProbability, s.OverVoltageReleaseConfidence95),
            ("uv-trip", s.UnderVoltageTripProbability, s.UnderVoltageTripConfidence95),
        })
        {
            var row = Row(part.Probabilities, key);
            Assert.Equal(F.Probability(p).Text, row.Value.Text);
            Assert.Equal("Share of the packs; 95 % interval " + F.ProbabilityInterval(ci.Low, ci.High), row.Note);
        }

        Assert.Equal(F.PackVoltage(s.RecommendedConstantVoltage).Text, Row(part.Recommendation, "recommended-cv").Value.Text);
        Assert.Equal(F.CellVoltage(s.RecommendedConstantVoltagePerCell).Text, Row(part.Recommendation, "recommended-cv-per-cell").Value.Text);
        Assert.Equal(F.Energy(s.EnergyCostWh).Text, Row(part.Recommendation, "energy-cost").Value.Text);

        var v = part.Percentiles.Single(r => r.Key == "highest-cell-voltage");
        var h = s.HighestCellVoltageAtEndOfCharge;
        Assert.Equal([F.CellVoltage(h.P5).Text, F.CellVoltage(h.P50).Text, F.CellVoltage(h.P95).Text, F.CellVoltage(h.P999).Text],
            new[] { v.P5.Text, v.P50.Text, v.P95.Text, v.P999.Text });
        var e = part.Percentiles.Single(r => r.Key == "usable-energy");
        var u = s.UsableEnergyWh;
        Assert.Equal([F.Energy(u.P5).Text, F.Energy(u.P50).Text, F.Energy(u.P95).Text, F.Energy(u.P999).Text],
            new[] { e.P5.Text, e.P50.Text, e.P95.Text, e.P999.Text });

        // Percentiles of one sample never decrease with the quantile (definition of an empirical quantile).
        Assert.True(h.P5 <= h.P50 && h.P50 <= h.P95 && h.P95 <= h.P999);
        // Default settings: 10 000 trials, seed 1, and the 2 % capacity tolerance read as 3 σ → 0.67 % (common practice).
        Assert.StartsWith("10000 trials · seed 1 · capacity σ 0.67 % (datasheet tolerance as 3 σ)", part.RunLine, StringComparison.Ordinal);
    }

    [Fact]
    public void Create_WithSpread_HistogramIsTheResultsWithBothOvLines()
    {
        var (s, model, _, _) = WithSpread.Value;
        var chart = model.Spread!.Histogram!;
        var source = s.HighestCellVoltageHistogram!;

        Assert.Equal(source.Counts, chart.Counts);
        Assert.Equal(40, chart.Counts.Count);
        Assert.Equal(s.Trials, chart.Counts.Sum());
        Assert.Equal(source.Low, chart.Low);
        Assert.Equal(source.BinWidth, chart.BinWidth);
        Assert.Equal(["ov-release", "ov-trip"], chart.Lines.Select(l => l.Key));
        Assert.Equal(s.OverVoltageRelease, chart.Lines[0].Value);
        Assert.Equal("OV trip " + F.CellVoltage(s.OverVoltageTrip).Text, chart.Lines[1].Label);
    }

    [Fact]
    public void Create_WithoutSpread_NoSpreadPartAndTheSameSheet()
    {
        var result = Design.Evaluate();
        var plain = DesignSheetModel.Create(Design.Header, Design.Input, result);
        var nullSpread = DesignSheetModel.Create(Design.Header, Design.Input, result, null);

        Assert.Null(plain.Spread);
        Assert.Null(nullSpread.Spread);
        var pdf = DesignSheetRenderer.RenderPdf(nullSpread, PaperSize.A4);
        Assert.Equal(DesignSheetRenderer.RenderPdf(plain, PaperSize.A4), pdf);
        var text = PdfText.Read(pdf);
        Assert.DoesNotContain(text.AllLines, l => l.Contains("Cell spread", StringComparison.Ordinal));
        Assert.Equal(2, text.ImagesPerPage.Sum());
        Assert.Contains("7 Findings", text.AllLines);
    }

    [Fact]
    public void Create_SpreadOfAnotherConfiguration_Throws()
    {
        var other = Analyze(Design.WithInput(i => i with { Series = 23 }));

        var e = Assert.Throws<ArgumentException>(() => DesignSheetModel.Create(Design.Header, Design.Input, Design.Evaluate(), other));
        Assert.Equal("spread", e.ParamName);
    }

    [Fact]
    public void RenderPdf_WithSpread_HeadingRecommendedCvAndThreeCharts()
    {
        var (s, model, _, text) = WithSpread.Value;

        Assert.Contains("7 Cell spread", text.AllLines);
        Assert.Contains("8 Findings", text.AllLines);
        Assert.Contains($"Recommended CV, pack {F.PackVoltage(s.RecommendedConstantVoltage).Text}", text.Flat, StringComparison.Ordinal);
        Assert.Contains($"Recommended CV per cell {F.CellVoltage(s.RecommendedConstantVoltagePerCell).Text}", text.AllLines);
        foreach (var p in model.Spread!.Percentiles)
        {
            Assert.Contains($"{p.P5.Text} {p.P50.Text} {p.P95.Text} {p.P999.Text}", text.Flat, StringComparison.Ordinal);
        }

        // The OCV chart, the ladder and the histogram.
        Assert.Equal(3, text.ImagesPerPage.Sum());
    }

    [Fact]
    public void RenderPdf_WithSpreadTwice_ByteIdentical()
    {
        var again = DesignSheetModel.Create(Design.Header, Design.Input, Design.Evaluate(), Analyze(Design));

        Assert.Equal(WithSpread.Value.Pdf, DesignSheetRenderer.RenderPdf(again, PaperSize.A4));
    }

    private static SpreadResult Analyze(SheetTestDesign design) =>
        SpreadMonteCarlo.Analyze(new SpreadRequest { Design = design.Input, Spread = new SpreadSettings() }).Result!;
}
