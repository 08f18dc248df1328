using PackDesigner.Reports.Formatting;

namespace PackDesigner.Reports.Model;

/// <summary>A labelled value of the summary.</summary>
public sealed record SheetField(string Key, string Label, string Value);

/// <summary>One entered figure; <see cref="Source"/> says whether it is the datasheet's, the preset's typical value, derived or entered.</summary>
public sealed record InputRow(string Key, string Label, string Value, string Source);

/// <summary>A group of inputs (cell, configuration, controller...).</summary>
public sealed record InputGroup(string Key, string Title, IReadOnlyList<InputRow> Rows, bool ShowsSource);

/// <summary>
/// One BMS setting, per cell (per parallel group for currents: per cell) and per pack. <see cref="PerPack"/> is null
/// where the setting exists per cell only (the balance start voltage).
/// </summary>
public sealed record BmsSetting(string Key, string Group, string Label, SheetValue PerCell, SheetValue? PerPack);

/// <summary>One value of the charger or protection tables, with an optional note.</summary>
public sealed record SettingRow(string Key, string Label, SheetValue Value, string? Note = null);

/// <summary>A titled group of <see cref="SettingRow"/>s (fuse, contactor, precharge...).</summary>
public sealed record SettingGroup(string Key, string Title, IReadOnlyList<SettingRow> Rows, string? Note = null);

/// <summary>One finding as printed.</summary>
public sealed record FindingRow(string Severity, string Code, string Message);

/// <summary>A caution of the sheet; every sheet carries all of them.</summary>
public sealed record Caution(string Key, string Title, string Text);

/// <summary>One line of the sign-off block; name and date are empty until recorded.</summary>
public sealed record SignOffLine(string Role, string Name, string Date, bool Recorded);

/// <summary>Build notes: an introduction and numbered steps.</summary>
public sealed record BuildNotes(string Title, string Introduction, IReadOnlyList<string> Steps);

/// <summary>A point of a chart, in the chart's units.</summary>
public sealed record ChartPoint(double X, double Y);

/// <summary>A labelled horizontal line of a chart at <see cref="Value"/> (chart units), labelled with <see cref="Label"/>.</summary>
public sealed record ChartLine(string Key, string Label, double Value);

/// <summary>Pack open-circuit voltage against state of charge (%, V), the window shaded, the limits as lines.</summary>
public sealed record OcvChartModel(
    string Title,
    string Caption,
    string XLabel,
    string YLabel,
    IReadOnlyList<ChartPoint> Curve,
    double WindowLowPercent,
    double WindowHighPercent,
    string WindowLabel,
    IReadOnlyList<ChartLine> Lines);

/// <summary>One layer of the protection ladder, per cell (V) with its printed per-cell and per-pack values.</summary>
public sealed record LadderRung(string Key, string Label, double PerCellVoltage, SheetValue PerCell, SheetValue PerPack);

/// <summary>The protection ladder drawn to scale per cell, highest layer first.</summary>
public sealed record LadderChartModel(string Title, string Caption, string YLabel, IReadOnlyList<LadderRung> Rungs);

/// <summary>One figure of the spread analysis at four percentiles, as printed.</summary>
public sealed record SpreadPercentileRow(string Key, string Label, SheetValue P5, SheetValue P50, SheetValue P95, SheetValue P999);

/// <summary>
/// Counts of the highest cell voltage at the end of charge in equal bins from <see cref="Low"/> (V per cell), each
/// <see cref="BinWidth"/> wide, with the OV release and OV trip as labelled vertical lines.
/// </summary>
public sealed record SpreadHistogramModel(
    string Title,
    string Caption,
    string XLabel,
    string YLabel,
    double Low,
    double BinWidth,
    IReadOnlyList<long> Counts,
    IReadOnlyList<ChartLine> Lines);

/// <summary>
/// The cell-spread analysis as printed: how it was run, the trip probabilities with their 95 % intervals, the
/// recommended charge voltage and its energy cost, the percentiles and the histogram (null when not kept).
/// </summary>
public sealed record SheetSpread(
    string Title,
    string RunLine,
    IReadOnlyList<SettingRow> Probabilities,
    IReadOnlyList<SettingRow> Recommendation,
    IReadOnlyList<SpreadPercentileRow> Percentiles,
    SpreadHistogramModel? Histogram);
