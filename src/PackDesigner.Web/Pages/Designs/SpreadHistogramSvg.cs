using System.Globalization;
using System.Text;
using PackDesigner.Core.Spread;

namespace PackDesigner.Web.Pages.Designs;

/// <summary>
/// An inline SVG bar chart of a spread histogram (cell voltage, V) with the OV release and OV trip drawn as vertical
/// lines. The x range covers the bars and both marks; bar heights are counts scaled to the tallest bar.
/// </summary>
public static class SpreadHistogramSvg
{
    private const double Width = 720;
    private const double Height = 280;
    private const double Left = 56;
    private const double Right = 16;
    private const double Top = 28;
    private const double Bottom = 40;
    private const int Ticks = 6;

    public static string Render(SpreadHistogram? histogram, double overVoltageRelease, double overVoltageTrip)
    {
        if (histogram is not { Counts.Count: > 0 } h)
        {
            return string.Empty;
        }

        var high = h.Low + h.BinWidth * h.Counts.Count;
        var low = Math.Min(h.Low, overVoltageRelease);
        var top = Math.Max(high, overVoltageTrip);
        var pad = Math.Max((top - low) * 0.05, 0.002);
        low -= pad;
        top += pad;
        var plotW = Width - Left - Right;
        var plotH = Height - Top - Bottom;
        double X(double v) => Left + (v - low) / (top - low) * plotW;
        var tallest = Math.Max(1, h.Counts.Max());
        // A histogram whose trials all gave one value is drawn as one bar 1 % of the axis wide.
        var barWidth = h.BinWidth > 0 ? h.BinWidth : (top - low) / 100;

        var svg = new StringBuilder();
        svg.Append(I($"<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"spread-histogram\" viewBox=\"0 0 {Width} {Height}\" role=\"img\" data-testid=\"spread-histogram\" aria-labelledby=\"histogram-title\">"));
        svg.Append(I($"<title id=\"histogram-title\">Highest cell voltage at the end of charge over the trials; OV release {overVoltageRelease:0.000} V and OV trip {overVoltageTrip:0.000} V marked</title>"));
        svg.Append(I($"<line x1=\"{Left}\" y1=\"{Top + plotH}\" x2=\"{Left + plotW}\" y2=\"{Top + plotH}\" stroke=\"#5b6472\" />"));
        for (var i = 0; i < h.Counts.Count; i++)
        {
            if (h.Counts[i] == 0)
            {
                continue;
            }

            var x0 = X(h.Low + i * barWidth);
            var x1 = X(h.Low + (i + 1) * barWidth);
            var barH = plotH * h.Counts[i] / tallest;
            svg.Append(I($"<rect x=\"{x0:0.##}\" y=\"{Top + plotH - barH:0.##}\" width=\"{Math.Max(1, x1 - x0 - 0.5):0.##}\" height=\"{barH:0.##}\" fill=\"#3b6ea5\"><title>{h.Low + i * barWidth:0.0000}–{h.Low + (i + 1) * barWidth:0.0000} V: {h.Counts[i]} trials</title></rect>"));
        }

        for (var t = 0; t <= Ticks; t++)
        {
            var v = low + (top - low) * t / Ticks;
            svg.Append(I($"<text x=\"{X(v):0.##}\" y=\"{Top + plotH + 16}\" font-size=\"11\" text-anchor=\"middle\" fill=\"#5b6472\">{v:0.000}</text>"));
        }

        svg.Append(I($"<text x=\"{Left + plotW / 2}\" y=\"{Height - 6}\" font-size=\"12\" text-anchor=\"middle\" fill=\"#1f2933\">Highest cell voltage at the end of charge (V)</text>"));
        svg.Append(I($"<text x=\"14\" y=\"{Top + plotH / 2}\" font-size=\"12\" text-anchor=\"middle\" fill=\"#1f2933\" transform=\"rotate(-90 14 {Top + plotH / 2})\">Trials</text>"));
        svg.Append(I($"<text x=\"{Left - 6}\" y=\"{Top + 4}\" font-size=\"11\" text-anchor=\"end\" fill=\"#5b6472\">{tallest}</text>"));
        Mark(svg, X(overVoltageRelease), plotH, "#b7791f", "OV release", "ov-release-mark", -1);
        Mark(svg, X(overVoltageTrip), plotH, "#c53030", "OV trip", "ov-trip-mark", 1);
        svg.Append("</svg>");
        return svg.ToString();
    }

    private static void Mark(StringBuilder svg, double x, double plotH, string colour, string label, string testId, int side) =>
        svg.Append(I($"<g data-testid=\"{testId}\"><line x1=\"{x:0.##}\" y1=\"{Top - 6}\" x2=\"{x:0.##}\" y2=\"{Top + plotH}\" stroke=\"{colour}\" stroke-width=\"2\" stroke-dasharray=\"5 3\" /><text x=\"{x + 4 * side:0.##}\" y=\"{Top - 10}\" font-size=\"12\" text-anchor=\"{(side < 0 ? "end" : "start")}\" fill=\"{colour}\">{label}</text></g>"));

    private static string I(FormattableString s) => s.ToString(CultureInfo.InvariantCulture);
}
