using PackDesigner.Reports;

namespace PackDesigner.Web.Pages.Sheets;

/// <summary>
/// Addresses of a revision's design sheet, its files and its charts; shared by the app and its tests. Every route
/// is under <see cref="RevisionTemplate"/>, with the design id and the revision number as whole numbers.
/// </summary>
public static class SheetRoutes
{
    /// <summary>Route template of one revision; the route values are <c>id</c> and <c>n</c>.</summary>
    public const string RevisionTemplate = "/designs/{id:int}/revisions/{n:int}";

    public const string SheetPath = "/sheet";
    public const string PdfPath = "/sheet.pdf";
    public const string CsvPath = "/settings.csv";
    public const string JsonPath = "/settings.json";
    public const string OcvChartPath = "/charts/ocv.png";
    public const string LadderChartPath = "/charts/ladder.png";
    public const string SpreadChartPath = "/charts/spread.png";

    /// <summary>The design's own page (built by the design pages).</summary>
    public static string Design(int id) => FormattableString.Invariant($"/designs/{id}");

    public static string Revision(int id, int n) => FormattableString.Invariant($"/designs/{id}/revisions/{n}");

    /// <summary>The HTML print view; with <paramref name="paper"/>, laid out for that paper whatever the saved setting.</summary>
    public static string Sheet(int id, int n, PaperSize? paper = null) => Revision(id, n) + SheetPath + PaperQuery(paper);

    /// <summary>The PDF; with <paramref name="paper"/>, on that paper whatever the saved setting.</summary>
    public static string Pdf(int id, int n, PaperSize? paper = null) => Revision(id, n) + PdfPath + PaperQuery(paper);

    public static string SettingsCsv(int id, int n) => Revision(id, n) + CsvPath;

    public static string SettingsJson(int id, int n) => Revision(id, n) + JsonPath;

    public static string OcvChart(int id, int n) => Revision(id, n) + OcvChartPath;

    public static string LadderChart(int id, int n) => Revision(id, n) + LadderChartPath;

    public static string SpreadChart(int id, int n) => Revision(id, n) + SpreadChartPath;

    /// <summary>File name of the PDF: <c>design-12-rev-3.pdf</c>.</summary>
    public static string PdfFileName(int id, int n) => FormattableString.Invariant($"design-{id}-rev-{n}.pdf");

    public static string CsvFileName(int id, int n) => FormattableString.Invariant($"design-{id}-rev-{n}-settings.csv");

    public static string JsonFileName(int id, int n) => FormattableString.Invariant($"design-{id}-rev-{n}-settings.json");

    private static string PaperQuery(PaperSize? paper) =>
        paper is { } p ? "?" + PaperSetting.QueryName + "=" + PaperSetting.Name(p) : string.Empty;
}
